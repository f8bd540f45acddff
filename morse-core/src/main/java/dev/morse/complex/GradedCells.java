package dev.morse.complex;

import java.util.Arrays;

/**
 * Where each dimension's cells start in a numbering by dimension. Immutable; 4 bytes per dimension.
 */
public final class GradedCells {
    private final int[] starts;

    /** @param counts cells per dimension, {@code counts[d]} for {@code d = 0..top} */
    public GradedCells(int[] counts) {
        int top = counts.length - 1;
        while (top >= 0 && counts[top] == 0) {
            top--;
        }
        starts = new int[top + 2];
        for (int d = 0; d <= top; d++) {
            if (counts[d] < 0) {
                throw new IllegalArgumentException("negative cell count");
            }
            starts[d + 1] = Math.addExact(starts[d], counts[d]);
        }
    }

    /** The top dimension, or -1 without cells. */
    public int dimension() {
        return starts.length - 2;
    }

    /** Total number of cells. */
    public int cellCount() {
        return starts[starts.length - 1];
    }

    /** Cells of dimension {@code d}, or 0 outside the range. */
    public int cellCount(int d) {
        return d < 0 || d > dimension() ? 0 : starts[d + 1] - starts[d];
    }

    /** First cell of dimension {@code d}, clamped to the ends. */
    public int firstCell(int d) {
        if (d <= 0) {
            return 0;
        }
        return d >= starts.length ? cellCount() : starts[d];
    }

    /** The dimension of a cell, by binary search. */
    public int dimensionOf(int cell) {
        if (cell < 0 || cell >= cellCount()) {
            throw new IndexOutOfBoundsException("no cell " + cell);
        }
        int i = Arrays.binarySearch(starts, cell);
        if (i >= 0) {
            while (i + 1 < starts.length && starts[i + 1] == cell) {
                i++;
            }
            return i;
        }
        return -i - 2;
    }
}
