package dev.morse.graph;

import dev.morse.poset.Adjacency;
import java.util.Arrays;

/**
 * A finite simple undirected graph: vertices are ints {@code 0..n-1} with labels, and each vertex's
 * neighbours as an {@link Adjacency} holding each edge both ways, ascending. Memory: 4 bytes per
 * vertex plus 8 per edge. Immutable.
 */
public final class Graph {
    private final String[] labels;
    private final Adjacency neighbours;

    private Graph(String[] labels, Adjacency neighbours) {
        this.labels = labels;
        this.neighbours = neighbours;
    }

    /**
     * The graph on {@code labels.length} vertices with edges {@code us[i] vs[i]}, {@code i < count};
     * an edge listed twice (either way round) counts once.
     *
     * @throws IllegalArgumentException for a loop or an unknown vertex
     */
    public static Graph of(String[] labels, int[] us, int[] vs, int count) {
        int n = labels.length;
        long[] keys = new long[count];
        for (int i = 0; i < count; i++) {
            int u = us[i];
            int v = vs[i];
            if (u < 0 || v < 0 || u >= n || v >= n) {
                throw new IllegalArgumentException("unknown vertex");
            }
            if (u == v) {
                throw new IllegalArgumentException("a loop at " + labels[u]);
            }
            keys[i] = ((long) Math.min(u, v) << 32) | Math.max(u, v);
        }
        Arrays.sort(keys);
        int distinct = 0;
        for (int i = 0; i < count; i++) {
            if (i == 0 || keys[i] != keys[i - 1]) {
                keys[distinct++] = keys[i];
            }
        }
        int[] from = new int[2 * distinct];
        int[] to = new int[2 * distinct];
        for (int i = 0; i < distinct; i++) {
            int u = (int) (keys[i] >>> 32);
            int v = (int) keys[i];
            from[2 * i] = u;
            to[2 * i] = v;
            from[2 * i + 1] = v;
            to[2 * i + 1] = u;
        }
        return new Graph(labels.clone(), Adjacency.fromEdges(n, from, to, 2 * distinct));
    }

    /** Number of vertices. */
    public int vertexCount() {
        return labels.length;
    }

    /** Number of edges. */
    public int edgeCount() {
        return neighbours.edgeCount() / 2;
    }

    /** The label of vertex {@code v}. */
    public String label(int v) {
        return labels[v];
    }

    /** The number of neighbours of {@code v}. */
    public int degree(int v) {
        return neighbours.degree(v);
    }

    /** The {@code i}-th neighbour of {@code v}, ascending in {@code i}. */
    public int neighbour(int v, int i) {
        return neighbours.target(neighbours.start(v) + i);
    }

    /** Whether {@code u} and {@code v} are joined by an edge (binary search). */
    public boolean adjacent(int u, int v) {
        return neighbours.contains(u, v);
    }
}
