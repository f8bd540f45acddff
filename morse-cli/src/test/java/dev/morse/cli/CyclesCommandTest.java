package dev.morse.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.math.BigInteger;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code homology --cycles}: the representative cycles in the JSON contract and in the table. */
class CyclesCommandTest {
    @TempDir
    Path dir;

    @Test
    @SuppressWarnings("unchecked")
    void projectivePlaneGivesAPointAndATorsionLoopInItsLabels() throws IOException {
        String file = Inputs.write(dir, "rp2.simplicial", Inputs.RP2);
        Map<String, Object> json = CliFiles.homologyJson(file, "--cycles");
        List<Map<String, Object>> cycles = (List<Map<String, Object>>) json.get("cycles");
        // H_0 = Z and H_1 = Z/2 (Hatcher, Algebraic Topology, 2002, Example 2.42): one generator each
        assertEquals(2, cycles.size());
        assertEquals(BigInteger.ZERO, cycles.get(0).get("dimension"));
        assertEquals(BigInteger.ZERO, cycles.get(0).get("order"));
        assertEquals(BigInteger.ONE, cycles.get(1).get("dimension"));
        assertEquals(BigInteger.TWO, cycles.get(1).get("order"));
        List<Map<String, Object>> terms = (List<Map<String, Object>>) cycles.get(1).get("terms");
        assertTrue(terms.size() >= 3, "a loop has at least three edges");
        for (Map<String, Object> term : terms) {
            assertEquals(2, ((List<Object>) term.get("cell")).size(), "an edge is written as its two vertex labels");
        }
    }

    @Test
    void theTableListsEachCycleOnOneLine() throws IOException {
        String file = Inputs.write(dir, "rp2.simplicial", Inputs.RP2);
        CliRun run = CliRun.morse("homology", file, "--cycles", "--quiet");
        assertEquals(0, run.code(), run.err());
        List<String> lines = run.out().lines().toList();
        int at = lines.indexOf("  cycles    2 generators, each a cycle of the simplicial complex, checked");
        assertTrue(at > 0, run.out());
        assertTrue(lines.get(at + 1).startsWith("    H_0 free: {"), lines.get(at + 1));
        assertTrue(lines.get(at + 2).startsWith("    H_1 order 2: {"), lines.get(at + 2));
    }

    @Test
    @SuppressWarnings("unchecked")
    void theImplicitEngineGivesCyclesOfTheOrderComplex() throws IOException {
        Map<String, Object> json = CliFiles.homologyJson("../corpus/boolean-3-proper.poset", "--complex", "implicit",
                "--cycles");
        List<Map<String, Object>> cycles = (List<Map<String, Object>>) json.get("cycles");
        // the proper part of the Boolean lattice B_3 is a circle (Björner, Topological methods, 1995):
        // H_0 = Z and H_1 = Z, the hexagon of its six elements' chains
        assertEquals(2, cycles.size());
        assertEquals(BigInteger.ONE, cycles.get(1).get("dimension"));
        List<Map<String, Object>> terms = (List<Map<String, Object>>) cycles.get(1).get("terms");
        assertEquals(6, terms.size());
        assertEquals(BigInteger.valueOf(6), cycles.get(1).get("terms_before_shortening"));
    }
}
