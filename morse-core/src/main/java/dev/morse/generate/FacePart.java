package dev.morse.generate;

import java.util.Locale;

/** Which faces of a polytope a face poset holds. */
public enum FacePart {
    /** The nonempty proper faces: the boundary sphere. */
    BOUNDARY,
    /** The nonempty faces, the polytope included: the closed ball. */
    CLOSED,
    /** Every face, the empty one and the polytope included: the face lattice. */
    LATTICE;

    /** The lower-case name users type. */
    public String optionName() {
        return name().toLowerCase(Locale.ROOT);
    }
}
