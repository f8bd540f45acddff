package dev.morse.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The tally of repeated trials is a sorted table with a header, and a bar chart in the comparison plot. */
class TrialTallyTest {
    /** One row of the table: vector, count, share, excess. */
    /** A row of the tally; compare adds a gap column when it sought the optimum. */
    private static final Pattern ROW = Pattern.compile(" +\\(([0-9, ]+)\\) +([0-9]+) +([0-9.]+)% +(-?[0-9]+)( +(-?[0-9]+))?");
    /**
     * The matching complex of K_7: H = Z, Z/3, Z^20 (Bouc 1992; FamiliesHomologyTest), so the Morse
     * lower bound is 1 + (0 + 1) + (20 + 1) = 23 (Forman 1998).
     */
    private static final long BOUND = 23;

    @TempDir
    static Path dir;
    private static String m7;

    @BeforeAll
    static void generate() {
        m7 = dir.resolve("m7.simplicial").toString();
        assertEquals(0, CliRun.morse("generate", "matching", "7", "-o", m7).code());
    }

    private record Row(List<Integer> vector, int count, double share, long excess, Long gap) {
    }

    private static List<Row> rows(String text) {
        List<Row> rows = new ArrayList<>();
        for (String line : text.lines().toList()) {
            Matcher m = ROW.matcher(line);
            if (m.matches()) {
                List<Integer> vector = new ArrayList<>();
                for (String c : m.group(1).split(", ")) {
                    vector.add(Integer.parseInt(c));
                }
                rows.add(new Row(vector, Integer.parseInt(m.group(2)), Double.parseDouble(m.group(3)),
                        Long.parseLong(m.group(4)), m.group(6) == null ? null : Long.parseLong(m.group(6))));
            }
        }
        return rows;
    }

    private static void assertTable(String text, int trials) {
        assertTrue(text.matches("(?s).*\n +critical cells +count +share +excess( +gap)?\n.*"), text);
        List<Row> rows = rows(text);
        assertTrue(!rows.isEmpty(), text);
        assertEquals(trials, rows.stream().mapToInt(Row::count).sum());
        for (int i = 0; i < rows.size(); i++) {
            Row r = rows.get(i);
            assertEquals(Math.round(1000.0 * r.count() / trials) / 10.0, r.share(), 1e-9, text);
            assertEquals(r.vector().stream().mapToLong(Integer::longValue).sum() - BOUND, r.excess(), text);
            assertTrue(r.excess() >= 0, "no matching beats the Morse lower bound");
            if (r.gap() != null) {
                // the optimum here meets the Morse bound (the exact search proves 23 = BOUND), so gap = excess
                assertEquals(r.excess(), (long) r.gap(), text);
            }
            if (i > 0) {
                assertTrue(rows.get(i - 1).count() >= r.count(), "most frequent first: " + text);
            }
        }
    }

    @Test
    void homologyPrintsTheTallyAsASortedTable() {
        CliRun run = CliRun.morse("homology", m7, "--matching", "random", "--trials", "40");
        assertEquals(0, run.code(), run.err());
        assertTrue(run.out().contains("  trials    40 runs of random, "), run.out());
        assertTable(run.out(), 40);
    }

    @Test
    void compareTalliesEachRandomizedMatchingAndDrawsIt() throws IOException {
        Path plot = dir.resolve("m7.svg");
        CliRun run = CliRun.morse("compare", m7, "--matching", "random,coreduction", "--trials", "30",
                "--plot", plot.toString());
        assertEquals(0, run.code(), run.err());
        assertTrue(run.out().contains("  random, 30 trials with seeds 1..30:\n"), run.out());
        assertTrue(run.out().contains("  optimum   23 = 1 + 1 + 21 in dimensions 0..2, proven optimal"), run.out());
        assertTable(run.out(), 30);
        String svg = Files.readString(plot);
        Matcher bar = Pattern.compile("<rect class=\"trial\" data-matching=\"random\" data-vector=\"\\(([0-9, ]+)\\)\""
                + " data-count=\"([0-9]+)\"").matcher(svg);
        List<Row> table = rows(run.out());
        int i = 0;
        while (bar.find()) {
            // one bar per row of the table, in the same order
            assertEquals(table.get(i).count(), Integer.parseInt(bar.group(2)));
            i++;
        }
        assertEquals(table.size(), i, svg);
    }
}
