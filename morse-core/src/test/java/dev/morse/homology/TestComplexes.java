package dev.morse.homology;

import dev.morse.complex.Boundary;
import dev.morse.complex.ChainComplex;
import dev.morse.complex.ComplexKind;
import dev.morse.complex.GradedCells;
import dev.morse.complex.ListedComplex;
import it.unimi.dsi.fastutil.ints.IntArrayList;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;

/**
 * A chain complex for tests, given by its cells per dimension and boundary entries, or built from
 * the facets of a simplicial complex (faces ordered, incidence numbers {@code (-1)^i} for dropping
 * the i-th vertex: the standard simplicial boundary).
 */
final class TestComplexes {
    private TestComplexes() {
    }

    private static ChainComplex build(ComplexKind kind, int[] counts, List<List<int[]>> entries) {
        GradedCells cells = new GradedCells(counts);
        int total = cells.cellCount();
        int[] offsets = new int[total + 1];
        List<int[]> all = new ArrayList<>();
        for (int d = 0; d < entries.size(); d++) {
            for (int[] e : entries.get(d)) {
                // e = {column cell in dimension d, row cell in dimension d - 1, coefficient}
                all.add(new int[] {cells.firstCell(d) + e[0], cells.firstCell(d - 1) + e[1], e[2]});
            }
        }
        all.sort((a, b) -> a[0] != b[0] ? Integer.compare(a[0], b[0]) : Integer.compare(a[1], b[1]));
        int[] targets = new int[all.size()];
        int[] coefficients = new int[all.size()];
        for (int i = 0; i < all.size(); i++) {
            offsets[all.get(i)[0] + 1]++;
            targets[i] = all.get(i)[1];
            coefficients[i] = all.get(i)[2];
        }
        for (int c = 0; c < total; c++) {
            offsets[c + 1] += offsets[c];
        }
        return new ListedComplex(kind, cells, new Boundary(offsets, targets, coefficients), c -> "c" + c);
    }

    /**
     * A cell complex with {@code counts[d]} cells in dimension d; {@code boundaries[d]} lists the
     * entries {column, row, coefficient} of the boundary from dimension d to d - 1.
     */
    static ChainComplex cellular(int[] counts, int[][]... boundaries) {
        List<List<int[]>> entries = new ArrayList<>();
        for (int[][] b : boundaries) {
            entries.add(Arrays.asList(b));
        }
        return build(ComplexKind.CELLULAR, counts, entries);
    }

    /** The simplicial complex whose faces are all nonempty subsets of the given facets. */
    static ChainComplex simplicial(int[][] facets) {
        int top = 0;
        for (int[] f : facets) {
            top = Math.max(top, f.length - 1);
        }
        List<HashMap<String, Integer>> index = new ArrayList<>();
        List<List<int[]>> faces = new ArrayList<>();
        for (int d = 0; d <= top; d++) {
            index.add(new HashMap<>());
            faces.add(new ArrayList<>());
        }
        for (int[] facet : facets) {
            int[] f = facet.clone();
            Arrays.sort(f);
            for (int mask = 1; mask < (1 << f.length); mask++) {
                IntArrayList s = new IntArrayList();
                for (int i = 0; i < f.length; i++) {
                    if ((mask & (1 << i)) != 0) {
                        s.add(f[i]);
                    }
                }
                int d = s.size() - 1;
                String key = Arrays.toString(s.toIntArray());
                if (!index.get(d).containsKey(key)) {
                    index.get(d).put(key, faces.get(d).size());
                    faces.get(d).add(s.toIntArray());
                }
            }
        }
        int[] counts = new int[top + 1];
        List<List<int[]>> entries = new ArrayList<>();
        entries.add(List.of());
        for (int d = 0; d <= top; d++) {
            counts[d] = faces.get(d).size();
            if (d == 0) {
                continue;
            }
            List<int[]> e = new ArrayList<>();
            for (int j = 0; j < faces.get(d).size(); j++) {
                int[] s = faces.get(d).get(j);
                for (int i = 0; i <= d; i++) {
                    int[] face = new int[d];
                    for (int t = 0, k = 0; t <= d; t++) {
                        if (t != i) {
                            face[k++] = s[t];
                        }
                    }
                    e.add(new int[] {j, index.get(d - 1).get(Arrays.toString(face)), i % 2 == 0 ? 1 : -1});
                }
            }
            entries.add(e);
        }
        return build(ComplexKind.SIMPLICIAL, counts, entries);
    }
}
