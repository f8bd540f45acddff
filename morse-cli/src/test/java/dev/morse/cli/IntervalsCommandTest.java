package dev.morse.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.math.BigInteger;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class IntervalsCommandTest {
    /** Two triangles glued at the vertex c: pure, contractible, not Cohen–Macaulay (Reisner 1976). */
    private static final String BOWTIE = "morse-simplicial 1\na b c\nc d e\n";

    @TempDir
    Path dir;

    private Path write(String name, String text) throws IOException {
        Path file = dir.resolve(name);
        Files.writeString(file, text);
        return file;
    }

    @SuppressWarnings("unchecked")
    private static Map<String, Object> json(String... args) {
        CliRun run = CliRun.morse(args);
        assertEquals(0, run.code(), run.err());
        return (Map<String, Object>) JsonValues.parse(run.out());
    }

    @Test
    @SuppressWarnings("unchecked")
    void bowtieNamesItsSharedVertexAsWitness() throws IOException {
        // Reisner 1976: the link of c is two disjoint edges, H~_0 = Z below its dimension 1
        Path file = write("bowtie.txt", BOWTIE);
        Map<String, Object> out = json("intervals", file.toString(), "--json");
        assertEquals("Q", out.get("coefficients"));
        assertEquals(true, out.get("pure"));
        assertEquals(false, out.get("cohen_macaulay"));
        Map<String, Object> witness = (Map<String, Object>) out.get("witness");
        assertEquals("{c}", witness.get("lower"));
        assertNull(witness.get("upper"));
        assertEquals(BigInteger.ONE, witness.get("dimension"));
        List<Map<String, Object>> homology = (List<Map<String, Object>>) witness.get("homology");
        assertEquals(BigInteger.ZERO, homology.get(0).get("dimension"));
        assertEquals(BigInteger.ONE, homology.get(0).get("betti"));
        // 13 faces; pairs face < face: two vertices below each of 6 edges, three edges and three vertices below
        // each of 2 triangles; then each face above 0^ and below 1^, and (0^, 1^)
        assertEquals(BigInteger.valueOf(6 * 2 + 2 * 6 + 13 + 13 + 1), out.get("intervals"));
        assertEquals(true, out.get("spherical"));
    }

    @Test
    @SuppressWarnings("unchecked")
    void partitionLatticeMobiusTableEndsWithTheKnownValue() throws IOException {
        // μ(Π_4) = (-1)^3 3! = -6 (Stanley, EC I, Example 3.10.4, from memory); geometric lattice: Cohen–Macaulay (Björner 1980)
        Path file = dir.resolve("pi4.poset");
        assertEquals(0, CliRun.morse("generate", "partition", "4", "--proper", "-o", file.toString()).code());
        Map<String, Object> out = json("intervals", file.toString(), "--json", "--mobius", "--coefficients", "Z");
        assertEquals(true, out.get("cohen_macaulay"));
        assertNull(out.get("witness"));
        List<Map<String, Object>> mobius = (List<Map<String, Object>>) out.get("mobius");
        assertEquals(((BigInteger) out.get("intervals")).intValue(), mobius.size());
        Map<String, Object> last = mobius.get(mobius.size() - 1);
        assertNull(last.get("lower"));
        assertNull(last.get("upper"));
        assertEquals(BigInteger.valueOf(-6), last.get("value"));
    }

    @Test
    void bruhatOrderIsGorensteinStar() throws IOException {
        // Björner–Wachs 1982: Bruhat intervals are shellable spheres; Verma 1971: μ = (-1)^length
        Path file = dir.resolve("s4.poset");
        assertEquals(0, CliRun.morse("generate", "bruhat", "4", "--proper", "-o", file.toString()).code());
        Map<String, Object> out = json("intervals", file.toString(), "--json", "--threads", "2");
        assertEquals(true, out.get("cohen_macaulay"));
        assertEquals(true, out.get("eulerian"));
        assertEquals(true, out.get("gorenstein_star"));
        assertEquals(BigInteger.valueOf(6), out.get("rank"));
    }

    @Test
    void oneAndTwoThreadsWriteTheSameOutput() throws IOException {
        Path file = dir.resolve("pi5.poset");
        assertEquals(0, CliRun.morse("generate", "partition", "5", "--proper", "-o", file.toString()).code());
        Path one = dir.resolve("one.jsonl");
        Path two = dir.resolve("two.jsonl");
        CliRun a = CliRun.morse("intervals", file.toString(), "--json", "--mobius", "--threads", "1", "--jsonl", one.toString());
        CliRun b = CliRun.morse("intervals", file.toString(), "--json", "--mobius", "--threads", "2", "--jsonl", two.toString());
        assertEquals(0, a.code(), a.err());
        assertEquals(a.out(), b.out());
        assertEquals(Files.readString(one), Files.readString(two));
    }

    @Test
    void jsonLinesListEveryIntervalWithTheEmptyOnesInDimensionMinusOne() throws IOException {
        Path file = write("bowtie.txt", BOWTIE);
        Path lines = dir.resolve("out.jsonl");
        assertEquals(0, CliRun.morse("intervals", file.toString(), "--jsonl", lines.toString()).code());
        List<String> all = Files.readAllLines(lines);
        assertEquals(51, all.size());
        // the first are covers (shortest intervals first): the empty complex, H~_{-1} = Z
        assertEquals("{\"lower\":\"{a}\",\"upper\":\"{a b}\",\"dimension\":-1,"
                + "\"homology\":[{\"dimension\":-1,\"betti\":1,\"torsion\":[]}]}", all.get(0));
    }

    @Test
    void firstFailureStopsEarlyAndLeavesSphericalOpen() throws IOException {
        Path file = write("bowtie.txt", BOWTIE);
        Map<String, Object> out = json("intervals", file.toString(), "--json", "--first-failure");
        assertEquals(false, out.get("cohen_macaulay"));
        assertEquals(true, out.get("stopped_early"));
        assertTrue(out.containsKey("spherical"));
        assertNull(out.get("spherical"));
        assertTrue(((BigInteger) out.get("swept")).intValue() < 51);
    }

    @Test
    void imagesAreRefusedInOneLine() throws IOException {
        Path file = dir.resolve("dot.pbm");
        Files.writeString(file, "P1\n1 1\n1\n");
        CliRun run = CliRun.morse("intervals", file.toString());
        assertEquals(2, run.code());
        assertEquals(List.of(file + ": an interval sweep needs a poset or a simplicial file, not an image"), run.errLines());
        assertEquals("", run.out());
    }

    @Test
    void badInputIsOneLineAndNoOutputFile() throws IOException {
        Path file = write("cycle.poset", "morse-poset 1\na: b\nb: a\n");
        Path lines = dir.resolve("never.jsonl");
        CliRun run = CliRun.morse("intervals", file.toString(), "--jsonl", lines.toString());
        assertEquals(2, run.code());
        assertEquals(1, run.errLines().size());
        assertTrue(run.err().startsWith(file + ":3: "), run.err());
        assertFalse(Files.exists(lines));
    }
}
