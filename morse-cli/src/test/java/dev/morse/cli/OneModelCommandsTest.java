package dev.morse.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonParser;
import dev.morse.engine.HeuristicComparison;
import dev.morse.implicit.ElementOrder;
import java.io.IOException;
import java.math.BigInteger;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Every command reads its input, chooses its complex and engine, and computes in one way: compare,
 * draw, export and inspect take images and the implicit order complex like homology does, honour
 * the coefficients and reduced homology, and give the same answer as homology on the same input.
 */
class OneModelCommandsTest {
    private static final Path CORPUS = Path.of(System.getProperty("morse.corpus", "../corpus"));
    /** The summary line of {@code draw -o}: nodes, covers, matched pairs, critical cells. */
    private static final Pattern DRAWN = Pattern.compile(
            "wrote (.+): (\\d+) nodes, (\\d+) covers, (\\d+) matched pairs?, (\\d+) critical");
    /**
     * A 3 x 3 bitmap without its centre pixel (Netpbm P1, 1 = black = foreground): a ring of 8 closed
     * unit squares, homotopy equivalent to a circle, so H_0 = Z, H_1 = Z, H_2 = 0 (common practice).
     * Its cubical complex, counted by hand: the 4 x 4 grid points (16 vertices), the 12 horizontal
     * and 12 vertical unit edges (24; every one lies on a foreground square) and 8 squares; Euler
     * characteristic 16 - 24 + 8 = 0, that of a circle.
     */
    private static final String RING = "P1\n3 3\n1 1 1\n1 0 1\n1 1 1\n";
    /**
     * Not a CW poset: c covers three elements a, b, e, and the open interval below c is three
     * points, not a sphere. Its order complex is the graph with edges a-c, b-c, e-c, a-d, b-d:
     * connected, 5 vertices and 5 edges, so H_0 = Z and H_1 = Z^(5 - 5 + 1) = Z (Euler's formula for
     * graphs, common practice). The poset reduction removes e (its only upper cover is c, a beat
     * point) and leaves the four-cycle a < c > b < d > a.
     */
    private static final String WHISKERED_BOWTIE = "morse-poset 1\na\nb\ne\nc: a b e\nd: a b\n";

    @TempDir
    Path dir;

    // ---- compare and draw on the implicit order complex ----

    @Test
    void compareOnTheImplicitOrderComplexComparesItsElementOrders() {
        String file = corpus("boolean-3-proper.poset");
        CliRun run = CliRun.morse("compare", "--complex", "implicit", file, "--matching", "implicit:down-sets,implicit:ids");
        assertEquals(0, run.code(), run.err());
        assertEquals("", run.err());
        // the proper part of B_3 is the boundary of a triangle, a circle (standard; Wachs 2007)
        assertEquals(List.of(file + " (poset file)", "  complex   order", "  cells     12 = 6 + 6 in dimensions 0..1",
                "  homology  H_0 = Z, H_1 = Z (by implicit:down-sets; every matching agrees)"),
                run.out().lines().limit(4).toList());

        Map<String, Object> json = json("compare", "--complex", "implicit", "--json", file, "--matching",
                "implicit:down-sets,implicit:ids");
        assertEquals("order", json.get("complex"));
        // the order complex of the 6 elements and 6 comparable pairs of the proper part of B_3
        assertEquals(List.of(big(6), big(6)), json.get("cells"));
        assertEquals(List.of(1L, 1L), CliFiles.betti(json));
        assertEquals(List.of(), CliFiles.torsion(json, 1));
        List<String> rows = new ArrayList<>();
        for (ElementOrder order : ElementOrder.values()) {
            rows.add(HeuristicComparison.IMPLICIT_ROW + order.optionName());
        }
        assertEquals(List.of("implicit:down-sets", "implicit:ids"), rows);
        assertEquals(rows, rowNames(json));
        assertEquals("implicit:down-sets", json.get("reference_matching"));
    }

