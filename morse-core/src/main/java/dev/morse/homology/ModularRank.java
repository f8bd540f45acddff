package dev.morse.homology;

import java.math.BigInteger;

/**
 * Rank of an integer matrix over the field Z/p.
 */
public final class ModularRank {
    private ModularRank() {
    }

    /**
     * The rank over Z/p: the number of invariant factors of the integer matrix not divisible by p
     * (common practice: reduction mod p commutes with the unimodular transformations of the Smith form).
     */
    public static int rank(SparseIntegerMatrix matrix, int p) {
        SmithForm form = SmithNormalForm.compute(matrix);
        BigInteger prime = BigInteger.valueOf(p);
        int divisible = 0;
        for (BigInteger factor : form.nonUnitFactors()) {
            if (factor.mod(prime).signum() == 0) {
                divisible++;
            }
        }
        return form.rank() - divisible;
    }
}
