package dev.morse.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.math.BigInteger;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Reports say what they mean: conventions at the edges, the ring a bound is over, whole counts. */
class HonestReportsTest {
    @TempDir
    static Path dir;
    private static String empty;
    private static String rp2;
    private static String square;

    @BeforeAll
    static void writeInputs() throws IOException {
        empty = Inputs.write(dir, "empty.poset", "morse-poset 1\n");
        rp2 = Inputs.write(dir, "rp2.simplicial", Inputs.RP2);
        square = Inputs.write(dir, "square.poset", Inputs.SQUARE);
    }

    @Test
    @SuppressWarnings("unchecked")
    void reducedHomologyOfTheEmptyComplexIsZInDimensionMinusOne() {
        // the augmented chain complex of the empty complex is Z in degree -1 alone, so H~_{-1} = Z
        // (common practice; Munkres 1984, §7, from memory): the empty set is the sphere S^{-1}
        Map<String, Object> json = CliFiles.homologyJson(empty, "--reduced");
        List<Map<String, Object>> groups = (List<Map<String, Object>>) json.get("homology");
        assertEquals(1, groups.size());
        assertEquals(BigInteger.valueOf(-1), groups.get(0).get("dimension"));
        assertEquals(BigInteger.ONE, groups.get(0).get("betti"));
        assertEquals(List.of(), groups.get(0).get("torsion"));
    }

    @Test
    void reducedHomologyOfTheEmptyComplexInText() {
        CliRun run = CliRun.morse("homology", empty, "--reduced");
        assertEquals(0, run.code(), run.err());
        assertTrue(run.out().contains("\n    ~H_-1 = Z\n"), run.out());
    }

    @Test
    void reducedHomologyOverAFieldOfTheEmptyComplexIsTheField() {
        CliRun run = CliRun.morse("homology", empty, "--reduced", "--coefficients", "Q");
        assertEquals(0, run.code(), run.err());
        assertTrue(run.out().contains("\n    ~H_-1 = Q\n"), run.out());
    }

    @Test
    void theBoundOverAFieldSaysSo() {
        // RP^2: H = Z, Z/2, 0, so over Q only beta_0 = 1 counts, while the bound over Z is
        // 1 + 1 + 1 (Forman 1998); the coreduction finds 3 critical cells
        Map<String, Object> json = CliFiles.homologyJson(rp2, "--coefficients", "Q");
        assertEquals(BigInteger.ONE, json.get("morse_lower_bound"));
        assertEquals("Q", json.get("morse_lower_bound_over"));
        CliRun run = CliRun.morse("homology", rp2, "--coefficients", "Q");
        assertTrue(run.out().contains("  bound     Morse lower bound over Q 1, excess 2 (integral torsion, not seen over"
                + " a field, may raise the bound)\n"), run.out());
    }

    @Test
    void theBoundOverTheIntegersCountsTorsion() {
        Map<String, Object> json = CliFiles.homologyJson(rp2);
        assertEquals(BigInteger.valueOf(3), json.get("morse_lower_bound"));
        assertEquals("Z", json.get("morse_lower_bound_over"));
    }

    @Test
    void aRefusedOrderComplexCountsTheChainsOfEveryDimension() throws IOException {
        // the chains of the proper part of B_13 are the ordered set partitions of {1..13} into at
        // least two blocks: the Fubini number a(13) = 526,858,348,381 less one (OEIS A000670, from
        // memory; checked by sum over m of m! S(13, m) for m = 2..13)
        String b13 = dir.resolve("b13.poset").toString();
        assertEquals(0, CliRun.morse("generate", "boolean", "13", "--proper", "-o", b13).code());
        CliRun run = CliRun.morse("homology", b13, "--complex", "order");
        assertEquals(2, run.code());
        assertEquals(List.of(b13 + ": too large to compute: the order complex would have 526,858,348,380 cells in all"
                + " dimensions, and more boundary entries than one array holds"), run.errLines());
        assertEquals("", run.out());
    }

