package dev.morse.generate;

import dev.morse.poset.Poset;
import dev.morse.poset.PosetBuilder;

/**
 * Real projective space {@code RP^d} as a regular CW complex: the boundary of the (d+1)-cube, a
 * d-sphere, divided by the antipodal map {@code x -> -x}, which on face words over
 * {@code 0, 1, *} (see {@link CubeFaces}) swaps 0 and 1. The map is free and cellular, so the
 * quotient is {@code RP^d} with one cell per antipodal pair of proper faces.
 *
 * <p>The quotient is regular: a proper face fixes some coordinate at c, and its antipode fixes it
 * at 1-c, so no proper face contains two antipodal faces; hence each closed cell maps injectively
 * and its faces in the quotient form the face poset of a cube. Each cell is labelled by the word
 * of the one of its two faces whose first fixed coordinate is 0.
 */
public final class ProjectiveSpace {
    /** Largest d accepted: (3^12 - 1)/2 cells. */
    public static final int MAX_DIMENSION = CubeFaces.MAX_DIMENSION - 1;

    private ProjectiveSpace() {
    }

    /** The face poset of {@code RP^d}, {@code d ≥ 1}, from the boundary of the (d+1)-cube. */
    public static Poset antipodalCubeQuotient(int d) {
        Sizes.inRange("dimension", d, 1, MAX_DIMENSION);
        Poset sphere = CubeFaces.boundaryFacePoset(d + 1);
        PosetBuilder b = new PosetBuilder();
        for (int x : sphere.linearExtension()) {
            String word = sphere.label(x);
            if (word.equals(representative(word))) {
                b.element(word);
            }
        }
        for (int x = 0; x < sphere.size(); x++) {
            String word = sphere.label(x);
            if (!word.equals(representative(word))) {
                continue;
            }
            int cell = b.element(word);
            for (int i = sphere.lowerCovers().start(x); i < sphere.lowerCovers().end(x); i++) {
                String face = sphere.label(sphere.lowerCovers().target(i));
                b.relate(b.element(representative(face)), cell, 0);
            }
        }
        return b.buildKnownAcyclic();
    }

    /** The antipodal face: 0 and 1 swapped. */
    static String antipode(String word) {
        char[] w = word.toCharArray();
        for (int i = 0; i < w.length; i++) {
            w[i] = w[i] == '0' ? '1' : w[i] == '1' ? '0' : w[i];
        }
        return new String(w);
    }

    /** Of a face and its antipode, the one whose first fixed coordinate is 0. */
    static String representative(String word) {
        for (int i = 0; i < word.length(); i++) {
            char c = word.charAt(i);
            if (c != '*') {
                return c == '0' ? word : antipode(word);
            }
        }
        throw new IllegalArgumentException("the whole cube has no antipodal partner: " + word);
    }
}
