package dev.morse.graph;

import java.util.Locale;
import java.util.Optional;

/** Which complex of a graph an input stands for; the name is the one users type. */
public enum GraphComplex {
    /** The clique (flag) complex: faces are the sets of pairwise adjacent vertices. */
    CLIQUE,
    /** The independence complex: faces are the sets of pairwise non-adjacent vertices. */
    INDEPENDENCE,
    /** The matching complex: vertices are the edges, faces the sets of pairwise disjoint edges. */
    MATCHING,
    /** The poset of the vertex sets that induce connected subgraphs, ordered by inclusion. */
    CONNECTED_SUBGRAPHS;

    /** The name users type, such as {@code connected-subgraphs}. */
    public String optionName() {
        return name().toLowerCase(Locale.ROOT).replace('_', '-');
    }

    /** The complex a name stands for. */
    public static Optional<GraphComplex> byName(String name) {
        for (GraphComplex c : values()) {
            if (c.optionName().equals(name)) {
                return Optional.of(c);
            }
        }
        return Optional.empty();
    }
}
