package dev.morse.complex;

import dev.morse.poset.Poset;

/** The face poset of an order complex, as a poset: one element per chain. */
public final class Subdivision {
    /** The most chains {@link #of} lists. */
    public static final long MAX_CHAINS = 5_000_000;

    private Subdivision() {
    }

    /**
     * The face poset of the order complex Δ(P): the nonempty chains of P ordered by inclusion,
     * each chain covering the chains with one element fewer. Each chain is labelled by its
     * elements' labels bottom first, joined by {@code <} (like {@code a<b<c}). Its order complex is
     * the barycentric subdivision of Δ(P), homeomorphic to it (common practice; e.g. Munkres,
     * Elements of Algebraic Topology, 1984, §15), and it is a CW poset.
     *
     * @throws IllegalArgumentException if P has more than {@link #MAX_CHAINS} chains, or if two
     *     chains get the same label (possible only when labels contain {@code <})
     */
    public static Poset of(Poset p) {
        OrderComplex complex;
        try {
            complex = OrderComplex.of(p, MAX_CHAINS);
        } catch (IllegalStateException e) {
            throw new IllegalArgumentException("too many chains for their face poset: " + e.getMessage());
        }
        try {
            return complex.facePoset();
        } catch (IllegalArgumentException e) {
            // the one failure left: two cells of one name
            throw new IllegalArgumentException(
                    "two chains get the same label; labels containing '<' are ambiguous here", e);
        }
    }
}
