package dev.morse.homology;

/**
 * Rank of an integer matrix over the field Z/p.
 *
 * <p>Method: the matrix is reduced modulo p and brought to echelon form by sparse Gaussian
 * elimination over Z/p ({@link ModularElimination}), pivots chosen by the Markowitz rule
 * (Markowitz 1957) to limit fill-in; the rank is the number of pivots. Products of residues are
 * formed in {@code long}, which cannot overflow for {@code p < 2^31}. The result equals the number
 * of invariant factors of the integer matrix not divisible by p (reduction modulo p commutes with
 * the unimodular transformations of the Smith form), which is how the tests check it.
 */
public final class ModularRank {
    private ModularRank() {
    }

    /**
     * The rank of {@code matrix} over Z/p.
     *
     * @param p a prime, {@code 2 <= p <= 2^31 - 1}
     * @throws IllegalArgumentException if p is not a prime
     */
    public static int rank(SparseIntegerMatrix matrix, int p) {
        if (!isPrime(p)) {
            throw new IllegalArgumentException(p + " is not a prime");
        }
        if (matrix.rows() == 0 || matrix.columns() == 0 || matrix.nonZeros() == 0) {
            return 0;
        }
        return new ModularElimination(matrix, p).run();
    }

    /** Deterministic primality by trial division: at most 46341 divisions for an int. */
    static boolean isPrime(int p) {
        if (p < 2) {
            return false;
        }
        for (long d = 2; d * d <= p; d++) {
            if (p % d == 0) {
                return false;
            }
        }
        return true;
    }
}
