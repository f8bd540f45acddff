package dev.morse.io;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.morse.complex.Facets;
import java.util.ArrayList;
import java.util.List;
import java.util.TreeSet;
import org.junit.jupiter.api.Test;

class SimplicialReaderTest {
    private static InputException failure(String text) {
        return assertThrows(InputException.class, () -> SimplicialReader.parse(text, "in.simplicial"));
    }

    /** Each listed face as its vertex labels in the order read. */
    private static List<List<String>> faces(Facets facets) {
        List<List<String>> faces = new ArrayList<>();
        for (int f = 0; f < facets.faceCount(); f++) {
            List<String> face = new ArrayList<>();
            for (int v : facets.face(f)) {
                face.add(facets.vertexLabel(v));
            }
            faces.add(face);
        }
        return faces;
    }

    private static TreeSet<String> vertexLabels(Facets facets) {
        TreeSet<String> labels = new TreeSet<>();
        for (int v = 0; v < facets.vertexCount(); v++) {
            labels.add(facets.vertexLabel(v));
        }
        return labels;
    }

    @Test
    void designExampleReadsTwoFaces() {
        // DESIGN.md's example
        Facets f = SimplicialReader.parse("morse-simplicial 1\na b c\nc d\n", "ex");
        assertEquals(List.of(List.of("a", "b", "c"), List.of("c", "d")), faces(f));
        assertEquals(4, f.vertexCount());
    }

    @Test
    void roundTripKeepsLabelsAndFaces() {
        String text = """
                morse-simplicial 1
                # comments and blank lines are skipped

                x1 x2 x3   # a triangle
                x3\tx4
                ω
                """;
        Facets f = SimplicialReader.parse(text, "t");
        Facets again = SimplicialReader.parse(SimplicialWriter.toText(f), "written");
        assertEquals(faces(f), faces(again));
        assertEquals(vertexLabels(f), vertexLabels(again));
        assertArrayEquals(new int[] {3, 2, 1}, new int[] {again.faceSize(0), again.faceSize(1), again.faceSize(2)});
    }

    @Test
    void repeatedVertexIsReported() {
        assertEquals("in.simplicial:3: vertex 'a' is repeated within one face",
                failure("morse-simplicial 1\na b\nb a c a\n").getMessage());
    }

    @Test
    void strayColonIsReported() {
        InputException e = failure("morse-simplicial 1\na: b\n");
        assertEquals(2, e.line());
        assertTrue(e.problem().startsWith("stray ':'"), e.getMessage());
    }

    @Test
    void posetHeaderIsNotASimplicialHeader() {
        assertEquals("in.simplicial:1: missing or unknown header: expected 'morse-simplicial 1'",
                failure("morse-poset 1\na b\n").getMessage());
    }

    @Test
    void emptyInputHasNoHeader() {
        InputException e = failure("");
        assertEquals("in.simplicial: no header: expected 'morse-simplicial 1' as the first line", e.getMessage());
    }
}
