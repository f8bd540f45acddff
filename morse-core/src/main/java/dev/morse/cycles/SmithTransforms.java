package dev.morse.cycles;

import java.math.BigInteger;
import java.util.Arrays;

/**
 * The Smith normal form of a small dense integer matrix with its unimodular transforms:
 * {@code U A V = D} with {@code D} diagonal, its nonzero entries positive and each dividing the
 * next, and the inverses of {@code U} and {@code V} kept alongside. Computed by the textbook
 * Euclidean row and column steps (e.g. Munkres, Elements of Algebraic Topology, 1984, §11), every
 * step applied to the transforms too. Exact BigInteger arithmetic; cubic time and quadratic memory,
 * so meant for Morse complexes, which are small. Immutable once computed.
 */
public final class SmithTransforms {
    private final BigInteger[][] d;
    private final BigInteger[][] u;
    private final BigInteger[][] uInverse;
    private final BigInteger[][] v;
    private final BigInteger[][] vInverse;
    private final int rank;

    private SmithTransforms(BigInteger[][] d, BigInteger[][] u, BigInteger[][] uInverse, BigInteger[][] v,
            BigInteger[][] vInverse, int rank) {
        this.d = d;
        this.u = u;
        this.uInverse = uInverse;
        this.v = v;
        this.vInverse = vInverse;
        this.rank = rank;
    }

    /** The Smith normal form of {@code a} ({@code rows} rows, {@code columns} columns); {@code a} is not changed. */
    public static SmithTransforms of(BigInteger[][] a, int rows, int columns) {
        BigInteger[][] m = new BigInteger[rows][];
        for (int i = 0; i < rows; i++) {
            m[i] = a[i].clone();
        }
        BigInteger[][] u = identity(rows);
        BigInteger[][] ui = identity(rows);
        BigInteger[][] v = identity(columns);
        BigInteger[][] vi = identity(columns);
        int t = 0;
        while (t < rows && t < columns) {
            int[] pivot = smallest(m, t, rows, columns);
            if (pivot == null) {
                break;
            }
            swapRows(m, u, ui, t, pivot[0]);
            swapColumns(m, v, vi, t, pivot[1]);
            if (clearRowAndColumn(m, u, ui, v, vi, t, rows, columns)) {
                continue; // a smaller remainder became the pivot's rival: choose again
            }
            int[] bad = notDivisible(m, t, rows, columns);
            if (bad != null) {
                addRow(m, u, ui, t, bad[0], BigInteger.ONE); // brings an entry not divisible by the pivot into row t
                continue;
            }
            if (m[t][t].signum() < 0) {
                negateRow(m, u, ui, t);
            }
            t++;
        }
        return new SmithTransforms(m, u, ui, v, vi, t);
    }

    /** The rank: the number of nonzero diagonal entries. */
    public int rank() {
        return rank;
    }

    /** Diagonal entry {@code i} of {@code D}, for {@code i < rank()}. */
    public BigInteger diagonal(int i) {
        return d[i][i];
    }

    /** Column {@code j} of {@code V}. */
    public BigInteger[] vColumn(int j) {
        return column(v, j);
    }

    /** Column {@code j} of {@code U⁻¹}. */
    public BigInteger[] uInverseColumn(int j) {
        return column(uInverse, j);
    }

    /** Row {@code i} of {@code U}. A copy. */
    public BigInteger[] uRow(int i) {
        return u[i].clone();
    }

    /** Row {@code i} of {@code V⁻¹}. A copy. */
    public BigInteger[] vInverseRow(int i) {
        return vInverse[i].clone();
    }

    /** {@code V⁻¹ x} for a vector {@code x} of length columns. */
    public BigInteger[] vInverseTimes(BigInteger[] x) {
        return times(vInverse, x);
    }

    /** {@code U}, for checks. A copy. */
    BigInteger[][] u() {
        return copy(u);
    }

    /** {@code V}, for checks. A copy. */
    BigInteger[][] v() {
        return copy(v);
    }

    private static BigInteger[] column(BigInteger[][] m, int j) {
        BigInteger[] c = new BigInteger[m.length];
        for (int i = 0; i < m.length; i++) {
            c[i] = m[i][j];
        }
        return c;
    }

    static BigInteger[] times(BigInteger[][] m, BigInteger[] x) {
        BigInteger[] y = new BigInteger[m.length];
        for (int i = 0; i < m.length; i++) {
            BigInteger s = BigInteger.ZERO;
            for (int j = 0; j < x.length; j++) {
                if (x[j].signum() != 0 && m[i][j].signum() != 0) {
                    s = s.add(m[i][j].multiply(x[j]));
                }
            }
            y[i] = s;
        }
        return y;
    }

