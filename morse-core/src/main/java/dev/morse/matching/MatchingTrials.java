package dev.morse.matching;

import dev.morse.complex.ChainComplex;
import dev.morse.progress.Progress;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Runs a heuristic with seeds {@code seed, seed + 1, ...} and tallies the critical-cell vectors, as
 * random discrete Morse theory reports its outcomes (Benedetti and Lutz 2014). Each matching is
 * verified; an invalid one is an internal failure.
 */
public final class MatchingTrials {
    private MatchingTrials() {
    }

    /**
     * The distribution of critical-cell vectors over {@code trials} runs, most frequent first (ties:
     * fewer critical cells first).
     */
    public static List<TrialCount> run(ChainComplex complex, MatchingHeuristic heuristic, long seed, int trials) {
        if (trials < 1) {
            throw new IllegalArgumentException("at least one trial");
        }
        Map<List<Integer>, Integer> tally = new LinkedHashMap<>();
        Progress progress = Progress.current();
        for (int t = 0; t < trials; t++) {
            progress.begin("trial " + (t + 1) + " of " + trials, "cells", complex.cellCount());
            Matching matching = heuristic.match(complex, new MatchingOptions(seed + t));
            MatchingVerifier.requireValid(complex, matching, heuristic, seed + t);
            List<Integer> vector = Arrays.stream(matching.criticalCounts(complex)).boxed().toList();
            tally.merge(vector, 1, Integer::sum);
        }
        List<TrialCount> counts = new ArrayList<>();
        tally.forEach((vector, count) -> counts.add(new TrialCount(vector, count)));
        counts.sort(Comparator.comparingInt(TrialCount::count).reversed()
                .thenComparingInt(c -> c.critical().stream().mapToInt(Integer::intValue).sum()));
        return counts;
    }
}
