package dev.morse.engine;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.morse.complex.ComplexChoice;
import dev.morse.complex.ComplexKind;
import dev.morse.generate.PartitionLattice;
import dev.morse.homology.Coefficients;
import dev.morse.implicit.ElementOrder;
import dev.morse.io.InputException;
import dev.morse.io.PosetWriter;
import dev.morse.report.JsonReportWriter;
import dev.morse.report.TextReportWriter;
import java.util.List;
import org.junit.jupiter.api.Test;

/** How the pipeline chooses between the stored and the implicit order complex, and how it says so. */
class ImplicitChoiceTest {
    /** An edge over a single vertex: not a CW poset; Δ is a segment of 3 chains. */
    private static final String LOOP = "morse-poset 1\nv\ne: v\n";
    /** Two vertices below two edges: a CW poset, the circle. */
    private static final String CIRCLE = "morse-poset 1\nv1\nv2\ne1: v1 v2\ne2: v1 v2\n";
    /** The proper part of Π_5: 435 chains, a wedge of 4! = 24 spheres S^2 (Björner 1980). */
    private static final String PI5 = PosetWriter.toText(PartitionLattice.properPart(5));
    private static final Request DEFAULTS = Request.defaults();

    private static Request storingAtMost(long chains) {
        return DEFAULTS.withImplicit(ElementOrder.DOWN_SETS, chains);
    }

    @Test
    void autoStoresAnOrderComplexWithFewChainsAndSaysWhy() {
        Computation report = Runs.run("loop.poset", LOOP, DEFAULTS.withPosetReduction(false));
        assertEquals(ComplexKind.ORDER, report.complexKind());
        assertFalse(report.plan().isImplicit());
        assertEquals("3 chains in the poset as given (no poset reduction), at most the 1,000,000 stored",
                report.reason());
        // the poset reduction leaves one point (a beat point goes), and the count is of what is left
        assertEquals("1 chain after the poset reduction, at most the 1,000,000 stored",
                Runs.run("loop.poset", LOOP, DEFAULTS).reason());
    }

    @Test
    void autoGeneratesTheChainsOnDemandBeyondTheStoredLimit() {
        Computation report = Runs.run("pi5.poset", PI5, storingAtMost(100));
        assertEquals(ComplexKind.ORDER, report.complexKind());
        assertTrue(report.plan().isImplicit());
        assertEquals("more than 100 chains after the poset reduction, too many to store, so the chains are generated"
                + " on demand", report.reason());
        assertEquals(List.of(50L, 205L, 180L), report.cells());
        // one vertex and the 24 falling chains: the Morse lower bound 1 + 24 (Forman 1998)
        assertEquals(List.of(1, 0, 24), report.critical());
        assertEquals(0, report.excess());
        assertArrayEquals(new int[] {1, 0, 24}, report.homology().bettiNumbers());
        assertFalse(report.cwCheck().orElseThrow().isCwPoset());
    }

    @Test
    void theReportsNameTheEngine() {
        Computation report = Runs.run("pi5.poset", PI5, storingAtMost(100));
        String json = JsonReportWriter.toJson(report);
        assertTrue(json.contains("\"complex\": \"order\",\n  \"engine\": \"implicit\","), json);
        assertTrue(json.contains("\"engine_reason\": \"more than 100 chains"), json);
        assertTrue(json.contains("\"element_order\": \"down-sets\""), json);
        String text = TextReportWriter.toText(report);
        assertTrue(text.contains("chains generated on demand (implicit engine)"), text);
        assertTrue(text.contains("  walk      element order down-sets: "), text);
        String stored = JsonReportWriter.toJson(Runs.run("loop.poset", LOOP, DEFAULTS));
        assertTrue(stored.contains("\"engine\": \"explicit\""), stored);
    }

    @Test
    void cwPosetsKeepTheCellularComplexHoweverManyChains() {
        Computation report = Runs.run("circle.poset", CIRCLE, storingAtMost(0));
        assertEquals(ComplexKind.CELLULAR, report.complexKind());
        assertFalse(report.plan().isImplicit());
    }

    @Test
    void matchingNoneKeepsEveryChainStored() {
        Request none = Runs.request(ComplexChoice.AUTO, Coefficients.INTEGERS, false, "none")
                .withImplicit(ElementOrder.DOWN_SETS, 100);
        Computation report = Runs.run("pi5.poset", PI5, none);
        assertFalse(report.plan().isImplicit());
        assertEquals(List.of(50L, 205L, 180L), report.cells());
        assertArrayEquals(new int[] {1, 0, 24}, report.homology().bettiNumbers());
    }

    @Test
    void implicitChoiceSkipsTheCwCheckAndGivesTheSameHomology() {
        Computation report = Runs.run("circle.poset", CIRCLE, DEFAULTS.withComplex(ComplexChoice.IMPLICIT));
        assertTrue(report.plan().isImplicit());
        assertEquals("", report.reason());
        assertTrue(report.cwCheck().isEmpty());
        // Δ of the circle's face poset is a 4-cycle: H = Z, Z (common practice)
        assertEquals(List.of(4L, 4L), report.cells());
        assertArrayEquals(new int[] {1, 1}, report.homology().bettiNumbers());
    }

    @Test
    void theImplicitEngineRunsOnTheReducedPoset() {
        // a chain of 70 elements is a cone: the poset reduction leaves a point (Δ is contractible)
        StringBuilder text = new StringBuilder("morse-poset 1\nc0\n");
        for (int i = 1; i < 70; i++) {
            text.append('c').append(i).append(": c").append(i - 1).append('\n');
        }
        Computation report = Runs.run("long.poset", text.toString(),
                DEFAULTS.withComplex(ComplexChoice.IMPLICIT));
        assertTrue(report.plan().isImplicit());
        assertEquals(List.of(1L), report.cells());
        assertEquals(70, report.homology().groups().size());
        assertArrayEquals(new int[70], report.homology().toReduced().bettiNumbers());
    }

    @Test
    void implicitChoiceWithMatchingNoneIsAnInputError() {
        Request none = Runs.request(ComplexChoice.IMPLICIT, Coefficients.INTEGERS, false, "none");
        InputException e = assertThrows(InputException.class, () -> Runs.run("loop.poset", LOOP, none));
        assertEquals("loop.poset: the implicit order complex always uses its own matching; the full Smith normal"
                + " form on every chain (--matching none) needs --complex order", e.getMessage());
    }

    @Test
    void chainsBeyondTheRangeOfALongAreAClearInputError() {
        // a chain of 70 elements has C(70, 35) > 2^63 subchains of 35 elements
        StringBuilder text = new StringBuilder("morse-poset 1\nc0\n");
        for (int i = 1; i < 70; i++) {
            text.append('c').append(i).append(": c").append(i - 1).append('\n');
        }
        InputException e = assertThrows(InputException.class, () -> Runs.run("long.poset", text.toString(),
                DEFAULTS.withComplex(ComplexChoice.IMPLICIT).withPosetReduction(false)));
        assertEquals("long.poset: too large to compute: the order complex has more than 2^63 - 1 chains in one"
                + " dimension", e.getMessage());
    }
}
