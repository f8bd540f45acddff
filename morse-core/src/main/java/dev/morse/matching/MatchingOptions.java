package dev.morse.matching;

/**
 * Choices a heuristic may use: the seed of its random choices (ignored by deterministic ones).
 */
public record MatchingOptions(long seed) {
    /** Seed 1. */
    public static final MatchingOptions DEFAULT = new MatchingOptions(1L);
}
