package dev.morse.cli;

import dev.morse.matching.MatchingHeuristics;
import picocli.CommandLine.Option;

/** The one matching of a command that runs one. */
final class MatchingChoice {
    @Option(names = "--matching", paramLabel = "NAME", defaultValue = MatchingHeuristics.DEFAULT,
            converter = OptionConverters.MatchingValues.class, completionCandidates = OptionConverters.MatchingValues.class,
            description = "Acyclic matching used to shrink the complex; available: ${COMPLETION-CANDIDATES}"
                    + " (default ${DEFAULT-VALUE}). 'none' computes on every cell.")
    private String matching;

    /** The matching's name. */
    String name() {
        return matching;
    }
}
