package dev.morse.layout;

/** A way to order the nodes of each layer of a layered graph so that fewer edges cross. Stateless. */
public interface LayerOrdering {
    /**
     * The nodes of each layer of {@code graph}, left to right; every node, dummies included, exactly
     * once, on its own layer.
     */
    int[][] order(LayeredGraph graph);
}
