package dev.morse.layout;

import java.util.Arrays;

/**
 * The number of edge crossings of a layered drawing, counted by the order of the nodes in each
 * layer: two edges between the same two layers cross exactly when their ends come in opposite
 * orders. Between two layers the count is that of inversions in the upper ends' positions, taken in
 * the order of the lower ends, found with an accumulator tree in O(E log V) (Barth, Jünger and
 * Mutzel, Simple and efficient bilayer cross counting, JGAA 8(2), 2004).
 */
public final class CrossingCount {
    private CrossingCount() {
    }

    /** Crossings of {@code graph} drawn with the layers in the order {@code rows}. */
    public static long of(LayeredGraph graph, int[][] rows) {
        int[] position = positions(graph, rows);
        long total = 0;
        for (int l = 0; l + 1 < rows.length; l++) {
            total += between(graph, rows[l], rows[l + 1].length, position);
        }
        return total;
    }

    /** Each node's place within its layer. */
    static int[] positions(LayeredGraph graph, int[][] rows) {
        int[] position = new int[graph.nodeCount()];
        for (int[] row : rows) {
            for (int k = 0; k < row.length; k++) {
                position[row[k]] = k;
            }
        }
        return position;
    }

    /** Crossings between a layer and the one above it, which has {@code upperSize} nodes. */
    static long between(LayeredGraph graph, int[] lowerRow, int upperSize, int[] position) {
        int edges = 0;
        for (int v : lowerRow) {
            edges += graph.upDegree(v);
        }
        int[] ends = new int[edges];
        int e = 0;
        for (int v : lowerRow) {
            int first = e;
            for (int i = 0; i < graph.upDegree(v); i++) {
                ends[e++] = position[graph.up(v, i)];
            }
            // edges of one lower node never cross each other: take them by their upper ends
            Arrays.sort(ends, first, e);
        }
        int leaves = 1;
        while (leaves < Math.max(1, upperSize)) {
            leaves <<= 1;
        }
        long[] tree = new long[2 * leaves - 1];
        long crossings = 0;
        for (int end : ends) {
            int index = end + leaves - 1;
            tree[index]++;
            while (index > 0) {
                if (index % 2 == 1) {
                    crossings += tree[index + 1];
                }
                index = (index - 1) / 2;
                tree[index]++;
            }
        }
        return crossings;
    }
}
