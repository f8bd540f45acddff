package dev.morse.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.morse.spark.SparkFixtures;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/**
 * {@code morse-spark intervals --json} and {@code morse-spark batch} print what {@code morse intervals
 * --json} and {@code morse batch} print, timings aside. Each command starts and stops its own Spark
 * context, as it does when run from the launcher.
 */
class MorseSparkCommandTest {
    private record Run(int code, String out, String err) {
    }

    private static Run run(CommandLine line, String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = line.setOut(new PrintWriter(out)).setErr(new PrintWriter(err)).execute(args);
        return new Run(code, out.toString(), err.toString());
    }

    @Test
    void intervalsPrintTheObjectOfTheSingleMachineCommand(@TempDir Path dir) throws Exception {
        // the real projective plane: over Z its torsion makes (0^, 1^) the witness (Hatcher, Example 2.42)
        String file = SparkFixtures.corpus().resolve("rp-2.poset").toString();
        Path linesHere = dir.resolve("here.jsonl");
        Path linesThere = dir.resolve("there.jsonl");
        Run here = run(MorseCommand.newCommandLine(), "intervals", file, "--json", "--coefficients", "Z", "--mobius",
                "--jsonl", linesHere.toString());
        Run there = run(MorseSparkCommand.newCommandLine(), "intervals", file, "--json", "--coefficients", "Z", "--mobius",
                "--jsonl", linesThere.toString(), "--master", "local[2]", "--threads", "2");
        assertEquals(0, here.code(), here.err());
        assertEquals(0, there.code(), there.err());
        assertEquals("morse: warning: --threads does not apply on Spark: the master sets how many tasks run at once"
                + " (--master local[N] on this machine)\n", there.err().replace(System.lineSeparator(), "\n"));
        // the intervals object has no timings, so it is the same text
        assertEquals(here.out(), there.out());
        assertTrue(there.out().contains("\"cohen_macaulay\": false"), there.out());
        assertEquals(Files.readString(linesHere, StandardCharsets.UTF_8), Files.readString(linesThere, StandardCharsets.UTF_8));
    }

    @Test
    void batchPrintsTheLinesOfTheSingleMachineCommand(@TempDir Path dir) throws Exception {
        Path bad = dir.resolve("bad.poset");
        Files.writeString(bad, "not a header\n", StandardCharsets.UTF_8);
        List<String> args = List.of("batch", SparkFixtures.corpus().resolve("loop.poset").toString(), bad.toString(),
                SparkFixtures.corpus().resolve("torus-7.simplicial").toString(), "--cohen-macaulay");
        Run here = run(MorseCommand.newCommandLine(), args.toArray(String[]::new));
        Run there = run(MorseSparkCommand.newCommandLine(),
                java.util.stream.Stream.concat(args.stream(), java.util.stream.Stream.of("--master", "local[2]"))
                        .toArray(String[]::new));
        assertEquals(2, here.code());
        assertEquals(2, there.code(), there.err());
        assertEquals(SparkFixtures.withoutTimings(here.out()), SparkFixtures.withoutTimings(there.out()));
        String[] lines = there.out().split("\n");
        assertEquals(3, lines.length);
        assertEquals("{\"input\":\"" + bad + "\",\"error\":\"" + bad
                + ":1: unknown header 'not a header': expected 'morse-poset 1' or 'morse-simplicial 1'\"}", lines[1]);
    }

    @Test
    void aFailedIntervalIsOneLineNamingItsEnds() {
        // the chain a < b: P-hat is 0^ < a < b < 1^
        dev.morse.poset.PosetBuilder b = new dev.morse.poset.PosetBuilder();
        b.relate(b.element("a"), b.element("b"), 0);
        dev.morse.interval.PosetWithBounds hat = dev.morse.interval.PosetWithBounds.of(b.buildKnownAcyclic());
        List<dev.morse.spark.IntervalOutcome> failures = List.of(
                new dev.morse.spark.IntervalOutcome(new dev.morse.interval.IntervalTask(hat.bottom(), hat.top()), null,
                        "c.poset interval (0^, 1^): out of memory on the executor (512 MiB heap)"),
                new dev.morse.spark.IntervalOutcome(new dev.morse.interval.IntervalTask(0, 1), null, "c.poset: x"));
        assertEquals("{\"input\":\"c.poset\",\"lower\":null,\"upper\":null,\"error\":"
                + "\"c.poset interval (0^, 1^): out of memory on the executor (512 MiB heap)\"}\n"
                + "{\"input\":\"c.poset\",\"lower\":\"a\",\"upper\":\"b\",\"error\":\"c.poset: x\"}\n",
                SparkIntervalsCommand.errorLines("c.poset", hat, failures));
    }

    @Test
    void anUnknownOptionIsOneLineAndExitCodeTwo() {
        Run there = run(MorseSparkCommand.newCommandLine(), "intervals", "x.poset", "--executors", "2");
        assertEquals(2, there.code());
        assertEquals("", there.out());
        assertEquals("morse: Unknown options: '--executors', '2' (see 'morse-spark intervals --help')\n", there.err());
    }
}
