package dev.morse.generate;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.morse.complex.Boundary;
import dev.morse.complex.ChainComplex;
import dev.morse.complex.SimplicialComplex;
import dev.morse.homology.Coefficients;
import dev.morse.homology.Homology;
import dev.morse.homology.HomologyCalculator;
import dev.morse.homology.HomologyGroup;
import dev.morse.matching.MatchingHeuristic;
import dev.morse.matching.MatchingHeuristics;
import dev.morse.matching.MatchingOptions;
import dev.morse.morsecomplex.MorseReduction;
import java.util.List;
import org.junit.jupiter.api.Test;

class HardLibraryTest {
    @Test
    void bingsHouseHasTheHomologyOfAPointAndNoFreeFace() {
        // Bing 1964: the house with two rooms is contractible, and no edge lies in a single square
        ChainComplex house = named("bings-house").complex();
        assertArrayEquals(new int[] {60, 129, 70}, house.cellCounts());
        assertEquals(List.of(HomologyGroup.free(0, 1), HomologyGroup.free(1, 0), HomologyGroup.free(2, 0)),
                HomologyCalculator.compute(house, Coefficients.INTEGERS).groups());
        Boundary coboundary = house.coboundary();
        for (int e = house.firstCell(1); e < house.firstCell(2); e++) {
            assertTrue(coboundary.size(e) >= 2, "edge " + house.cellName(e) + " is a free face");
        }
    }

    @Test
    void sumComplexesHaveTheFacetCountOfAHypertree() {
        // Linial–Meshulam–Rosenthal 2010: with gcd(k + 1, n) = 1, X_A has C(n − 1, k) k-faces
        assertEquals(binomial(6, 2), SimplicialComplex.of(SumComplex.facets(7, 0, 1, 3)).cellCount(2));
        assertEquals(binomial(16, 2), SimplicialComplex.of(SumComplex.facets(17, 0, 1, 3)).cellCount(2));
        assertEquals(binomial(10, 3), SimplicialComplex.of(SumComplex.facets(11, 0, 1, 2, 4)).cellCount(3));
        assertEquals(binomial(8, 3), SimplicialComplex.of(SumComplex.facets(9, 0, 1, 3, 7)).cellCount(3));
    }

    @Test
    void sumComplexesOnAPrimeAreRationallyAcyclic() {
        // LMR 2010: for n prime X_A is a k-hypertree, so over Q it has the homology of a point
        for (int[] nA : new int[][] {{7, 0, 1, 3}, {11, 0, 1, 3}, {13, 0, 1, 4}, {7, 0, 1, 2, 4}, {11, 0, 1, 2, 4}}) {
            ChainComplex x = SimplicialComplex.of(SumComplex.facets(nA[0], java.util.Arrays.copyOfRange(nA, 1, nA.length)));
            int[] betti = HomologyCalculator.compute(x, Coefficients.RATIONALS).bettiNumbers();
            int[] point = new int[betti.length];
            point[0] = 1;
            assertArrayEquals(point, betti, java.util.Arrays.toString(nA));
        }
    }

    @Test
    void aSumComplexOfAnArithmeticProgressionIsIntegrallyAcyclic() {
        // LMR 2010: for n prime and A an arithmetic progression X_A is k-collapsible; a collapse keeps
        // the homotopy type and the top homology of what is left is free, hence 0 over Z too
        for (int[] a : new int[][] {{0, 1, 2}, {1, 3, 5}, {0, 2, 4, 6}}) {
            ChainComplex x = SimplicialComplex.of(SumComplex.facets(11, a));
            Homology h = HomologyCalculator.compute(x, Coefficients.INTEGERS);
            for (HomologyGroup g : h.groups()) {
                assertEquals(g.dimension() == 0 ? 1 : 0, g.betti(), java.util.Arrays.toString(a));
                assertTrue(g.torsion().isEmpty(), java.util.Arrays.toString(a));
            }
        }
    }

    @Test
    void everyHeuristicGivesTheHomologyOfTheFullSmithNormalForm() {
        // the oracle: the Smith normal form on every cell; torsion where LMR 2010 predict it is only
        // checked this way, as no closed formula for its order is used here
        List<MatchingHeuristic> heuristics = new java.util.ArrayList<>(MatchingHeuristics.all().values());
        heuristics.addAll(MatchingHeuristics.onRequest().stream().filter(h -> !h.name().equals("optimal")).toList());
        for (HardComplex hard : HardLibrary.all()) {
            ChainComplex complex = hard.complex();
            Homology oracle = HomologyCalculator.compute(complex, Coefficients.INTEGERS);
            for (MatchingHeuristic h : heuristics) {
                MorseReduction.Outcome outcome = MorseReduction.run(complex,
                        new MorseReduction.Request(h, MatchingOptions.DEFAULT, Coefficients.INTEGERS, true));
                assertEquals(oracle, outcome.homology(), hard.name() + " with " + h.name());
                hard.optimum().ifPresent(known -> {
                    long best = java.util.Arrays.stream(known).sum();
                    long total = java.util.Arrays.stream(outcome.critical()).sum();
                    assertTrue(total >= best, hard.name() + " with " + h.name() + " beat the optimum");
                });
            }
        }
    }

    @Test
    void knownOptimaAreNotBelowTheMorseBound() {
        for (HardComplex hard : HardLibrary.all()) {
            hard.optimum().ifPresent(known -> {
                Homology h = HomologyCalculator.compute(hard.complex(), Coefficients.INTEGERS);
                assertTrue(java.util.Arrays.stream(known).sum() >= MorseReduction.lowerBound(h), hard.name());
                assertEquals(hard.complex().dimension() + 1, known.length, hard.name());
            });
        }
    }

    private static HardComplex named(String name) {
        return HardLibrary.all().stream().filter(h -> h.name().equals(name)).findFirst().orElseThrow();
    }

    private static long binomial(int n, int k) {
        long b = 1;
        for (int i = 1; i <= k; i++) {
            b = b * (n - k + i) / i;
        }
        return b;
    }
}
