package dev.morse.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.math.BigInteger;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.ArrayDeque;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class HomologyCommandTest {
    /** The face poset of a square: four corners, four sides, one face; a closed disk. */
    private static final String SQUARE = """
            morse-poset 1
            a
            b
            c
            d
            ab: a b
            bc: b c
            cd: c d
            da: d a
            face: ab bc cd da
            """;
    /** DESIGN.md's example: two vertices below two edges, a circle made of two cells of each dimension. */
    private static final String CIRCLE = "morse-poset 1\nv1\nv2\ne1: v1 v2\ne2: v1 v2\n";
    /** One edge with both ends at one vertex: a loop as a CW complex, but not a regular one. */
    private static final String LOOP = "morse-poset 1\nv\ne: v\n";
    @TempDir
    static Path dir;
    private static String square;
    private static String circle;
    private static String loop;
    private static String rp2;

    @BeforeAll
    static void writeInputs() throws IOException {
        square = write("square.poset", SQUARE);
        circle = write("circle.poset", CIRCLE);
        loop = write("loop.poset", LOOP);
        rp2 = write("rp2.simplicial", Inputs.RP2);
    }

    private static String write(String name, String text) throws IOException {
        Path file = dir.resolve(name);
        Files.writeString(file, text);
        return file.toString();
    }

    /** Runs {@code morse homology ARGS --json}, asserts success, and returns the parsed object. */
    @SuppressWarnings("unchecked")
    private static Map<String, Object> json(String... args) {
        List<String> all = new ArrayList<>(List.of("homology", "--json"));
        all.addAll(List.of(args));
        CliRun run = CliRun.morse(all.toArray(new String[0]));
        assertEquals(0, run.code(), run.err());
        assertEquals("", run.err());
        return (Map<String, Object>) JsonValues.parse(run.out());
    }

    private static List<Object> ints(long... values) {
        List<Object> list = new ArrayList<>();
        for (long v : values) {
            list.add(BigInteger.valueOf(v));
        }
        return list;
    }

    @SuppressWarnings("unchecked")
    private static List<Object> betti(Map<String, Object> json) {
        return ((List<Map<String, Object>>) json.get("homology")).stream().map(g -> g.get("betti")).toList();
    }

    @SuppressWarnings("unchecked")
    private static List<Object> torsion(Map<String, Object> json, int dimension) {
        Map<String, Object> group = ((List<Map<String, Object>>) json.get("homology")).get(dimension);
        assertEquals(BigInteger.valueOf(dimension), group.get("dimension"));
        return (List<Object>) group.get("torsion");
    }

    @Test
    void squareIsAContractibleDisk() {
        // a closed disk is contractible: H = Z, 0, 0 (common practice)
        Map<String, Object> json = json(square);
        assertEquals("cellular", json.get("complex"));
        assertEquals(ints(4, 4, 1), json.get("cells"));
        assertEquals("coreduction", json.get("matching"));
        // a disk is collapsible: coreduction leaves one critical vertex, the Morse lower bound (Forman 1998)
        assertEquals(ints(1, 0, 0), json.get("critical"));
        assertEquals(BigInteger.ONE, json.get("morse_lower_bound"));
        assertEquals(BigInteger.ZERO, json.get("excess"));
        assertEquals("Z", json.get("coefficients"));
        assertEquals(ints(1, 0, 0), betti(json));
        assertEquals(List.of(), torsion(json, 1));
        assertEquals(square, json.get("input"));
    }

    @Test
    void twoVertexCircleHasTheHomologyOfACircle() {
        // H(S^1) = Z, Z (Hatcher, Algebraic Topology, 2002, §2.1)
        Map<String, Object> json = json(circle);
        assertEquals("cellular", json.get("complex"));
        assertEquals(ints(2, 2), json.get("cells"));
        assertEquals(ints(1, 1), betti(json));
    }

    @Test
    void loopIsNotACwPosetAndItsOrderComplexIsContractible() {
        // the poset v < e is a chain; its order complex is one segment, contractible (common practice).
        // e covers only v, a beat point (Stong 1966): the order complex is built on v alone
        Map<String, Object> json = json(loop);
        assertEquals("order", json.get("complex"));
        assertEquals(ints(1), json.get("cells"));
        assertEquals(ints(1, 0), betti(json));
        @SuppressWarnings("unchecked")
        Map<String, Object> check = (Map<String, Object>) json.get("cw_check");
        assertEquals(Boolean.FALSE, check.get("cw_poset"));
    }

    @Test
    void projectivePlaneHasTwoTorsionInDimensionOne() {
        // RP^2: H = Z, Z/2, 0 (Hatcher, Algebraic Topology, 2002, Example 2.42; REFERENCES.md)
        Map<String, Object> json = json(rp2);
        assertEquals("simplicial", json.get("complex"));
        assertEquals(ints(6, 15, 10), json.get("cells"));
        assertEquals(ints(1, 0, 0), betti(json));
        assertEquals(ints(2), torsion(json, 1));
        assertEquals(List.of(), torsion(json, 2));
    }

    @Test
    void projectivePlaneOverTwoElementsHasBettiOneInEachDimension() {
        // H_k(RP^2; Z/2) = Z/2 for k = 0, 1, 2 (Hatcher 2002, Example 2.42 with the universal coefficient theorem)
        Map<String, Object> json = json(rp2, "--coefficients", "2");
        assertEquals("2", json.get("coefficients"));
        assertEquals(ints(1, 1, 1), betti(json));
        assertEquals(List.of(), torsion(json, 1));
    }

    @Test
    void projectivePlaneOverTheRationalsIsAcyclic() {
        // Z/2 dies over Q: H(RP^2; Q) = Q, 0, 0 (universal coefficient theorem)
        assertEquals(ints(1, 0, 0), betti(json(rp2, "--coefficients", "Q")));
    }

    @Test
    void reducedHomologyDropsOneFromDimensionZero() {
        // reduced H(S^1) = 0, Z (Hatcher 2002, §2.1)
        Map<String, Object> json = json(circle, "--reduced");
        assertEquals(Boolean.TRUE, json.get("reduced"));
        assertEquals(ints(0, 1), betti(json));
    }

    @Test
    void orderComplexCanBeForced() {
        // Δ of the circle's face poset is its barycentric subdivision, a 4-cycle; same homology
        Map<String, Object> json = json(circle, "--complex", "order");
        assertEquals("order", json.get("complex"));
        assertEquals(ints(4, 4), json.get("cells"));
        assertEquals(ints(1, 1), betti(json));
    }

    @Test
    void implicitOrderComplexGivesTheSameHomology() {
        // the same 4-cycle, its chains generated on demand: H = Z, Z
        for (String order : List.of("down-sets", "ids")) {
            Map<String, Object> json = json(circle, "--complex", "implicit", "--element-order", order);
            assertEquals("order", json.get("complex"));
            assertEquals("implicit", json.get("engine"));
            assertEquals(ints(4, 4), json.get("cells"));
            assertEquals(ints(1, 1), betti(json));
        }
    }

    @Test
    void automaticChoiceGeneratesChainsOnDemandPastTheLimit() {
        // the loop is no CW poset and Δ has 3 chains, more than the limit of 2: a segment, contractible
        Map<String, Object> json = json(loop, "--max-stored-chains", "2", "--no-poset-reduction");
        assertEquals("implicit", json.get("engine"));
        assertEquals("more than 2 chains in the poset as given (no poset reduction), too many to store, so the chains"
                + " are generated on demand",
                json.get("engine_reason"));
        assertEquals(ints(1, 0), betti(json));
    }

    @Test
    void unknownElementOrderIsAnOptionError() {
        CliRun run = CliRun.morse("homology", square, "--element-order", "atoms");
        assertEquals(2, run.code());
        assertEquals("", run.out());
        assertTrue(run.err().contains("the element order must be one of down-sets, ids, not 'atoms'"), run.err());
    }

    @Test
    void matchingNoneMakesEveryCellCritical() {
        Map<String, Object> json = json(square, "--matching", "none");
        assertEquals("none", json.get("matching"));
        assertEquals(json.get("cells"), json.get("critical"));
    }

    @Test
    void everyHeuristicGivesTheSameHomologyOfRp2() {
        // RP^2: H = Z, Z/2, 0 (Hatcher 2002, Example 2.42); the lower bound is 1 + 1 + 1 = 3
        for (String name : List.of("coreduction", "collapse", "lexicographic", "random", "none")) {
            Map<String, Object> json = json(rp2, "--matching", name);
            assertEquals(ints(1, 0, 0), betti(json), name);
            assertEquals(List.of(BigInteger.TWO), torsion(json, 1), name);
            assertEquals(BigInteger.valueOf(3), json.get("morse_lower_bound"), name);
        }
    }

    @Test
    void trialsOfTheRandomMatchingAreTallied() {
        Map<String, Object> json = json(rp2, "--matching", "random", "--trials", "20", "--seed", "7");
        @SuppressWarnings("unchecked")
        List<Map<String, Object>> trials = (List<Map<String, Object>>) json.get("trials");
        int total = trials.stream().mapToInt(t -> ((BigInteger) t.get("count")).intValue()).sum();
        assertEquals(20, total);
    }

    @Test
    void textReportShowsTheGroups() {
        CliRun run = CliRun.morse("homology", rp2);
        assertEquals(0, run.code(), run.err());
        assertTrue(run.out().contains("H_1 = Z/2\n"), run.out());
        assertTrue(run.out().contains("31 = 6 + 15 + 10"), run.out());
    }

    @Test
    void unavailableMatchingIsAnOptionErrorNamingTheAvailableOnes() {
        CliRun run = CliRun.morse("homology", square, "--matching", "steepest");
        assertEquals(2, run.code());
        assertEquals("", run.out());
        assertTrue(run.errLines().get(0).contains(
                "unknown matching 'steepest'; available: coreduction, collapse, lexicographic, random, none, last-free-face,"
                + " freeing-collapse, cancelling-collapse, cancelling-freeing-collapse, optimal"), run.err());
        assertTrue(run.errLines().size() <= 2, run.err());
    }

    @Test
    void badInputIsOneLineOnStandardErrorAndNothingOnStandardOutput() throws IOException {
        String cycle = write("cycle.poset", "morse-poset 1\na: b\nb: a\n");
        CliRun run = CliRun.morse("homology", "--json", cycle);
        assertEquals(2, run.code());
        assertEquals("", run.out());
        assertEquals(1, run.errLines().size(), run.err());
        assertTrue(run.err().matches("\\Q" + cycle + "\\E:[23]: the relations contain a cycle of 2 elements: .*\n"),
                run.err());
    }

    @Test
    void debugAddsTheStackTraceToAnInputError() throws IOException {
        String self = write("self.poset", "morse-poset 1\na: a\n");
        CliRun run = CliRun.morse("homology", self, "--debug");
        assertEquals(2, run.code());
        assertEquals("", run.out());
        assertEquals(self + ":2: label 'a' is listed below itself", run.errLines().get(0));
        assertTrue(run.errLines().size() > 1 && run.err().contains("InputException"), run.err());
    }

    @Test
    void missingFileIsNamed() {
        String missing = dir.resolve("absent.poset").toString();
        CliRun run = CliRun.morse("homology", missing);
        assertEquals(2, run.code());
        assertEquals("", run.out());
        assertEquals(List.of(missing + ": no such file"), run.errLines());
    }

    @Test
    void cellularOnAPosetThatIsNotCwIsAnInputError() {
        CliRun run = CliRun.morse("homology", loop, "--complex", "cellular");
        assertEquals(2, run.code());
        assertEquals("", run.out());
        assertEquals(1, run.errLines().size(), run.err());
        assertTrue(run.err().startsWith(loop + ": the cellular complex needs a CW poset"), run.err());
    }

    @Test
    void badOptionValuesAreUsageErrors() {
        CliRun complex = CliRun.morse("homology", square, "--complex", "sideways");
        assertEquals(2, complex.code());
        assertEquals("", complex.out());
        assertTrue(complex.errLines().get(0).contains("--complex") && complex.err().contains("auto, order, cellular or implicit"),
                complex.err());
        CliRun coefficients = CliRun.morse("homology", square, "--coefficients", "4");
        assertEquals(2, coefficients.code());
        assertTrue(coefficients.errLines().get(0).contains("4 is not a prime"), coefficients.err());
        CliRun noFile = CliRun.morse("homology");
        assertEquals(2, noFile.code());
        assertTrue(noFile.errLines().get(0).contains("FILE"), noFile.err());
    }

    @Test
    void noSubcommandIsAUsageError() {
        CliRun run = CliRun.morse();
        assertEquals(2, run.code());
        assertEquals("", run.out());
    }

    @Test
    void rp2IsAClosedSurfaceOfEulerCharacteristicOne() {
        // By the classification of closed surfaces, a connected closed surface with χ = 1 is RP^2.
        // Closed surface: every edge in exactly two triangles, every vertex link a single cycle.
        List<int[]> triangles = Inputs.RP2.lines().skip(1).map(l -> Arrays.stream(l.split(" "))
                .mapToInt(Integer::parseInt).toArray()).toList();
        Map<String, Integer> edgeUse = new HashMap<>();
        for (int[] t : triangles) {
            for (int i = 0; i < 3; i++) {
                int a = Math.min(t[i], t[(i + 1) % 3]);
                int b = Math.max(t[i], t[(i + 1) % 3]);
                edgeUse.merge(a + "-" + b, 1, Integer::sum);
            }
        }
        assertTrue(edgeUse.values().stream().allMatch(u -> u == 2));
        for (int v = 1; v <= 6; v++) {
            // the link of v: the edges opposite v in the triangles containing v
            final int vertex = v;
            List<int[]> link = new ArrayList<>();
            for (int[] t : triangles) {
                if (Arrays.stream(t).anyMatch(x -> x == vertex)) {
                    link.add(Arrays.stream(t).filter(x -> x != vertex).toArray());
                }
            }
            assertEquals(1, cycles(link), "link of " + v);
        }
        int vertices = 6;
        int edges = edgeUse.size();
        assertEquals(1, vertices - edges + triangles.size());
    }

    /** Number of cycles in a graph where every vertex has degree 2 (fails otherwise). */
    private static int cycles(List<int[]> edges) {
        Map<Integer, List<Integer>> next = new HashMap<>();
        for (int[] e : edges) {
            next.computeIfAbsent(e[0], k -> new ArrayList<>()).add(e[1]);
            next.computeIfAbsent(e[1], k -> new ArrayList<>()).add(e[0]);
        }
        assertTrue(next.values().stream().allMatch(n -> n.size() == 2), "degrees in the link");
        Set<Integer> seen = new HashSet<>();
        int count = 0;
        for (int start : next.keySet()) {
            if (seen.add(start)) {
                count++;
                ArrayDeque<Integer> stack = new ArrayDeque<>(List.of(start));
                while (!stack.isEmpty()) {
                    for (int w : next.get(stack.pop())) {
                        if (seen.add(w)) {
                            stack.push(w);
                        }
                    }
                }
            }
        }
        return count;
    }
}
