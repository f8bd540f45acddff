package dev.morse.morsecomplex;

import dev.morse.homology.SparseIntegerMatrix;
import java.util.Arrays;
import java.util.List;

/**
 * A chain complex given by its boundary matrices only, as the Morse complex of a matching is: per
 * dimension the number of cells, and for each {@code d >= 1} the matrix of {@code ∂_d} with one row
 * per cell of dimension {@code d - 1} and one column per cell of dimension {@code d}. Immutable.
 *
 * <p>Memory: that of the matrices, 12 bytes per nonzero entry.
 */
public final class MorseComplex {
    private final int[] cellCounts;
    private final List<SparseIntegerMatrix> boundaries;

    /**
     * @param cellCounts cells per dimension
     * @param boundaries {@code boundaries.get(d)} is {@code ∂_d} for {@code d = 1..top}; entry 0 is
     *     an empty matrix with no rows
     */
    public MorseComplex(int[] cellCounts, List<SparseIntegerMatrix> boundaries) {
        if (boundaries.size() != cellCounts.length) {
            throw new IllegalArgumentException("one boundary matrix per dimension is needed");
        }
        for (int d = 1; d < cellCounts.length; d++) {
            SparseIntegerMatrix m = boundaries.get(d);
            if (m.rows() != cellCounts[d - 1] || m.columns() != cellCounts[d]) {
                throw new IllegalArgumentException("boundary " + d + " has the wrong shape");
            }
        }
        this.cellCounts = cellCounts.clone();
        this.boundaries = List.copyOf(boundaries);
    }

    /** The boundary list a complex starts with: the matrix of ∂_0, with no rows. */
    static SparseIntegerMatrix zeroBoundary(int cellsOfDimensionZero) {
        return new SparseIntegerMatrix(0, new int[cellsOfDimensionZero + 1], new int[0], new long[0]);
    }

    /** The top dimension, or -1 when empty. */
    public int dimension() {
        return cellCounts.length - 1;
    }

    /** Cells of dimension {@code d}. */
    public int cellCount(int d) {
        return d < 0 || d >= cellCounts.length ? 0 : cellCounts[d];
    }

    /** Cells per dimension. */
    public int[] cellCounts() {
        return cellCounts.clone();
    }

    /** Total number of cells. */
    public long totalCells() {
        return Arrays.stream(cellCounts).asLongStream().sum();
    }

    /** The boundary matrix {@code ∂_d}, for {@code 1 <= d <= dimension()}. */
    public SparseIntegerMatrix boundary(int d) {
        return boundaries.get(d);
    }
}
