package dev.morse.layout;

import java.util.Arrays;

/**
 * A graph drawn in layers, made <em>proper</em> as layered drawing requires (Sugiyama, Tagawa and
 * Toda 1981): every edge joins two adjacent layers, an edge that spans more layers being split by
 * one dummy node on each layer it passes. Nodes {@code 0..realNodes-1} are the given ones, the rest
 * dummies. Immutable.
 *
 * <p>Memory: per node a layer and its neighbours above and below in CSR arrays, about 20 bytes
 * plus 8 per edge segment.
 */
public final class LayeredGraph {
    private final int realNodes;
    private final int[] layerOf;
    private final int layers;
    private final int[] upStart;
    private final int[] upTarget;
    private final int[] downStart;
    private final int[] downTarget;
    private final int[][] routes;

    private LayeredGraph(int realNodes, int[] layerOf, int layers, int[] segLower, int[] segUpper, int segments,
            int[][] routes) {
        this.realNodes = realNodes;
        this.layerOf = layerOf;
        this.layers = layers;
        int nodes = layerOf.length;
        upStart = new int[nodes + 1];
        downStart = new int[nodes + 1];
        for (int s = 0; s < segments; s++) {
            upStart[segLower[s] + 1]++;
            downStart[segUpper[s] + 1]++;
        }
        for (int v = 0; v < nodes; v++) {
            upStart[v + 1] += upStart[v];
            downStart[v + 1] += downStart[v];
        }
        upTarget = new int[segments];
        downTarget = new int[segments];
        int[] upFill = Arrays.copyOf(upStart, nodes);
        int[] downFill = Arrays.copyOf(downStart, nodes);
        for (int s = 0; s < segments; s++) {
            upTarget[upFill[segLower[s]]++] = segUpper[s];
            downTarget[downFill[segUpper[s]]++] = segLower[s];
        }
        this.routes = routes;
    }

    /**
     * The proper layered graph of nodes on {@code levels} (0 at the bottom) with edges from
     * {@code lower[e]} up to {@code upper[e]}.
     *
     * @throws IllegalArgumentException when an edge does not go strictly upward or a level is negative
     */
    public static LayeredGraph of(int[] levels, int[] lower, int[] upper) {
        if (lower.length != upper.length) {
            throw new IllegalArgumentException("every edge has a lower and an upper end");
        }
        int n = levels.length;
        int layers = 0;
        for (int level : levels) {
            if (level < 0) {
                throw new IllegalArgumentException("levels start at 0");
            }
            layers = Math.max(layers, level + 1);
        }
        int dummies = 0;
        for (int e = 0; e < lower.length; e++) {
            int span = levels[upper[e]] - levels[lower[e]];
            if (span < 1) {
                throw new IllegalArgumentException("edge " + e + " does not go upward");
            }
            dummies += span - 1;
        }
        int[] layerOf = Arrays.copyOf(levels, n + dummies);
        int segments = lower.length + dummies;
        int[] segLower = new int[segments];
        int[] segUpper = new int[segments];
        int[][] routes = new int[lower.length][];
        int next = n;
        int s = 0;
        for (int e = 0; e < lower.length; e++) {
            int from = levels[lower[e]];
            int to = levels[upper[e]];
            int[] route = new int[to - from + 1];
            route[0] = lower[e];
            route[route.length - 1] = upper[e];
            for (int k = 1; k < route.length - 1; k++) {
                layerOf[next] = from + k;
                route[k] = next++;
            }
            for (int k = 0; k + 1 < route.length; k++) {
                segLower[s] = route[k];
                segUpper[s] = route[k + 1];
                s++;
            }
            routes[e] = route;
        }
        return new LayeredGraph(n, layerOf, layers, segLower, segUpper, segments, routes);
    }

    /** Number of nodes, dummies included. */
    public int nodeCount() {
        return layerOf.length;
    }

    /** Number of given nodes; they come first. */
    public int realNodeCount() {
        return realNodes;
    }

    /** Whether {@code v} is a dummy node on a long edge. */
    public boolean isDummy(int v) {
        return v >= realNodes;
    }

    /** Number of layers. */
    public int layerCount() {
        return layers;
    }

    /** The layer of node {@code v}. */
    public int layer(int v) {
        return layerOf[v];
    }

    /** The neighbours of {@code v} on the layer above. */
    public int[] above(int v) {
        return Arrays.copyOfRange(upTarget, upStart[v], upStart[v + 1]);
    }

    /** The neighbours of {@code v} on the layer below. */
    public int[] below(int v) {
        return Arrays.copyOfRange(downTarget, downStart[v], downStart[v + 1]);
    }

    /** Number of neighbours of {@code v} on the layer above. */
    int upDegree(int v) {
        return upStart[v + 1] - upStart[v];
    }

    /** The {@code i}-th neighbour of {@code v} on the layer above. */
    int up(int v, int i) {
        return upTarget[upStart[v] + i];
    }

    /** Number of neighbours of {@code v} on the layer below. */
    int downDegree(int v) {
        return downStart[v + 1] - downStart[v];
    }

    /** The {@code i}-th neighbour of {@code v} on the layer below. */
    int down(int v, int i) {
        return downTarget[downStart[v] + i];
    }

    /** The nodes edge {@code e} passes from its lower end to its upper end, dummies between. */
    public int[] route(int e) {
        return routes[e].clone();
    }

    /** The nodes of each layer in the order of their ids: the order a drawing starts from. */
    public int[][] layersById() {
        int[] size = new int[layers];
        for (int l : layerOf) {
            size[l]++;
        }
        int[][] rows = new int[layers][];
        for (int l = 0; l < layers; l++) {
            rows[l] = new int[size[l]];
            size[l] = 0;
        }
        for (int v = 0; v < layerOf.length; v++) {
            rows[layerOf[v]][size[layerOf[v]]++] = v;
        }
        return rows;
    }
}
