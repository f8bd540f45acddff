package dev.morse.generate;

import dev.morse.poset.OrderCycleException;
import dev.morse.poset.Poset;
import dev.morse.poset.PosetBuilder;

/** Finishing a builder whose relations are acyclic by construction. */
final class Built {
    private Built() {
    }

    /** Builds {@code builder}; a cycle can only come from a defect in the generator itself. */
    static Poset poset(PosetBuilder builder) {
        try {
            return builder.build();
        } catch (OrderCycleException e) {
            throw new IllegalStateException("a generator produced cyclic relations", e);
        }
    }

    /** Checks that a label can be written in the text formats: nonempty, no white space, ':' or '#'. */
    static String checkLabel(String label) {
        if (label.isEmpty()) {
            throw new IllegalArgumentException("empty label");
        }
        for (int i = 0; i < label.length(); i++) {
            char c = label.charAt(i);
            if (Character.isWhitespace(c) || c == ':' || c == '#') {
                throw new IllegalArgumentException("label '" + label + "' contains '" + c + "'");
            }
        }
        return label;
    }
}
