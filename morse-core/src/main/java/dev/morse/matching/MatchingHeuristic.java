package dev.morse.matching;

import dev.morse.complex.ChainComplex;

/** A way to pair cells of a chain complex. Implementations keep no state between calls. */
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
}
