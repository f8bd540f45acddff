package dev.morse.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.morse.complex.ComplexChoice;
import dev.morse.io.InputException;
import dev.morse.engine.Runs;
import dev.morse.homology.Coefficients;
import dev.morse.input.InputReaders;
import org.junit.jupiter.api.Test;

class HasseDrawingsTest {
    /** The face poset of a square, a closed disk: a CW poset. */
    static final String SQUARE = """
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
    /** An edge over a single vertex: not a CW poset. */
    static final String LOOP = "morse-poset 1\nv\ne: v\n";

    private static HasseDrawing draw(String source, String text, ComplexChoice choice, String matching) {
        return HasseDrawings.draw(InputReaders.parse(source, text), Runs.request(choice, Coefficients.INTEGERS, false, matching));
    }

    @Test
    void cwPosetIsDrawnWithTheMatchingOfItsCellularComplex() {
        HasseDrawing d = draw("square.poset", SQUARE, ComplexChoice.AUTO, "coreduction");
        assertEquals(9, d.nodeCount());
        assertEquals(12, d.coverCount());
        assertTrue(d.marked());
        // a disk is collapsible, and coreduction is perfect on it: one critical vertex, four pairs
        assertEquals(1, d.criticalCount());
        assertEquals(4, d.matchedCount());
    }

    @Test
    void otherPosetsAreDrawnWithNothingMarked() {
        HasseDrawing d = draw("loop.poset", LOOP, ComplexChoice.AUTO, "coreduction");
        assertEquals(2, d.nodeCount());
        assertEquals(1, d.coverCount());
        assertFalse(d.marked());
        assertEquals(0, d.matchedCount());
        assertEquals("loop.poset: Hasse diagram of a poset that is not a CW poset; nothing marked", d.caption());
        assertTrue(d.note().startsWith("Not a CW poset: 'e' has height 1 but covers only 'v'"), d.note());
    }

    @Test
    void theOrderComplexCanBeDrawnInstead() {
        // Δ of the loop poset is one segment: vertices v, e and the edge v<e; collapsible, so one pair
        HasseDrawing d = draw("loop.poset", LOOP, ComplexChoice.ORDER, "coreduction");
        assertEquals(3, d.nodeCount());
        assertEquals(2, d.coverCount());
        assertEquals(1, d.matchedCount());
        assertEquals(1, d.criticalCount());
    }

    @Test
    void withoutAMatchingEveryCellIsCritical() {
        HasseDrawing d = draw("square.poset", SQUARE, ComplexChoice.AUTO, "none");
        assertEquals(9, d.criticalCount());
        assertEquals(0, d.matchedCount());
    }

    @Test
    void aPosetTooLargeToDrawIsRefusedWithTheLimit() {
        StringBuilder text = new StringBuilder("morse-poset 1\n");
        for (int i = 0; i <= HasseDrawing.MAX_NODES; i++) {
            text.append("x").append(i).append('\n');
        }
        InputException e = assertThrows(InputException.class,
                () -> draw("wide.poset", text.toString(), ComplexChoice.AUTO, "coreduction"));
        assertEquals("wide.poset: too large to draw: a picture takes at most 500 nodes, and this has 501 elements",
                e.getMessage());
    }

    @Test
    void anOrderComplexTooLargeToDrawIsRefused() {
        // a chain of 9 elements has 2^9 - 1 = 511 nonempty chains, more than 500
        StringBuilder text = new StringBuilder("morse-poset 1\nx0\n");
        for (int i = 1; i < 9; i++) {
            text.append("x").append(i).append(": x").append(i - 1).append('\n');
        }
        InputException e = assertThrows(InputException.class,
                () -> draw("chain.poset", text.toString(), ComplexChoice.ORDER, "coreduction"));
        assertEquals("chain.poset: too large to draw: a picture takes at most 500 nodes, and this has more chains than that",
                e.getMessage());
    }
}
