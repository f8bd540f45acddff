package dev.morse.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.math.BigInteger;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;

class CompareCommandTest {
    @TempDir
    Path dir;

    @SuppressWarnings("unchecked")
    private static Map<String, Object> json(String... args) {
        CliRun run = CliRun.morse(args);
        assertEquals(0, run.code(), run.err());
        assertEquals("", run.err());
        return (Map<String, Object>) JsonValues.parse(run.out());
    }

    @SuppressWarnings("unchecked")
    private static List<Map<String, Object>> matchings(Map<String, Object> json) {
        return (List<Map<String, Object>>) json.get("matchings");
    }

    @Test
    void tableHasOneRowPerDefaultMatching() throws IOException {
        String file = Inputs.write(dir, "rp2.simplicial", Inputs.RP2);
        CliRun run = CliRun.morse("compare", file);
        assertEquals(0, run.code(), run.err());
        List<String> lines = run.out().lines().toList();
        assertEquals(file + " (simplicial file)", lines.get(0));
        // H_1(RP^2) = Z/2, and Forman's bound is 1 + 1 + 1 (β_0; t_1; t_1 again in dimension 2)
        assertEquals("  homology  H_0 = Z, H_1 = Z/2, H_2 = 0 (by coreduction; every matching agrees)", lines.get(3));
        assertEquals("  bound     Morse lower bound 3 = 1 + 1 + 1 in dimensions 0..2", lines.get(4));
        // the 6-vertex RP^2 has a perfect Morse matching, (1, 1, 1) (Forman 1998: the bound is met), and the
        // exact search proves it
        assertTrue(lines.get(5).startsWith("  optimum   3 = 1 + 1 + 1 in dimensions 0..2, proven optimal by the exact"
                + " search (combinatorial bounds, then integer programming after Joswig-Pfetsch) in "), lines.get(5));
        assertTrue(lines.get(7).matches("  matching +critical +total +excess +gap +match +verify +sweep +reduce"
                + " +homology +all +peak heap"), lines.get(7));
        List<String> names = lines.subList(8, 12).stream().map(l -> l.strip().split(" +")[0]).toList();
        assertEquals(List.of("coreduction", "collapse", "lexicographic", "random"), names);
    }

    @Test
    @SuppressWarnings("unchecked")
    void theDunceHatNeedsThreeCriticalCellsAndEachRowShowsItsGap() throws IOException {
        // the dunce hat is contractible but every discrete Morse function on it has a critical cell in
        // each of the dimensions 0, 1 and 2 (Zeeman 1964; Forman 1998), so the optimum is (1, 1, 1)
        String file = Inputs.write(dir, "dunce.simplicial", dev.morse.io.SimplicialWriter.toText(
                dev.morse.generate.Triangulations.dunceHat8()));
        Map<String, Object> json = json("compare", file, "--json");
        Map<String, Object> optimum = (Map<String, Object>) json.get("optimum");
        assertEquals(List.of(BigInteger.ONE, BigInteger.ONE, BigInteger.ONE), optimum.get("critical"));
        assertEquals(Boolean.TRUE, optimum.get("proven"));
        for (Map<String, Object> run : matchings(json)) {
            BigInteger total = (BigInteger) run.get("total");
            assertEquals(total.subtract(BigInteger.valueOf(3)), run.get("gap"), (String) run.get("matching"));
        }
        Map<String, Object> without = json("compare", file, "--json", "--no-optimum");
        assertTrue(!without.containsKey("optimum"));
    }

    @Test
    void jsonListsTheMatchingsAskedForInOrderWithTheBaselineWhenNamed() throws IOException {
        String file = Inputs.write(dir, "rp2.simplicial", Inputs.RP2);
        Map<String, Object> json = json("compare", file, "--matching", "none,collapse", "--json");
        assertEquals("none", json.get("reference_matching"));
        assertEquals(BigInteger.valueOf(3), json.get("morse_lower_bound"));
        List<Map<String, Object>> runs = matchings(json);
        assertEquals(List.of("none", "collapse"), runs.stream().map(r -> r.get("matching")).toList());
        // without a matching every cell is critical: 6 + 15 + 10, excess 31 - 3
        assertEquals(List.of(BigInteger.valueOf(6), BigInteger.valueOf(15), BigInteger.TEN), runs.get(0).get("critical"));
        assertEquals(BigInteger.valueOf(28), runs.get(0).get("excess"));
        assertTrue(((BigInteger) runs.get(1).get("peak_heap_bytes")).signum() > 0);
        assertFalse(runs.get(1).containsKey("trials"));
    }

    @Test
    @SuppressWarnings("unchecked")
    void trialsOfTheRandomMatchingAddUpToTheNumberAsked() throws IOException {
        String file = Inputs.write(dir, "rp2.simplicial", Inputs.RP2);
        Map<String, Object> json = json("compare", file, "--matching", "coreduction,random", "--trials", "30", "--json");
        List<Map<String, Object>> trials = (List<Map<String, Object>>) matchings(json).get(1).get("trials");
        assertEquals(BigInteger.valueOf(30), trials.stream().map(t -> (BigInteger) t.get("count"))
                .reduce(BigInteger.ZERO, BigInteger::add));
        assertFalse(matchings(json).get(0).containsKey("trials"), "coreduction does not depend on the seed");
    }

