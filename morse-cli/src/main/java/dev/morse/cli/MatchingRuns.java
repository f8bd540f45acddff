package dev.morse.cli;

import picocli.CommandLine.Option;

/** How a matching is run: its seed, how many seeded trials to tally, and whether to verify it. */
final class MatchingRuns {
    @Option(names = "--seed", paramLabel = "N", defaultValue = "1",
            description = "Seed of the random matching's choices, and of the first trial (default ${DEFAULT-VALUE}).")
    private long seed;

    @Option(names = "--trials", paramLabel = "N", defaultValue = "1",
            description = "Run the matching N times with seeds from --seed on and report how often each vector of"
                    + " critical cells occurred; at most 1,000,000.")
    private int trials;

    @Option(names = "--no-verify", description = "Trust the matching without checking that it is acyclic.")
    private boolean noVerify;

    @Option(names = "--time-limit", paramLabel = "SECONDS", defaultValue = "20",
            description = "How long a matching that searches may take: the exact optimum (--matching optimal, and the"
                    + " optimum column of compare) gives its best matching and bound when time is up"
                    + " (default ${DEFAULT-VALUE}).")
    private long timeLimitSeconds;

    long seed() {
        return seed;
    }

    int trials() {
        return trials;
    }

    boolean verify() {
        return !noVerify;
    }

    /** The time limit, as given in seconds. */
    java.time.Duration timeLimit() {
        return java.time.Duration.ofSeconds(timeLimitSeconds);
    }
}
