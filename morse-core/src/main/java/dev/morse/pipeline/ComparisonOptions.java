package dev.morse.pipeline;

import dev.morse.complex.ComplexChoice;
import dev.morse.matching.MatchingHeuristics;
import java.util.HashSet;
import java.util.List;
import java.util.Objects;
import java.util.Set;

/**
 * What a comparison of matching heuristics should run.
 *
 * @param complex which complex to build from a poset
 * @param matchings the heuristics to compare, by name, in the order to show them; the first one's
 *     homology is the reference the others must match
 * @param seed the seed of each heuristic's run, and of the first trial
 * @param trials how many seeded runs to tally for each randomized heuristic; 1 for none
 */
public record ComparisonOptions(ComplexChoice complex, List<String> matchings, long seed, int trials) {
    /**
     * Validates.
     *
     * @throws IllegalArgumentException for an unknown or repeated name, an empty list or fewer than
     *     one trial
     */
    public ComparisonOptions {
        Objects.requireNonNull(complex, "complex");
        matchings = List.copyOf(matchings);
        if (matchings.isEmpty()) {
            throw new IllegalArgumentException("name at least one matching to compare");
        }
        Set<String> seen = new HashSet<>();
        for (String name : matchings) {
            HomologyPipeline.requireKnownMatching(name);
            if (!seen.add(name)) {
                throw new IllegalArgumentException("matching '" + name + "' is named twice");
            }
        }
        if (trials < 1) {
            throw new IllegalArgumentException("trials must be at least 1");
        }
    }

    /** Every built-in heuristic except {@code none}, which is the baseline and is compared only when asked for. */
    public static List<String> defaultMatchings() {
        return MatchingHeuristics.builtInNames().stream().filter(n -> !n.equals(HomologyPipeline.NO_MATCHING)).toList();
    }

    /** The default heuristics on the automatically chosen complex, seed 1, no trials. */
    public static ComparisonOptions defaults() {
        return new ComparisonOptions(ComplexChoice.AUTO, defaultMatchings(), 1L, 1);
    }
}
