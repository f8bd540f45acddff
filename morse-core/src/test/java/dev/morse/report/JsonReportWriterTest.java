package dev.morse.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.morse.complex.ComplexKind;
import dev.morse.cw.CwPosetVerdict;
import dev.morse.homology.Coefficients;
import dev.morse.homology.Homology;
import dev.morse.homology.HomologyGroup;
import dev.morse.io.InputFormat;
import java.math.BigDecimal;
import java.math.BigInteger;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.junit.jupiter.api.Test;

class JsonReportWriterTest {
    private static final List<PhaseTiming> TIMINGS =
            List.of(new PhaseTiming("read", 1.25), new PhaseTiming("complex", 0.5), new PhaseTiming("homology", 2));

    /**
     * The Klein bottle: H = Z, Z + Z/2, 0 (REFERENCES.md; Hatcher, Algebraic Topology, 2002, Example
     * 2.37, numbering from memory). Cells of its 8-vertex triangulation: f0 = 8, and χ = 0 with 3 f2 = 2 f1 gives f1 = 24, f2 = 16.
     */
    static HomologyReport kleinBottle() {
        Homology homology = new Homology(Coefficients.INTEGERS, false, List.of(
                HomologyGroup.free(0, 1),
                new HomologyGroup(1, 1, List.of(BigInteger.TWO)),
                HomologyGroup.free(2, 0)));
        return new HomologyReport("klein.simplicial", InputFormat.SIMPLICIAL, ComplexKind.SIMPLICIAL,
                List.of(8L, 24L, 16L), "none", List.of(8, 24, 16), homology, Optional.empty(), TIMINGS);
    }

    @SuppressWarnings("unchecked")
    private static Map<String, Object> json(HomologyReport report) {
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
                "reduced", "homology", "morse_lower_bound", "excess", "rounds", "cw_check", "timings_ms"),
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
        HomologyReport report = new HomologyReport("lens.poset", InputFormat.POSET, ComplexKind.CELLULAR,
                List.of(1L, 1L, 1L, 1L), "none", List.of(1, 1, 1, 1), homology,
                Optional.of(CwPosetVerdict.passed()), TIMINGS);
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
