package dev.morse.homology;

/**
 * Rank of an integer matrix over the rationals, exactly.
 *
 * <p>Method: sparse fraction-free elimination over the integers ({@link IntegerElimination} in
 * rank mode). Pivots ±1 come first in Markowitz order (Markowitz 1957) and clear their column by
 * adding integer multiples of their row, as in the Smith normal form. A pivot {@code p} of another
 * value clears an entry {@code a} by replacing its row with {@code (p/g)·row - (a/g)·pivot row},
 * {@code g = gcd(p, a)}, and every row produced is divided by the gcd of its entries. Multiplying
 * a row by a nonzero integer, dividing it by a common factor and adding multiples of other rows
 * all preserve the row space over Q, so the number of pivots is the rank over Q.
 *
 * <p>Why this method: it is exact without any bound on the invariant factors (ranks modulo a few
 * primes are not), it needs no column operations and no Euclidean loops (a Smith normal form
 * does), and its entries stay bounded: each active row is a rational multiple of a row of the
 * Schur complement, whose entries are ratios of minors (Sylvester's identity), so the primitive
 * row has entries no larger than the input's minors (the same bound that makes Gaussian
 * elimination over Q polynomial, Edmonds 1967). Arithmetic is exact ({@code long} with overflow
 * checks, BigInteger beyond).
 */
public final class RationalRank {
    private RationalRank() {
    }

    /** The rank of {@code matrix} over Q (entries listed twice at one position are summed). */
    public static int rank(SparseIntegerMatrix matrix) {
        if (matrix.rows() == 0 || matrix.columns() == 0 || matrix.nonZeros() == 0) {
            return 0;
        }
        return new IntegerElimination(matrix, IntegerElimination.Mode.RANK).run().pivotCount();
    }
}
