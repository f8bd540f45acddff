package dev.morse.generate;

import dev.morse.poset.PosetOperations;

import dev.morse.poset.Poset;
import dev.morse.poset.PosetBuilder;

/**
 * The Boolean lattice {@code B_n}: all subsets of {@code {1..n}} ordered by inclusion, labelled
 * like {@code {1,3}} (the empty set is {@code {}}). Its proper part is the face poset of the
 * boundary of the (n-1)-simplex, a sphere {@code S^(n-2)} (Wachs, "Poset topology: tools and
 * applications", 2007).
 */
public final class BooleanLattice {
    /** Largest n accepted: 2^20 elements. */
    public static final int MAX_N = 20;

    private BooleanLattice() {
    }

    /** All {@code 2^n} subsets of {@code {1..n}}; a subset covers the subsets with one element fewer. */
    public static Poset lattice(int n) {
        Sizes.inRange("n", n, 0, MAX_N);
        PosetBuilder b = new PosetBuilder();
        for (int mask = 0; mask < (1 << n); mask++) {
            b.element(subsetLabel(mask));
        }
        for (int mask = 0; mask < (1 << n); mask++) {
            for (int bits = mask; bits != 0; bits &= bits - 1) {
                b.relate(mask & ~Integer.lowestOneBit(bits), mask, 0);
            }
        }
        return b.buildKnownAcyclic();
    }

    /** The proper part: nonempty subsets other than {@code {1..n}}; for {@code n ≥ 1}. */
    public static Poset properPart(int n) {
        if (n < 1) {
            throw new IllegalArgumentException("the proper part needs n ≥ 1, got " + n);
        }
        return PosetOperations.properPart(lattice(n));
    }

    /** The label of the subset whose element {@code i} is bit {@code i-1} of {@code mask}. */
    static String subsetLabel(int mask) {
        StringBuilder s = new StringBuilder("{");
        for (int i = 0; i < Integer.SIZE; i++) {
            if ((mask & (1 << i)) != 0) {
                if (s.length() > 1) {
                    s.append(',');
                }
                s.append(i + 1);
            }
        }
        return s.append('}').toString();
    }
}
