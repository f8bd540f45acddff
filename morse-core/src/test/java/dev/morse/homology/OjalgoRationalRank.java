package dev.morse.homology;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;
import org.ojalgo.matrix.decomposition.LU;
import org.ojalgo.matrix.store.GenericStore;
import org.ojalgo.matrix.store.MatrixStore;
import org.ojalgo.scalar.RationalNumber;

/**
 * Rank over Q computed by a general-purpose library, ojalgo 56.1.1, for cross-checks: its LU
 * decomposition over {@link RationalNumber} ({@code LU.Q128}), with the factors certified exactly
 * here before any rank is read off.
 *
 * <p>Why not simply {@code LU.Q128.make(a).getRank()}: two properties of ojalgo 56.1.1, read from
 * its byte code and confirmed on examples.
 * <ul>
 *   <li>{@code RationalNumber} keeps numerator and denominator in {@code long}s. When a result
 *       needs more than 63 bits, both are shifted right until they fit: the value is silently
 *       approximated (a product of 3·10^18/7 and 10^6/11 comes out as {@code 1/0}).</li>
 *   <li>The dense LU pivots rows only. When the rest of a column is zero it records a zero pivot
 *       and moves to the next column and the next row together, so on rank-deficient matrices the
 *       number of nonzero pivots can fall short of the rank: {@code [[0, 1], [0, 0]]} gets rank 0.</li>
 * </ul>
 *
 * <p>Method, safe despite both: for a matrix B (transposed first if it is wide, which changes no
 * rank and leaves fewer columns to test), ojalgo computes {@code P·B = L·U}. Every entry of L and U
 * is read back exactly (as the numerator/denominator pair ojalgo prints) and {@code L·U = P·B} is
 * checked in exact BigInteger fractions. Once that holds the factors are exact whatever happened
 * inside, and since L is unit lower triangular, {@code rank B = rank U}. If the first zero on the
 * diagonal of U is at k and all rows of U from k on are zero, the rank is k (rows above are
 * independent, having nonzero diagonal); if U has no zero on its diagonal the rank is the number
 * of columns. Otherwise column k of U lies in the span of columns 0..k-1 (an invertible upper
 * triangle above it, zeros below), so column k of B is dependent on the earlier ones: it is
 * dropped and the decomposition repeated. When the check fails (ojalgo's arithmetic was not
 * exact) an {@link ArithmeticException} is thrown: this never returns an uncertified rank.
 *
 * <p>Cost: one dense decomposition per dropped column, plus a cubic exact check each time; meant
 * for matrices of up to a few hundred rows and columns with small entries, such as boundary
 * matrices of small complexes.
 */
public final class OjalgoRationalRank {
    private OjalgoRationalRank() {
    }

    /**
     * The rank of {@code m} over Q, certified exactly.
     *
     * @throws ArithmeticException if an entry does not fit a long, or ojalgo's rational arithmetic
     *     lost exactness on this matrix
     */
    public static int rank(SparseIntegerMatrix m) {
        BigInteger[][] dense = m.toDense();
        int rows = m.rows();
        int columns = m.columns();
        boolean transpose = columns > rows;
        int r = transpose ? columns : rows;
        int c = transpose ? rows : columns;
        long[][] b = new long[r][c];
        for (int i = 0; i < rows; i++) {
            for (int j = 0; j < columns; j++) {
                long v = dense[i][j].longValueExact();
                if (transpose) {
                    b[j][i] = v;
                } else {
                    b[i][j] = v;
                }
            }
        }
        List<Integer> kept = new ArrayList<>();
        for (int j = 0; j < c; j++) {
            for (int i = 0; i < r; i++) {
                if (b[i][j] != 0) {
                    kept.add(j);
                    break;
                }
            }
        }
        while (!kept.isEmpty()) {
            GenericStore<RationalNumber> store = GenericStore.Q128.make(r, kept.size());
            for (int i = 0; i < r; i++) {
                for (int j = 0; j < kept.size(); j++) {
                    store.set(i, j, b[i][kept.get(j)]);
                }
            }
            LU<RationalNumber> lu = LU.Q128.make(store);
            if (!lu.decompose(store)) {
                throw new ArithmeticException("ojalgo did not decompose the matrix");
            }
            Fraction[][] l = exact(lu.getL());
            Fraction[][] u = exact(lu.getU());
            certify(l, u, lu.getPivotOrder(), b, kept);
            int diagonal = Math.min(u.length, kept.size());
            int firstZero = diagonal;
            for (int k = 0; k < diagonal; k++) {
                if (u[k][k].isZero()) {
                    firstZero = k;
                    break;
                }
            }
            if (firstZero == diagonal || rowsVanishFrom(u, firstZero)) {
                return firstZero;
            }
            kept.remove(firstZero);
        }
        return 0;
    }

