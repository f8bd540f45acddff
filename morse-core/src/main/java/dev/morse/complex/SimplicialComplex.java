package dev.morse.complex;

import java.util.Arrays;

/**
 * The simplicial complex whose faces are all nonempty subsets of the listed faces, each simplex
 * once. Cells are numbered by dimension and, within a dimension, in lexicographic order of their
 * ascending vertex ids. The boundary is {@code Σ (-1)^i [v0 .. v̂i .. vd]} with
 * {@code v0 < ... < vd} (orientation by vertex order).
 *
 * <p>The faces are found from the top down: the faces of dimension d are the listed ones of that
 * size together with the facets of the d+1 dimensional faces, deduplicated in a hash table, so
 * the work is proportional to the boundary entries however much the listed faces overlap.
 *
 * <p>Memory: a cell of dimension d costs {@code 4(d+1)} bytes for its vertices and
 * {@code 4 + 8(d+1)} for its boundary row, {@code 12(d+1) + 4} bytes in all, and about as much
 * again for the coboundary once it is requested.
 */
public final class SimplicialComplex extends TupleComplex {
    private final Facets facets;

    private SimplicialComplex(Facets facets, GradedCells cells, int[][] simplices, Boundary boundary) {
        super(ComplexKind.SIMPLICIAL, cells, simplices, boundary);
        this.facets = facets;
    }

    /**
     * All nonempty subsets of the listed faces, with at most {@link #DEFAULT_CELL_LIMIT} cells.
     *
     * @throws IllegalStateException if there are more faces than that
     */
    public static SimplicialComplex of(Facets facets) {
        return of(facets, DEFAULT_CELL_LIMIT);
    }

    /**
     * All nonempty subsets of the listed faces.
     *
     * @param maxCells the most faces allowed
     * @throws IllegalStateException if the complex has more than {@code maxCells} faces
     */
    public static SimplicialComplex of(Facets facets, long maxCells) {
        long limit = CellLimits.validLimit(maxCells);
        int largest = 0;
        for (int f = 0; f < facets.faceCount(); f++) {
            largest = Math.max(largest, facets.faceSize(f));
        }
        if (largest >= 62 || (1L << largest) - 1 > limit) {
            throw new IllegalStateException("a listed face has " + largest + " vertices, so the complex has at least 2^"
                    + largest + " - 1 faces, more than the limit of " + limit);
        }
        // the faces of one k-vertex face alone have k·2^(k-1) boundary entries (each of the 2^k subsets
        // of size j has j facets): refuse before enumerating them when one array cannot hold those
        long entries = (long) largest << Math.max(0, largest - 1);
        if (entries > CellLimits.MAX_ARRAY) {
            throw new IllegalStateException(String.format(java.util.Locale.ROOT, "a listed face has %d vertices, so the"
                    + " complex has at least 2^%d - 1 = %,d faces with %,d boundary entries, more than one array holds",
                    largest, largest, (1L << largest) - 1, entries));
        }
        TupleTable[] tables = faceTables(facets, largest, limit);
        int top = largest - 1;
        int[] counts = new int[largest];
        int[][] simplices = new int[largest][];
        for (int d = 0; d <= top; d++) {
            tables[d].sortLexicographically();
            counts[d] = tables[d].size();
            simplices[d] = tables[d].toFlatArray();
        }
        Boundary boundary = boundaryOf(tables, simplices, counts);
        return new SimplicialComplex(facets, new GradedCells(counts), simplices, boundary);
    }

    private static TupleTable[] faceTables(Facets facets, int largest, long limit) {
        int[] listed = new int[largest + 1];
        for (int f = 0; f < facets.faceCount(); f++) {
            listed[facets.faceSize(f)]++;
        }
        TupleTable[] tables = new TupleTable[largest];
        for (int d = 0; d < largest; d++) {
            tables[d] = new TupleTable(d + 1, listed[d + 1]);
        }
        for (int f = 0; f < facets.faceCount(); f++) {
            int[] face = facets.face(f);
            Arrays.sort(face);
            tables[face.length - 1].add(face, 0);
        }
        long total = largest == 0 ? 0 : tables[largest - 1].size();
        int[] face = new int[largest];
        for (int d = largest - 1; d >= 1; d--) {
            TupleTable upper = tables[d];
            int[] flat = upper.backingArray(); // upper is complete: only the table below grows
            for (int s = 0; s < upper.size(); s++) {
                int at = s * (d + 1);
                for (int i = 0; i <= d; i++) {
                    copyWithout(flat, at, d + 1, i, face);
                    tables[d - 1].add(face, 0);
                }
            }
            total += tables[d - 1].size();
            if (total > limit) {
                throw new IllegalStateException("the simplicial complex has more than the limit of " + limit + " faces");
            }
        }
        return tables;
    }

    private static Boundary boundaryOf(TupleTable[] tables, int[][] simplices, int[] counts) {
        long cellTotal = 0;
        long entryTotal = 0;
        for (int d = 0; d < counts.length; d++) {
            cellTotal += counts[d];
            if (d > 0) {
                entryTotal += (long) counts[d] * (d + 1);
            }
        }
        if (entryTotal > CellLimits.MAX_ARRAY) {
            throw new IllegalStateException("the simplicial complex has more boundary entries than one array holds");
        }
        int[] offsets = new int[(int) cellTotal + 1];
        int[] targets = new int[(int) entryTotal];
        int[] coefficients = new int[(int) entryTotal];
        int cell = counts.length == 0 ? 0 : counts[0]; // vertices have empty boundaries
        int entry = 0;
        int firstBelow = 0;
        int[] face = new int[counts.length];
        for (int d = 1; d < counts.length; d++) {
            int[] flat = simplices[d];
            for (int s = 0; s < counts[d]; s++) {
                for (int i = 0; i <= d; i++) {
                    copyWithout(flat, s * (d + 1), d + 1, i, face);
                    targets[entry] = firstBelow + tables[d - 1].find(face, 0);
                    coefficients[entry] = (i & 1) == 0 ? 1 : -1;
                    entry++;
                }
                offsets[++cell] = entry;
            }
            firstBelow += counts[d - 1];
        }
        return new Boundary(offsets, targets, coefficients);
    }

    private static void copyWithout(int[] source, int from, int length, int skip, int[] into) {
        int k = 0;
        for (int t = 0; t < length; t++) {
            if (t != skip) {
                into[k++] = source[from + t];
            }
        }
    }

    /** The listed faces this complex was built from. */
    public Facets facets() {
        return facets;
    }

    /** The simplex's vertex ids, ascending. A copy. */
    public int[] simplex(int cell) {
        return vertexTuple(cell);
    }

    /** The vertex labels in braces, ascending by vertex id, like <code>{a b c}</code>. */
    @Override
    public String cellName(int cell) {
        return tupleName(cell, facets::vertexLabel, "{", ' ', "}");
    }
}
