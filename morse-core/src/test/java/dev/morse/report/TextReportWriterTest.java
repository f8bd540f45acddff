package dev.morse.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.morse.complex.ComplexKind;
import dev.morse.cw.CwPosetVerdict;
import dev.morse.engine.Computation;
import dev.morse.homology.Coefficients;
import dev.morse.input.PosetInput;
import dev.morse.io.PosetReader;
import java.util.Map;
import dev.morse.homology.Homology;
import dev.morse.homology.HomologyGroup;
import java.math.BigInteger;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;

class TextReportWriterTest {
    @Test
    void kleinBottleGroupsReadAsSums() {
        String text = TextReportWriter.toText(JsonReportWriterTest.kleinBottle());
        assertTrue(text.contains("    H_0 = Z\n    H_1 = Z + Z/2\n    H_2 = 0\n"), text);
        assertTrue(text.contains("48 = 8 + 24 + 16 in dimensions 0..2"), text);
        assertTrue(text.contains("simplicial"), text);
    }

    @Test
    void groupsAreWrittenOverTheirCoefficients() {
        // the torus: β = 1, 2, 1 over every field (REFERENCES.md; Hatcher, Algebraic Topology, 2002, Example 2.36, numbering from memory)
        HomologyGroup h1 = HomologyGroup.free(1, 2);
        assertEquals("Z^2", TextReportWriter.groupText(h1, Coefficients.INTEGERS));
        assertEquals("Q^2", TextReportWriter.groupText(h1, Coefficients.RATIONALS));
        assertEquals("F_3^2", TextReportWriter.groupText(h1, Coefficients.modulo(3)));
        assertEquals("F_3", TextReportWriter.groupText(HomologyGroup.free(2, 1), Coefficients.modulo(3)));
        assertEquals("0", TextReportWriter.groupText(HomologyGroup.free(2, 0), Coefficients.RATIONALS));
        assertEquals("Z^3 + Z/2 + Z/2", TextReportWriter.groupText(
                new HomologyGroup(1, 3, List.of(BigInteger.TWO, BigInteger.TWO)), Coefficients.INTEGERS));
    }

    @Test
    void orderComplexLineGivesTheReasonTheCellularOneWasNotUsed() {
        // a single edge over one vertex: Δ is a segment, contractible (common practice)
        Homology homology = new Homology(Coefficients.INTEGERS, false,
                List.of(HomologyGroup.free(0, 1), HomologyGroup.free(1, 0)));
        PosetInput input = new PosetInput("loop.poset", PosetReader.parse("morse-poset 1\nv\ne: v\n", "loop.poset"), 0);
        Computation report = ReportFixtures.computation(input, ComplexKind.ORDER,
                Optional.of(new CwPosetVerdict(false, "an edge with one end")), Optional.empty(), "none",
                new long[] {2, 1}, new int[] {2, 1}, homology, true, 0, Map.of());
        String text = TextReportWriter.toText(report);
        assertTrue(text.contains("  why       not a CW poset: an edge with one end\n"), text);
        assertTrue(text.contains("~H_0 = 0"), text);
        assertTrue(text.contains("reduced"), text);
    }
}
