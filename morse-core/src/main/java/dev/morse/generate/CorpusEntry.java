package dev.morse.generate;

import dev.morse.complex.Facets;
import dev.morse.homology.HomologyGroup;
import dev.morse.poset.Poset;
import java.util.List;
import java.util.function.Supplier;

/**
 * A corpus case as the writer knows it: how to generate its input and what homology the
 * literature predicts. Exactly one of {@code poset} and {@code facets} is set.
 */
record CorpusEntry(String name, String description, String source, List<HomologyGroup> expected, boolean cwPoset,
        Supplier<Poset> poset, Supplier<Facets> facets) {

    CorpusEntry {
        if ((poset == null) == (facets == null)) {
            throw new IllegalArgumentException("a case is either a poset or a simplicial complex");
        }
        expected = List.copyOf(expected);
    }

    static CorpusEntry poset(String name, String description, String source, boolean cwPoset,
            List<HomologyGroup> expected, Supplier<Poset> poset) {
        return new CorpusEntry(name, description, source, expected, cwPoset, poset, null);
    }

    static CorpusEntry simplicial(String name, String description, String source, List<HomologyGroup> expected,
            Supplier<Facets> facets) {
        return new CorpusEntry(name, description, source, expected, false, null, facets);
    }

    boolean isPoset() {
        return poset != null;
    }

    String fileName() {
        return name + (isPoset() ? ".poset" : ".simplicial");
    }
}
