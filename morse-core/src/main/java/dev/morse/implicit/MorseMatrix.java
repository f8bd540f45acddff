package dev.morse.implicit;

import dev.morse.homology.SparseIntegerMatrix;
import java.math.BigInteger;
import java.util.Arrays;

/**
 * One boundary matrix of the Morse complex, by columns, with exact entries: longs, and BigIntegers
 * for the entries (if any) that do not fit in a long. Memory: 16 bytes per nonzero entry, more for
 * a BigInteger one.
 */
final class MorseMatrix {
    private final int rows;
    private final int[] offsets;
    private final int[] rowIndices;
    private final long[] values;
    private final BigInteger[] bigValues;

    /** Takes ownership; {@code bigValues} is null or overrides {@code values} where not null. */
    MorseMatrix(int rows, int[] offsets, int[] rowIndices, long[] values, BigInteger[] bigValues) {
        this.rows = rows;
        this.offsets = offsets;
        this.rowIndices = rowIndices;
        this.values = values;
        this.bigValues = bigValues;
    }

    /** The zero matrix of the given shape. */
    static MorseMatrix zero(int rows, int columns) {
        return new MorseMatrix(rows, new int[columns + 1], new int[0], new long[0], null);
    }

    int rows() {
        return rows;
    }

    int columns() {
        return offsets.length - 1;
    }

    /** Whether every entry fits in a long. */
    boolean fitsInLong() {
        return bigValues == null || Arrays.stream(bigValues).allMatch(v -> v == null);
    }

    /** The matrix with long entries; only when {@link #fitsInLong()}. */
    SparseIntegerMatrix toSparse() {
        if (!fitsInLong()) {
            throw new IllegalStateException("an entry does not fit in a long");
        }
        return new SparseIntegerMatrix(rows, offsets, rowIndices, values);
    }

    /** The matrix as a dense BigInteger array {@code [row][column]}. */
    BigInteger[][] toDense() {
        BigInteger[][] dense = new BigInteger[rows][columns()];
        for (BigInteger[] row : dense) {
            Arrays.fill(row, BigInteger.ZERO);
        }
        for (int j = 0; j < columns(); j++) {
            for (int i = offsets[j]; i < offsets[j + 1]; i++) {
                dense[rowIndices[i]][j] = bigValues != null && bigValues[i] != null
                        ? bigValues[i]
                        : BigInteger.valueOf(values[i]);
            }
        }
        return dense;
    }
}
