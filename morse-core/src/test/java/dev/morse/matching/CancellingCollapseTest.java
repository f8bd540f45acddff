package dev.morse.matching;

import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.morse.complex.ChainComplex;
import dev.morse.complex.OrderComplex;
import dev.morse.complex.SimplicialComplex;
import dev.morse.generate.HardComplex;
import dev.morse.generate.HardLibrary;
import dev.morse.homology.Coefficients;
import dev.morse.homology.HomologyCalculator;
import dev.morse.morsecomplex.MorseReduction;
import dev.morse.testing.RandomInputs;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * Forman's cancellation theorem (1998) after collapsing: each cancellation pairs two critical cells
 * along their only gradient path and keeps the matching acyclic, so the result is an acyclic matching
 * (checked by the independent verifier) with never more critical cells than the matching it started from.
 */
class CancellingCollapseTest {
    @Test
    void cancellingNeverAddsCriticalCellsAndTheResultIsAcyclic() {
        SplittableRandom random = new SplittableRandom(1998);
        for (int i = 0; i < 400; i++) {
            ChainComplex complex = i % 2 == 0
                    ? SimplicialComplex.of(RandomInputs.simplicial(random, 5 + random.nextInt(5), 2 + random.nextInt(10),
                            2 + random.nextInt(3)))
                    : OrderComplex.of(RandomInputs.poset(random, 4 + random.nextInt(6), 0.2 + 0.5 * random.nextDouble()));
            String where = "case " + i + " with cells " + Arrays.toString(complex.cellCounts());
            for (MatchingHeuristic[] pair : new MatchingHeuristic[][] {
                {MatchingHeuristics.COLLAPSE, MatchingHeuristics.CANCELLING_COLLAPSE},
                {MatchingHeuristics.FREEING_COLLAPSE, MatchingHeuristics.CANCELLING_FREEING_COLLAPSE}}) {
                Matching before = pair[0].match(complex, MatchingOptions.DEFAULT);
                Matching after = pair[1].match(complex, MatchingOptions.DEFAULT);
                assertTrue(MatchingVerifier.verify(complex, after).valid(), where + " with " + pair[1].name());
                assertTrue(after.pairCount() >= before.pairCount(), where + " with " + pair[1].name());
                long bound = MorseReduction.lowerBound(HomologyCalculator.compute(complex, Coefficients.INTEGERS));
                assertTrue(complex.cellCount() - 2L * after.pairCount() >= bound, where + ": below the Morse bound");
            }
        }
    }

    @Test
    void overTheHardLibraryCancellingCollapseLeavesLessExcessThanEveryOneOfTheDefaultHeuristics() {
        Map<String, Long> excess = excessOverTheLibrary();
        long cancelling = excess.get("cancelling-collapse");
        for (String other : List.of("coreduction", "collapse", "lexicographic", "random", "last-free-face")) {
            assertTrue(cancelling < excess.get(other), excess.toString());
        }
        // with the critical cells of freeing-collapse it leaves less than any other heuristic
        for (Map.Entry<String, Long> e : excess.entrySet()) {
            if (!e.getKey().equals("cancelling-freeing-collapse")) {
                assertTrue(excess.get("cancelling-freeing-collapse") < e.getValue(), excess.toString());
            }
        }
    }

    /** Total critical cells beyond the Morse bound Σ(β_k + t_k + t_(k−1)) (Forman 1998) over the library. */
    private static Map<String, Long> excessOverTheLibrary() {
        Map<String, Long> excess = new LinkedHashMap<>();
        for (HardComplex hard : HardLibrary.all()) {
            ChainComplex complex = hard.complex();
            long bound = MorseReduction.lowerBound(HomologyCalculator.compute(complex, Coefficients.INTEGERS));
            for (MatchingHeuristic h : MatchingHeuristics.everyKnown().values()) {
                if (h.name().equals("optimal") || h.name().equals("none")) {
                    continue;
                }
                long total = complex.cellCount() - 2L * h.match(complex, MatchingOptions.DEFAULT).pairCount();
                excess.merge(h.name(), total - bound, Long::sum);
            }
        }
        return excess;
    }
}
