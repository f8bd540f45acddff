package dev.morse.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.morse.complex.ComplexChoice;
import dev.morse.complex.ComplexKind;
import dev.morse.generate.PartitionLattice;
import dev.morse.homology.HomologyGroup;
import dev.morse.io.PosetWriter;
import dev.morse.posetreduction.ReductionStats;
import java.util.List;
import org.junit.jupiter.api.Test;

class PosetReductionPipelineTest {
    private static final Request DEFAULTS = Request.defaults();
    private static final String CIRCLE = "morse-poset 1\nv1\nv2\ne1: v1 v2\ne2: v1 v2\n";
    private static final String PI5 = PosetWriter.toText(PartitionLattice.lattice(5));

    @Test
    void orderComplexIsBuiltOnTheReducedPoset() {
        // Π_5 has a least element, so Δ(Π_5) is a cone: contractible, H = Z, 0, 0, 0, 0 (common practice)
        Computation report = Runs.run("pi5.poset", PI5, DEFAULTS);
        assertEquals(ComplexKind.ORDER, report.complexKind());
        ReductionStats stats = report.posetReduction().orElseThrow();
        assertEquals(52, stats.elementsBefore());
        assertEquals(1, stats.elementsAfter());
        assertEquals(List.of(1L), report.cells());
        // the groups of Δ(Π_5) are listed up to its dimension 4, although the reduced poset is a point
        assertEquals(List.of(HomologyGroup.free(0, 1), HomologyGroup.free(1, 0), HomologyGroup.free(2, 0),
                HomologyGroup.free(3, 0), HomologyGroup.free(4, 0)), report.homology().groups());
        assertEquals(List.of("read", "poset reduction", "complex"),
                report.timings().stream().map(PhaseTiming::phase).toList().subList(0, 3));
    }

    @Test
    void reductionCanBeSwitchedOff() {
        Computation report = Runs.run("pi5.poset", PI5, DEFAULTS.withPosetReduction(false));
        assertTrue(report.posetReduction().isEmpty());
        // all chains of Π_5: as many cells as FaceCounts finds, and the same homology
        assertEquals(52, report.cells().get(0));
        assertEquals(Runs.run("pi5.poset", PI5, DEFAULTS).homology(), report.homology());
    }

    @Test
    void neverAppliedWhereTheCellularComplexIsUsed() {
        Computation report = Runs.run("circle.poset", CIRCLE, DEFAULTS);
        assertEquals(ComplexKind.CELLULAR, report.complexKind());
        assertTrue(report.posetReduction().isEmpty());
        Computation order = Runs.run("circle.poset", CIRCLE, DEFAULTS.withComplex(ComplexChoice.ORDER));
        assertEquals(0, order.posetReduction().orElseThrow().removed(), "the two-vertex circle is its own core");
    }

    @Test
    void reducedHomologyOfAReducedPosetIsPadded() {
        Computation report = Runs.run("pi5.poset", PI5,
                Runs.request(ComplexChoice.AUTO, dev.morse.homology.Coefficients.RATIONALS, true, "coreduction"));
        assertEquals(5, report.homology().groups().size());
        for (HomologyGroup g : report.homology().groups()) {
            assertTrue(g.isTrivial(), "a cone has trivial reduced homology");
        }
    }
}
