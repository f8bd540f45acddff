package dev.morse.engine;

import dev.morse.generate.Triangulations;
import dev.morse.io.SimplicialWriter;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.morse.complex.ComplexKind;
import dev.morse.homology.Coefficients;
import dev.morse.homology.Homology;
import dev.morse.homology.HomologyGroup;
import dev.morse.matching.TrialCount;
import java.math.BigInteger;
import java.util.List;
import java.util.Optional;
import dev.morse.input.InputReaders;
import org.junit.jupiter.api.Test;

class HeuristicComparisonTest {
    /** The 6-vertex triangulation of RP^2 (REFERENCES.md): f = (6, 15, 10), H = Z, Z/2, 0. */
    static final String RP2 = SimplicialWriter.toText(Triangulations.projectivePlane6());

    private static ComparisonReport compare(String text, List<String> matchings, int trials) {
        return HeuristicComparison.run(InputReaders.parse("rp2.simplicial", text),
                Request.defaults().withMatching("coreduction", 1L, trials), Optional.of(matchings));
    }

    @Test
    void byDefaultEveryBuiltInHeuristicButNoneIsCompared() {
        assertEquals(List.of("coreduction", "collapse", "lexicographic", "random"), HeuristicComparison.defaultMatchings());
    }

    @Test
    void projectivePlaneBoundsAndTheBaseline() {
        ComparisonReport report = compare(RP2, List.of("coreduction", "none"), 1);
        assertEquals(ComplexKind.SIMPLICIAL, report.complex());
        assertEquals(List.of(6L, 15L, 10L), report.cells());
        // H_1(RP^2) = Z/2 (Hatcher, Algebraic Topology, 2002, Example 2.42, from memory)
        assertEquals(List.of(BigInteger.TWO), report.homology().group(1).torsion());
        // Forman's bound per dimension β_d + t_d + t_(d-1): 1 + 0 + 0, 0 + 1 + 0, 0 + 0 + 1
        assertEquals(List.of(1L, 1L, 1L), report.boundByDimension());
        assertEquals(3, report.morseLowerBound());
        assertEquals("coreduction", report.referenceMatching());
        MatchingRun none = report.runs().get(1);
        assertEquals("none", none.matching());
        assertEquals(List.of(6, 15, 10), none.critical());
        assertEquals(31 - 3, report.excess(none));
        assertEquals(-1, none.millis("sweep"), "the baseline does not sweep");
    }

    @Test
    void everyRunRespectsTheBoundInEachDimension() {
        ComparisonReport report = compare(RP2, HeuristicComparison.defaultMatchings(), 1);
        assertEquals(4, report.runs().size());
        for (MatchingRun run : report.runs()) {
            for (int d = 0; d < 3; d++) {
                assertTrue(run.critical().get(d) >= report.boundByDimension().get(d), run.matching() + " in dimension " + d);
            }
            assertEquals(run.totalCritical() - 3, report.excess(run));
            assertTrue(run.millis("match") >= 0 && run.millis("verify") >= 0, run.matching());
        }
    }

    @Test
    void randomTrialsTallyEveryRunAndDeterministicOnesHaveNone() {
        ComparisonReport report = compare(RP2, List.of("coreduction", "random"), 25);
        assertEquals(List.of(), report.runs().get(0).trials());
        List<TrialCount> trials = report.runs().get(1).trials();
        assertEquals(25, report.runs().get(1).trialCount());
        for (TrialCount t : trials) {
            // an acyclic matching on RP^2 has an Euler characteristic of 1 among its critical cells
            assertEquals(1, t.critical().get(0) - t.critical().get(1) + t.critical().get(2));
        }
    }

    @Test
    void differentHomologyIsAnInternalFailureNamingBoth() {
        Homology circle = new Homology(Coefficients.INTEGERS, false, List.of(HomologyGroup.free(0, 1), HomologyGroup.free(1, 1)));
        Homology point = new Homology(Coefficients.INTEGERS, false, List.of(HomologyGroup.free(0, 1), HomologyGroup.free(1, 0)));
        IllegalStateException e = assertThrows(IllegalStateException.class,
                () -> HeuristicComparison.requireAgreement("coreduction", circle, "broken", point));
        assertEquals("matchings disagree on the homology: coreduction gives H1 = Z but broken gives H1 = 0", e.getMessage());
    }

    @Test
    void namingAMatchingTwiceIsRefused() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> HeuristicComparison.requireComparable(List.of("random", "random")));
        assertEquals("matching 'random' is named twice", e.getMessage());
    }
}
