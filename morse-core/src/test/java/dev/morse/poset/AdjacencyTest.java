package dev.morse.poset;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;

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
}
