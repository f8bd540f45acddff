package dev.morse.generate;

import dev.morse.poset.Poset;
import dev.morse.poset.PosetBuilder;

/**
 * Faces of the d-cube {@code [0,1]^d}. A nonempty face is a word over {@code 0, 1, *} of length
 * d: coordinate i is fixed at 0 or 1, or free ({@code *}); its dimension is the number of stars,
 * and a face covers the faces obtained by fixing one of its stars. There are {@code 3^d} nonempty
 * faces, {@code C(d,k) 2^(d-k)} of dimension k (common practice).
 */
public final class CubeFaces {
    /** The letters of a face's word, digit 0, 1 and 2 in base 3 (0, 1, then *). */
    private static final String LETTERS = "01*";

    /** Largest dimension accepted: 3^12 = 531441 faces. */
    public static final int MAX_DIMENSION = 12;
    /** Label of the empty face in {@link #faceLattice}. */
    public static final String EMPTY_FACE = "empty";

    private CubeFaces() {
    }

    /**
     * The nonempty proper faces (every word but {@code *...*}): a CW poset whose regular CW complex
     * is the boundary sphere {@code S^(d-1)}.
     */
    public static Poset boundaryFacePoset(int d) {
        return build(d, false, false);
    }

    /** The nonempty faces, the cube {@code *...*} included: a CW poset of the closed d-ball. */
    public static Poset closedFacePoset(int d) {
        return build(d, true, false);
    }

    /** The face lattice: every face, with the empty face {@value #EMPTY_FACE} below the vertices. */
    public static Poset faceLattice(int d) {
        return build(d, true, true);
    }

    private static Poset build(int d, boolean withCube, boolean withEmpty) {
        Sizes.inRange("dimension", d, 1, MAX_DIMENSION);
        int faces = TernaryWords.count(d);
        PosetBuilder b = new PosetBuilder();
        int empty = withEmpty ? b.element(EMPTY_FACE) : -1;
        int offset = b.size();
        int count = withCube ? faces : faces - 1; // the last code is the cube *...*
        for (int code = 0; code < count; code++) {
            b.element(TernaryWords.word(code, d, LETTERS));
        }
        for (int code = 0; code < count; code++) {
            boolean vertex = true;
            int place = 1;
            for (int i = 0; i < d; i++, place *= 3) {
                if ((code / place) % 3 == 2) {
                    vertex = false;
                    b.relate(offset + code - 2 * place, offset + code, 0); // fix coordinate i at 0
                    b.relate(offset + code - place, offset + code, 0); // fix coordinate i at 1
                }
            }
            if (vertex && withEmpty) {
                b.relate(empty, offset + code, 0);
            }
        }
        return b.buildKnownAcyclic();
    }
}
