package dev.morse.implicit;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.morse.complex.OrderComplex;
import dev.morse.homology.Coefficients;
import dev.morse.homology.Homology;
import dev.morse.matching.Matching;
import dev.morse.matching.MatchingVerdict;
import dev.morse.matching.MatchingVerifier;
import dev.morse.poset.Poset;
import dev.morse.testing.RandomInputs;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * The implicit engine against the explicit order complex on random posets, for every element order
 * offered and for random orders: the homology of the full Smith normal form on every chain (the
 * oracle), the acyclicity of the matching as the independent verifier sees it, and the critical
 * chains the pruned walk finds against the chains the rule leaves unmatched.
 */
class ImplicitHomologyPropertyTest {
    private static final int CASES = 400;

    private record Case(String name, Poset poset, ElementOrder reported, BoundedPoset.Ranking ranking) {
    }

    private static List<Case> cases(long seed) {
        SplittableRandom random = new SplittableRandom(seed);
        List<Case> cases = new ArrayList<>();
        for (int i = 0; i < CASES; i++) {
            Poset poset = RandomInputs.poset(random, 1 + random.nextInt(11), 0.1 + 0.6 * random.nextDouble());
            for (ElementOrder order : ElementOrder.values()) {
                cases.add(new Case("case " + i + " of seed " + seed + ", order " + order.optionName(), poset, order,
                        order::ranks));
            }
            cases.add(new Case("case " + i + " of seed " + seed + ", random order", poset, ElementOrder.IDS,
                    Oracle.randomRanking(seed * 1000 + i)));
        }
        return cases;
    }

    @Test
    void homologyEqualsTheFullSmithNormalForm() {
        for (Case c : cases(21)) {
            for (Coefficients coefficients : List.of(Coefficients.INTEGERS, Coefficients.modulo(2))) {
                Homology oracle = Oracle.fullSmithNormalForm(c.poset(), coefficients);
                ImplicitHomology.Outcome outcome = ImplicitHomology.run(c.poset(),
                        new ImplicitHomology.Options(c.reported(), coefficients), c.ranking());
                assertEquals(oracle, outcome.homology(), c.name() + ", " + coefficients);
                assertArrayEquals(OrderComplex.of(c.poset()).cellCounts(),
                        java.util.Arrays.stream(outcome.cells()).mapToInt(Math::toIntExact).toArray(), c.name());
            }
        }
    }

    @Test
    void criticalChainsObeyTheMorseInequalities() {
        // Forman, "Morse theory for cell complexes", 1998: m_k ≥ β_k + t_k + t_(k−1)
        for (Case c : cases(22)) {
            ImplicitHomology.Outcome outcome = ImplicitHomology.run(c.poset(),
                    new ImplicitHomology.Options(c.reported(), Coefficients.INTEGERS), c.ranking());
            Homology h = outcome.homology();
            int[] m = outcome.critical();
            for (int k = 0; k < m.length; k++) {
                long bound = h.group(k).betti() + h.group(k).torsion().size() + (k > 0 ? h.group(k - 1).torsion().size() : 0);
                assertTrue(m[k] >= bound, c.name() + ", dimension " + k);
            }
        }
    }

    @Test
    void theMatchingPassesTheIndependentVerifier() {
        for (Case c : cases(23)) {
            OrderComplex complex = OrderComplex.of(c.poset());
            BoundedPoset bounded = BoundedPoset.of(c.poset(), c.ranking(), Long.MAX_VALUE);
            MatchingVerdict verdict = MatchingVerifier.verify(complex, Oracle.explicitMatching(complex, bounded));
            assertTrue(verdict.valid(), c.name() + ": " + verdict.defect());
        }
    }

    @Test
    void thePrunedWalkFindsExactlyTheChainsTheRuleLeavesUnmatched() {
        long defective = 0;
        for (Case c : cases(24)) {
            OrderComplex complex = OrderComplex.of(c.poset());
            BoundedPoset bounded = BoundedPoset.of(c.poset(), c.ranking(), Long.MAX_VALUE);
            Matching matching = Oracle.explicitMatching(complex, bounded);
            CriticalChains found = CriticalChainSearch.run(bounded, Long.MAX_VALUE);
            defective += found.statistics().defectiveFacets();
            List<List<Integer>> byRule = new ArrayList<>();
            for (int d = 0; d <= complex.dimension(); d++) {
                for (int cell : matching.criticalCells(complex, d)) {
                    byRule.add(chainList(Oracle.internal(complex.chain(cell), bounded)));
                }
            }
            List<List<Integer>> byWalk = new ArrayList<>();
            for (int d = 0; d <= found.dimension(); d++) {
                int[] chain = new int[d + 1];
                for (int k = 0; k < found.count(d); k++) {
                    found.copy(d, k, chain);
                    byWalk.add(chainList(chain));
                }
            }
            byRule.sort(ImplicitHomologyPropertyTest::compareChains);
            byWalk.sort(ImplicitHomologyPropertyTest::compareChains);
            assertEquals(byRule, byWalk, c.name());
        }
        // the random orders must exercise the element-by-element matching of defective fibres
        assertTrue(defective > 100, "defective fibres met: " + defective);
    }

    @Test
    void bigIntegerSweepsAgreeWithLongSweeps() {
        for (Case c : cases(25)) {
            BoundedPoset bounded = BoundedPoset.of(c.poset(), c.ranking(), Long.MAX_VALUE);
            CriticalChains critical = CriticalChainSearch.run(bounded, Long.MAX_VALUE);
            int top = c.poset().maxHeight();
            List<MorseMatrix> inLong = new ArrayList<>();
            List<MorseMatrix> inBig = new ArrayList<>();
            for (int d = 1; d <= top; d++) {
                inLong.add(new LocalGradientSweep(new ChainMatching(bounded), Long.MAX_VALUE).boundary(critical, d));
                inBig.add(new LocalGradientSweep(new ChainMatching(bounded), Long.MAX_VALUE).inBigInteger()
                        .boundary(critical, d));
            }
            for (int d = 0; d < inLong.size(); d++) {
                assertTrue(java.util.Arrays.deepEquals(inLong.get(d).toDense(), inBig.get(d).toDense()), c.name());
            }
            for (Coefficients coefficients : List.of(Coefficients.INTEGERS, Coefficients.RATIONALS, Coefficients.modulo(3))) {
                assertEquals(Oracle.fullSmithNormalForm(c.poset(), coefficients),
                        ImplicitHomology.denseHomology(critical.counts(top), inBig, coefficients), c.name());
            }
        }
    }

    private static List<Integer> chainList(int[] chain) {
        return java.util.Arrays.stream(chain).boxed().toList();
    }

    private static int compareChains(List<Integer> a, List<Integer> b) {
        if (a.size() != b.size()) {
            return Integer.compare(a.size(), b.size());
        }
        for (int i = 0; i < a.size(); i++) {
            int c = Integer.compare(a.get(i), b.get(i));
            if (c != 0) {
                return c;
            }
        }
        return 0;
    }
}
