package dev.morse.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import java.io.IOException;
import java.math.BigInteger;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class BatchCommandTest {
    @TempDir
    Path dir;

    private Path write(String name, String text) throws IOException {
        Path file = dir.resolve(name);
        Files.writeString(file, text);
        return file;
    }

    @SuppressWarnings("unchecked")
    private static List<Map<String, Object>> lines(String out) {
        return out.lines().map(l -> (Map<String, Object>) JsonValues.parse(l)).toList();
    }

    @Test
    @SuppressWarnings("unchecked")
    void oneLinePerInputInOrderWithFailuresAsLines() throws IOException {
        // the circle of DESIGN.md: H_0 = H_1 = Z; the boundary of a triangle likewise (standard)
        Path circle = write("a-circle.poset", "morse-poset 1\nv1\nv2\ne1: v1 v2\ne2: v1 v2\n");
        Path bad = write("b-bad.poset", "morse-poset 1\na: b\nb: a\n");
        Path triangle = write("c-triangle.txt", "morse-simplicial 1\na b\nb c\na c\n");
        CliRun run = CliRun.morse("batch", circle.toString(), dir.resolve("missing.poset").toString(), bad.toString(),
                triangle.toString(), "--threads", "2");
        assertEquals(2, run.code(), "any failed input makes the exit code 2");
        List<Map<String, Object>> out = lines(run.out());
        assertEquals(4, out.size());
        assertEquals(circle.toString(), out.get(0).get("input"));
        assertEquals(List.of(1L, 1L), CliFiles.betti(out.get(0)));
        assertEquals(Map.of("input", dir.resolve("missing.poset").toString(), "error",
                dir.resolve("missing.poset") + ": no such file"), out.get(1));
        assertEquals(bad + ":3: the relations contain a cycle of 2 elements: b < a < b", out.get(2).get("error"));
        assertEquals(List.of(1L, 1L), CliFiles.betti(out.get(3)));
    }

    @Test
    void directoriesAndListFilesExpandInOrder() throws IOException {
        Path sub = Files.createDirectory(dir.resolve("inputs"));
        Files.writeString(sub.resolve("one.poset"), "morse-poset 1\nx\n");
        Files.writeString(sub.resolve("two.poset"), "morse-poset 1\nx\ny\n");
        Path list = write("list.txt", sub.resolve("two.poset") + "\n");
        CliRun run = CliRun.morse("batch", sub.toString(), "@" + list);
        assertEquals(0, run.code(), run.err());
        List<Map<String, Object>> out = lines(run.out());
        assertEquals(List.of(sub.resolve("one.poset").toString(), sub.resolve("two.poset").toString(),
                sub.resolve("two.poset").toString()), out.stream().map(m -> m.get("input")).toList());
        assertEquals(List.of(2L), CliFiles.betti(out.get(1)));
    }

    @Test
    void cohenMacaulayVerdictOnEachLine() throws IOException {
        // the boundary of a triangle is a sphere (Cohen–Macaulay); two triangles glued at a vertex are not
        // (Reisner 1976); an image has no verdict
        Path sphere = write("a.txt", "morse-simplicial 1\na b\nb c\na c\n");
        Path bowtie = write("b.txt", "morse-simplicial 1\na b c\nc d e\n");
        Path image = write("c.pbm", "P1\n1 1\n1\n");
        CliRun run = CliRun.morse("batch", sphere.toString(), bowtie.toString(), image.toString(), "--cohen-macaulay");
        assertEquals(0, run.code(), run.err());
        List<Map<String, Object>> out = lines(run.out());
        assertEquals(true, out.get(0).get("cohen_macaulay"));
        assertEquals(false, out.get(1).get("cohen_macaulay"));
        assertEquals(true, out.get(2).containsKey("cohen_macaulay"));
        assertNull(out.get(2).get("cohen_macaulay"));
    }

    @Test
    void twoThreadsPrintWhatOneThreadPrints() throws IOException {
        for (int n = 3; n <= 5; n++) {
            assertEquals(0, CliRun.morse("generate", "partition", Integer.toString(n), "--proper", "-o",
                    dir.resolve("pi" + n + ".poset").toString()).code());
        }
        write("x-bad.poset", "morse-poset 1\n:\n");
        CliRun one = CliRun.morse("batch", dir.toString(), "--threads", "1", "--cohen-macaulay");
        CliRun two = CliRun.morse("batch", dir.toString(), "--threads", "2", "--cohen-macaulay");
        assertEquals(2, one.code());
        assertEquals(withoutTimings(one.out()), withoutTimings(two.out()));
        assertEquals(4, one.out().lines().count());
        assertEquals(BigInteger.valueOf(24), BigInteger.valueOf(CliFiles.betti(lines(one.out()).get(2)).get(2)),
                "Pi_5 proper part: a wedge of 4! spheres S^2 (Björner 1980)");
    }

    @Test
    void everyPosetOnFourElementsGetsALine() throws IOException {
        // 16 posets on 4 elements up to isomorphism (OEIS A000112, from memory), one file each
        Path all = dir.resolve("all4");
        CliRun generated = CliRun.morse("generate", "posets", "4", "-o", all.toString());
        assertEquals(0, generated.code(), generated.err());
        assertEquals("wrote 16 posets on 4 elements into " + all + "\n", generated.out());
        CliRun run = CliRun.morse("batch", all.toString(), "--cohen-macaulay", "--threads", "2");
        assertEquals(0, run.code(), run.err());
        List<Map<String, Object>> out = lines(run.out());
        assertEquals(16, out.size());
        // the last in canonical order is the 4-chain: a simplex, contractible and Cohen–Macaulay (common practice)
        assertEquals(all.resolve("n4-0016.poset").toString(), out.get(15).get("input"));
        assertEquals(true, out.get(15).get("cohen_macaulay"));
        assertEquals(List.of(1L, 0L, 0L, 0L), CliFiles.betti(out.get(15)));
    }

    private static List<String> withoutTimings(String out) {
        return out.lines().map(l -> l.replaceAll("\"timings_ms\":\\{[^}]*\\}", "")
                .replaceAll("\"ms\":[0-9.]+", "")).toList();
    }
}