    @Test
    void drawOnTheImplicitOrderComplexDrawsChainsWithTheImplicitMatching() throws IOException {
        String file = corpus("boolean-3-proper.poset");
        Path svg = dir.resolve("b3.svg");
        CliRun run = CliRun.morse("draw", "--complex", "implicit", file, "-o", svg.toString());
        assertEquals(0, run.code(), run.err());
        assertEquals("", run.err());
        List<String> lines = run.out().lines().toList();
        assertEquals(2, lines.size(), run.out());
        Matcher m = drawn(lines.get(0), svg);
        // the face poset of the order complex of the proper part of B_3: one node per chain, its
        // 6 elements and 6 comparable pairs (12 nodes), each pair covering its 2 ends (12 covers);
        // the cellular complex would have 6 nodes
        assertEquals(12, count(m, 2));
        assertEquals(12, count(m, 3));
        int pairs = count(m, 4);
        int critical = count(m, 5);
        assertEquals(12, 2 * pairs + critical, "every node is matched or critical");
        Map<String, Object> homology = CliFiles.homologyJson("--complex", "implicit", file);
        assertEquals(total(homology.get("critical")), critical, "the implicit engine's critical chains");
        assertEquals(file + ": face poset of the order complex, one node per chain (chains generated on demand);"
                + " matching " + homology.get("matching") + ", " + pairs + " pairs, " + critical + " critical",
                lines.get(1));
        String picture = Files.readString(svg);
        assertTrue(picture.contains(">{1}&lt;{1,2}<"), "the chain {1} < {1,2} is a node");
    }

    // ---- an image through compare, draw, export and inspect ----

    @Test
    void compareOnAnImageUsesTheCubicalComplex() throws IOException {
        String ring = Inputs.write(dir, "ring.pbm", RING);
        CliRun text = CliRun.morse("compare", ring);
        assertEquals(0, text.code(), text.err());
        assertEquals(List.of(ring + " (image file)", "  complex   cubical",
                "  cells     48 = 16 + 24 + 8 in dimensions 0..2",
                "  homology  H_0 = Z, H_1 = Z, H_2 = 0 (by coreduction; every matching agrees)"),
                text.out().lines().limit(4).toList());
        Map<String, Object> json = json("compare", "--json", ring);
        assertEquals("image", json.get("format"));
        assertEquals("cubical", json.get("complex"));
        assertEquals(List.of(big(16), big(24), big(8)), json.get("cells"));
        // the ring is a circle up to homotopy (common practice)
        assertEquals(List.of(1L, 1L, 0L), CliFiles.betti(json));
        assertEquals(HeuristicComparison.defaultMatchings(), rowNames(json));
    }

    @Test
    void drawOnAnImageDrawsTheCubesWithTheirMatching() throws IOException {
        String ring = Inputs.write(dir, "ring.pbm", RING);
        Path svg = dir.resolve("ring.svg");
        CliRun run = CliRun.morse("draw", ring, "-o", svg.toString());
        assertEquals(0, run.code(), run.err());
        assertEquals("", run.err());
        List<String> lines = run.out().lines().toList();
        Matcher m = drawn(lines.get(0), svg);
        // one node per cube: 16 + 24 + 8 = 48; covers: 2 per edge and 4 per square, 48 + 32 = 80
        assertEquals(48, count(m, 2));
        assertEquals(80, count(m, 3));
        int pairs = count(m, 4);
        int critical = count(m, 5);
        assertEquals(48, 2 * pairs + critical);
        Map<String, Object> homology = CliFiles.homologyJson(ring);
        assertEquals(total(homology.get("critical")), critical);
        assertEquals(ring + ": face poset of the cubical complex, one node per elementary cube; matching coreduction, "
                + pairs + " pairs, " + critical + " critical", lines.get(1));
        assertTrue(Files.readString(svg).startsWith("<"), "an SVG file");
    }

    @Test
    void exportOnAnImageWritesTheMorseComplexOfTheCubes() throws IOException {
        String ring = Inputs.write(dir, "ring.pbm", RING);
        Path out = dir.resolve("ring-morse");
        CliRun run = CliRun.morse("export", ring, "-o", out.toString());
        assertEquals(0, run.code(), run.err());
        assertEquals("", run.err());
        List<String> lines = run.out().lines().toList();
        assertEquals("wrote the Morse complex of " + ring + " (cubical complex, matching coreduction) to " + out,
                lines.get(0));
        // the ring is a circle up to homotopy (common practice)
        assertEquals("  homology  coefficients Z: H_0 = Z, H_1 = Z, H_2 = 0", lines.get(lines.size() - 1));
        for (int d = 0; d <= 2; d++) {
            assertTrue(Files.isRegularFile(out.resolve("boundary-" + d + ".mtx")), "boundary-" + d + ".mtx");
            assertTrue(Files.isRegularFile(out.resolve("critical-" + d + ".txt")), "critical-" + d + ".txt");
        }
        assertFalse(Files.exists(out.resolve("boundary-3.mtx")));
    }

