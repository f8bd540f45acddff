package dev.morse.input;

import dev.morse.graph.GraphComplex;
import dev.morse.image.ImageOptions;
import java.util.Objects;

/**
 * How inputs are read beyond their own content.
 *
 * @param image how images and volumes become voxels
 * @param graphAs which complex a graph file stands for
 */
public record ReadOptions(ImageOptions image, GraphComplex graphAs) {
    /** The complex a graph stands for unless told otherwise: its clique complex. */
    public static final GraphComplex DEFAULT_GRAPH_COMPLEX = GraphComplex.CLIQUE;

    /** Validates. */
    public ReadOptions {
        Objects.requireNonNull(image, "image");
        Objects.requireNonNull(graphAs, "graphAs");
    }

    /** Images at their defaults, graphs as their clique complexes. */
    public static ReadOptions defaults() {
        return new ReadOptions(ImageOptions.defaults(), DEFAULT_GRAPH_COMPLEX);
    }

    /** These options for images, graphs as their clique complexes. */
    public static ReadOptions of(ImageOptions image) {
        return new ReadOptions(image, DEFAULT_GRAPH_COMPLEX);
    }
}
