package dev.morse.generate;

import dev.morse.poset.PosetOperations;

import dev.morse.poset.Poset;

/**
 * Faces of the d-simplex on the vertices {@code 1..d+1}, each face labelled by its vertex set
 * like {@code {1,3}}: the Boolean lattice {@code B_(d+1)} with or without its ends.
 */
public final class SimplexFaces {
    private SimplexFaces() {
    }

    /**
     * The nonempty proper faces: a CW poset whose regular CW complex is the boundary sphere
     * {@code S^(d-1)} (empty for {@code d = 0}).
     */
    public static Poset boundaryFacePoset(int d) {
        requireDimension(d);
        return BooleanLattice.properPart(d + 1);
    }

    /** The nonempty faces, the simplex itself included: a CW poset of the closed d-ball. */
    public static Poset closedFacePoset(int d) {
        requireDimension(d);
        return PosetOperations.withoutBottom(BooleanLattice.lattice(d + 1));
    }

    /** The face lattice: all faces, the empty face {@code {}} and the simplex itself included. */
    public static Poset faceLattice(int d) {
        requireDimension(d);
        return BooleanLattice.lattice(d + 1);
    }

    private static void requireDimension(int d) {
        if (d < 0 || d + 1 > BooleanLattice.MAX_N) {
            throw new IllegalArgumentException("dimension out of range: " + d);
        }
    }
}