    @Test
    void inspectOnAnImageCountsPixelsAndCubes() throws IOException {
        String ring = Inputs.write(dir, "ring.pbm", RING);
        CliRun run = CliRun.morse("inspect", ring);
        assertEquals(0, run.code(), run.err());
        assertEquals("", run.err());
        // counts by hand, see RING
        assertEquals(List.of(ring + " (image)",
                "  size       3 x 3 pixels",
                "  foreground 8 (samples at or above 1)",
                "  cells      (16, 24, 8), 48 elementary cubes in dimensions 0..2",
                "  euler      Euler characteristic 0"), run.out().lines().toList());
        Map<String, Object> json = json("inspect", "--json", ring);
        assertEquals("image", json.get("format"));
        assertEquals(List.of(big(3), big(3)), json.get("size"));
        assertEquals(big(8), json.get("foreground"));
        assertEquals(List.of(big(16), big(24), big(8)), json.get("cells"));
        assertEquals(big(0), json.get("euler_characteristic"));
    }

    @Test
    void invertSelectsTheSameForegroundForEveryCommand() throws IOException {
        // inverted, the foreground of RING is its centre pixel alone: one closed square with its
        // 4 edges and 4 corners, contractible, so H_0 = Z and nothing else (common practice)
        String ring = Inputs.write(dir, "ring.pbm", RING);
        CliRun inspect = CliRun.morse("inspect", "--invert", ring);
        assertEquals(0, inspect.code(), inspect.err());
        assertEquals(List.of(ring + " (image)",
                "  size       3 x 3 pixels",
                "  foreground 1 (samples below 1)",
                "  cells      (4, 4, 1), 9 elementary cubes in dimensions 0..2",
                "  euler      Euler characteristic 1"), inspect.out().lines().toList());
        Map<String, Object> compared = json("compare", "--json", "--invert", ring);
        assertEquals(List.of(big(4), big(4), big(1)), compared.get("cells"));
        assertEquals(List.of(1L, 0L, 0L), CliFiles.betti(compared));
        Path svg = dir.resolve("centre.svg");
        CliRun draw = CliRun.morse("draw", "--invert", ring, "-o", svg.toString());
        assertEquals(0, draw.code(), draw.err());
        // 9 nodes; covers: 2 per edge and 4 for the square, 8 + 4 = 12
        Matcher m = drawn(draw.out().lines().findFirst().orElseThrow(), svg);
        assertEquals(9, count(m, 2));
        assertEquals(12, count(m, 3));
        Path out = dir.resolve("centre-morse");
        CliRun export = CliRun.morse("export", "--invert", ring, "-o", out.toString());
        assertEquals(0, export.code(), export.err());
        List<String> lines = export.out().lines().toList();
        assertEquals("  homology  coefficients Z: H_0 = Z, H_1 = 0, H_2 = 0", lines.get(lines.size() - 1));
        assertCriticalCountsAreTheMatrixSides(CliFiles.homologyJson("--invert", ring), out);
    }

    // ---- a poset that is not a CW poset, on the implicit engine ----

    @Test
    void theWhiskeredBowtieIsNotACwPoset() throws IOException {
        String file = Inputs.write(dir, "bowtie.poset", WHISKERED_BOWTIE);
        Map<String, Object> json = CliFiles.homologyJson(file);
        @SuppressWarnings("unchecked")
        Map<String, Object> cw = (Map<String, Object>) json.get("cw_check");
        assertEquals(Boolean.FALSE, cw.get("cw_poset"));
        assertEquals(List.of(1L, 1L), CliFiles.betti(json));
    }

