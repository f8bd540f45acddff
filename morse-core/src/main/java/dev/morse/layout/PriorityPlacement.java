package dev.morse.layout;

import java.util.Arrays;

/**
 * Horizontal coordinates for ordered layers by the priority layout method of Sugiyama, Tagawa and
 * Toda (1981, §3.3): each layer starts packed at its least separation and centred; then, in sweeps
 * down and up, each node in turn moves toward the mean position of its neighbours on the layer just
 * placed, nodes of higher priority first (dummy nodes highest, so long edges run straight; then by
 * number of neighbours there). A node moving pushes the nodes of lower priority beside it along but
 * never a node of higher priority already placed, and never changes the order. The result is
 * shifted so that the leftmost node is at 0.
 */
public final class PriorityPlacement {
    private static final int SWEEPS = 4;

    private PriorityPlacement() {
    }

    /**
     * The x coordinate of every node of {@code graph} ordered as {@code rows}, where nodes of layer
     * {@code l} are at least {@code separation[l]} apart.
     */
    public static double[] place(LayeredGraph graph, int[][] rows, double[] separation) {
        double[] x = new double[graph.nodeCount()];
        double widest = 0;
        for (int l = 0; l < rows.length; l++) {
            widest = Math.max(widest, (rows[l].length - 1) * separation[l]);
        }
        for (int l = 0; l < rows.length; l++) {
            double start = (widest - (rows[l].length - 1) * separation[l]) / 2;
            for (int k = 0; k < rows[l].length; k++) {
                x[rows[l][k]] = start + k * separation[l];
            }
        }
        int top = rows.length - 1;
        for (int sweep = 0; sweep < SWEEPS; sweep++) {
            boolean upward = sweep % 2 == 0;
            for (int k = 1; k <= top; k++) {
                int level = upward ? k : top - k;
                placeLayer(graph, rows[level], separation[level], upward, x);
            }
        }
        double min = Double.POSITIVE_INFINITY;
        for (double v : x) {
            min = Math.min(min, v);
        }
        for (int v = 0; v < x.length; v++) {
            x[v] -= x.length == 0 ? 0 : min;
        }
        return x;
    }

    private static void placeLayer(LayeredGraph graph, int[] row, double separation, boolean byLower, double[] x) {
        int n = row.length;
        double[] target = new double[n];
        int[] priority = new int[n];
        Integer[] byPriority = new Integer[n];
        for (int i = 0; i < n; i++) {
            int v = row[i];
            int degree = byLower ? graph.downDegree(v) : graph.upDegree(v);
            double sum = 0;
            for (int j = 0; j < degree; j++) {
                sum += x[byLower ? graph.down(v, j) : graph.up(v, j)];
            }
            target[i] = degree == 0 ? x[v] : sum / degree;
            priority[i] = graph.isDummy(v) ? Integer.MAX_VALUE : degree;
            byPriority[i] = i;
        }
        // the highest priority first; among equals the middle of the layer first, as in the method
        Arrays.sort(byPriority, (a, b) -> priority[a] != priority[b] ? Integer.compare(priority[b], priority[a])
                : Integer.compare(Math.abs(2 * a - (n - 1)), Math.abs(2 * b - (n - 1))));
        boolean[] placed = new boolean[n];
        for (int i : byPriority) {
            double want = target[i];
            if (want > x[row[i]]) {
                for (int j = i + 1; j < n; j++) {
                    if (placed[j]) {
                        want = Math.min(want, x[row[j]] - (j - i) * separation);
                        break;
                    }
                }
                want = Math.max(want, x[row[i]]);
                x[row[i]] = want;
                for (int j = i + 1; j < n && x[row[j]] < x[row[j - 1]] + separation; j++) {
                    x[row[j]] = x[row[j - 1]] + separation;
                }
            } else if (want < x[row[i]]) {
                for (int j = i - 1; j >= 0; j--) {
                    if (placed[j]) {
                        want = Math.max(want, x[row[j]] + (i - j) * separation);
                        break;
                    }
                }
                want = Math.min(want, x[row[i]]);
                x[row[i]] = want;
                for (int j = i - 1; j >= 0 && x[row[j]] > x[row[j + 1]] - separation; j--) {
                    x[row[j]] = x[row[j + 1]] - separation;
                }
            }
            placed[i] = true;
        }
    }
}
