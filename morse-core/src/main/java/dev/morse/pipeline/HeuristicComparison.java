package dev.morse.pipeline;

import dev.morse.complex.ChainComplex;
import dev.morse.homology.Coefficients;
import dev.morse.homology.Homology;
import dev.morse.matching.MatchingHeuristic;
import dev.morse.matching.MatchingHeuristics;
import dev.morse.matching.MatchingOptions;
import dev.morse.matching.MatchingTrials;
import dev.morse.matching.TrialCount;
import dev.morse.morsecomplex.MorseReduction;
import dev.morse.report.ComparisonReport;
import dev.morse.report.MatchingRun;
import dev.morse.report.PhaseTiming;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * Runs several matching heuristics on one input: reads it and builds its complex once, then for
 * each heuristic matches, verifies, sweeps, reduces and computes homology, timing every phase and
 * noting the approximate peak heap use. The first heuristic's homology is the reference; every
 * other must give the same groups, since any acyclic matching preserves homology (Forman 1998), so
 * a difference is a bug and raises {@link IllegalStateException}, as does a matching the verifier
 * rejects. Randomized heuristics are also run {@code trials} times to tally their critical vectors.
 * Stateless.
 */
public final class HeuristicComparison {
    private HeuristicComparison() {
    }

    /**
     * Compares on a file.
     *
     * @throws dev.morse.io.InputException for bad input
     * @throws IOException when reading fails for another reason
     * @throws IllegalStateException when a heuristic fails verification or disagrees with the reference
     */
    public static ComparisonReport run(Path file, ComparisonOptions options) throws IOException {
        return run(InputLoader.load(file), options);
    }

    /** Compares on an input already read. */
    public static ComparisonReport run(LoadedInput input, ComparisonOptions options) {
        BuiltComplex built = InputLoader.complex(input, options.complex());
        ChainComplex complex = built.complex();
        List<MatchingRun> runs = new ArrayList<>();
        Homology reference = null;
        String referenceName = options.matchings().get(0);
        for (String name : options.matchings()) {
            MatchingHeuristic heuristic = MatchingHeuristics.byName(name).orElseThrow();
            HeapPeaks.reset();
            MorseReduction.Outcome outcome = MorseReduction.run(complex, new MorseReduction.Request(heuristic,
                    new MatchingOptions(options.seed()), Coefficients.INTEGERS, true));
            long peak = HeapPeaks.peakBytes();
            if (reference == null) {
                reference = outcome.homology();
            } else {
                requireAgreement(referenceName, reference, name, outcome.homology());
            }
            List<PhaseTiming> timings = new ArrayList<>();
            outcome.times().millis().forEach((phase, ms) -> timings.add(new PhaseTiming(phase, ms)));
            List<TrialCount> trials = heuristic.randomized() && options.trials() > 1
                    ? MatchingTrials.run(complex, heuristic, options.seed(), options.trials())
                    : List.of();
            runs.add(new MatchingRun(name, boxed(outcome.critical()), timings, peak, trials));
        }
        List<PhaseTiming> setup = List.of(new PhaseTiming("read", input.readMillis()),
                new PhaseTiming("complex", built.buildMillis()));
        return new ComparisonReport(input.source(), input.format(), complex.kind(), boxed(complex.cellCounts()),
                built.cwCheck(), reference, referenceName, setup, runs, options.seed());
    }

    /**
     * Fails unless two runs found the same homology groups.
     *
     * @throws IllegalStateException naming both runs and the first dimension where they differ
     */
    static void requireAgreement(String referenceName, Homology reference, String name, Homology found) {
        if (reference.groups().equals(found.groups())) {
            return;
        }
        int d = 0;
        while (d < reference.groups().size() && d < found.groups().size()
                && reference.group(d).equals(found.group(d))) {
            d++;
        }
        throw new IllegalStateException("matchings disagree on the homology: " + referenceName + " gives H" + d
                + " = " + reference.group(d) + " but " + name + " gives H" + d + " = " + found.group(d));
    }

    private static List<Integer> boxed(int[] counts) {
        List<Integer> list = new ArrayList<>(counts.length);
        for (int c : counts) {
            list.add(c);
        }
        return list;
    }
}
