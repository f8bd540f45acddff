package dev.morse.poset;

import java.math.BigInteger;

/**
 * The Möbius function of a bounded poset from its defining recursion {@code μ(0̂,0̂) = 1},
 * {@code μ(0̂,x) = -Σ_{0̂ ≤ z < x} μ(0̂,z)} (Rota 1964; Stanley, Enumerative Combinatorics I, Ch. 3).
 * Exact: an overflow of {@code long} throws.
 */
public final class Mobius {
    private Mobius() {
    }

    /**
     * {@code μ(0̂, 1̂)} of a poset with a unique minimal and a unique maximal element.
     *
     * @throws IllegalArgumentException if {@code poset} is not bounded
     */
    public static long bottomToTop(Poset poset) {
        int bottom = -1;
        int top = -1;
        for (int x = 0; x < poset.size(); x++) {
            if (poset.lowerCovers().degree(x) == 0) {
                if (bottom >= 0) {
                    throw new IllegalArgumentException("more than one minimal element");
                }
                bottom = x;
            }
            if (poset.upperCovers().degree(x) == 0) {
                if (top >= 0) {
                    throw new IllegalArgumentException("more than one maximal element");
                }
                top = x;
            }
        }
        if (bottom < 0) {
            throw new IllegalArgumentException("empty poset");
        }
        DownSetBitsets downSets = DownSetBitsets.of(poset);
        long[] mu = new long[poset.size()];
        for (int x : poset.linearExtension()) {
            if (x == bottom) {
                mu[x] = 1;
                continue;
            }
            long sum = 0;
            for (int z : downSets.elementsBelow(x)) {
                sum = Math.addExact(sum, mu[z]);
            }
            mu[x] = Math.negateExact(sum);
        }
        return mu[top];
    }

    /**
     * {@code μ(0̂, 1̂)} of the poset {@code P̂} made from {@code poset} by adjoining a new bottom
     * 0̂ and a new top 1̂, exactly, by the same recursion: {@code μ(0̂, x) = -1 - Σ_{y < x} μ(0̂, y)}
     * for x in P (the 1 is 0̂'s term), and {@code μ(0̂, 1̂) = -1 - Σ_{x ∈ P} μ(0̂, x)}. Works in longs
     * and, should one overflow, again in BigInteger.
     *
     * @param downSets the down-sets of {@code poset}
     */
    public static BigInteger withBoundsAdjoined(Poset poset, StrictDownSets downSets) {
        try {
            long[] mu = new long[poset.size()];
            long total = 1;
            for (int x : poset.linearExtension()) {
                long sum = 1;
                for (int i = downSets.start(x); i < downSets.end(x); i++) {
                    sum = Math.addExact(sum, mu[downSets.element(i)]);
                }
                mu[x] = Math.negateExact(sum);
                total = Math.addExact(total, mu[x]);
            }
            return BigInteger.valueOf(Math.negateExact(total));
        } catch (ArithmeticException overflow) {
            BigInteger[] mu = new BigInteger[poset.size()];
            BigInteger total = BigInteger.ONE;
            for (int x : poset.linearExtension()) {
                BigInteger sum = BigInteger.ONE;
                for (int i = downSets.start(x); i < downSets.end(x); i++) {
                    sum = sum.add(mu[downSets.element(i)]);
                }
                mu[x] = sum.negate();
                total = total.add(mu[x]);
            }
            return total.negate();
        }
    }
}
