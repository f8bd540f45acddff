package dev.morse.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Collectors;
import java.util.stream.IntStream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Inputs that used to block, run for minutes or run out of memory: each is refused at once or
 * answered, with one short line when refused. No timings are asserted; a hang shows as a test that
 * does not finish.
 */
class NoHangsTest {
    @TempDir
    static Path dir;

    private static String chain(String name, int n) throws IOException {
        StringBuilder text = new StringBuilder("morse-poset 1\ne0\n");
        for (int i = 1; i < n; i++) {
            text.append('e').append(i).append(": e").append(i - 1).append('\n');
        }
        return Inputs.write(dir, name, text.toString());
    }

    @Test
    void aFifoIsRefusedWithoutReadingIt() throws Exception {
        Path fifo = dir.resolve("pipe");
        Process mkfifo = new ProcessBuilder("mkfifo", fifo.toString()).start();
        assumeTrue(mkfifo.waitFor() == 0, "mkfifo is not available");
        CliRun run = CliRun.morse("homology", fifo.toString());
        assertEquals(2, run.code());
        assertEquals(List.of(fifo + ": is not a regular file (a pipe or a device?); save the input to a file first"),
                run.errLines());
    }

    @Test
    void aCharacterDeviceAsARawVolumeIsNotCalledMissing() {
        assumeTrue(Files.exists(Path.of("/dev/zero")));
        CliRun run = CliRun.morse("homology", "--dims", "8,8,8", "/dev/zero");
        assertEquals(2, run.code());
        assertEquals(List.of("/dev/zero: is not a regular file (a pipe or a device?); save the input to a file first"),
                run.errLines());
        assertEquals("", run.out());
    }

    @Test
    void inspectingALongChainFinishesWithShortLines() throws IOException {
        String chain = chain("chain.poset", 100_000);
        CliRun run = CliRun.morse("inspect", chain);
        assertEquals(0, run.code(), run.err());
        // 100,000 ranks of one element each; the comparable pairs are at least 0 + 1 + ... + 99,999
        assertTrue(run.out().contains("  ranks      1 (×100000) elements of rank 0..99999\n"), run.out());
        assertTrue(run.out().contains("not counted: the poset has at least 4999950000 comparable pairs"), run.out());
        assertTrue(run.out().lines().allMatch(line -> line.length() < 300), "every line short");
    }

    @Test
    void theHomologyOfALongChainListsItsZeroGroupsAsOneRun() throws IOException {
        // a chain is a simplex (a cone), contractible: H_0 = Z and zero above, up to dimension 999
        String chain = chain("chain1000.poset", 1000);
        CliRun run = CliRun.morse("homology", chain);
        assertEquals(0, run.code(), run.err());
        assertTrue(run.out().contains("    H_0 = Z\n    H_1 .. H_999 = 0\n"), run.out());
    }

    @Test
    void aStarOfManyAtomsIsReducedToAPoint() throws IOException {
        // one bottom, 10^5 atoms, one top: a cone over a discrete set, contractible (common practice);
        // every atom is a beat point (Stong 1966)
        int atoms = 100_000;
        String upper = IntStream.range(0, atoms).mapToObj(i -> "a" + i).collect(Collectors.joining(" "));
        StringBuilder text = new StringBuilder("morse-poset 1\nbottom\n");
        for (int i = 0; i < atoms; i++) {
            text.append('a').append(i).append(": bottom\n");
        }
        text.append("top: ").append(upper).append('\n');
        String star = Inputs.write(dir, "star.poset", text.toString());
        assertEquals(List.of(1L, 0L, 0L), CliFiles.betti(CliFiles.homologyJson(star)));
    }

    @Test
    void aSimplexOfThirtyVerticesIsRefusedUpFrontWithItsSize() throws IOException {
        String facet = IntStream.range(0, 30).mapToObj(i -> "v" + i).collect(Collectors.joining(" "));
        String simplex = Inputs.write(dir, "simplex30.simplicial", "morse-simplicial 1\n" + facet + "\n");
        CliRun run = CliRun.morse("homology", simplex);
        assertEquals(2, run.code());
        // 2^30 - 1 nonempty faces; the j-element ones have j facets each: Σ j·C(30, j) = 30·2^29
        assertEquals(List.of(simplex + ": too large to compute: a listed face has 30 vertices, so the complex has at"
                + " least 2^30 - 1 = 1,073,741,823 faces with 16,106,127,360 boundary entries, more than one array holds"),
                run.errLines());
    }

    @Test
    void aLongCycleIsNamedByAFewOfItsElements() throws IOException {
        int n = 100_000;
        StringBuilder text = new StringBuilder("morse-poset 1\n");
        for (int i = 1; i < n; i++) {
            text.append('e').append(i).append(": e").append(i - 1).append('\n');
        }
        text.append("e0: e").append(n - 1).append('\n');
        String cycle = Inputs.write(dir, "cycle.poset", text.toString());
        CliRun run = CliRun.morse("homology", cycle);
        assertEquals(2, run.code());
        assertEquals(1, run.errLines().size());
        String line = run.errLines().get(0);
        assertTrue(line.contains(": the relations contain a cycle of 100000 elements: "), line);
        // six elements, the count of the others, the last two, and the first again
        assertTrue(line.matches(".*: (e[0-9]+ < ){6}… \\(99992 more\\) … < (e[0-9]+ < ){2}e[0-9]+"), line);
    }

    @Test
    void aHugeLabelInAMessageIsCut() throws IOException {
        String label = "x".repeat(5000);
        String loop = Inputs.write(dir, "self.poset", "morse-poset 1\n" + label + ": " + label + "\n");
        CliRun run = CliRun.morse("homology", loop);
        assertEquals(2, run.code());
        assertEquals(1, run.errLines().size());
        assertTrue(run.errLines().get(0).length() <= Failures.MAX_LINE + 40, run.err());
        assertTrue(run.errLines().get(0).endsWith(" more characters)"), run.err());
    }
}
