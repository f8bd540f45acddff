package dev.morse.morsecomplex;

import dev.morse.complex.ChainComplex;
import dev.morse.homology.Coefficients;
import dev.morse.homology.Homology;
import dev.morse.homology.HomologyCalculator;
import dev.morse.homology.HomologyGroup;
import dev.morse.matching.Matching;
import dev.morse.matching.MatchingHeuristic;
import dev.morse.matching.MatchingOptions;
import dev.morse.matching.MatchingVerdict;
import dev.morse.matching.MatchingVerifier;
import dev.morse.matching.MatchingHeuristics;
import dev.morse.progress.Progress;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.ArrayList;
import java.util.Optional;
import java.util.Arrays;

/**
 * Homology of a chain complex by discrete Morse reduction: match, verify, sweep the gradient into the
 * Morse complex, reduce it algebraically, and finish with exact homology of what is left. With the
 * heuristic {@code none} the Smith normal form runs on every cell (the baseline). Should a Morse
 * coefficient not fit in a long, the answer is computed on every cell instead, where the Smith
 * normal form carries on in BigInteger arithmetic: slower, never wrong.
 */
public final class MorseReduction {
    private MorseReduction() {
    }

    /** What to run. */
    public record Request(MatchingHeuristic heuristic, MatchingOptions options, Coefficients coefficients, boolean verify) {
    }

    /**
     * Everything a run found, keeping the complex, the matching and the Morse complex so that later
     * questions (exports, pictures, cycles) need no second run.
     *
     * @param heuristic the heuristic's name
     * @param complex the complex that was matched
     * @param matching the acyclic matching
     * @param verdict the verifier's verdict, or {@code null} when verification was skipped
     * @param morse the Morse complex before algebraic reduction, or {@code null} when none was built
     * @param rounds counts after each algebraic round (empty for {@code none})
     * @param homology the unreduced homology
     * @param times milliseconds per phase
     */
    public record Outcome(String heuristic, ChainComplex complex, Matching matching, MatchingVerdict verdict,
            MorseComplex morse, List<ReductionRound> rounds, Homology homology, PhaseTimes times)
            implements MorseOutcome {
        /** Copies lists. */
        public Outcome {
            rounds = List.copyOf(rounds);
        }

        @Override
        public String matchingName() {
            return heuristic;
        }

        @Override
        public long[] cells() {
            return Arrays.stream(complex.cellCounts()).asLongStream().toArray();
        }

        @Override
        public int[] critical() {
            return matching.criticalCounts(complex);
        }

        @Override
        public Optional<MorseComplex> morseComplex() {
            return Optional.ofNullable(morse);
        }

        @Override
        public List<String> criticalCellNames(int dimension) {
            List<String> names = new ArrayList<>();
            for (int c : matching.criticalCells(complex, dimension)) {
                names.add(complex.cellName(c));
            }
            return names;
        }

        /**
         * The Morse lower bound Σ_k (β_k + t_k + t_(k−1)) on the number of critical cells, t_k being the
         * number of torsion factors of H_k (Forman, "Morse theory for cell complexes", 1998).
         */
        public long lowerBound() {
            return MorseReduction.lowerBound(homology);
        }

        /** Critical cells beyond the lower bound. */
        public long excess() {
            return totalCritical() - lowerBound();
        }
    }

    /** Runs the reduction on {@code complex}. */
    public static Outcome run(ChainComplex complex, Request request) {
        Map<String, Double> times = new LinkedHashMap<>();
        Progress.current().begin("match", "cells", complex.cellCount());
        long t0 = System.nanoTime();
        Matching matching = request.heuristic().match(complex, request.options());
        long t1 = System.nanoTime();
        times.put("match", millis(t0, t1));
        MatchingVerdict verdict = null;
        if (request.verify()) {
            verdict = MatchingVerifier.requireValid(complex, matching, request.heuristic(), request.options().seed());
            times.put("verify", millis(t1, System.nanoTime()));
        }
        if (request.heuristic() == MatchingHeuristics.NONE) {
            return onEveryCell(complex, matching, verdict, request, times, "homology");
        }
        long t2 = System.nanoTime();
        MorseComplex morse;
        try {
            morse = GradientSweep.build(complex, matching);
        } catch (ArithmeticException overflow) {
            // a Morse coefficient left the range of long: answer exactly on every cell instead
            times.put("sweep", millis(t2, System.nanoTime()));
            return onEveryCell(complex, matching, verdict, request, times, "homology on every cell after overflow");
        }
        long t3 = System.nanoTime();
        times.put("sweep", millis(t2, t3));
        AlgebraicReduction.Result reduced = AlgebraicReduction.reduce(morse);
        long t4 = System.nanoTime();
        times.put("reduce", millis(t3, t4));
        MorseComplex left = reduced.reduced();
        Homology homology = HomologyCalculator.fromBoundaries(left.cellCounts(), left::boundary, request.coefficients());
        times.put("homology", millis(t4, System.nanoTime()));
        return new Outcome(request.heuristic().name(), complex, matching, verdict, morse, reduced.rounds(), homology,
                new PhaseTimes(times));
    }

    /** The Smith normal form on every cell, timed as {@code phase}: the baseline, and the way out of an overflow. */
    private static Outcome onEveryCell(ChainComplex complex, Matching matching, MatchingVerdict verdict,
            Request request, Map<String, Double> times, String phase) {
        long start = System.nanoTime();
        Homology homology = HomologyCalculator.compute(complex, request.coefficients());
        times.put(phase, millis(start, System.nanoTime()));
        return new Outcome(request.heuristic().name(), complex, matching, verdict, null, List.of(), homology,
                new PhaseTimes(times));
    }

    private static double millis(long startNanos, long endNanos) {
        return (endNanos - startNanos) / 1e6;
    }

    /** Σ_k (β_k + t_k + t_(k−1)) for the given homology. */
    public static long lowerBound(Homology homology) {
        long bound = 0;
        List<HomologyGroup> groups = homology.groups();
        for (int k = 0; k < groups.size(); k++) {
            bound += groups.get(k).betti() + groups.get(k).torsion().size();
            if (k > 0) {
                bound += groups.get(k - 1).torsion().size();
            }
        }
        return bound;
    }
}