    @Test
    @SuppressWarnings("unchecked")
    void theSpectrumOfTheTrialsAgreesWithTheirTallyAndTheOptimum() throws IOException {
        // RP^2: H = Z, Z/2, 0 (Hatcher 2002, Ex. 2.42), so the Morse bound 3 = 1 + 1 + 1 is the optimum
        String file = Inputs.write(dir, "rp2.simplicial", Inputs.RP2);
        Map<String, Object> json = json("compare", file, "--matching", "random", "--trials", "40", "--json");
        Map<String, Object> random = matchings(json).get(0);
        Map<String, Object> optimum = (Map<String, Object>) json.get("optimum");
        assertEquals(BigInteger.valueOf(3), optimum.get("total"));
        List<Map<String, Object>> tally = (List<Map<String, Object>>) random.get("trials");
        long atThree = 0;
        long least = Long.MAX_VALUE;
        long most = 0;
        for (Map<String, Object> row : tally) {
            long total = ((List<BigInteger>) row.get("critical")).stream().mapToLong(BigInteger::longValue).sum();
            long count = ((BigInteger) row.get("count")).longValue();
            atThree += total == 3 ? count : 0;
            least = Math.min(least, total);
            most = Math.max(most, total);
        }
        Map<String, Object> spectrum = (Map<String, Object>) random.get("trial_spectrum");
        assertEquals(BigInteger.valueOf(40), spectrum.get("trials"));
        assertEquals(BigInteger.valueOf(atThree), spectrum.get("at_optimum"));
        assertEquals(BigInteger.valueOf(atThree), spectrum.get("at_morse_lower_bound"));
        assertEquals(BigInteger.valueOf(least), spectrum.get("min_total"));
        assertEquals(BigInteger.valueOf(most), spectrum.get("max_total"));
        assertEquals(BigInteger.valueOf(most - 3), spectrum.get("max_gap"));
        long median = ((BigInteger) spectrum.get("median_total")).longValue();
        assertTrue(least <= median && median <= most, spectrum.toString());
        CliRun text = CliRun.morse("compare", file, "--matching", "random", "--trials", "40");
        assertTrue(text.out().contains(atThree + " of 40 trials reach the optimum 3; gap least " + (least - 3)
                + ", median " + (median - 3) + ", most " + (most - 3)), text.out());
    }

    @Test
    void plotHasABarPerMatchingAndDimensionAndTheBoundsMarked() throws Exception {
        String file = Inputs.write(dir, "square.poset", Inputs.SQUARE);
        Path svg = dir.resolve("square.svg");
        CliRun run = CliRun.morse("compare", file, "--plot", svg.toString());
        assertEquals(0, run.code(), run.err());
        DocumentBuilderFactory factory = DocumentBuilderFactory.newInstance();
        Document doc = factory.newDocumentBuilder().parse(svg.toFile());
        NodeList rects = doc.getElementsByTagName("rect");
        int bars = 0;
        for (int i = 0; i < rects.getLength(); i++) {
            bars += ((Element) rects.item(i)).getAttribute("class").equals("bar") ? 1 : 0;
        }
        // 4 default matchings, 3 dimensions of the square's cellular complex
        assertEquals(12, bars);
        NodeList lines = doc.getElementsByTagName("line");
        StringBuilder bounds = new StringBuilder();
        for (int i = 0; i < lines.getLength(); i++) {
            Element line = (Element) lines.item(i);
            if (line.getAttribute("class").equals("bound")) {
                bounds.append(line.getAttribute("data-value"));
            }
        }
        // a disk: β = 1, 0, 0 and no torsion
        assertEquals("100", bounds.toString());
    }

    @Test
    void unknownMatchingInTheListIsAnOptionError() throws IOException {
        String file = Inputs.write(dir, "square.poset", Inputs.SQUARE);
        CliRun run = CliRun.morse("compare", file, "--matching", "coreduction,steepest");
        assertEquals(2, run.code());
        assertEquals("", run.out());
        assertTrue(run.errLines().get(0).contains("unknown matching 'steepest'"), run.err());
    }

    @Test
    void aPlotThatCannotBeWrittenIsAnErrorAndNothingIsPrinted() throws IOException {
        String file = Inputs.write(dir, "square.poset", Inputs.SQUARE);
        Path plot = dir.resolve("no-such-dir").resolve("chart.svg");
        CliRun run = CliRun.morse("compare", file, "--plot", plot.toString());
        assertEquals(2, run.code());
        assertEquals("", run.out());
        assertEquals(List.of(plot + ": cannot be written: no such directory"), run.errLines());
        assertFalse(Files.exists(plot));
    }
}
