package dev.morse.complex;

import it.unimi.dsi.fastutil.ints.IntArrayList;
import it.unimi.dsi.fastutil.objects.Object2IntOpenHashMap;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * The simplicial complex of all nonempty subsets of listed faces, with the alternating-sign
 * boundary {@code ∂[v0..vd] = Σ (-1)^i [v0..^vi..vd]} (common practice; Munkres, Elements of
 * Algebraic Topology, 1984, §5). Each simplex is its ascending vertex ids; simplices are numbered by
 * dimension, lexicographically within a dimension.
 *
 * <p>Memory: per d-simplex 4(d+1) bytes of vertices, 4 bytes of offsets, and 8(d+1) bytes of
 * boundary plus as much again for the coboundary.
 */
public final class SimplicialComplex implements ChainComplex {
    private static final int LARGEST_FACE = 30;

    private final ComplexKind kind;
    private final String separator;
    private final String[] vertexLabels;
    private final GradedCells cells;
    private final int[] vertexOffsets;
    private final int[] vertices;
    private final Boundary boundary;
    private final Boundary coboundary;

    SimplicialComplex(String[] vertexLabels, List<int[]> faces, ComplexKind kind, String separator) {
        this.kind = kind;
        this.separator = separator;
        this.vertexLabels = vertexLabels.clone();
        List<List<IntArrayList>> byDimension = allSubsets(faces);
        int[] counts = new int[byDimension.size()];
        for (int d = 0; d < counts.length; d++) {
            counts[d] = byDimension.get(d).size();
        }
        this.cells = new GradedCells(counts);
        int total = cells.cellCount();
        this.vertexOffsets = new int[total + 1];
        IntArrayList flat = new IntArrayList();
        List<Object2IntOpenHashMap<IntArrayList>> ids = new ArrayList<>();
        int cell = 0;
        for (int d = 0; d < byDimension.size(); d++) {
            Object2IntOpenHashMap<IntArrayList> index = new Object2IntOpenHashMap<>();
            for (IntArrayList simplex : byDimension.get(d)) {
                index.put(simplex, cell);
                flat.addAll(simplex);
                vertexOffsets[++cell] = flat.size();
            }
            ids.add(index);
        }
        this.vertices = flat.toIntArray();
        this.boundary = buildBoundary(ids);
        this.coboundary = boundary.transpose(total);
    }

    /** The complex of all faces of the listed faces. */
    public static SimplicialComplex of(Facets facets) {
        String[] labels = new String[facets.vertexCount()];
        for (int v = 0; v < labels.length; v++) {
            labels[v] = facets.vertexLabel(v);
        }
        List<int[]> faces = new ArrayList<>();
        for (int f = 0; f < facets.faceCount(); f++) {
            faces.add(facets.face(f));
        }
        return new SimplicialComplex(labels, faces, ComplexKind.SIMPLICIAL, " ");
    }

    private static List<List<IntArrayList>> allSubsets(List<int[]> faces) {
        List<java.util.Set<IntArrayList>> sets = new ArrayList<>();
        for (int[] face : faces) {
            if (face.length > LARGEST_FACE) {
                throw new IllegalArgumentException("a face of " + face.length
                        + " vertices is too large to list all its subsets");
            }
            int[] sorted = face.clone();
            Arrays.sort(sorted);
            while (sets.size() < sorted.length) {
                sets.add(new java.util.HashSet<>());
            }
            for (int mask = 1; mask < (1 << sorted.length); mask++) {
                IntArrayList subset = new IntArrayList(Integer.bitCount(mask));
                for (int i = 0; i < sorted.length; i++) {
                    if ((mask & (1 << i)) != 0) {
                        subset.add(sorted[i]);
                    }
                }
                sets.get(subset.size() - 1).add(subset);
            }
        }
        List<List<IntArrayList>> sorted = new ArrayList<>();
        for (java.util.Set<IntArrayList> set : sets) {
            List<IntArrayList> list = new ArrayList<>(set);
            list.sort(IntArrayList::compareTo);
            sorted.add(list);
        }
        return sorted;
    }

    private Boundary buildBoundary(List<Object2IntOpenHashMap<IntArrayList>> ids) {
        int total = cells.cellCount();
        int[] offsets = new int[total + 1];
        IntArrayList targets = new IntArrayList();
        IntArrayList coefficients = new IntArrayList();
        for (int c = 0; c < total; c++) {
            int d = vertexOffsets[c + 1] - vertexOffsets[c] - 1;
            if (d > 0) {
                for (int i = 0; i <= d; i++) {
                    IntArrayList face = new IntArrayList(d);
                    for (int j = 0; j <= d; j++) {
                        if (j != i) {
                            face.add(vertices[vertexOffsets[c] + j]);
                        }
                    }
                    targets.add(ids.get(d - 1).getInt(face));
                    coefficients.add(i % 2 == 0 ? 1 : -1);
                }
            }
            offsets[c + 1] = targets.size();
        }
        return new Boundary(offsets, targets.toIntArray(), coefficients.toIntArray());
    }

    @Override
    public ComplexKind kind() {
        return kind;
    }

    @Override
    public int dimension() {
        return cells.dimension();
    }

    @Override
    public int cellCount() {
        return cells.cellCount();
    }

    @Override
    public int cellCount(int d) {
        return cells.cellCount(d);
    }

    @Override
    public int firstCell(int d) {
        return cells.firstCell(d);
    }

    @Override
    public int dimensionOf(int cell) {
        return cells.dimensionOf(cell);
    }

    @Override
    public Boundary boundary() {
        return boundary;
    }

    @Override
    public Boundary coboundary() {
        return coboundary;
    }

    @Override
    public String cellName(int cell) {
        StringBuilder name = new StringBuilder();
        for (int i = vertexOffsets[cell]; i < vertexOffsets[cell + 1]; i++) {
            if (i > vertexOffsets[cell]) {
                name.append(separator);
            }
            name.append(vertexLabels[vertices[i]]);
        }
        return kind == ComplexKind.SIMPLICIAL ? "{" + name + "}" : name.toString();
    }
}
