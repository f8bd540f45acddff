package dev.morse.matching;

import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.morse.complex.ChainComplex;
import dev.morse.complex.SimplicialComplex;
import dev.morse.cw.CwPosetCheck;
import dev.morse.generate.CubeFaces;
import dev.morse.generate.HardComplex;
import dev.morse.generate.HardLibrary;
import dev.morse.generate.SimplexFaces;
import dev.morse.generate.Triangulations;
import dev.morse.homology.Coefficients;
import dev.morse.homology.HomologyCalculator;
import dev.morse.morsecomplex.MorseReduction;
import java.time.Duration;
import java.util.Arrays;
import java.util.List;
import org.junit.jupiter.api.Test;

class OptimalMatchingSolverTest {
    private static final MatchingOptions OPTIONS = new MatchingOptions(1L, Duration.ofSeconds(30));

    @Test
    void theDunceHatNeedsOneCriticalCellInEachDimension() {
        // Zeeman 1964: contractible, not collapsible; with no free edge every Morse matching leaves a
        // critical cell in dimensions 0, 1 and 2 (Forman 1998), and (1, 1, 1) is attained
        ChainComplex hat = SimplicialComplex.of(Triangulations.dunceHat8());
        OptimalMatching result = OptimalMatchingSolver.solve(hat, OPTIONS);
        assertTrue(result.proven());
        assertArrayEquals(new int[] {1, 1, 1}, result.critical());
        assertEquals(3, result.lowerBound());
        assertTrue(MatchingVerifier.verify(hat, result.matching()).valid());
    }

    @Test
    void theIntegerProgramsProveTheDunceHatAndBingsHouseWithoutTheSearchedBound() {
        // the same facts (Zeeman 1964; Bing 1964) without the searched bound on critical top cells: on
        // the dunce hat from the empty matching, on Bing's house from the heuristics' best
        OptimalMatching hat = OptimalMatchingSolver.solve(SimplicialComplex.of(Triangulations.dunceHat8()), OPTIONS,
                false, false);
        OptimalMatching house = OptimalMatchingSolver.solve(HardLibrary.all().stream()
                .filter(h -> h.name().equals("bings-house")).findFirst().orElseThrow().complex(), OPTIONS, true, false);
        for (OptimalMatching result : List.of(hat, house)) {
            assertTrue(result.proven());
            assertTrue(result.solves() >= 1);
            assertArrayEquals(new int[] {1, 1, 1}, result.critical());
        }
    }

    @Test
    void collapsibleBallsNeedOnlyOneCriticalVertex() {
        // simplices and cubes are collapsible (Whitehead 1939), so a Morse matching with a single
        // critical vertex exists (Forman 1998), and none can do better
        List<ChainComplex> balls = List.of(
                CwPosetCheck.cellularComplex(SimplexFaces.closedFacePoset(3)),
                CwPosetCheck.cellularComplex(SimplexFaces.closedFacePoset(5)),
                CwPosetCheck.cellularComplex(CubeFaces.closedFacePoset(2)),
                CwPosetCheck.cellularComplex(CubeFaces.closedFacePoset(4)));
        for (ChainComplex ball : balls) {
            OptimalMatching result = OptimalMatchingSolver.solve(ball, OPTIONS);
            int[] expected = new int[ball.dimension() + 1];
            expected[0] = 1;
            assertTrue(result.proven(), Arrays.toString(ball.cellCounts()));
            assertArrayEquals(expected, result.critical(), Arrays.toString(ball.cellCounts()));
        }
    }

    @Test
    void everyHardComplexUpToTheSizeLimitIsSolvedWithProof() {
        int solved = 0;
        for (HardComplex hard : HardLibrary.all()) {
            ChainComplex complex = hard.complex();
            if (complex.cellCount() > OptimalMatchingSolver.PROVEN_CELL_LIMIT) {
                continue;
            }
            OptimalMatching result = OptimalMatchingSolver.solve(complex, OPTIONS);
            assertTrue(result.proven(), hard.name());
            assertTrue(MatchingVerifier.verify(complex, result.matching()).valid(), hard.name());
            assertEquals(result.criticalTotal(), result.lowerBound(), hard.name());
            hard.optimum().ifPresent(known -> assertArrayEquals(known, result.critical(), hard.name() + ": " + hard.source()));
            solved++;
        }
        assertEquals(17, solved);
    }

