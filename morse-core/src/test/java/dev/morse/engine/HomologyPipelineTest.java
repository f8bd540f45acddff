package dev.morse.engine;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.morse.matching.MatchingHeuristics;
import dev.morse.complex.ComplexChoice;
import dev.morse.complex.ComplexKind;
import dev.morse.homology.Coefficients;
import dev.morse.io.InputException;
import dev.morse.io.InputFormat;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class HomologyPipelineTest {
    /** DESIGN.md's example: two vertices below two edges, a circle. */
    private static final String CIRCLE = "morse-poset 1\nv1\nv2\ne1: v1 v2\ne2: v1 v2\n";
    /** An edge over a single vertex: not a CW poset; Δ is a segment. */
    private static final String LOOP = "morse-poset 1\nv\ne: v\n";
    private static final Request DEFAULTS = Request.defaults();

    @Test
    void circlePosetUsesTheCellularComplex() {
        // H(S^1) = Z, Z (Hatcher, Algebraic Topology, 2002, Corollary 2.14, numbering from memory)
        Computation report = Runs.run("circle.poset", CIRCLE, DEFAULTS);
        assertEquals(InputFormat.POSET, report.format());
        assertEquals(ComplexKind.CELLULAR, report.complexKind());
        assertEquals(List.of(2L, 2L), report.cells());
        // the default coreduction leaves one vertex and one edge: the Morse lower bound 1 + 1 (Forman 1998)
        assertEquals(List.of(1, 1), report.critical());
        assertEquals(0, report.excess());
        assertArrayEquals(new int[] {1, 1}, report.homology().bettiNumbers());
        assertTrue(report.cwCheck().orElseThrow().isCwPoset());
        assertEquals(List.of("read", "complex", "match", "verify", "sweep", "reduce", "homology"),
                report.timings().stream().map(PhaseTiming::phase).toList());
    }

    @Test
    void orderChoiceSkipsTheCheckAndKeepsTheHomology() {
        // Δ of the circle's face poset is its barycentric subdivision, a 4-cycle: again Z, Z
        Computation report = Runs.run("circle.poset", CIRCLE, DEFAULTS.withComplex(ComplexChoice.ORDER));
        assertEquals(ComplexKind.ORDER, report.complexKind());
        assertEquals(List.of(4L, 4L), report.cells());
        assertTrue(report.cwCheck().isEmpty());
        assertArrayEquals(new int[] {1, 1}, report.homology().bettiNumbers());
    }

    @Test
    void posetThatIsNotCwFallsBackToTheOrderComplex() {
        Computation report = Runs.run("loop.poset", LOOP, DEFAULTS);
        assertEquals(ComplexKind.ORDER, report.complexKind());
        assertFalse(report.cwCheck().orElseThrow().isCwPoset());
        // a segment is contractible (common practice)
        assertArrayEquals(new int[] {1, 0}, report.homology().bettiNumbers());
    }

    @Test
    void cellularChoiceOnAPosetThatIsNotCwIsAnInputError() {
        InputException e = assertThrows(InputException.class,
                () -> Runs.run("loop.poset", LOOP, DEFAULTS.withComplex(ComplexChoice.CELLULAR)));
        assertTrue(e.getMessage().startsWith("loop.poset: the cellular complex needs a CW poset"), e.getMessage());
    }

    @Test
    void simplicialFilesTakeNoChoiceOfComplex() {
        String triangle = "morse-simplicial 1\na b c\n";
        assertEquals(ComplexKind.SIMPLICIAL, Runs.run("t", triangle, DEFAULTS).complexKind());
        InputException e = assertThrows(InputException.class,
                () -> Runs.run("t", triangle, DEFAULTS.withComplex(ComplexChoice.ORDER)));
        assertEquals(InputException.NO_LINE, e.line());
    }

    @Test
    void reducedHomologyOfACircle() {
        // reduced H(S^1): 0, Z (Hatcher 2002, §2.1)
        Request reduced = Runs.request(ComplexChoice.AUTO, Coefficients.RATIONALS, true, "none");
        Computation report = Runs.run("circle.poset", CIRCLE, reduced);
        assertTrue(report.reduced());
        assertArrayEquals(new int[] {0, 1}, report.homology().bettiNumbers());
        assertEquals(Coefficients.RATIONALS, report.coefficients());
    }

    @Test
    void filesAreReadByTheirHeader(@TempDir Path dir) throws IOException {
        Path file = dir.resolve("edge.txt");
        Files.writeString(file, "# any name will do\nmorse-simplicial 1\nu w\n");
        Computation report = Runs.run(file, DEFAULTS);
        assertEquals(InputFormat.SIMPLICIAL, report.format());
        assertEquals(file.toString(), report.source());
        assertEquals(List.of(2L, 1L), report.cells());
    }

    @Test
    void unknownHeaderIsAnInputErrorAtItsLine(@TempDir Path dir) throws IOException {
        Path file = dir.resolve("x.txt");
        Files.writeString(file, "\nhello world\n");
        InputException e = assertThrows(InputException.class, () -> Runs.run(file, DEFAULTS));
        assertTrue(e.getMessage().startsWith(file + ":2: unknown header"), e.getMessage());
    }

    @Test
    void missingFileAndDirectoryAreInputErrors(@TempDir Path dir) {
        Path missing = dir.resolve("missing.poset");
        assertEquals(missing + ": no such file",
                assertThrows(InputException.class, () -> Runs.run(missing, DEFAULTS)).getMessage());
        // a directory is read as the slices of a volume; this one has none
        assertEquals(dir + ": is a directory with no image files to read as the slices of a volume",
                assertThrows(InputException.class, () -> Runs.run(dir, DEFAULTS)).getMessage());
    }

    @Test
    void unknownMatchingListsTheAvailableOnes() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> Request.defaults().withMatching("greedy", 1L, 1));
        assertEquals("unknown matching 'greedy'; available: " + String.join(", ", MatchingHeuristics.everyKnown().keySet()),
                e.getMessage());
        assertTrue(MatchingHeuristics.names().contains(Request.NO_MATCHING));
    }
}
