package dev.morse.morsecomplex;

import dev.morse.matching.MatchingHeuristics;
import dev.morse.cw.CwPosetCheck;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import dev.morse.complex.Boundary;
import dev.morse.complex.CellularComplex;
import dev.morse.complex.ChainComplex;
import dev.morse.complex.ComplexKind;
import dev.morse.complex.GradedCells;
import dev.morse.complex.ListedComplex;
import dev.morse.generate.ProjectiveSpace;
import dev.morse.homology.Coefficients;
import dev.morse.homology.HomologyGroup;
import dev.morse.matching.Matching;
import dev.morse.matching.MatchingOptions;
import dev.morse.matching.MatchingVerifier;
import java.math.BigInteger;
import java.util.List;
import org.junit.jupiter.api.Test;

class GradientSweepTest {

    @Test
    void projectivePlaneMorseComplexCarriesTheBoundaryTwo() {
        // RP^2 has a CW structure with one cell per dimension and ∂_2 = ±2, ∂_1 = 0 (Hatcher 2002, Example 2.42);
        // a perfect matching on the antipodal cube quotient must produce exactly that Morse complex
        CellularComplex rp2 = CwPosetCheck.cellularComplex(ProjectiveSpace.antipodalCubeQuotient(2));
        Matching matching = MatchingHeuristics.COREDUCTION.match(rp2, MatchingOptions.DEFAULT);
        assertEquals(true, MatchingVerifier.verify(rp2, matching).valid());
        MorseComplex morse = GradientSweep.build(rp2, matching);
        assertArrayEquals(new int[] {1, 1, 1}, morse.cellCounts());
        assertEquals(0, morse.boundary(1).nonZeros());
        assertEquals(1, morse.boundary(2).nonZeros());
        assertEquals(2, Math.abs(morse.boundary(2).value(0)));
    }

    /**
     * A chain complex in dimensions 0 and 1 with ∂e_i = v_i − 2v_(i−1) for i = 1..k and ∂f = v_k. Since
     * v_i = 2^i v_0 in H_0 and v_k = 0, H_0 = Z/2^k and H_1 = 0 (worked by hand). Pairing v_i with e_i
     * leaves v_0 and f critical, and the gradient path from f doubles k times, so ∂f = ±2^k v_0 in the
     * Morse complex.
     */
    private static ChainComplex doublingLadder(int k) {
        int vertices = k + 1;
        int[] offsets = new int[vertices + k + 2];
        int[] targets = new int[2 * k + 1];
        int[] coefficients = new int[2 * k + 1];
        int entry = 0;
        for (int i = 1; i <= k; i++) {
            int cell = vertices + i - 1;
            targets[entry] = i - 1;
            coefficients[entry++] = -2;
            targets[entry] = i;
            coefficients[entry++] = 1;
            offsets[cell + 1] = entry;
        }
        targets[entry] = k;
        coefficients[entry++] = 1;
        offsets[vertices + k + 1] = entry;
        for (int c = 1; c <= vertices; c++) {
            offsets[c] = 0;
        }
        return new ListedComplex(ComplexKind.CELLULAR, new GradedCells(new int[] {vertices, k + 1}),
                new Boundary(offsets, targets, coefficients), c -> "c" + c);
    }

    private static Matching ladderMatching(int k) {
        int vertices = k + 1;
        int[] mates = new int[vertices + k + 1];
        java.util.Arrays.fill(mates, Matching.CRITICAL);
        for (int i = 1; i <= k; i++) {
            mates[i] = vertices + i - 1;
            mates[vertices + i - 1] = i;
        }
        return Matching.of(mates);
    }

    @Test
    void sweepAccumulatesEveryGradientPathExactly() {
        ChainComplex ladder = doublingLadder(40);
        MorseComplex morse = GradientSweep.build(ladder, ladderMatching(40));
        assertArrayEquals(new int[] {1, 1}, morse.cellCounts());
        assertEquals(1L << 40, Math.abs(morse.boundary(1).value(0)));
    }

    @Test
    void sweepRefusesACoefficientBeyondLongRatherThanWrapping() {
        assertThrows(ArithmeticException.class, () -> GradientSweep.build(doublingLadder(70), ladderMatching(70)));
    }

    @Test
    void overflowingMorseCoefficientsStillGiveTheExactAnswer() {
        ChainComplex ladder = doublingLadder(70);
        MorseReduction.Outcome outcome = MorseReduction.run(ladder, new MorseReduction.Request(new LadderHeuristic(),
                MatchingOptions.DEFAULT, Coefficients.INTEGERS, true));
        assertEquals(List.of(new HomologyGroup(0, 0, List.of(BigInteger.TWO.pow(70))), HomologyGroup.free(1, 0)),
                outcome.homology().groups());
    }

    /** Hands out the ladder's matching, to drive the whole run through the overflow. */
    private static final class LadderHeuristic implements dev.morse.matching.MatchingHeuristic {
        @Override
        public String name() {
            return "ladder";
        }

        @Override
        public Matching match(ChainComplex complex, MatchingOptions options) {
            return ladderMatching(complex.cellCount(0) - 1);
        }
    }
}