    @Test
    void namedImplicitRowsNeedTheImplicitEngineAndNamedHeuristicsTheStoredOne() throws IOException {
        String file = Inputs.write(dir, "bowtie.poset", WHISKERED_BOWTIE);
        CliRun stored = CliRun.morse("compare", "--complex", "order", "--matching", "implicit:ids", file);
        assertEquals(2, stored.code());
        assertEquals(List.of(file + ": the implicit: rows name the matching of the order complex generated on demand,"
                + " and the complex here is stored; --complex implicit generates it"), stored.err().lines().toList());
        CliRun implicit = CliRun.morse("compare", "--complex", "implicit", "--matching", "collapse", file);
        assertEquals(2, implicit.code());
        assertTrue(implicit.err().startsWith(file + ": the order complex here is generated on demand (as asked)"),
                implicit.err());
        CliRun unknown = CliRun.morse("compare", "--complex", "implicit", "--matching", "implicit:sideways", file);
        assertEquals(2, unknown.code());
        assertEquals("", unknown.out());
    }

    @Test
    void compareOnTheImplicitOrderComplexOfANonCwPoset() throws IOException {
        String file = Inputs.write(dir, "bowtie.poset", WHISKERED_BOWTIE);
        Map<String, Object> json = json("compare", "--complex", "implicit", "--json", file);
        assertEquals("order", json.get("complex"));
        // the circle of WHISKERED_BOWTIE
        assertEquals(List.of(1L, 1L), CliFiles.betti(json));
        // by default only the element order homology would use
        assertEquals(List.of("implicit:down-sets"), rowNames(json));
        assertEquals(CliFiles.homologyJson("--complex", "implicit", file).get("homology"), json.get("homology"));
    }

    @Test
    void drawOnTheImplicitOrderComplexOfANonCwPoset() throws IOException {
        String file = Inputs.write(dir, "bowtie.poset", WHISKERED_BOWTIE);
        Path svg = dir.resolve("bowtie.svg");
        CliRun run = CliRun.morse("draw", "--complex", "implicit", file, "-o", svg.toString());
        assertEquals(0, run.code(), run.err());
        assertEquals("", run.err());
        List<String> lines = run.out().lines().toList();
        Matcher m = drawn(lines.get(0), svg);
        // a picture shows the poset as given, not reduced: the 5 vertices and 5 edges of the graph
        // of WHISKERED_BOWTIE, each edge covering its 2 ends
        assertEquals(10, count(m, 2));
        assertEquals(10, count(m, 3));
        int pairs = count(m, 4);
        int critical = count(m, 5);
        assertEquals(10, 2 * pairs + critical);
        // the same matching as homology's implicit run on the poset as given
        Map<String, Object> homology = CliFiles.homologyJson("--complex", "implicit", "--no-poset-reduction", file);
        assertEquals(total(homology.get("critical")), critical);
        assertEquals(file + ": face poset of the order complex, one node per chain (chains generated on demand);"
                + " matching " + homology.get("matching") + ", " + pairs + " pairs, " + critical + " critical",
                lines.get(1));
    }

    @Test
    void exportOnTheImplicitOrderComplexOfANonCwPoset() throws IOException {
        String file = Inputs.write(dir, "bowtie.poset", WHISKERED_BOWTIE);
        Path out = dir.resolve("bowtie-morse");
        CliRun run = CliRun.morse("export", "--complex", "implicit", file, "-o", out.toString());
        assertEquals(0, run.code(), run.err());
        assertEquals("", run.err());
        List<String> lines = run.out().lines().toList();
        Map<String, Object> homology = CliFiles.homologyJson("--complex", "implicit", file);
        assertEquals("wrote the Morse complex of " + file + " (order complex, matching " + homology.get("matching")
                + ") to " + out, lines.get(0));
        // the circle of WHISKERED_BOWTIE
        assertEquals("  homology  coefficients Z: H_0 = Z, H_1 = Z", lines.get(lines.size() - 1));
        assertCriticalCountsAreTheMatrixSides(homology, out);
    }

    // ---- coefficients and reduced homology ----

    @Test
    void compareReportsReducedHomologyOverTheCoefficientsAsked() {
        // RP^2: H = Z, Z/2, 0 (Hatcher 2002, Example 2.42); over Z/3 the Z/2 vanishes (universal
        // coefficient theorem, Hatcher Theorem 3A.3) and reduced, so every group is 0
        Map<String, Object> json = json("compare", "--json", "--coefficients", "3", "--reduced", corpus("rp-2.poset"));
        assertEquals("3", json.get("coefficients"));
        assertEquals(Boolean.TRUE, json.get("reduced"));
        assertEquals(List.of(0L, 0L, 0L), CliFiles.betti(json));
        for (int d = 0; d < 3; d++) {
            assertEquals(List.of(), CliFiles.torsion(json, d));
        }
        assertEquals(CliFiles.homologyJson("--coefficients", "3", "--reduced", corpus("rp-2.poset")).get("homology"),
                json.get("homology"));
    }

