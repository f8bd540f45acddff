package dev.morse.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.morse.complex.ComplexKind;
import dev.morse.cw.CwPosetVerdict;
import dev.morse.engine.Computation;
import dev.morse.homology.Coefficients;
import dev.morse.input.FacetInput;
import dev.morse.input.PosetInput;
import dev.morse.io.PosetReader;
import dev.morse.io.SimplicialReader;
import dev.morse.homology.Homology;
import dev.morse.homology.HomologyGroup;
import java.math.BigDecimal;
import java.math.BigInteger;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.junit.jupiter.api.Test;

class JsonReportWriterTest {
    /** Read 1.25 ms, complex 0.5 ms, homology 2 ms. */
    private static final Map<String, Double> PHASES = Map.of("homology", 2.0);

    /**
     * The Klein bottle: H = Z, Z + Z/2, 0 (REFERENCES.md; Hatcher, Algebraic Topology, 2002, Example
     * 2.37, numbering from memory). Cells of its 8-vertex triangulation: f0 = 8, and χ = 0 with 3 f2 = 2 f1 gives f1 = 24, f2 = 16.
     */
    static Computation kleinBottle() {
        Homology homology = new Homology(Coefficients.INTEGERS, false, List.of(
                HomologyGroup.free(0, 1),
                new HomologyGroup(1, 1, List.of(BigInteger.TWO)),
                HomologyGroup.free(2, 0)));
        FacetInput input = new FacetInput("klein.simplicial", SimplicialReader.parse("morse-simplicial 1\na b c\n",
                "klein.simplicial"), 1.25);
        return ReportFixtures.computation(input, ComplexKind.SIMPLICIAL, Optional.empty(), Optional.empty(), "none",
                new long[] {8, 24, 16}, new int[] {8, 24, 16}, homology, false, 0.5, PHASES);
    }

    @SuppressWarnings("unchecked")
    private static Map<String, Object> json(Computation report) {
        return (Map<String, Object>) JsonValues.parse(JsonReportWriter.toJson(report));
    }

    private static List<Object> ints(long... values) {
        return java.util.Arrays.stream(values).mapToObj(BigInteger::valueOf).map(Object.class::cast).toList();
    }

    @Test
    void designFieldsComeWithTheirValues() {
        Map<String, Object> json = json(kleinBottle());
        assertEquals("simplicial", json.get("complex"));
        assertEquals(ints(8, 24, 16), json.get("cells"));
        assertEquals("none", json.get("matching"));
        assertEquals(ints(8, 24, 16), json.get("critical"));
        assertEquals("Z", json.get("coefficients"));
        assertEquals(List.of(
                Map.of("dimension", BigInteger.ZERO, "betti", BigInteger.ONE, "torsion", List.of()),
                Map.of("dimension", BigInteger.ONE, "betti", BigInteger.ONE, "torsion", ints(2)),
                Map.of("dimension", BigInteger.TWO, "betti", BigInteger.ZERO, "torsion", List.of())),
                json.get("homology"));
    }

    @Test
    void extraFieldsDescribeTheRun() {
        Map<String, Object> json = json(kleinBottle());
        assertEquals(List.of("input", "format", "complex", "engine", "cells", "matching", "critical", "coefficients",
                "reduced", "homology", "morse_lower_bound", "morse_lower_bound_over", "excess", "rounds", "cw_check", "timings_ms"),
                List.copyOf(json.keySet()));
        assertEquals("klein.simplicial", json.get("input"));
        assertEquals("simplicial", json.get("format"));
        assertEquals(Boolean.FALSE, json.get("reduced"));
        assertNull(json.get("cw_check"));
        assertEquals(Map.of("read", new BigDecimal("1.250"), "complex", new BigDecimal("0.500"),
                "homology", new BigDecimal("2.000")), json.get("timings_ms"));
    }

    @Test
    void torsionBeyondLongIsAnExactInteger() {
        // the lens space L(p,1): H_1 = Z/p (Hatcher, Algebraic Topology, 2002, Example 2.43, numbering from memory), here p = 2^89 - 1
        BigInteger p = BigInteger.TWO.pow(89).subtract(BigInteger.ONE);
        Homology homology = new Homology(Coefficients.INTEGERS, false, List.of(
                HomologyGroup.free(0, 1), new HomologyGroup(1, 0, List.of(p)), HomologyGroup.free(2, 0),
                HomologyGroup.free(3, 1)));
        PosetInput input = new PosetInput("lens.poset", PosetReader.parse("morse-poset 1\nv\n", "lens.poset"), 1.25);
        Computation report = ReportFixtures.computation(input, ComplexKind.CELLULAR, Optional.of(CwPosetVerdict.passed()),
                Optional.empty(), "none", new long[] {1, 1, 1, 1}, new int[] {1, 1, 1, 1}, homology, false, 0.5, PHASES);
        String text = JsonReportWriter.toJson(report);
        assertTrue(text.contains("\"torsion\": [ " + p + " ]"), text);
        @SuppressWarnings("unchecked")
        Map<String, Object> json = (Map<String, Object>) JsonValues.parse(text);
        assertEquals(Map.of("cw_poset", true), json.get("cw_check"));
        assertEquals("cellular", json.get("complex"));
    }

    @Test
    void outputIsOneObjectEndingWithANewline() {
        String text = JsonReportWriter.toJson(kleinBottle());
        assertTrue(text.startsWith("{\n") && text.endsWith("}\n"), text);
    }
}
