package dev.morse.generate;

import dev.morse.poset.Poset;
import dev.morse.poset.PosetBuilder;

/** Chains and antichains: the building blocks of cones, suspensions and joins. */
public final class SmallPosets {
    private SmallPosets() {
    }

    /** The chain {@code c1 < c2 < ... < ck}; its order complex is a (k-1)-simplex, contractible. */
    public static Poset chain(int k) {
        return chain(k, "c");
    }

    /** The chain of {@code k} elements labelled {@code prefix1 < prefix2 < ...}. */
    public static Poset chain(int k, String prefix) {
        PosetBuilder b = elements(k, prefix);
        for (int x = 1; x < k; x++) {
            b.relate(x - 1, x, 0);
        }
        return b.buildKnownAcyclic();
    }

    /** {@code k} pairwise incomparable elements {@code a1 .. ak}; two of them form the sphere S^0. */
    public static Poset antichain(int k) {
        return antichain(k, "a");
    }

    /** {@code k} pairwise incomparable elements labelled {@code prefix1 .. prefixk}. */
    public static Poset antichain(int k, String prefix) {
        return elements(k, prefix).buildKnownAcyclic();
    }

    /** A builder holding {@code k ≥ 1} elements labelled {@code prefix1 .. prefixk}, ids 0 .. k-1, and no relations. */
    private static PosetBuilder elements(int k, String prefix) {
        if (k < 1) {
            throw new IllegalArgumentException("need at least one element, got " + k);
        }
        PosetBuilder b = new PosetBuilder();
        for (int i = 1; i <= k; i++) {
            b.element(PosetBuilder.requireWritableLabel(prefix + i));
        }
        return b;
    }
}
