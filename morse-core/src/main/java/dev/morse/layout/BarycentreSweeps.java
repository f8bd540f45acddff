package dev.morse.layout;

import java.util.Arrays;

/**
 * A few sweeps of the barycentre heuristic (Sugiyama, Tagawa and Toda, Methods for visual
 * understanding of hierarchical system structures, IEEE Trans. SMC 11(2), 1981): up and down in
 * turn, each layer is sorted by the mean position of each node's neighbours on the layer just
 * swept, positions being centred on 0 so that layers of different widths line up; a node without
 * such neighbours keeps its position, and ties keep their order. This was the whole of the layout of
 * the first Hasse diagram pictures, and it is kept as the comparison and as the start of
 * {@link MedianSweeps}.
 */
public final class BarycentreSweeps implements LayerOrdering {
    private final int sweeps;

    /** Sweeps up, down, up, ... {@code sweeps} times in all. */
    public BarycentreSweeps(int sweeps) {
        if (sweeps < 0) {
            throw new IllegalArgumentException("a number of sweeps is not negative");
        }
        this.sweeps = sweeps;
    }

    @Override
    public int[][] order(LayeredGraph graph) {
        int[][] rows = graph.layersById();
        int top = rows.length - 1;
        double[] position = new double[graph.nodeCount()];
        centred(rows, position);
        for (int sweep = 0; sweep < sweeps; sweep++) {
            boolean upward = sweep % 2 == 0;
            for (int k = 1; k <= top; k++) {
                int level = upward ? k : top - k;
                rows[level] = sorted(graph, rows[level], upward, position);
                centred(rows, position);
            }
        }
        return rows;
    }

    private static int[] sorted(LayeredGraph graph, int[] row, boolean byLower, double[] position) {
        double[] key = new double[graph.nodeCount()];
        for (int v : row) {
            int degree = byLower ? graph.downDegree(v) : graph.upDegree(v);
            double sum = 0;
            for (int i = 0; i < degree; i++) {
                sum += position[byLower ? graph.down(v, i) : graph.up(v, i)];
            }
            key[v] = degree == 0 ? position[v] : sum / degree;
        }
        Integer[] boxed = Arrays.stream(row).boxed().toArray(Integer[]::new);
        Arrays.sort(boxed, (a, b) -> Double.compare(key[a], key[b]));
        return Arrays.stream(boxed).mapToInt(Integer::intValue).toArray();
    }

    private static void centred(int[][] rows, double[] position) {
        for (int[] row : rows) {
            for (int k = 0; k < row.length; k++) {
                position[row[k]] = k - (row.length - 1) / 2.0;
            }
        }
    }
}