    @Test
    void compareJsonNamesEachFieldOnce() throws IOException {
        CliRun run = CliRun.morse("compare", "--json", "--coefficients", "3", corpus("boolean-3-proper.poset"));
        assertEquals(0, run.code(), run.err());
        assertNoDuplicateField(run.out());
    }

    @Test
    void exportSummaryEndsWithReducedHomologyOverTheCoefficientsAsked() {
        Path out = dir.resolve("rp2-morse");
        CliRun run = CliRun.morse("export", "--coefficients", "3", "--reduced", corpus("rp-2.poset"), "-o",
                out.toString());
        assertEquals(0, run.code(), run.err());
        assertEquals("", run.err());
        List<String> lines = run.out().lines().toList();
        // RP^2 over Z/3, reduced: 0 in every dimension (see the comparison test above)
        assertEquals("  homology  reduced, coefficients 3: ~H_0 = 0, ~H_1 = 0, ~H_2 = 0", lines.get(lines.size() - 1));
    }

    @Test
    void drawAcceptsCoefficientsAndReducedHomology() {
        Path svg = dir.resolve("rp2.svg");
        CliRun run = CliRun.morse("draw", "--coefficients", "3", "--reduced", corpus("rp-2.poset"), "-o",
                svg.toString());
        assertEquals(0, run.code(), run.err());
        assertEquals("", run.err());
        Matcher m = drawn(run.out().lines().findFirst().orElseThrow(), svg);
        // the antipodal quotient of the boundary of the 3-cube: 4 + 6 + 3 = 13 cells, a CW poset
        // drawn as itself (corpus/rp-2.poset, Hatcher 2002, Example 2.42)
        assertEquals(13, count(m, 2));
    }

    // ---- export writes the computation homology makes ----

    @Test
    void exportWritesTheMorseComplexOfTheHomologyRun() throws IOException {
        String ring = Inputs.write(dir, "ring.pbm", RING);
        String bowtie = Inputs.write(dir, "bowtie.poset", WHISKERED_BOWTIE);
        List<List<String>> runs = List.of(
                List.of(corpus("dunce-hat-8.simplicial")),
                List.of(corpus("dunce-hat-8.simplicial"), "--matching", "random", "--seed", "3"),
                List.of(corpus("rp-3.poset")),
                List.of(corpus("rp-3.poset"), "--complex", "order", "--matching", "lexicographic"),
                List.of(corpus("partition-5-proper.poset"), "--complex", "order", "--no-poset-reduction",
                        "--matching", "collapse"),
                List.of(corpus("partition-5-proper.poset"), "--complex", "implicit", "--element-order", "ids"),
                List.of(bowtie, "--complex", "implicit"),
                List.of(ring, "--coefficients", "Q"));
        int k = 0;
        for (List<String> options : runs) {
            Map<String, Object> homology = CliFiles.homologyJson(options.toArray(new String[0]));
            Path out = dir.resolve("morse-" + k++);
            List<String> args = new ArrayList<>(List.of("export", "-o", out.toString()));
            args.addAll(options);
            CliRun run = CliRun.morse(args.toArray(new String[0]));
            assertEquals(0, run.code(), options + ": " + run.err());
            assertCriticalCountsAreTheMatrixSides(homology, out);
        }
    }

    // ---- the same answer whatever the command ----

    @Test
    @SuppressWarnings("unchecked")
    void homologyAndCompareAgreeOnEveryCorpusPosetOfAtMost200Elements() throws IOException {
        Map<String, Object> manifest = (Map<String, Object>) JsonValues.parse(
                Files.readString(CORPUS.resolve("manifest.json")));
        int checked = 0;
        for (Map<String, Object> c : (List<Map<String, Object>>) manifest.get("cases")) {
            Map<String, Object> size = (Map<String, Object>) c.get("size");
            if (!c.get("format").equals("poset") || ((BigInteger) size.get("elements")).intValue() > 200) {
                continue;
            }
            String file = corpus((String) c.get("file"));
            Object homology = CliFiles.homologyJson(file).get("homology");
            Map<String, Object> compared = json("compare", "--json", file);
            assertEquals(homology, compared.get("homology"), c.get("name") + ": homology and compare");
            // the expected groups of the manifest come from the literature, its "source" field
            assertEquals(c.get("expected"), homology, c.get("name") + " against the manifest (" + c.get("source") + ")");
            checked++;
        }
        // the manifest lists 46 posets; 6 have more than 200 elements (cube-5-boundary, cross-5-boundary,
        // rp-5, partition-6-proper, subspace-2-5-proper, subspace-3-4-proper)
        assertTrue(checked >= 40, "only " + checked + " corpus posets checked");
    }

