package dev.morse.poset;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class PosetBuilderTest {

    @Test
    void listedRelationsAreReducedToCovers() {
        // the chain a < b < c listed with the redundant relation a < c
        PosetBuilder b = new PosetBuilder();
        int a = b.element("a");
        int bb = b.element("b");
        int c = b.element("c");
        b.relate(a, bb, 1);
        b.relate(bb, c, 2);
        b.relate(a, c, 3);
        Poset p = assertDoesNotThrowBuild(b);
        assertEquals(2, p.coverCount());
        assertArrayEquals(new int[] {bb}, p.lowerCovers().neighbours(c));
        assertArrayEquals(new int[] {a}, p.lowerCovers().neighbours(bb));
        assertTrue(p.isBelow(a, c));
        assertFalse(p.isBelow(c, a));
        assertEquals(2, p.height(c));
        assertTrue(p.isGraded());
    }

    @Test
    void ungradedPosetIsRecognised() {
        // a < b < c and a < c' with c' also above nothing else, plus d above c and c': heights differ on a cover
        PosetBuilder b = new PosetBuilder();
        int a = b.element("a");
        int x = b.element("x");
        int y = b.element("y");
        int top = b.element("top");
        b.relate(a, x, 1);
        b.relate(x, top, 2);
        b.relate(y, top, 3);
        Poset p = assertDoesNotThrowBuild(b);
        assertEquals(3, p.coverCount());
        assertFalse(p.isGraded());
    }

    @Test
    void cycleIsReportedWithItsElements() {
        PosetBuilder b = new PosetBuilder();
        int n = 5000;
        for (int i = 0; i < n; i++) {
            b.element("e" + i);
        }
        for (int i = 0; i < n; i++) {
            b.relate(i, (i + 1) % n, i + 2);
        }
        OrderCycleException e = assertThrows(OrderCycleException.class, b::build);
        assertEquals(n, e.cycle().length);
        int[] cycle = e.cycle();
        for (int i = 0; i < n; i++) {
            assertEquals((cycle[i] + 1) % n, cycle[(i + 1) % n], "consecutive elements are related");
        }
    }

    @Test
    void linearExtensionRespectsTheOrder() {
        PosetBuilder b = new PosetBuilder();
        int top = b.element("top");
        int mid = b.element("mid");
        int bottom = b.element("bottom");
        b.relate(mid, top, 1);
        b.relate(bottom, mid, 2);
        Poset p = assertDoesNotThrowBuild(b);
        int[] pos = p.linearExtensionPositions();
        assertTrue(pos[bottom] < pos[mid] && pos[mid] < pos[top]);
    }

    private static Poset assertDoesNotThrowBuild(PosetBuilder b) {
        try {
            return b.build();
        } catch (OrderCycleException e) {
            throw new AssertionError("no cycle expected", e);
        }
    }
}
