package dev.morse.matching;

import dev.morse.complex.ChainComplex;
import java.util.Objects;

/**
 * A pairing under the name users type.
 *
 * @param name the name after {@code --matching}
 * @param randomized whether the pairing depends on the seed
 * @param pairing what pairs the cells
 */
record NamedHeuristic(String name, boolean randomized, MatchingHeuristic.Pairing pairing) implements MatchingHeuristic {
    NamedHeuristic {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(pairing, "pairing");
    }

    @Override
    public Matching match(ChainComplex complex, MatchingOptions options) {
        return pairing.match(complex, options);
    }

    @Override
    public String toString() {
        return name;
    }
}
