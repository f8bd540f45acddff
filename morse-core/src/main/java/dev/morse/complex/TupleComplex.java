package dev.morse.complex;

import dev.morse.poset.Poset;
import dev.morse.poset.PosetBuilder;
import java.util.Arrays;
import java.util.function.IntFunction;

/**
 * A stored complex whose cell of dimension d stands for a tuple of d + 1 vertices, kept per
 * dimension in one flat array, cell after cell: the simplices of a simplicial complex and the
 * chains of an order complex. The tuple is the cell's {@link #vertexTuple}.
 *
 * <p>Memory: {@code 4(d+1)} bytes per cell of dimension d besides the boundary.
 */
public abstract class TupleComplex extends StoredComplex {
    /** The default bound on the number of cells: every cell id must be an int. */
    public static final long DEFAULT_CELL_LIMIT = CellLimits.MAX_ARRAY;

    private final int[][] tuples;

    /**
     * @param kind the construction the complex stands for
     * @param cells where each dimension's cells start
     * @param tuples per dimension d, the {@code d + 1} vertices of each cell one after another
     * @param boundary faces of every cell, each one dimension lower
     */
    protected TupleComplex(ComplexKind kind, GradedCells cells, int[][] tuples, Boundary boundary) {
        super(kind, cells, boundary);
        this.tuples = tuples;
    }

    /** The cell's {@code d + 1} vertex ids in the order that orients it. A copy. */
    @Override
    public final int[] vertexTuple(int cell) {
        int d = grading().dimensionOf(cell);
        int local = cell - grading().firstCell(d);
        return Arrays.copyOfRange(tuples[d], local * (d + 1), (local + 1) * (d + 1));
    }

    /**
     * The face poset: one element per cell, labelled by its {@link #cellName}, covering the faces in
     * its boundary. Its order complex is the barycentric subdivision of this complex.
     *
     * @throws IllegalArgumentException if two cells have the same name
     */
    public final Poset facePoset() {
        PosetBuilder b = new PosetBuilder();
        for (int c = 0; c < cellCount(); c++) {
            b.element(cellName(c));
        }
        if (b.size() != cellCount()) {
            throw new IllegalArgumentException("two cells have the same name");
        }
        Boundary boundary = boundary();
        for (int c = 0; c < cellCount(); c++) {
            for (int i = boundary.start(c); i < boundary.end(c); i++) {
                b.relate(boundary.target(i), c, 0);
            }
        }
        return b.buildKnownAcyclic();
    }

    /** The labels of a cell's tuple joined by {@code separator}, between {@code open} and {@code close}. */
    protected final String tupleName(int cell, IntFunction<String> label, String open, char separator, String close) {
        int d = grading().dimensionOf(cell);
        int at = (cell - grading().firstCell(d)) * (d + 1);
        StringBuilder name = new StringBuilder(open);
        for (int i = 0; i <= d; i++) {
            if (i > 0) {
                name.append(separator);
            }
            name.append(label.apply(tuples[d][at + i]));
        }
        return name.append(close).toString();
    }
}
