package dev.morse.homology;

import dev.morse.progress.Progress;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;

/**
 * Smith normal form by plain dense elimination over BigInteger: simple enough to trust, cubic in
 * time and quadratic in memory. The oracle that every faster path is tested against; use only for
 * small matrices.
 *
 * <p>Diagonalises by repeated Euclidean row and column steps (the textbook method, e.g. Munkres,
 * Elements of Algebraic Topology, 1984, §11), then turns the diagonal into invariant factors by
 * replacing pairs {@code (a, b)} with {@code (gcd, lcm)}.
 */
public final class DenseSmithNormalForm {
    private DenseSmithNormalForm() {
    }

    /** The Smith form of {@code matrix}. */
    public static SmithForm compute(SparseIntegerMatrix matrix) {
        return compute(matrix.toDense());
    }

    /** The Smith form of a dense matrix {@code a[row][column]}; {@code a} is overwritten. */
    public static SmithForm compute(BigInteger[][] a) {
        int rows = a.length;
        int cols = rows == 0 ? 0 : a[0].length;
        List<BigInteger> diagonal = new ArrayList<>();
        int t = 0;
        Progress progress = Progress.current();
        while (t < rows && t < cols) {
            // one pivot per step, against one column per column of the matrix in the phase's total
            progress.advance(1);
            int[] pivot = smallestNonZero(a, t, rows, cols);
            if (pivot == null) {
                break;
            }
            swapRows(a, t, pivot[0]);
            swapColumns(a, t, pivot[1]);
            boolean clean = false;
            while (!clean) {
                clean = true;
                for (int i = t + 1; i < rows; i++) {
                    if (a[i][t].signum() != 0) {
                        BigInteger q = a[i][t].divide(a[t][t]);
                        addRowMultiple(a, i, t, q.negate(), t);
                        if (a[i][t].signum() != 0) {
                            swapRows(a, t, i);
                            clean = false;
                        }
                    }
                }
                for (int j = t + 1; j < cols; j++) {
                    if (a[t][j].signum() != 0) {
                        BigInteger q = a[t][j].divide(a[t][t]);
                        addColumnMultiple(a, j, t, q.negate(), t);
                        if (a[t][j].signum() != 0) {
                            swapColumns(a, t, j);
                            clean = false;
                        }
                    }
                }
            }
            diagonal.add(a[t][t].abs());
            t++;
        }
        return fromDiagonal(diagonal);
    }

    /** Invariant factors from any diagonal form, by gcd/lcm exchanges. */
    static SmithForm fromDiagonal(List<BigInteger> diagonal) {
        BigInteger[] d = diagonal.toArray(new BigInteger[0]);
        for (int i = 0; i < d.length; i++) {
            for (int j = i + 1; j < d.length; j++) {
                BigInteger g = d[i].gcd(d[j]);
                if (!g.equals(d[i])) {
                    BigInteger lcm = d[i].divide(g).multiply(d[j]);
                    d[i] = g;
                    d[j] = lcm;
                }
            }
        }
        List<BigInteger> nonUnit = new ArrayList<>();
        for (BigInteger x : d) {
            if (x.compareTo(BigInteger.ONE) > 0) {
                nonUnit.add(x);
            }
        }
        return new SmithForm(d.length, nonUnit);
    }

    private static int[] smallestNonZero(BigInteger[][] a, int t, int rows, int cols) {
        int[] best = null;
        BigInteger bestAbs = null;
        for (int i = t; i < rows; i++) {
            for (int j = t; j < cols; j++) {
                if (a[i][j].signum() != 0 && (bestAbs == null || a[i][j].abs().compareTo(bestAbs) < 0)) {
                    bestAbs = a[i][j].abs();
                    best = new int[] {i, j};
                }
            }
        }
        return best;
    }

    private static void swapRows(BigInteger[][] a, int i, int k) {
        BigInteger[] tmp = a[i];
        a[i] = a[k];
        a[k] = tmp;
    }

    private static void swapColumns(BigInteger[][] a, int j, int k) {
        for (BigInteger[] row : a) {
            BigInteger tmp = row[j];
            row[j] = row[k];
            row[k] = tmp;
        }
    }

    private static void addRowMultiple(BigInteger[][] a, int target, int source, BigInteger factor, int from) {
        for (int j = from; j < a[target].length; j++) {
            a[target][j] = a[target][j].add(factor.multiply(a[source][j]));
        }
    }

    private static void addColumnMultiple(BigInteger[][] a, int target, int source, BigInteger factor, int from) {
        for (int i = from; i < a.length; i++) {
            a[i][target] = a[i][target].add(factor.multiply(a[i][source]));
        }
    }
}
