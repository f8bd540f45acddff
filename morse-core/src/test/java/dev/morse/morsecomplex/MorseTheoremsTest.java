package dev.morse.morsecomplex;

import dev.morse.cw.CwPosetCheck;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.morse.complex.ChainComplex;
import dev.morse.complex.OrderComplex;
import dev.morse.complex.SimplicialComplex;
import dev.morse.generate.CrossPolytopeFaces;
import dev.morse.generate.FacePart;
import dev.morse.generate.CubeFaces;
import dev.morse.generate.SimplexFaces;
import dev.morse.generate.Skeleton;
import dev.morse.generate.Triangulations;
import dev.morse.homology.Coefficients;
import dev.morse.matching.MatchingHeuristic;
import dev.morse.matching.MatchingHeuristics;
import dev.morse.matching.MatchingOptions;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/** Discrete Morse theory's own theorems about how few critical cells a matching can leave. */
class MorseTheoremsTest {

    private static MorseReduction.Outcome coreduce(ChainComplex complex) {
        return MorseReduction.run(complex, new MorseReduction.Request(MatchingHeuristics.COREDUCTION, MatchingOptions.DEFAULT,
                Coefficients.INTEGERS, true));
    }

    /** Cellular complexes of shellable spheres and collapsible balls, dimensions 1 to 6. */
    private static List<ChainComplex> shellableAndCollapsible() {
        List<ChainComplex> complexes = new ArrayList<>();
        for (int d = 1; d <= 6; d++) {
            // boundaries of polytopes are shellable (Bruggesser–Mani 1971); closed polytopes are collapsible balls
            complexes.add(CwPosetCheck.cellularComplex(CubeFaces.boundaryFacePoset(d)));
            complexes.add(CwPosetCheck.cellularComplex(CubeFaces.closedFacePoset(d)));
            complexes.add(CwPosetCheck.cellularComplex(CrossPolytopeFaces.of(FacePart.BOUNDARY, d)));
            complexes.add(CwPosetCheck.cellularComplex(CrossPolytopeFaces.of(FacePart.CLOSED, d)));
            complexes.add(CwPosetCheck.cellularComplex(SimplexFaces.boundaryFacePoset(d)));
            complexes.add(CwPosetCheck.cellularComplex(SimplexFaces.closedFacePoset(d)));
            // the simplex itself and its boundary, as simplicial complexes: the (d-1)-skeleton of Δ^d is ∂Δ^d
            complexes.add(SimplicialComplex.of(Skeleton.ofSimplex(d, d + 1)));
            complexes.add(SimplicialComplex.of(Skeleton.ofSimplex(d - 1, d + 1)));
        }
        // barycentric subdivisions: order complexes of the same face posets
        for (int d = 1; d <= 4; d++) {
            complexes.add(OrderComplex.of(CubeFaces.boundaryFacePoset(d)));
            complexes.add(OrderComplex.of(CrossPolytopeFaces.of(FacePart.CLOSED, d)));
        }
        return complexes;
    }

    @Test
    void coreductionIsPerfectInTheFirstRoundOnShellableSpheresAndCollapsibleBalls() {
        // a shellable sphere has a perfect Morse matching (one critical cell in dimensions 0 and top), a
        // collapsible ball one with a single critical vertex (Forman 1998; Chari 2000): excess 0 before any
        // algebraic reduction
        for (ChainComplex complex : shellableAndCollapsible()) {
            MorseReduction.Outcome outcome = coreduce(complex);
            String where = complex.kind().reportName() + " complex with cells " + java.util.Arrays.toString(complex.cellCounts());
            assertEquals(0, outcome.excess(), where + ": critical " + java.util.Arrays.toString(outcome.critical()));
            assertTrue(outcome.rounds().isEmpty(), where + " needed no algebraic round");
        }
    }

    @Test
    void theDunceHatLeavesCriticalCellsInEveryDimensionWhateverTheHeuristic() {
        // every edge of the dunce hat lies in two or more triangles, so no collapse can start, and it is
        // contractible but not collapsible (Zeeman 1964): any Morse matching leaves a critical cell in
        // dimensions 0, 1 and 2 (Forman 1998 with the weak Morse inequalities)
        ChainComplex hat = SimplicialComplex.of(Triangulations.dunceHat8());
        for (MatchingHeuristic h : MatchingHeuristics.all().values()) {
            for (long seed = 1; seed <= (h.name().equals("random") ? 20 : 1); seed++) {
                MorseReduction.Outcome outcome = MorseReduction.run(hat,
                        new MorseReduction.Request(h, new MatchingOptions(seed), Coefficients.INTEGERS, true));
                int[] m = outcome.critical();
                assertTrue(m[0] >= 1 && m[1] >= 1 && m[2] >= 1, h.name() + " seed " + seed + ": " + java.util.Arrays.toString(m));
                assertArrayEquals(new int[] {1, 0, 0}, outcome.homology().bettiNumbers(), h.name());
            }
        }
    }

    @Test
    void noMatchingLeavesEveryCellCritical() {
        // the baseline pairs nothing (DESIGN: with --matching none, critical equals cells)
        ChainComplex torus = SimplicialComplex.of(Triangulations.torus7());
        MorseReduction.Outcome outcome = MorseReduction.run(torus, new MorseReduction.Request(MatchingHeuristics.NONE,
                MatchingOptions.DEFAULT, Coefficients.INTEGERS, true));
        assertArrayEquals(torus.cellCounts(), outcome.critical());
        // torus: f = (7, 21, 14) for the 7-vertex triangulation (Möbius 1861 / Császár); H = Z, Z^2, Z
        assertArrayEquals(new int[] {7, 21, 14}, outcome.critical());
        assertArrayEquals(new int[] {1, 2, 1}, outcome.homology().bettiNumbers());
    }
}