    private static boolean rowsVanishFrom(Fraction[][] u, int k) {
        for (int i = k; i < u.length; i++) {
            for (Fraction f : u[i]) {
                if (!f.isZero()) {
                    return false;
                }
            }
        }
        return true;
    }

    /** Checks {@code L·U = (row piv[i] of B restricted to kept columns)} for every row i, exactly. */
    private static void certify(Fraction[][] l, Fraction[][] u, int[] pivotOrder, long[][] b, List<Integer> kept) {
        int inner = u.length;
        if (l.length != b.length || l[0].length != inner || u[0].length != kept.size()) {
            throw new ArithmeticException("unexpected factor shapes from ojalgo");
        }
        for (int i = 0; i < l.length; i++) {
            for (int j = 0; j < kept.size(); j++) {
                Fraction sum = Fraction.ZERO;
                for (int t = 0; t < inner; t++) {
                    if (!l[i][t].isZero() && !u[t][j].isZero()) {
                        sum = sum.add(l[i][t].multiply(u[t][j]));
                    }
                }
                if (!sum.equals(Fraction.of(BigInteger.valueOf(b[pivotOrder[i]][kept.get(j)]), BigInteger.ONE))) {
                    throw new ArithmeticException("ojalgo's rational LU is not exact for this matrix");
                }
            }
        }
    }

    private static Fraction[][] exact(MatrixStore<RationalNumber> store) {
        int rows = Math.toIntExact(store.countRows());
        int columns = Math.toIntExact(store.countColumns());
        Fraction[][] f = new Fraction[rows][columns];
        for (int i = 0; i < rows; i++) {
            for (int j = 0; j < columns; j++) {
                f[i][j] = parse(store.get(i, j));
            }
        }
        return f;
    }

    /** Reads the exact value ojalgo holds, printed as {@code (numerator / denominator)}. */
    private static Fraction parse(RationalNumber number) {
        String text = number.toString().trim();
        if (!text.startsWith("(") || !text.endsWith(")") || !text.contains(" / ")) {
            throw new ArithmeticException("unexpected rational form " + text);
        }
        String[] parts = text.substring(1, text.length() - 1).split(" / ");
        BigInteger numerator = new BigInteger(parts[0].trim());
        BigInteger denominator = new BigInteger(parts[1].trim());
        if (denominator.signum() == 0) {
            throw new ArithmeticException("ojalgo produced " + text);
        }
        return Fraction.of(numerator, denominator);
    }

    /** An exact rational in lowest terms with positive denominator. */
    private record Fraction(BigInteger numerator, BigInteger denominator) {
        static final Fraction ZERO = new Fraction(BigInteger.ZERO, BigInteger.ONE);

        static Fraction of(BigInteger numerator, BigInteger denominator) {
            BigInteger g = numerator.gcd(denominator);
            if (denominator.signum() < 0) {
                g = g.negate();
            }
            return new Fraction(numerator.divide(g), denominator.divide(g));
        }

        boolean isZero() {
            return numerator.signum() == 0;
        }

        Fraction add(Fraction o) {
            return of(numerator.multiply(o.denominator).add(o.numerator.multiply(denominator)), denominator.multiply(o.denominator));
        }

        Fraction multiply(Fraction o) {
            return of(numerator.multiply(o.numerator), denominator.multiply(o.denominator));
        }
    }
}
