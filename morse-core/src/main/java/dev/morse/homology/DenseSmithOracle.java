package dev.morse.homology;

import dev.morse.progress.Progress;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;

/**
 * Smith normal form by plain dense elimination over BigInteger: simple enough to trust, cubic in
 * time and quadratic in memory. The oracle that every faster path is tested against; use only for
 * small matrices. It shares no code with the sparse path.
 *
 * <p>Method, in three textbook steps:
 * <ol>
 *   <li>Fraction-free Gaussian elimination with full pivoting (Bareiss, "Sylvester's identity and
 *       multistep integer-preserving Gaussian elimination", Math. Comp. 1968) gives the rank r and
 *       a nonzero r×r minor D (its last pivot).</li>
 *   <li>Diagonalisation by repeated Euclidean row and column steps (the textbook method, e.g.
 *       Munkres, Elements of Algebraic Topology, 1984, §11), with every entry reduced modulo
 *       {@code M = 2|D|}. Plain Euclidean elimination lets entries grow without bound (their
 *       length can double with every pivot); modulo M they stay below M. This is the classical
 *       device of computing modulo a multiple of the determinant (e.g. Domich, Kannan and Trotter,
 *       Math. Oper. Res. 1987; Hafner and McCurley, SIAM J. Comput. 1991).</li>
 *   <li>The diagonal entries e over Z/M give invariant factors {@code gcd(e, M)}, made into a
 *       divisibility chain by gcd/lcm exchanges. Over Z/M the Smith form of the matrix is
 *       {@code diag(gcd(d_i, M))} for its integer invariant factors d_i (with {@code gcd(0, M) = M}).
 *       Each of d_1 ... d_r divides d_1⋯d_r, which divides every r×r minor and so D; hence
 *       {@code d_i <= |D| < M} and the chain is d_1, ..., d_r followed by copies of M standing for
 *       the zero factors.</li>
 * </ol>
 */
public final class DenseSmithOracle {
    private DenseSmithOracle() {
    }

    /** The Smith form of {@code matrix}. */
    public static SmithInvariants compute(SparseIntegerMatrix matrix) {
        return compute(matrix.toDense());
    }

    /** The Smith form of a dense matrix {@code a[row][column]}; {@code a} is overwritten. */
    public static SmithInvariants compute(BigInteger[][] a) {
        int rows = a.length;
        int cols = rows == 0 ? 0 : a[0].length;
        BigInteger[][] copy = new BigInteger[rows][];
        for (int i = 0; i < rows; i++) {
            copy[i] = a[i].clone();
        }
        int rank = bareissRank(copy);
        if (rank == 0) {
            return new SmithInvariants(0, List.of());
        }
        BigInteger modulus = copy[rank - 1][rank - 1].abs().shiftLeft(1);
        for (BigInteger[] row : a) {
            for (int j = 0; j < cols; j++) {
                row[j] = row[j].mod(modulus);
            }
        }
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
                        addRowMultiple(a, i, t, q.negate(), t, modulus);
                        if (a[i][t].signum() != 0) {
                            swapRows(a, t, i);
                            clean = false;
                        }
                    }
                }
                for (int j = t + 1; j < cols; j++) {
                    if (a[t][j].signum() != 0) {
                        BigInteger q = a[t][j].divide(a[t][t]);
                        addColumnMultiple(a, j, t, q.negate(), t, modulus);
                        if (a[t][j].signum() != 0) {
                            swapColumns(a, t, j);
                            clean = false;
                        }
                    }
                }
            }
            diagonal.add(a[t][t].gcd(modulus));
            t++;
        }
        for (; t < Math.min(rows, cols); t++) {
            diagonal.add(modulus);
        }
        BigInteger[] chain = divisibilityChain(diagonal);
        for (int i = 0; i < chain.length; i++) {
            if ((i < rank) != (chain[i].compareTo(modulus) < 0)) {
                throw new IllegalStateException("modular diagonal disagrees with the rank");
            }
        }
        List<BigInteger> nonUnit = new ArrayList<>();
        for (int i = 0; i < rank; i++) {
            if (chain[i].compareTo(BigInteger.ONE) > 0) {
                nonUnit.add(chain[i]);
            }
        }
        return new SmithInvariants(rank, nonUnit);
    }

    /** Positive entries rearranged by (gcd, lcm) exchanges into a chain, each dividing the next. */
    private static BigInteger[] divisibilityChain(List<BigInteger> diagonal) {
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
        return d;
    }

    /**
     * The rank, by Bareiss elimination with full pivoting on {@code a} (overwritten). Afterwards
     * {@code a[r-1][r-1]} is, up to sign, the r×r minor on the pivot rows and columns: nonzero.
     */
    private static int bareissRank(BigInteger[][] a) {
        int rows = a.length;
        int cols = rows == 0 ? 0 : a[0].length;
        BigInteger previous = BigInteger.ONE;
        int k = 0;
        while (k < rows && k < cols) {
            int[] pivot = anyNonZero(a, k, rows, cols);
            if (pivot == null) {
                break;
            }
            swapRows(a, k, pivot[0]);
            swapColumns(a, k, pivot[1]);
            for (int i = k + 1; i < rows; i++) {
                for (int j = k + 1; j < cols; j++) {
                    // Exact by Sylvester's identity.
                    a[i][j] = a[i][j].multiply(a[k][k]).subtract(a[i][k].multiply(a[k][j])).divide(previous);
                }
                a[i][k] = BigInteger.ZERO;
            }
            previous = a[k][k];
            k++;
        }
        return k;
    }

    private static int[] anyNonZero(BigInteger[][] a, int t, int rows, int cols) {
        for (int i = t; i < rows; i++) {
            for (int j = t; j < cols; j++) {
                if (a[i][j].signum() != 0) {
                    return new int[] {i, j};
                }
            }
        }
        return null;
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

    private static void addRowMultiple(BigInteger[][] a, int target, int source, BigInteger factor, int from,
            BigInteger modulus) {
        for (int j = from; j < a[target].length; j++) {
            a[target][j] = a[target][j].add(factor.multiply(a[source][j])).mod(modulus);
        }
    }

    private static void addColumnMultiple(BigInteger[][] a, int target, int source, BigInteger factor, int from,
            BigInteger modulus) {
        for (int i = from; i < a.length; i++) {
            a[i][target] = a[i][target].add(factor.multiply(a[i][source])).mod(modulus);
        }
    }
}
