package dev.morse.layout;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

class LayeredLayoutTest {
    /** Crossings by the definition: pairs of segments between the same two layers whose ends come in opposite orders. */
    private static long bruteForce(LayeredGraph g, int[][] rows) {
        int[] pos = new int[g.nodeCount()];
        for (int[] row : rows) {
            for (int k = 0; k < row.length; k++) {
                pos[row[k]] = k;
            }
        }
        long count = 0;
        for (int a = 0; a < g.nodeCount(); a++) {
            for (int b = 0; b < g.nodeCount(); b++) {
                if (g.layer(a) != g.layer(b) || pos[a] >= pos[b]) {
                    continue;
                }
                for (int u : g.above(a)) {
                    for (int w : g.above(b)) {
                        count += pos[u] > pos[w] ? 1 : 0;
                    }
                }
            }
        }
        return count;
    }

    @Test
    void completeBipartiteTwoByTwoKeepsItsOneUnavoidableCrossing() {
        // K_{2,2} on two layers: whatever the orders, exactly one pair of its four edges crosses (common practice)
        LayeredGraph g = LayeredGraph.of(new int[] {0, 0, 1, 1}, new int[] {0, 0, 1, 1}, new int[] {2, 3, 2, 3});
        int[][] rows = new MedianSweeps().order(g);
        assertEquals(1, CrossingCount.of(g, rows));
        assertEquals(1, bruteForce(g, rows));
    }

    @Test
    void twoEdgesDrawnCrossedByTheirIdsAreUncrossed() {
        // a below d and b below c: in the order of ids they cross once; swapping one layer removes it
        LayeredGraph g = LayeredGraph.of(new int[] {0, 0, 1, 1}, new int[] {0, 1}, new int[] {3, 2});
        assertEquals(1, CrossingCount.of(g, g.layersById()));
        assertEquals(0, CrossingCount.of(g, new MedianSweeps().order(g)));
    }

    @Test
    void anEdgeSkippingTwoLevelsGetsADummyOnEach() {
        LayeredGraph g = LayeredGraph.of(new int[] {0, 3, 1, 2}, new int[] {0, 0, 2}, new int[] {1, 2, 3});
        assertEquals(6, g.nodeCount());
        assertEquals(4, g.realNodeCount());
        int[] route = g.route(0);
        assertEquals(4, route.length);
        assertEquals(0, route[0]);
        assertEquals(1, route[3]);
        assertTrue(g.isDummy(route[1]) && g.isDummy(route[2]));
        assertEquals(1, g.layer(route[1]));
        assertEquals(2, g.layer(route[2]));
        assertArrayEquals(new int[] {0, 2}, g.route(1));
    }

    @Test
    void theAccumulatorTreeCountsAsTheDefinitionOnRandomLayeredGraphs() {
        SplittableRandom random = new SplittableRandom(14);
        for (int trial = 0; trial < 100; trial++) {
            int n = 2 + random.nextInt(20);
            int[] levels = new int[n];
            for (int v = 0; v < n; v++) {
                levels[v] = random.nextInt(4);
            }
            int[] lower = new int[3 * n];
            int[] upper = new int[3 * n];
            int edges = 0;
            for (int a = 0; a < n; a++) {
                for (int b = 0; b < n; b++) {
                    if (levels[a] < levels[b] && random.nextInt(4) == 0) {
                        lower[edges] = a;
                        upper[edges] = b;
                        if (++edges == lower.length) {
                            break;
                        }
                    }
                }
                if (edges == lower.length) {
                    break;
                }
            }
            LayeredGraph g = LayeredGraph.of(levels, Arrays.copyOf(lower, edges), Arrays.copyOf(upper, edges));
            for (LayerOrdering ordering : new LayerOrdering[] {new BarycentreSweeps(6), new MedianSweeps()}) {
                int[][] rows = ordering.order(g);
                assertEquals(bruteForce(g, rows), CrossingCount.of(g, rows), "trial " + trial);
                for (int l = 0; l < rows.length; l++) {
                    for (int v : rows[l]) {
                        assertEquals(l, g.layer(v));
                    }
                }
                assertEquals(g.nodeCount(), Arrays.stream(rows).mapToInt(r -> r.length).sum());
            }
            assertTrue(CrossingCount.of(g, new MedianSweeps().order(g))
                    <= CrossingCount.of(g, new BarycentreSweeps(6).order(g)), "trial " + trial);
        }
    }

    @Test
    void placementKeepsTheOrderAndTheSeparationOfEachLayer() {
        // K_{2,2} under a chain: a dummy-free graph of three layers
        LayeredGraph g = LayeredGraph.of(new int[] {0, 0, 1, 1, 2}, new int[] {0, 0, 1, 1, 2, 3},
                new int[] {2, 3, 2, 3, 4, 4});
        int[][] rows = new MedianSweeps().order(g);
        double[] separation = {30, 50, 10};
        double[] x = PriorityPlacement.place(g, rows, separation);
        for (int l = 0; l < rows.length; l++) {
            for (int k = 0; k + 1 < rows[l].length; k++) {
                assertTrue(x[rows[l][k + 1]] - x[rows[l][k]] >= separation[l] - 1e-9);
            }
        }
        assertEquals(0, Arrays.stream(x).min().orElseThrow(), 1e-9);
    }
}