    @Test
    void theLargestSumComplexIsProvenAtItsMorseBoundAfterCancellations() {
        // X_{0,2,5,6} on Z/13 (597 cells, beyond the size limit): rationally acyclic with H_2 torsion (LMR
        // 2010); coreduction followed by Forman's cancellations meets the Morse bound, which proves it
        HardComplex hard = HardLibrary.all().stream().filter(h -> h.name().equals("sum-13-0.2.5.6")).findFirst()
                .orElseThrow();
        ChainComplex complex = hard.complex();
        OptimalMatching result = OptimalMatchingSolver.solve(complex, OPTIONS);
        assertTrue(result.proven());
        assertEquals(MorseReduction.lowerBound(HomologyCalculator.compute(complex, Coefficients.INTEGERS)),
                result.criticalTotal());
        assertTrue(MatchingVerifier.verify(complex, result.matching()).valid());
    }

    @Test
    void bingsHouseNeedsOneCriticalCellInEachDimension() {
        // contractible without free faces (Bing 1964): at least (1, 1, 1) by the argument for the dunce
        // hat; the solver proves that (1, 1, 1) is attained on this cubical house
        ChainComplex house = HardLibrary.all().stream().filter(h -> h.name().equals("bings-house")).findFirst()
                .orElseThrow().complex();
        OptimalMatching result = OptimalMatchingSolver.solve(house, OPTIONS);
        assertTrue(result.proven());
        assertArrayEquals(new int[] {1, 1, 1}, result.critical());
    }

    @Test
    void aShortTimeLimitStillGivesAValidMatchingAndABound() {
        // X_{0,1,3,7} on Z/13 (597 cells, beyond the size limit; a 3-hypertree, LMR 2010), which the heuristics
        // and cancellations leave well above its Morse bound, so that one second ends the search unproven
        ChainComplex sum = HardLibrary.sum(13, new int[] {0, 1, 3, 7}, null, "a 3-hypertree").complex();
        OptimalMatching result = OptimalMatchingSolver.solve(sum, OPTIONS.withTimeLimit(Duration.ofSeconds(1)));
        assertTrue(MatchingVerifier.verify(sum, result.matching()).valid());
        assertTrue(result.lowerBound() >= MorseReduction.lowerBound(HomologyCalculator.compute(sum, Coefficients.INTEGERS)));
        assertTrue(result.criticalTotal() >= result.lowerBound());
        assertEquals(result.proven(), result.gap() == 0);
        for (MatchingHeuristic h : MatchingHeuristics.all().values()) {
            long total = Arrays.stream(h.match(sum, OPTIONS).criticalCounts(sum)).sum();
            assertTrue(result.criticalTotal() <= total, h.name());
        }
    }

    @Test
    void optimalIsAHeuristicByNameAndKeepsTheHomology() {
        MatchingHeuristic optimal = MatchingHeuristics.byName("optimal").orElseThrow();
        assertSame(MatchingHeuristics.OPTIMAL, optimal);
        // RP^2: H = Z, Z/2, 0 (Hatcher 2002, Ex. 2.42), so the Morse bound (1, 1, 1) is the optimum
        ChainComplex rp2 = SimplicialComplex.of(Triangulations.projectivePlane6());
        MorseReduction.Outcome outcome = MorseReduction.run(rp2,
                new MorseReduction.Request(optimal, OPTIONS, Coefficients.INTEGERS, true));
        assertArrayEquals(new int[] {1, 1, 1}, outcome.critical());
        assertArrayEquals(new int[] {1, 0, 0}, outcome.homology().bettiNumbers());
        assertEquals(List.of(java.math.BigInteger.TWO), outcome.homology().group(1).torsion());
    }

    @Test
    void theOldConstructorKeepsTheDefaultTimeLimit() {
        assertEquals(MatchingOptions.DEFAULT_TIME_LIMIT, new MatchingOptions(7L).timeLimit());
        assertEquals(7L, new MatchingOptions(7L).seed());
    }
}
