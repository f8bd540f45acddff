package dev.morse.matching;

import dev.morse.complex.ChainComplex;

/**
 * A way to pair cells of a chain complex. Implementations keep no state between calls. The
 * built-in heuristics are {@link #named} pairings, see {@link MatchingHeuristics}; a plug-in may
 * implement this interface directly.
 */
public interface MatchingHeuristic {
    /** The name users type after {@code --matching}. */
    String name();

    /** Pairs cells of {@code complex}; the result must pass {@link MatchingVerifier}. */
    Matching match(ChainComplex complex, MatchingOptions options);

    /**
     * Whether the result depends on {@link MatchingOptions#seed()}, so that repeated seeded trials
     * can give different matchings. False unless overridden.
     */
    default boolean randomized() {
        return false;
    }

    /**
     * The heuristic called {@code name} that pairs by {@code pairing}.
     *
     * @param randomized whether the pairing depends on {@link MatchingOptions#seed()}
     */
    static MatchingHeuristic named(String name, boolean randomized, Pairing pairing) {
        return new NamedHeuristic(name, randomized, pairing);
    }

    /** How cells are paired, without a name: what {@link #match} does. */
    @FunctionalInterface
    interface Pairing {
        /** Pairs cells of {@code complex}; the result must pass {@link MatchingVerifier}. */
        Matching match(ChainComplex complex, MatchingOptions options);
    }
}
