package dev.morse.cw;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class KnownSpheresTest {
    // the boundary of a triangle: vertices 0, 1, 2, edges 3 = {0, 1}, 4 = {1, 2}, 5 = {0, 2}: S^1
    private static final int[] TRIANGLE_STARTS = {0, 0, 0, 0, 2, 4, 6};
    private static final int[] TRIANGLE_FACES = {0, 1, 1, 2, 0, 2};
    // the same three vertices with two parallel edges 0-1 and an edge 0-2 hanging off: not S^1
    private static final int[] OTHER_FACES = {0, 1, 0, 1, 0, 2};

    @Test
    void listsProvenBeforeAreKnown() {
        KnownSpheres known = new KnownSpheres();
        long hash = KnownSpheres.hash(6, 1, TRIANGLE_STARTS, TRIANGLE_FACES);
        assertFalse(known.contains(hash, 6, 1, TRIANGLE_STARTS, TRIANGLE_FACES));
        known.add(hash, 6, 1, TRIANGLE_STARTS, TRIANGLE_FACES);
        assertTrue(known.contains(hash, 6, 1, TRIANGLE_STARTS, TRIANGLE_FACES));
    }

    @Test
    void aHashAloneProvesNothing() {
        // other lists presented under the triangle's hash, as a collision would: compared in full, refused
        KnownSpheres known = new KnownSpheres();
        long hash = KnownSpheres.hash(6, 1, TRIANGLE_STARTS, TRIANGLE_FACES);
        known.add(hash, 6, 1, TRIANGLE_STARTS, TRIANGLE_FACES);
        assertFalse(known.contains(hash, 6, 1, TRIANGLE_STARTS, OTHER_FACES));
        assertFalse(known.contains(hash, 6, 2, TRIANGLE_STARTS, TRIANGLE_FACES));
    }
}
