package dev.morse.layout;

import java.util.Arrays;

/**
 * Crossing reduction by the weighted median heuristic with transposition, as in Gansner,
 * Koutsofios, North and Vo, A technique for drawing directed graphs, IEEE Trans. Software Eng.
 * 19(3), 1993, §3: iterations alternate a downward and an upward layer-by-layer sweep; each sweep
 * sorts a layer by the median position of each node's neighbours on the layer before it (Eades and
 * Wormald, Edge crossings in drawings of bipartite graphs, Algorithmica 11, 1994: the median
 * heuristic is within a factor 3 of the optimum for two layers), weighted toward the side where
 * those neighbours lie closer together when their number is even; a node without neighbours there
 * keeps its place. After each sweep, adjacent nodes of a layer are exchanged while that lowers the
 * crossings (ties are exchanged on every other iteration, to leave plateaus). The iterations run twice,
 * from the order of {@link BarycentreSweeps} (Sugiyama, Tagawa and Toda 1981) and from the order of
 * the ids, and the best order found, by the exact count of {@link CrossingCount}, is kept: the result
 * never has more crossings than the barycentre sweeps alone.
 */
public final class MedianSweeps implements LayerOrdering {
    /** The iterations of Gansner et al., who found little gain beyond 24. */
    public static final int ITERATIONS = 24;
    private static final int START_SWEEPS = 6;

    @Override
    public int[][] order(LayeredGraph graph) {
        int[][] start = new BarycentreSweeps(START_SWEEPS).order(graph);
        int[][] best = improved(graph, start);
        int[][] other = improved(graph, graph.layersById());
        return CrossingCount.of(graph, other) < CrossingCount.of(graph, best) ? other : best;
    }

    private static int[][] improved(LayeredGraph graph, int[][] start) {
        int[][] rows = copy(start);
        int[][] best = copy(rows);
        long bestCrossings = CrossingCount.of(graph, best);
        int[] position = CrossingCount.positions(graph, rows);
        for (int iteration = 0; iteration < ITERATIONS && bestCrossings > 0; iteration++) {
            medianSweep(graph, rows, position, iteration % 2 == 0);
            transpose(graph, rows, position, iteration % 2 == 1);
            long crossings = CrossingCount.of(graph, rows);
            if (crossings < bestCrossings) {
                bestCrossings = crossings;
                best = copy(rows);
            }
        }
        return best;
    }

    private static void medianSweep(LayeredGraph graph, int[][] rows, int[] position, boolean upward) {
        int top = rows.length - 1;
        for (int k = 1; k <= top; k++) {
            int level = upward ? k : top - k;
            int[] row = rows[level];
            double[] median = new double[row.length];
            for (int i = 0; i < row.length; i++) {
                median[i] = medianValue(graph, row[i], upward, position);
            }
            rows[level] = sortKeepingFixed(row, median);
            for (int i = 0; i < row.length; i++) {
                position[rows[level][i]] = i;
            }
        }
    }

    /** The weighted median of the positions of {@code v}'s neighbours on one side; -1 without any. */
    static double medianValue(LayeredGraph graph, int v, boolean below, int[] position) {
        int degree = below ? graph.downDegree(v) : graph.upDegree(v);
        if (degree == 0) {
            return -1;
        }
        int[] p = new int[degree];
        for (int i = 0; i < degree; i++) {
            p[i] = position[below ? graph.down(v, i) : graph.up(v, i)];
        }
        Arrays.sort(p);
        int m = degree / 2;
        if (degree % 2 == 1) {
            return p[m];
        }
        if (degree == 2) {
            return (p[0] + p[1]) / 2.0;
        }
        double left = p[m - 1] - p[0];
        double right = p[degree - 1] - p[m];
        if (left + right == 0) {
            return (p[m - 1] + p[m]) / 2.0;
        }
        return (p[m - 1] * right + p[m] * left) / (left + right);
    }

    /** Sorts the nodes with a median (stably), leaving those with -1 where they are. */
    private static int[] sortKeepingFixed(int[] row, double[] median) {
        Integer[] movable = java.util.stream.IntStream.range(0, row.length).filter(i -> median[i] >= 0).boxed()
                .toArray(Integer[]::new);
        Arrays.sort(movable, (a, b) -> Double.compare(median[a], median[b]));
        int[] out = new int[row.length];
        int next = 0;
        for (int i = 0; i < row.length; i++) {
            out[i] = median[i] < 0 ? row[i] : row[movable[next++]];
        }
        return out;
    }

    /** Exchanges adjacent nodes while some exchange lowers the crossings. */
    private static void transpose(LayeredGraph graph, int[][] rows, int[] position, boolean exchangeTies) {
        boolean improved = true;
        while (improved) {
            improved = false;
            for (int[] row : rows) {
                for (int i = 0; i + 1 < row.length; i++) {
                    int v = row[i];
                    int w = row[i + 1];
                    long kept = pairCrossings(graph, v, w, position);
                    long exchanged = pairCrossings(graph, w, v, position);
                    if (exchanged < kept || (exchangeTies && exchanged == kept && kept > 0)) {
                        improved |= exchanged < kept;
                        row[i] = w;
                        row[i + 1] = v;
                        position[w] = i;
                        position[v] = i + 1;
                    }
                }
            }
        }
    }

    /** Crossings among the edges of {@code v} and {@code w} when {@code v} is just left of {@code w}. */
    static long pairCrossings(LayeredGraph graph, int v, int w, int[] position) {
        long count = 0;
        for (int i = 0; i < graph.upDegree(v); i++) {
            for (int j = 0; j < graph.upDegree(w); j++) {
                count += position[graph.up(v, i)] > position[graph.up(w, j)] ? 1 : 0;
            }
        }
        for (int i = 0; i < graph.downDegree(v); i++) {
            for (int j = 0; j < graph.downDegree(w); j++) {
                count += position[graph.down(v, i)] > position[graph.down(w, j)] ? 1 : 0;
            }
        }
        return count;
    }

    private static int[][] copy(int[][] rows) {
        return Arrays.stream(rows).map(int[]::clone).toArray(int[][]::new);
    }
}
