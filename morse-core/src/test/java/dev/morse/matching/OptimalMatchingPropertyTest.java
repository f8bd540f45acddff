package dev.morse.matching;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.morse.complex.Boundary;
import dev.morse.complex.ChainComplex;
import dev.morse.complex.OrderComplex;
import dev.morse.complex.SimplicialComplex;
import dev.morse.cw.CwPosetCheck;
import dev.morse.homology.Coefficients;
import dev.morse.homology.Homology;
import dev.morse.homology.HomologyCalculator;
import dev.morse.morsecomplex.MorseReduction;
import dev.morse.poset.Poset;
import dev.morse.testing.RandomInputs;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * The exact solver against outside facts on random small complexes: never below the Morse lower bound
 * Σ(β_k + t_k + t_(k−1)) (Forman 1998), never above any heuristic, and equal to an exhaustive search
 * over all acyclic matchings where that search is small enough to run.
 */
class OptimalMatchingPropertyTest {
    private static final MatchingOptions OPTIONS = new MatchingOptions(1L, Duration.ofSeconds(30));
    /** Exhaustive search only on complexes with at most this many candidate pairs. */
    private static final int EXHAUSTIVE_PAIRS = 40;

    @Test
    void theOptimumLiesBetweenTheMorseBoundAndEveryHeuristic() {
        SplittableRandom random = new SplittableRandom(2006);
        List<MatchingHeuristic> heuristics = new ArrayList<>(MatchingHeuristics.all().values());
        heuristics.add(MatchingHeuristics.LAST_FREE_FACE);
        heuristics.add(MatchingHeuristics.FREEING_COLLAPSE);
        heuristics.add(MatchingHeuristics.CANCELLING_COLLAPSE);
        heuristics.add(MatchingHeuristics.CANCELLING_FREEING_COLLAPSE);
        int exhaustive = 0;
        int programs = 0;
        for (int i = 0; i < 240; i++) {
            ChainComplex complex = randomComplex(random, i);
            String where = "case " + i + " with cells " + Arrays.toString(complex.cellCounts());
            OptimalMatching result = OptimalMatchingSolver.solve(complex, OPTIONS);
            assertTrue(MatchingVerifier.verify(complex, result.matching()).valid(), where);
            assertTrue(result.proven(), where);
            Homology homology = HomologyCalculator.compute(complex, Coefficients.INTEGERS);
            assertTrue(result.criticalTotal() >= MorseReduction.lowerBound(homology), where);
            for (MatchingHeuristic h : heuristics) {
                long total = Arrays.stream(h.match(complex, new MatchingOptions(i)).criticalCounts(complex)).sum();
                assertTrue(result.criticalTotal() <= total, where + " against " + h.name());
            }
            // the integer programs alone, from the empty matching, reach the same optimum; so do they with
            // the searched bound on critical top cells, which must never exceed the optimum
            for (boolean coreSearch : new boolean[] {false, true}) {
                OptimalMatching fromEmpty = OptimalMatchingSolver.solve(complex, OPTIONS, false, coreSearch);
                assertTrue(fromEmpty.proven(), where);
                assertTrue(MatchingVerifier.verify(complex, fromEmpty.matching()).valid(), where);
                assertEquals(result.criticalTotal(), fromEmpty.criticalTotal(), where + ": from the empty matching");
                programs += !coreSearch && fromEmpty.solves() > 0 ? 1 : 0;
            }
            if (candidatePairs(complex) <= EXHAUSTIVE_PAIRS) {
                assertEquals(exhaustiveMaximum(complex), result.matching().pairCount(), where + ": exhaustive search");
                exhaustive++;
            }
        }
        assertTrue(exhaustive >= 100, "only " + exhaustive + " complexes small enough for the exhaustive search");
        assertTrue(programs >= 150, programs + " complexes needed an integer program, " + exhaustive + " exhaustive");
    }

    @Test
    void theNewHeuristicsKeepTheHomology() {
        // a Morse matching's complex has the homology of the complex (Forman 1998): compare with the full
        // Smith normal form on every cell
        SplittableRandom random = new SplittableRandom(2014);
        for (int i = 0; i < 300; i++) {
            ChainComplex complex = randomComplex(random, i);
            Homology oracle = HomologyCalculator.compute(complex, Coefficients.INTEGERS);
            for (MatchingHeuristic h : List.of(MatchingHeuristics.LAST_FREE_FACE, MatchingHeuristics.FREEING_COLLAPSE,
                    MatchingHeuristics.CANCELLING_COLLAPSE, MatchingHeuristics.CANCELLING_FREEING_COLLAPSE)) {
                MorseReduction.Outcome outcome = MorseReduction.run(complex,
                        new MorseReduction.Request(h, MatchingOptions.DEFAULT, Coefficients.INTEGERS, true));
                assertEquals(oracle, outcome.homology(), "case " + i + " with " + h.name());
                assertTrue(outcome.excess() >= 0, "case " + i + " with " + h.name());
            }
        }
    }

    private static ChainComplex randomComplex(SplittableRandom random, int i) {
        switch (i % 3) {
            case 0:
                return SimplicialComplex.of(RandomInputs.simplicial(random, 4 + random.nextInt(4), 1 + random.nextInt(7),
                        1 + random.nextInt(3)));
            case 1:
                return OrderComplex.of(RandomInputs.poset(random, 3 + random.nextInt(5), 0.2 + 0.4 * random.nextDouble()));
            default:
                Poset p = RandomInputs.cubical(random, 1 + random.nextInt(2), 1 + random.nextInt(2), 1, 0.5 + 0.5 * random.nextDouble());
                return p.size() == 0 ? OrderComplex.of(p) : CwPosetCheck.cellularComplex(p);
        }
    }

    private static int candidatePairs(ChainComplex complex) {
        return pairs(complex).size();
    }

    /** Face–coface pairs with a unit incidence, the only ones a Morse matching may use. */
    private static List<int[]> pairs(ChainComplex complex) {
        List<int[]> pairs = new ArrayList<>();
        Boundary boundary = complex.boundary();
        for (int s = 0; s < complex.cellCount(); s++) {
            for (int i = boundary.start(s); i < boundary.end(s); i++) {
                if (Math.abs(boundary.coefficient(i)) == 1) {
                    pairs.add(new int[] {boundary.target(i), s});
                }
            }
        }
        return pairs;
    }

    /** The most pairs of any Morse matching, by trying every matching (acyclicity by the verifier). */
    private static int exhaustiveMaximum(ChainComplex complex) {
        List<int[]> pairs = pairs(complex);
        int[] mates = new int[complex.cellCount()];
        Arrays.fill(mates, Matching.CRITICAL);
        return search(complex, pairs, 0, mates, 0);
    }

    private static int search(ChainComplex complex, List<int[]> pairs, int next, int[] mates, int chosen) {
        int best = chosen;
        for (int k = next; k < pairs.size(); k++) {
            int lower = pairs.get(k)[0];
            int upper = pairs.get(k)[1];
            if (mates[lower] != Matching.CRITICAL || mates[upper] != Matching.CRITICAL) {
                continue;
            }
            mates[lower] = upper;
            mates[upper] = lower;
            // a matching with a closed path stays cyclic when pairs are added, so stop there
            if (MatchingVerifier.verify(complex, Matching.of(mates)).valid()) {
                best = Math.max(best, search(complex, pairs, k + 1, mates, chosen + 1));
            }
            mates[lower] = Matching.CRITICAL;
            mates[upper] = Matching.CRITICAL;
        }
        return best;
    }
}
