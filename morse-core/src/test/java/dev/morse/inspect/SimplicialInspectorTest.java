package dev.morse.inspect;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.morse.generate.Triangulations;
import dev.morse.io.SimplicialReader;
import java.util.List;
import org.junit.jupiter.api.Test;

class SimplicialInspectorTest {
    @Test
    void sixVertexProjectivePlane() {
        // the 6-vertex RP^2: f = (6, 15, 10), χ = 1 (REFERENCES.md; Euler characteristic of RP^2)
        SimplicialSummary s = SimplicialInspector.inspect(Triangulations.projectivePlane6());
        assertEquals(6, s.vertices());
        assertEquals(2, s.dimension());
        assertEquals(List.of(6L, 15L, 10L), s.faces());
        assertEquals(List.of(0L, 0L, 10L), s.facets());
        assertTrue(s.pure());
        assertEquals(1, s.eulerCharacteristic());
    }

    @Test
    void facetsAreTheMaximalFacesNotTheListedOnes() {
        // a triangle with one of its edges listed again, and an edge hanging off it: two facets of
        // different dimensions, so not pure; f = (4, 4, 1), χ = 1 for a contractible complex
        SimplicialSummary s = SimplicialInspector.inspect(SimplicialReader.parse(
                "morse-simplicial 1\na b c\na b\nc d\n", "kite.simplicial"));
        assertEquals(3, s.listedFaces());
        assertEquals(List.of(4L, 4L, 1L), s.faces());
        assertEquals(List.of(0L, 1L, 1L), s.facets());
        assertEquals(2, s.facetCount());
        assertFalse(s.pure());
        assertEquals(1, s.eulerCharacteristic());
    }
}