    @Test
    void primesBeyondTheSupportedRangeAreRefusedWithTheLimit() {
        CliRun run = CliRun.morse("homology", rp2, "--coefficients", "9223372036854775783");
        assertEquals(2, run.code());
        assertEquals(List.of("morse: Invalid value for option '--coefficients': prime coefficients must be below 2^31"
                + " (at most 2147483647), not 9223372036854775783 (see 'morse homology --help')"), run.errLines());
    }

    @Test
    void theLargestSupportedPrimeWorks() {
        // 2^31 - 1 is a Mersenne prime (Euler 1772); over any field RP^2 of characteristic not 2 is acyclic
        Map<String, Object> json = CliFiles.homologyJson(rp2, "--coefficients", "2147483647");
        assertEquals(List.of(1L, 0L, 0L), CliFiles.betti(json));
    }

    @Test
    void aThresholdOnAPosetIsWarnedAbout() {
        CliRun run = CliRun.morse("homology", square, "--threshold", "3");
        assertEquals(0, run.code());
        assertEquals(List.of("morse: warning: --threshold applies only to images; " + square + " is not an image"),
                run.errLines());
    }

    @Test
    void matchingOptionsTheImplicitEngineIgnoresAreWarnedAbout() {
        CliRun run = CliRun.morse("homology", square, "--complex", "implicit", "--matching", "random", "--trials", "3");
        assertEquals(0, run.code(), run.err());
        String why = " does not apply: the order complex was generated on demand, with its own matching"
                + " (--complex order stores it for the heuristics)";
        assertEquals(List.of("morse: warning: --matching random" + why, "morse: warning: --trials 3" + why),
                run.errLines());
    }

    @Test
    void groupsOverAPrimeFieldArePrintedAsVectorSpaces() throws IOException {
        // the proper part of Pi_5 is a wedge of 4! = 24 spheres S^2 (Björner 1980), so over F_3 the
        // homology is F_3, 0, F_3^24; the text must not read like torsion (Z/3)^24
        String pi5 = dir.resolve("pi5.poset").toString();
        assertEquals(0, CliRun.morse("generate", "partition", "5", "--proper", "-o", pi5).code());
        CliRun run = CliRun.morse("homology", pi5, "--coefficients", "3");
        assertEquals(0, run.code(), run.err());
        assertTrue(run.out().contains("coefficients F_3 (the field Z/3 of 3 elements)\n    H_0 = F_3\n    H_1 = 0\n"
                + "    H_2 = F_3^24\n"), run.out());
        // JSON keeps Betti numbers only
        assertEquals(List.of(1L, 0L, 24L), CliFiles.betti(CliFiles.homologyJson(pi5, "--coefficients", "3")));
    }

    @Test
    void groupsOverTheRationalsArePrintedAsVectorSpaces() {
        // RP^2 over Z/2: F_2 in every dimension 0..2 (universal coefficients; Hatcher 2002, §3.1, from memory);
        // over Q only H_0 = Q survives
        CliRun f2 = CliRun.morse("homology", rp2, "--coefficients", "2");
        assertTrue(f2.out().contains("    H_0 = F_2\n    H_1 = F_2\n    H_2 = F_2\n"), f2.out());
        CliRun q = CliRun.morse("homology", rp2, "--coefficients", "Q");
        assertTrue(q.out().contains("    H_0 = Q\n    H_1 = 0\n    H_2 = 0\n"), q.out());
    }

    @Test
    @SuppressWarnings("unchecked")
    void everyJsonKeyIsSnakeCase() {
        // the order complex of the square, so that the poset reduction runs and is timed
        Map<String, Object> json = CliFiles.homologyJson(square, "--complex", "order");
        assertTrue(((Map<String, Object>) json.get("timings_ms")).containsKey("poset_reduction"), json.toString());
        assertSnakeCase(json);
    }

    @SuppressWarnings("unchecked")
    private static void assertSnakeCase(Object value) {
        if (value instanceof Map<?, ?> map) {
            for (Map.Entry<?, ?> e : map.entrySet()) {
                assertTrue(((String) e.getKey()).matches("[a-z][a-z0-9_]*"), "key '" + e.getKey() + "'");
                assertSnakeCase(e.getValue());
            }
        } else if (value instanceof List<?> list) {
            list.forEach(HonestReportsTest::assertSnakeCase);
        }
    }
}
