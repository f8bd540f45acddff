package dev.morse.implicit;

import java.util.Arrays;
import java.util.Locale;

/**
 * The order in which the upper covers of every element are tried. It orders the maximal chains
 * lexicographically, and so fixes the acyclic matching of {@link ImplicitHomology}; the homology
 * never depends on it, the number of critical chains does.
 */
public enum ElementOrder {
    /**
     * Elements by their closed down-sets, compared as words over the elements sorted by height:
     * the down-set that holds the first element where two differ comes first. On a geometric lattice
     * two covers of an element differ first in an atom, so the maximal chains come in the order of
     * Björner's labelling by least atoms, and on an upper semimodular lattice (least join-irreducible
     * elements) likewise; those labellings are EL-labellings (Björner, "Shellable and Cohen-Macaulay
     * partially ordered sets", Trans. AMS 260, 1980; recalled from memory). Then the matching has one
     * critical vertex and one critical chain per falling maximal chain, |μ(0̂, 1̂)| of them: the
     * fewest possible for the partition and subspace lattices. The default.
     */
    DOWN_SETS("down-sets"),
    /** Elements by their id in the poset, the order of first appearance in the input. */
    IDS("ids");

    private final String optionName;

    ElementOrder(String optionName) {
        this.optionName = optionName;
    }

    /** The lower-case name users type. */
    public String optionName() {
        return optionName;
    }

    /**
     * Parses an option name.
     *
     * @throws IllegalArgumentException with a message fit for users
     */
    public static ElementOrder parse(String text) {
        for (ElementOrder order : values()) {
            if (order.optionName.equals(text.strip().toLowerCase(Locale.ROOT))) {
                return order;
            }
        }
        throw new IllegalArgumentException("the element order must be one of "
                + String.join(", ", Arrays.stream(values()).map(ElementOrder::optionName).toList())
                + ", not '" + text + "'");
    }

    /** A rank for every internal id of {@code poset}: covers are tried by ascending rank. */
    long[] ranks(BoundedPoset poset) {
        int n = poset.size();
        long[] rank = new long[n];
        switch (this) {
            case DOWN_SETS -> {
                Integer[] elements = new Integer[n];
                for (int x = 0; x < n; x++) {
                    elements[x] = x;
                }
                Arrays.sort(elements, poset::compareDownSets);
                for (int i = 0; i < n; i++) {
                    rank[elements[i]] = i;
                }
            }
            case IDS -> {
                for (int x = 0; x < n; x++) {
                    rank[x] = poset.original(x);
                }
            }
        }
        return rank;
    }
}