    // ---- helpers ----

    private static String corpus(String name) {
        return CORPUS.resolve(name).toString();
    }

    private static BigInteger big(long n) {
        return BigInteger.valueOf(n);
    }

    @SuppressWarnings("unchecked")
    private static Map<String, Object> json(String... args) {
        CliRun run = CliRun.morse(args);
        assertEquals(0, run.code(), Arrays.toString(args) + ": " + run.err());
        assertEquals("", run.err());
        return (Map<String, Object>) JsonValues.parse(run.out());
    }

    @SuppressWarnings("unchecked")
    private static List<String> rowNames(Map<String, Object> compareJson) {
        return ((List<Map<String, Object>>) compareJson.get("matchings")).stream()
                .map(r -> (String) r.get("matching")).toList();
    }

    private static Matcher drawn(String line, Path svg) {
        Matcher m = DRAWN.matcher(line);
        assertTrue(m.matches(), line);
        assertEquals(svg.toString(), m.group(1));
        assertTrue(Files.isRegularFile(svg), "the picture is written");
        return m;
    }

    private static int count(Matcher m, int group) {
        return Integer.parseInt(m.group(group));
    }

    @SuppressWarnings("unchecked")
    private static int total(Object critical) {
        return ((List<BigInteger>) critical).stream().mapToInt(BigInteger::intValue).sum();
    }

    /**
     * The Morse complex written to {@code out} has, in each dimension d of the homology run, a
     * boundary-d.mtx with one column per critical d-cell of that run and one row per critical
     * (d-1)-cell, and a critical-d.txt naming them; and nothing beyond the top dimension.
     */
    @SuppressWarnings("unchecked")
    private static void assertCriticalCountsAreTheMatrixSides(Map<String, Object> homology, Path out)
            throws IOException {
        List<BigInteger> critical = (List<BigInteger>) homology.get("critical");
        for (int d = 0; d < critical.size(); d++) {
            int[] size = matrixSize(out.resolve("boundary-" + d + ".mtx"));
            assertEquals(d == 0 ? 0 : critical.get(d - 1).intValue(), size[0], out + " boundary-" + d + " rows");
            assertEquals(critical.get(d).intValue(), size[1], out + " boundary-" + d + " columns");
            List<String> names = Files.readAllLines(out.resolve("critical-" + d + ".txt"));
            assertEquals(critical.get(d).intValue(), names.size(), out + " critical-" + d + ".txt");
        }
        assertFalse(Files.exists(out.resolve("boundary-" + critical.size() + ".mtx")), out + ": no more dimensions");
    }

    /** Rows and columns of a Matrix Market coordinate file: the first line after the comments. */
    private static int[] matrixSize(Path file) throws IOException {
        List<String> lines = Files.readAllLines(file);
        assertEquals("%%MatrixMarket matrix coordinate integer general", lines.get(0), file.toString());
        int k = 1;
        while (lines.get(k).startsWith("%")) {
            k++;
        }
        String[] fields = lines.get(k).trim().split("\\s+");
        assertEquals(3, fields.length, file + ": " + lines.get(k));
        assertEquals(k + 1 + Integer.parseInt(fields[2]), lines.size(), file + ": one line per entry");
        return new int[] {Integer.parseInt(fields[0]), Integer.parseInt(fields[1])};
    }

    /** Reads all of {@code text} with a parser that rejects a field named twice in one object. */
    private static void assertNoDuplicateField(String text) throws IOException {
        JsonFactory strict = new JsonFactory().enable(JsonParser.Feature.STRICT_DUPLICATE_DETECTION);
        try (JsonParser p = strict.createParser(text)) {
            while (p.nextToken() != null) {
                // reading is the check
            }
        }
    }
}