    private static BigInteger[][] copy(BigInteger[][] m) {
        return Arrays.stream(m).map(BigInteger[]::clone).toArray(BigInteger[][]::new);
    }

    private static BigInteger[][] identity(int n) {
        BigInteger[][] e = new BigInteger[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                e[i][j] = i == j ? BigInteger.ONE : BigInteger.ZERO;
            }
        }
        return e;
    }

    /** The nonzero entry of least absolute value in the block from (t, t) on, or null when it is zero. */
    private static int[] smallest(BigInteger[][] m, int t, int rows, int columns) {
        int[] best = null;
        BigInteger least = null;
        for (int i = t; i < rows; i++) {
            for (int j = t; j < columns; j++) {
                BigInteger x = m[i][j];
                if (x.signum() != 0 && (least == null || x.abs().compareTo(least) < 0)) {
                    least = x.abs();
                    best = new int[] {i, j};
                }
            }
        }
        return best;
    }

    /**
     * Subtracts multiples of row and column t from the others; returns true when a nonzero
     * remainder is left, which is then smaller than the pivot.
     */
    private static boolean clearRowAndColumn(BigInteger[][] m, BigInteger[][] u, BigInteger[][] ui, BigInteger[][] v,
            BigInteger[][] vi, int t, int rows, int columns) {
        boolean remainder = false;
        BigInteger p = m[t][t];
        for (int i = t + 1; i < rows; i++) {
            if (m[i][t].signum() != 0) {
                BigInteger q = m[i][t].divide(p);
                addRow(m, u, ui, i, t, q.negate());
                remainder |= m[i][t].signum() != 0;
            }
        }
        for (int j = t + 1; j < columns; j++) {
            if (m[t][j].signum() != 0) {
                BigInteger q = m[t][j].divide(p);
                addColumn(m, v, vi, j, t, q.negate());
                remainder |= m[t][j].signum() != 0;
            }
        }
        return remainder;
    }

    private static int[] notDivisible(BigInteger[][] m, int t, int rows, int columns) {
        BigInteger p = m[t][t];
        for (int i = t + 1; i < rows; i++) {
            for (int j = t + 1; j < columns; j++) {
                if (m[i][j].mod(p.abs()).signum() != 0) {
                    return new int[] {i, j};
                }
            }
        }
        return null;
    }

    /** row target += factor · row source, in A and U; U⁻¹ takes the inverse step on its columns. */
    private static void addRow(BigInteger[][] m, BigInteger[][] u, BigInteger[][] ui, int target, int source,
            BigInteger factor) {
        for (BigInteger[][] x : new BigInteger[][][] {m, u}) {
            for (int j = 0; j < x[target].length; j++) {
                x[target][j] = x[target][j].add(factor.multiply(x[source][j]));
            }
        }
        for (BigInteger[] row : ui) {
            row[source] = row[source].subtract(factor.multiply(row[target]));
        }
    }

    /** column target += factor · column source, in A and V; V⁻¹ takes the inverse step on its rows. */
    private static void addColumn(BigInteger[][] m, BigInteger[][] v, BigInteger[][] vi, int target, int source,
            BigInteger factor) {
        for (BigInteger[][] x : new BigInteger[][][] {m, v}) {
            for (BigInteger[] row : x) {
                row[target] = row[target].add(factor.multiply(row[source]));
            }
        }
        for (int j = 0; j < vi[source].length; j++) {
            vi[source][j] = vi[source][j].subtract(factor.multiply(vi[target][j]));
        }
    }

    private static void swapRows(BigInteger[][] m, BigInteger[][] u, BigInteger[][] ui, int a, int b) {
        if (a == b) {
            return;
        }
        BigInteger[] r = m[a];
        m[a] = m[b];
        m[b] = r;
        r = u[a];
        u[a] = u[b];
        u[b] = r;
        for (BigInteger[] row : ui) {
            BigInteger x = row[a];
            row[a] = row[b];
            row[b] = x;
        }
    }

    private static void swapColumns(BigInteger[][] m, BigInteger[][] v, BigInteger[][] vi, int a, int b) {
        if (a == b) {
            return;
        }
        for (BigInteger[][] x : new BigInteger[][][] {m, v}) {
            for (BigInteger[] row : x) {
                BigInteger y = row[a];
                row[a] = row[b];
                row[b] = y;
            }
        }
        BigInteger[] r = vi[a];
        vi[a] = vi[b];
        vi[b] = r;
    }

    private static void negateRow(BigInteger[][] m, BigInteger[][] u, BigInteger[][] ui, int t) {
        for (int j = 0; j < m[t].length; j++) {
            m[t][j] = m[t][j].negate();
        }
        for (int j = 0; j < u[t].length; j++) {
            u[t][j] = u[t][j].negate();
        }
        for (BigInteger[] row : ui) {
            row[t] = row[t].negate();
        }
    }
}
