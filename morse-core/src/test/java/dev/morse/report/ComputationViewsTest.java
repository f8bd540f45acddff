package dev.morse.report;

import dev.morse.generate.Triangulations;
import dev.morse.io.SimplicialWriter;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.morse.complex.ComplexChoice;
import dev.morse.engine.Computation;
import dev.morse.engine.Request;
import dev.morse.engine.Runs;
import dev.morse.homology.Coefficients;
import dev.morse.morsecomplex.MorseComplex;
import java.math.BigInteger;
import java.util.List;
import org.junit.jupiter.api.Test;

/** Exports and pictures are views of one computation: they reuse what it kept and never run again. */
class ComputationViewsTest {
    /** The 6-vertex triangulation of RP^2 (common practice): H_1 = Z/2 (Hatcher 2002, Example 2.42). */
    private static final String RP2 = SimplicialWriter.toText(Triangulations.projectivePlane6());
    /** Two minima below two maxima: the face poset of a circle of two vertices and two edges; Δ is a circle of four edges. */
    private static final String BOWTIE = "morse-poset 1\na\nb\nc: a b\nd: a b\n";

    @Test
    void exportWritesTheMorseComplexTheRunKept() {
        Computation run = Runs.run("rp2.simplicial", RP2, Request.defaults());
        MorseComplex kept = run.morseComplex().orElseThrow();
        MorseComplexExport export = MorseComplexExport.of(run);
        assertSame(kept, export.morse());
        for (int d = 0; d <= kept.dimension(); d++) {
            assertEquals(run.critical().get(d), kept.cellCount(d));
            assertEquals(kept.cellCount(d), export.criticalNames().get(d).size());
        }
        // the torsion of H_1 is the one entry of d_2 on a perfect matching of RP^2
        assertEquals(List.of(BigInteger.TWO), run.homology().group(1).torsion());
    }

    @Test
    void pictureMarksTheMatchingTheRunKept() {
        Computation run = Runs.run("rp2.simplicial", RP2, Request.defaults());
        HasseDrawing drawing = HasseDrawings.of(run);
        assertEquals(run.matching().orElseThrow().pairCount(), drawing.matchedCount());
        assertEquals(run.totalCritical(), drawing.criticalCount());
    }

    @Test
    void theImplicitEngineExportsItsCriticalChainsAndTheirMorseBoundary() {
        Request implicit = Runs.request(ComplexChoice.IMPLICIT, Coefficients.modulo(3), true, "coreduction");
        Computation run = Runs.run("bowtie.poset", BOWTIE, implicit);
        assertTrue(run.plan().isImplicit());
        MorseComplexExport export = MorseComplexExport.of(run);
        assertEquals(run.critical().get(0), export.morse().cellCount(0));
        assertEquals(run.critical().get(1), export.morse().cellCount(1));
        assertEquals(run.critical().get(1), export.criticalNames().get(1).size());
        // reduced homology of a circle over F_3: ~H_0 = 0, ~H_1 = F_3 (common practice)
        assertEquals(0, run.homology().group(0).betti());
        assertEquals(1, run.homology().group(1).betti());
    }

    @Test
    void theImplicitMatchingIsDrawnOnTheOrderComplex() {
        Request implicit = Runs.request(ComplexChoice.IMPLICIT, Coefficients.INTEGERS, false, "coreduction");
        Computation run = Runs.run("bowtie.poset", BOWTIE, implicit);
        HasseDrawing drawing = HasseDrawings.of(run);
        // Δ(bowtie): 4 vertices and 4 edges, a circle; a perfect matching leaves one vertex and one edge
        assertEquals(8, drawing.nodeCount());
        assertEquals(run.totalCritical(), drawing.criticalCount());
        assertEquals((8 - run.totalCritical()) / 2, drawing.matchedCount());
    }
}
