package dev.morse.homology;

import dev.morse.poset.CompressedRows;
import dev.morse.complex.Boundary;
import dev.morse.complex.ChainComplex;
import it.unimi.dsi.fastutil.ints.IntArrayList;
import it.unimi.dsi.fastutil.longs.LongArrayList;
import java.math.BigInteger;

/**
 * An immutable sparse integer matrix stored by columns (CSC): column {@code j} holds entries
 * {@code start(j) .. end(j) - 1}, each a row index and a nonzero long value.
 *
 * <p>Memory: 4 bytes per column plus 12 bytes per nonzero entry.
 */
public final class SparseIntegerMatrix extends CompressedRows {
    private final int rows;
    private final long[] values;

    /** Takes ownership of the arrays; entries must be nonzero, rows in range. */
    public SparseIntegerMatrix(int rows, int[] offsets, int[] targets, long[] values) {
        super(offsets, targets);
        if (targets.length != values.length) {
            throw new IllegalArgumentException("inconsistent CSC arrays: one value per entry is needed");
        }
        for (int i = 0; i < targets.length; i++) {
            if (targets[i] < 0 || targets[i] >= rows || values[i] == 0) {
                throw new IllegalArgumentException("bad entry at " + i);
            }
        }
        this.rows = rows;
        this.values = values;
    }

    /**
     * The boundary map from dimension {@code d} to {@code d - 1} of {@code complex}: one column per
     * d-cell, one row per (d-1)-cell, both indexed from 0 within their dimension.
     */
    public static SparseIntegerMatrix boundaryOf(ChainComplex complex, int d) {
        int rows = complex.cellCount(d - 1);
        int cols = complex.cellCount(d);
        int firstRow = complex.firstCell(d - 1);
        int firstCol = complex.firstCell(d);
        Boundary boundary = complex.boundary();
        int[] offsets = new int[cols + 1];
        IntArrayList rowIndex = new IntArrayList();
        LongArrayList value = new LongArrayList();
        for (int j = 0; j < cols; j++) {
            int cell = firstCol + j;
            for (int i = boundary.start(cell); i < boundary.end(cell); i++) {
                if (boundary.coefficient(i) != 0) {
                    rowIndex.add(boundary.target(i) - firstRow);
                    value.add(boundary.coefficient(i));
                }
            }
            offsets[j + 1] = rowIndex.size();
        }
        return new SparseIntegerMatrix(rows, offsets, rowIndex.toIntArray(), value.toLongArray());
    }

    /** Builds from a dense array {@code entries[row][column]}. */
    public static SparseIntegerMatrix fromDense(long[][] entries, int columns) {
        int rows = entries.length;
        int[] offsets = new int[columns + 1];
        IntArrayList rowIndex = new IntArrayList();
        LongArrayList value = new LongArrayList();
        for (int j = 0; j < columns; j++) {
            for (int i = 0; i < rows; i++) {
                if (entries[i][j] != 0) {
                    rowIndex.add(i);
                    value.add(entries[i][j]);
                }
            }
            offsets[j + 1] = rowIndex.size();
        }
        return new SparseIntegerMatrix(rows, offsets, rowIndex.toIntArray(), value.toLongArray());
    }

    /** Number of rows. */
    public int rows() {
        return rows;
    }

    /** Number of columns. */
    public int columns() {
        return rowCount();
    }

    /** Number of nonzero entries. */
    public int nonZeros() {
        return entryCount();
    }

    /** Row of entry {@code i}. */
    public int row(int i) {
        return target(i);
    }

    /** Value of entry {@code i}. */
    public long value(int i) {
        return values[i];
    }

    /** The matrix as a dense BigInteger array {@code [row][column]}; for small matrices only. */
    public BigInteger[][] toDense() {
        BigInteger[][] dense = new BigInteger[rows][columns()];
        for (BigInteger[] row : dense) {
            java.util.Arrays.fill(row, BigInteger.ZERO);
        }
        for (int j = 0; j < columns(); j++) {
            for (int i = start(j); i < end(j); i++) {
                dense[targets[i]][j] = dense[targets[i]][j].add(BigInteger.valueOf(values[i]));
            }
        }
        return dense;
    }
}
