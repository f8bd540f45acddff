package dev.morse.generate;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.morse.complex.Boundary;
import dev.morse.complex.ChainComplex;
import dev.morse.complex.Facets;
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

    @Test
    void rudinsBallIsAPureHomologyBallWithEveryVertexOnItsBoundarySphere() {
        // Rudin 1958: 14 vertices, all on the boundary of the tetrahedron it triangulates, 41 tetrahedra
        ChainComplex ball = named("rudin-ball").complex();
        assertArrayEquals(new int[] {14, 66, 94, 41}, ball.cellCounts());
        assertEquals(List.of(HomologyGroup.free(0, 1), HomologyGroup.free(1, 0), HomologyGroup.free(2, 0),
                HomologyGroup.free(3, 0)), HomologyCalculator.compute(ball, Coefficients.INTEGERS).groups());
        Boundary coboundary = ball.coboundary();
        List<List<String>> boundaryTriangles = new java.util.ArrayList<>();
        for (int t = ball.firstCell(2); t < ball.firstCell(3); t++) {
            // a 3-manifold with boundary: every triangle in one tetrahedron (on the boundary) or two
            assertTrue(coboundary.size(t) == 1 || coboundary.size(t) == 2, ball.cellName(t));
            if (coboundary.size(t) == 1) {
                boundaryTriangles.add(labels(ball, t));
            }
        }
        for (int c = 0; c < ball.cellCount(); c++) {
            // pure: every cell lies in a tetrahedron
            assertTrue(ball.dimensionOf(c) == 3 || coboundary.size(c) > 0, ball.cellName(c));
        }
        ChainComplex sphere = SimplicialComplex.of(dev.morse.complex.Facets.ofLabels(boundaryTriangles));
        assertEquals(14, sphere.cellCount(0), "every vertex on the boundary");
        assertEquals(List.of(HomologyGroup.free(0, 1), HomologyGroup.free(1, 0), HomologyGroup.free(2, 1)),
                HomologyCalculator.compute(sphere, Coefficients.INTEGERS).groups());
    }

    @Test
    void noTetrahedronOfRudinsBallMeetsTheBoundaryInADisc() {
        // strongly non-shellable (Rudin 1958; Lutz 2003): a tetrahedron can be removed leaving a ball only
        // when it meets the boundary in a 2-ball, that is in the closure of its boundary triangles alone
        ChainComplex ball = named("rudin-ball").complex();
        Boundary coboundary = ball.coboundary();
        java.util.Set<List<String>> onBoundary = new java.util.HashSet<>();
        for (int t = ball.firstCell(2); t < ball.firstCell(3); t++) {
            if (coboundary.size(t) == 1) {
                for (List<String> face : faces(labels(ball, t))) {
                    onBoundary.add(face);
                }
            }
        }
        for (int f = ball.firstCell(3); f < ball.cellCount(); f++) {
            List<String> tetrahedron = labels(ball, f);
            java.util.Set<List<String>> closure = new java.util.HashSet<>();
            for (List<String> face : faces(tetrahedron)) {
                if (face.size() == 3 && onBoundary.contains(face)) {
                    closure.addAll(faces(face));
                }
            }
            java.util.Set<List<String>> meets = new java.util.HashSet<>();
            for (List<String> face : faces(tetrahedron)) {
                if (face.size() < 4 && onBoundary.contains(face)) {
                    meets.add(face);
                }
            }
            assertTrue(closure.isEmpty() || !closure.equals(meets), ball.cellName(f) + " meets the boundary in a disc");
        }
    }

    private static List<String> labels(ChainComplex complex, int cell) {
        List<String> labels = new java.util.ArrayList<>();
        Facets facets = Triangulations.rudinBall();
        for (int v : complex.vertexTuple(cell)) {
            labels.add(facets.vertexLabel(v));
        }
        java.util.Collections.sort(labels);
        return labels;
    }

    /** Every nonempty subset of a sorted face, each sorted. */
    private static List<List<String>> faces(List<String> face) {
        List<List<String>> out = new java.util.ArrayList<>();
        for (int mask = 1; mask < 1 << face.size(); mask++) {
            List<String> sub = new java.util.ArrayList<>();
            for (int i = 0; i < face.size(); i++) {
                if ((mask & 1 << i) != 0) {
                    sub.add(face.get(i));
                }
            }
            out.add(sub);
        }
        return out;
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
