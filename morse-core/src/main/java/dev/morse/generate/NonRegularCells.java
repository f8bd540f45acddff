package dev.morse.generate;

import dev.morse.poset.Poset;
import dev.morse.poset.PosetBuilder;

/**
 * Face posets of CW complexes that are not regular. They are not CW posets, and their order
 * complexes are not homeomorphic to the spaces they come from: the homology of the file (that of
 * the order complex) differs from that of the space.
 */
public final class NonRegularCells {
    private NonRegularCells() {
    }

    /**
     * The circle as one vertex {@code v} and one edge {@code e} with both ends at {@code v}: the
     * poset {@code v < e}, whose order complex is a segment (contractible), while the circle has
     * {@code H_1 = Z}.
     */
    public static Poset loop() {
        PosetBuilder b = new PosetBuilder();
        b.relate(b.element("v"), b.element("e"), 0);
        return b.buildKnownAcyclic();
    }

    /**
     * The 2-sphere as a vertex {@code v}, a loop {@code e} at it (the equator) and two discs
     * {@code d1, d2} glued along it: the poset {@code v < e < d1, d2}, whose order complex is two
     * triangles sharing the edge {@code v e} (contractible), while the sphere has {@code H_2 = Z}.
     */
    public static Poset twoDiscsOnALoop() {
        PosetBuilder b = new PosetBuilder();
        int v = b.element("v");
        int e = b.element("e");
        b.relate(v, e, 0);
        b.relate(e, b.element("d1"), 0);
        b.relate(e, b.element("d2"), 0);
        return b.buildKnownAcyclic();
    }
}
