package dev.morse.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.math.BigInteger;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class InspectCommandTest {
    @TempDir
    Path dir;

    @Test
    void squareFacePosetAsText() throws IOException {
        String file = Inputs.write(dir, "square.poset", Inputs.SQUARE);
        CliRun run = CliRun.morse("inspect", file);
        assertEquals(0, run.code(), run.err());
        assertEquals("", run.err());
        // chains: 9 elements; 8 vertex < side, 4 side < face, 4 vertex < face pairs; 8 flags vertex < side < face.
        // χ = 9 - 16 + 8 = 1, as for any contractible space such as this disk; μ must then be the reduced
        // χ, 0 (Philip Hall's theorem, Stanley, Enumerative Combinatorics I, Prop. 3.8.5)
        assertEquals(file + " (poset file)\n"
                + "  elements   9, of which 4 minimal and 1 maximal\n"
                + "  covers     12\n"
                + "  ranks      4 + 4 + 1 elements of rank 0..2\n"
                + "  graded     yes, every cover raises the rank by one\n"
                + "  thin       yes, every interval of length 2 has exactly two middle elements\n"
                + "  CW poset   yes, so its cellular complex has one cell per element\n"
                + "  chains     33 = 9 + 16 + 8 in dimensions 0..2 of the order complex\n"
                + "  euler      Euler characteristic 1, reduced 0\n"
                + "  mobius     0 from bottom to top, once both are adjoined; equal to the reduced Euler"
                + " characteristic (Philip Hall)\n", run.out());
    }

    @Test
    void projectivePlaneAsText() throws IOException {
        String file = Inputs.write(dir, "rp2.simplicial", Inputs.RP2);
        CliRun run = CliRun.morse("inspect", file);
        assertEquals(0, run.code(), run.err());
        // χ(RP^2) = 1 (Hatcher, Algebraic Topology, 2002, from memory)
        assertEquals(file + " (simplicial file)\n"
                + "  vertices   6\n"
                + "  dimension  2\n"
                + "  f-vector   (6, 15, 10), 31 faces in dimensions 0..2\n"
                + "  facets     10 (10 faces listed), by dimension 0 + 0 + 10; pure\n"
                + "  euler      Euler characteristic 1\n", run.out());
    }

    @Test
    @SuppressWarnings("unchecked")
    void loopPosetAsJsonSaysWhyItIsNotACwPoset() throws IOException {
        String file = Inputs.write(dir, "loop.poset", Inputs.LOOP);
        CliRun run = CliRun.morse("inspect", file, "--json");
        assertEquals(0, run.code(), run.err());
        Map<String, Object> json = (Map<String, Object>) JsonValues.parse(run.out());
        assertEquals("poset", json.get("format"));
        assertEquals(BigInteger.TWO, json.get("elements"));
        assertEquals(List.of(BigInteger.ONE, BigInteger.ONE), json.get("rank_sizes"));
        assertEquals(true, json.get("graded"));
        // no interval of length 2 at all, so thin for want of a counterexample
        assertEquals(Map.of("thin", true), json.get("thin"));
        assertEquals(Map.of("cw_poset", false, "reason",
                "'e' has height 1 but covers only 'v'; in a CW poset an element of height 1 covers exactly two"),
                json.get("cw_check"));
        // Δ is a segment: 2 vertices, 1 edge; χ = 1, reduced 0; and by the defining recursion on the
        // chain 0̂ < v < e < 1̂: μ(0̂,v) = -1, μ(0̂,e) = 0, μ(0̂,1̂) = -(1 - 1 + 0) = 0
        assertEquals(List.of(BigInteger.TWO, BigInteger.ONE), json.get("chains"));
        assertEquals(BigInteger.ONE, json.get("euler_characteristic"));
        assertEquals(BigInteger.ZERO, json.get("reduced_euler_characteristic"));
        assertEquals(BigInteger.ZERO, json.get("mobius"));
    }

    @Test
    void missingFileIsAnInputError() {
        CliRun run = CliRun.morse("inspect", dir.resolve("absent.poset").toString());
        assertEquals(2, run.code());
        assertEquals("", run.out());
        assertEquals(List.of(dir.resolve("absent.poset") + ": no such file"), run.errLines());
    }
}
