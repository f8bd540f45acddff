package dev.morse.homology;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;

/** Seeded random integer matrices of several kinds, for property tests. */
final class RandomMatrices {
    private RandomMatrices() {
    }

    /** Each entry nonzero with probability {@code density}, uniform in {@code [-bound, bound] \ {0}}. */
    static long[][] sparse(Random random, int rows, int columns, double density, long bound) {
        long[][] a = new long[rows][columns];
        for (int i = 0; i < rows; i++) {
            for (int j = 0; j < columns; j++) {
                if (random.nextDouble() < density) {
                    a[i][j] = nonZero(random, bound);
                }
            }
        }
        return a;
    }

    /** Like a boundary matrix: each column has 1 to {@code maxPerColumn} entries ±1. */
    static long[][] boundaryLike(Random random, int rows, int columns, int maxPerColumn) {
        long[][] a = new long[rows][columns];
        for (int j = 0; j < columns && rows > 0; j++) {
            int k = 1 + random.nextInt(Math.min(maxPerColumn, rows));
            for (int t = 0; t < k; t++) {
                a[random.nextInt(rows)][j] = random.nextBoolean() ? 1 : -1;
            }
        }
        return a;
    }

    /** A product {@code B·C} of small random factors, so of rank at most {@code inner}. */
    static long[][] lowRank(Random random, int rows, int columns, int inner, long bound) {
        long[][] b = sparse(random, rows, inner, 0.6, bound);
        long[][] c = sparse(random, inner, columns, 0.6, bound);
        long[][] a = new long[rows][columns];
        for (int i = 0; i < rows; i++) {
            for (int j = 0; j < columns; j++) {
                for (int t = 0; t < inner; t++) {
                    a[i][j] += b[i][t] * c[t][j];
                }
            }
        }
        return a;
    }

    /**
     * {@code U·D·V} for a diagonal {@code D} with the given invariant factors and random
     * unimodular {@code U}, {@code V} (products of elementary operations with small multipliers).
     * By the uniqueness of the Smith form its invariant factors are {@code factors}.
     */
    static long[][] disguisedDiagonal(Random random, int rows, int columns, long[] factors, int operations) {
        long[][] a = new long[rows][columns];
        for (int i = 0; i < factors.length; i++) {
            a[i][i] = factors[i];
        }
        for (int k = 0; k < operations; k++) {
            long m = random.nextInt(5) - 2;
            if (random.nextBoolean() && rows > 1) {
                int i = random.nextInt(rows);
                int j = random.nextInt(rows - 1);
                j = j >= i ? j + 1 : j;
                for (int c = 0; c < columns; c++) {
                    a[i][c] = Math.addExact(a[i][c], Math.multiplyExact(m, a[j][c]));
                }
            } else if (columns > 1) {
                int i = random.nextInt(columns);
                int j = random.nextInt(columns - 1);
                j = j >= i ? j + 1 : j;
                for (int r = 0; r < rows; r++) {
                    a[r][i] = Math.addExact(a[r][i], Math.multiplyExact(m, a[r][j]));
                }
            }
        }
        return a;
    }

    /** Random row and column permutations and sign changes of the rows of {@code a}. */
    static long[][] shuffled(Random random, long[][] a, int columns) {
        int rows = a.length;
        int[] rowOrder = permutation(random, rows);
        int[] columnOrder = permutation(random, columns);
        long[][] b = new long[rows][columns];
        for (int i = 0; i < rows; i++) {
            long sign = random.nextBoolean() ? 1 : -1;
            for (int j = 0; j < columns; j++) {
                b[i][j] = sign * a[rowOrder[i]][columnOrder[j]];
            }
        }
        return b;
    }

    /** The factors as BigIntegers, without the ones. */
    static List<BigInteger> nonUnit(long... factors) {
        List<BigInteger> list = new ArrayList<>();
        for (long f : factors) {
            if (Math.abs(f) > 1) {
                list.add(BigInteger.valueOf(Math.abs(f)));
            }
        }
        return list;
    }

    /** The sparse form of {@code a}, which has {@code columns} columns. */
    static SparseIntegerMatrix matrix(long[][] a, int columns) {
        return SparseIntegerMatrix.fromDense(a, columns);
    }

    private static int[] permutation(Random random, int n) {
        int[] p = new int[n];
        for (int i = 0; i < n; i++) {
            p[i] = i;
        }
        for (int i = n - 1; i > 0; i--) {
            int j = random.nextInt(i + 1);
            int t = p[i];
            p[i] = p[j];
            p[j] = t;
        }
        return p;
    }

    private static long nonZero(Random random, long bound) {
        long v = 1 + (long) (random.nextDouble() * bound);
        v = Math.min(v, bound);
        return random.nextBoolean() ? v : -v;
    }
}
