package dev.morse.matching;

import java.time.Duration;
import java.util.Objects;

/**
 * Choices a heuristic may use: the seed of its random choices (ignored by deterministic ones) and how
 * long a search for an optimal matching may run ({@link OptimalMatchingSolver}; ignored by the
 * heuristics that run in one pass).
 *
 * @param seed seed of random choices
 * @param timeLimit wall-clock budget of the exact solver, positive
 */
public record MatchingOptions(long seed, Duration timeLimit) {
    /** The exact solver's budget when none is given: long enough for every complex below its proven size limit. */
    public static final Duration DEFAULT_TIME_LIMIT = Duration.ofSeconds(20);

    /** Seed 1 and the default time limit. */
    public static final MatchingOptions DEFAULT = new MatchingOptions(1L);

    /** Requires a positive time limit. */
    public MatchingOptions {
        Objects.requireNonNull(timeLimit, "timeLimit");
        if (timeLimit.isNegative() || timeLimit.isZero()) {
            throw new IllegalArgumentException("the time limit must be positive, not " + timeLimit);
        }
    }

    /** The given seed and {@link #DEFAULT_TIME_LIMIT}. */
    public MatchingOptions(long seed) {
        this(seed, DEFAULT_TIME_LIMIT);
    }

    /** These options with another time limit. */
    public MatchingOptions withTimeLimit(Duration limit) {
        return new MatchingOptions(seed, limit);
    }
}
