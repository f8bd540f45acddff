package dev.morse.poset;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class AdjacencyTest {

    @Test
    void edgeListIsOrderedBySourceThenTarget() {
        // edges 2->0, 0->3, 2->1, 0->1 given out of order on 4 vertices; vertex 1 and 3 have none.
        // Sorted by source, then target, by hand: 0->1, 0->3, 2->0, 2->1.
        Adjacency graph = Adjacency.fromEdges(4, new int[] {2, 0, 2, 0}, new int[] {0, 3, 1, 1}, 4);
        assertArrayEquals(new int[] {0, 0, 2, 2}, graph.edgeSources());
        assertArrayEquals(new int[] {1, 3, 0, 1}, graph.edgeTargets());
    }

    @Test
    void edgeListsAreCopies() {
        Adjacency graph = Adjacency.fromEdges(2, new int[] {0}, new int[] {1}, 1);
        graph.edgeSources()[0] = 7;
        graph.edgeTargets()[0] = 7;
        assertArrayEquals(new int[] {0}, graph.edgeSources());
        assertArrayEquals(new int[] {1}, graph.edgeTargets());
    }

    @Test
    void indexOfFindsTheEdgeOrMinusOne() {
        // rows by hand: 0 -> {1, 3} at indices 0, 1; 2 -> {0, 1} at indices 2, 3
        Adjacency graph = Adjacency.fromEdges(4, new int[] {2, 0, 2, 0}, new int[] {0, 3, 1, 1}, 4);
        assertEquals(1, graph.indexOf(0, 3));
        assertEquals(2, graph.indexOf(2, 0));
        assertEquals(-1, graph.indexOf(0, 2));
        assertEquals(-1, graph.indexOf(1, 0));
    }

    @Test
    void upSetsAreTheTransposeOfTheDownSets() {
        // a < b < c and a < d, ids 0 to 3, worked by hand: above a are b, c, d; above b is c;
        // nothing above c or d
        PosetBuilder builder = new PosetBuilder();
        for (String label : new String[] {"a", "b", "c", "d"}) {
            builder.element(label);
        }
        for (int[] cover : new int[][] {{0, 1}, {1, 2}, {0, 3}}) {
            builder.relate(cover[0], cover[1], 0);
        }
        Adjacency up = StrictDownSets.of(builder.buildKnownAcyclic(), StrictDownSets.MAX_PAIRS).upSets();
        assertArrayEquals(new int[] {1, 2, 3}, up.neighbours(0));
        assertArrayEquals(new int[] {2}, up.neighbours(1));
        assertArrayEquals(new int[0], up.neighbours(2));
        assertArrayEquals(new int[0], up.neighbours(3));
    }
}
