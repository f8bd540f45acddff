package dev.morse.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.morse.poset.Poset;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class PosetReaderTest {
    private static final String SQUARE = """
            morse-poset 1
            # a square: two vertices below two edges
            v1
            v2
            e1: v1 v2
            e2: v1 v2
            """;

    /** Labels of the poset, as a set. */
    static Set<String> labels(Poset p) {
        Set<String> labels = new TreeSet<>();
        for (int x = 0; x < p.size(); x++) {
            labels.add(p.label(x));
        }
        return labels;
    }

    /** Cover relations of the poset as "lower<upper" strings. */
    static Set<String> covers(Poset p) {
        Set<String> covers = new TreeSet<>();
        for (int y = 0; y < p.size(); y++) {
            for (int i = p.lowerCovers().start(y); i < p.lowerCovers().end(y); i++) {
                covers.add(p.label(p.lowerCovers().target(i)) + "<" + p.label(y));
            }
        }
        return covers;
    }

    private static InputException failure(String text) {
        return assertThrows(InputException.class, () -> PosetReader.parse(text, "in.poset"));
    }

    @Test
    void designExampleReadsAsTwoVerticesBelowTwoEdges() {
        // DESIGN.md's example: each LOWER listed after ':' is below the label
        Poset p = PosetReader.parse(SQUARE, "square.poset");
        assertEquals(Set.of("v1", "v2", "e1", "e2"), labels(p));
        assertEquals(Set.of("v1<e1", "v2<e1", "v1<e2", "v2<e2"), covers(p));
    }

    @Test
    void roundTripKeepsLabelsAndCovers() {
        // relations need not be covers and lines accumulate (DESIGN.md); writing gives covers only
        String text = """
                morse-poset 1
                a
                b: a
                c: b a   # a < c is implied by a < b < c
                d: a
                c: d
                top: c b d a
                lonely
                """;
        Poset p = PosetReader.parse(text, "t.poset");
        assertEquals(Set.of("a<b", "b<c", "a<d", "d<c", "c<top"), covers(p));
        Poset again = PosetReader.parse(PosetWriter.toText(p), "written");
        assertEquals(labels(p), labels(again));
        assertEquals(covers(p), covers(again));
    }

    @Test
    void roundTripKeepsUnicodeLabels() {
        String text = "morse-poset 1\nα\nβ′: α\n中: β′ α\n\uD83D\uDE00: 中\n";
        Poset p = PosetReader.parse(text, "u.poset");
        Poset again = PosetReader.parse(PosetWriter.toText(p), "written");
        assertEquals(Set.of("α", "β′", "中", "\uD83D\uDE00"), labels(again));
        assertEquals(covers(p), covers(again));
    }

    @Test
    void unicodeWhiteSpaceSeparatesLabels() {
        // a label has no white space (DESIGN.md); an em space between two lowers separates them
        Poset p = PosetReader.parse("morse-poset 1\nx: a\u2003b\n", "w.poset");
        assertEquals(Set.of("x", "a", "b"), labels(p));
        assertEquals(labels(p), labels(PosetReader.parse(PosetWriter.toText(p), "written")));
    }

    @Test
    void readsFilesAndNamesThemInMessages(@TempDir Path dir) throws IOException {
        Path file = dir.resolve("square.poset");
        Files.writeString(file, SQUARE);
        assertEquals(4, PosetReader.read(file).size());
        Files.writeString(file, "morse-poset 1\na: a\n");
        InputException e = assertThrows(InputException.class, () -> PosetReader.read(file));
        assertEquals(file + ":2: label 'a' is listed below itself", e.getMessage());
    }

    @Test
    void emptyInputHasNoHeader() {
        InputException e = failure("# only a comment\n\n");
        assertEquals(InputException.NO_LINE, e.line());
        assertTrue(e.getMessage().startsWith("in.poset: no header"), e.getMessage());
    }

    @Test
    void missingHeaderIsReportedOnTheFirstContentLine() {
        InputException e = failure("# comment\n\na: b\n");
        assertEquals("in.poset:3: missing or unknown header: expected 'morse-poset 1'", e.getMessage());
    }

    @Test
    void unknownHeaderIsReported() {
        assertEquals("in.poset:1: missing or unknown header: expected 'morse-poset 1'",
                failure("morse-graph 1\na\n").getMessage());
    }

    @Test
    void otherVersionIsReported() {
        InputException e = failure("morse-poset 2\na\n");
        assertEquals(1, e.line());
        assertTrue(e.problem().contains("version '2'"), e.getMessage());
    }

    @Test
    void labelBelowItselfIsReported() {
        assertEquals("in.poset:3: label 'b' is listed below itself",
                failure("morse-poset 1\na\nb: a b\n").getMessage());
    }

    @Test
    void strayColonIsReported() {
        assertEquals("in.poset:2: stray ':' after the first one", failure("morse-poset 1\na: b: c\n").getMessage());
    }

    @Test
    void emptyLabelIsReported() {
        assertEquals("in.poset:4: empty label before ':'", failure("morse-poset 1\na\n\n: a\n").getMessage());
    }

    @Test
    void severalWordsWithoutColonAreReported() {
        InputException e = failure("morse-poset 1\na b\n");
        assertEquals(2, e.line());
        assertTrue(e.problem().contains("without ':'"), e.getMessage());
    }

    @Test
    void threeCycleIsNamedWithItsLabels() {
        // "a: c" states c < a
        InputException e = failure("morse-poset 1\na: c\nb: a\nc: b\n");
        assertTrue(e.getMessage().startsWith("in.poset:"), e.getMessage());
        assertStatedCycle(e, List.of("c<a", "a<b", "b<c"), 3);
    }

    @Test
    void cycleAmongOtherElementsNamesOnlyTheCycle() {
        // x and y hang off the cycle p < q < r < p and must not be named in it
        String text = "morse-poset 1\nx\nq: p x\nr: q\np: r\ny: r\n";
        InputException e = failure(text);
        assertEquals(Set.of("p", "q", "r"), assertStatedCycle(e, List.of("p<q", "x<q", "q<r", "r<p", "r<y"), 3));
    }

    @Test
    void cycleOfFiveThousandElementsIsNamedByItsEnds() {
        int n = 5000;
        StringBuilder text = new StringBuilder("morse-poset 1\n");
        List<String> stated = new ArrayList<>();
        for (int i = 1; i < n; i++) {
            text.append('e').append(i).append(": e").append(i - 1).append('\n');
            stated.add("e" + (i - 1) + "<e" + i);
        }
        text.append("e0: e").append(n - 1).append('\n');
        stated.add("e" + (n - 1) + "<e0");
        InputException e = failure(text.toString());
        assertTrue(e.line() >= 2 && e.line() <= n + 1, "line " + e.line());
        // one short line: six elements, the count of the rest, the last two and the first again
        String problem = e.problem();
        String prefix = "the relations contain a cycle of 5000 elements: ";
        assertTrue(problem.startsWith(prefix), problem);
        String[] parts = problem.substring(prefix.length()).split(" < … \\(4992 more\\) … < ");
        assertEquals(2, parts.length, problem);
        String[] head = parts[0].split(" < ");
        String[] tail = parts[1].split(" < ");
        assertEquals(6, head.length, problem);
        assertEquals(3, tail.length, problem);
        assertEquals(head[0], tail[2]);
        Set<String> relations = new HashSet<>(stated);
        for (int i = 0; i + 1 < head.length; i++) {
            assertTrue(relations.contains(head[i] + "<" + head[i + 1]), head[i] + " < " + head[i + 1]);
        }
        for (int i = 0; i + 1 < tail.length; i++) {
            assertTrue(relations.contains(tail[i] + "<" + tail[i + 1]), tail[i] + " < " + tail[i + 1]);
        }
    }

    /**
     * Checks that the message names a cycle {@code l0 < l1 < ... < l0} of {@code length} distinct
     * labels, each step a stated relation, on one line; returns the labels.
     */
    private static Set<String> assertStatedCycle(InputException e, List<String> stated, int length) {
        String message = e.getMessage();
        assertTrue(message.indexOf('\n') < 0, "one line");
        String problem = e.problem();
        int colon = problem.indexOf(": ");
        assertTrue(problem.startsWith("the relations contain a cycle of " + length + " elements"), problem);
        String[] steps = problem.substring(colon + 2).split(" < ");
        assertEquals(length + 1, steps.length, problem);
        assertEquals(steps[0], steps[length]);
        Set<String> distinct = new HashSet<>(List.of(steps).subList(0, length));
        assertEquals(length, distinct.size());
        Set<String> relations = new HashSet<>(stated);
        for (int i = 0; i < length; i++) {
            assertTrue(relations.contains(steps[i] + "<" + steps[i + 1]), steps[i] + " < " + steps[i + 1]);
        }
        return distinct;
    }

    @Test
    void badUtf8IsReportedWithoutALine(@TempDir Path dir) throws IOException {
        Path file = dir.resolve("bad.poset");
        Files.write(file, new byte[] {'m', 'o', 'r', 's', 'e', '-', 'p', 'o', 's', 'e', 't', ' ', '1', '\n',
            'a', (byte) 0xC3, '\n'});
        InputException e = assertThrows(InputException.class, () -> PosetReader.read(file));
        assertEquals(file + ": not valid UTF-8 text", e.getMessage());
    }
}
