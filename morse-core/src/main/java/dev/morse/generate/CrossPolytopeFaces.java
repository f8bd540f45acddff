package dev.morse.generate;

import dev.morse.poset.Poset;
import dev.morse.poset.PosetBuilder;

/**
 * Faces of the d-dimensional cross-polytope, the convex hull of {@code ±e_1, ..., ±e_d}. A set of
 * its vertices spans a proper face exactly when it contains no antipodal pair, so faces other than
 * the polytope itself are sign vectors {@code s} in {@code {+,-,0}^d}: the face spanned by the
 * vertices {@code s_i e_i} with {@code s_i ≠ 0}, of dimension {@code |support| - 1}. The zero word
 * is the empty face, and a face covers the faces obtained by zeroing one nonzero sign. There are
 * {@code 2^(k+1) C(d,k+1)} faces of dimension {@code k < d} (common practice); the face lattice is
 * dual to that of the d-cube.
 */
public final class CrossPolytopeFaces {
    /** The letters of a face's word, digit 0, 1 and 2 in base 3 (0, +, then -). */
    private static final String LETTERS = "0+-";

    /** Largest dimension accepted: 3^12 = 531441 faces. */
    public static final int MAX_DIMENSION = 12;
    /** Label of the whole cross-polytope in the closed ball and the face lattice. */
    public static final String WHOLE = "whole";

    private CrossPolytopeFaces() {
    }

    /**
     * The faces of the d-dimensional cross-polytope that {@code part} asks for: the nonempty proper
     * faces (nonzero sign vectors), a CW poset whose regular CW complex is the boundary sphere
     * {@code S^(d-1)}, a simplicial complex; with the polytope itself ({@value #WHOLE}), a CW poset
     * of the closed d-ball; or the face lattice, the empty face being the zero word {@code 00...0}.
     */
    public static Poset of(FacePart part, int d) {
        return build(d, part != FacePart.BOUNDARY, part == FacePart.LATTICE);
    }

    private static Poset build(int d, boolean withWhole, boolean withEmpty) {
        Sizes.inRange("dimension", d, 1, MAX_DIMENSION);
        int words = TernaryWords.count(d);
        PosetBuilder b = new PosetBuilder();
        int first = withEmpty ? 0 : 1; // code 0 is the zero word
        int[] id = new int[words];
        for (int code = first; code < words; code++) {
            id[code] = b.element(TernaryWords.word(code, d, LETTERS));
        }
        for (int code = first; code < words; code++) {
            int place = 1;
            for (int i = 0; i < d; i++, place *= 3) {
                int digit = (code / place) % 3;
                int lower = code - digit * place;
                if (digit != 0 && lower >= first) {
                    b.relate(id[lower], id[code], 0);
                }
            }
        }
        if (withWhole) {
            int whole = b.element(WHOLE);
            for (int code = first; code < words; code++) {
                if (TernaryWords.word(code, d, LETTERS).indexOf('0') < 0) {
                    b.relate(id[code], whole, 0);
                }
            }
        }
        return b.buildKnownAcyclic();
    }
}
