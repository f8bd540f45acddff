package dev.morse.input;

import dev.morse.io.InputFormat;

/**
 * One input as read, before any complex is built: a poset, a list of faces, the foreground of an
 * image or a chain complex given by its matrices. Graphs and meshes are read as the poset or faces
 * they stand for. Adding a kind of input is adding a record here and an {@link InputReader} that makes it.
 * The records hold what their reader made, never null.
 */
public sealed interface Input permits PosetInput, FacetInput, VoxelInput, ChainComplexInput {
    /** The name the input was given by (a file name as typed, or the files of a stack joined by spaces). */
    String source();

    /** The format it was read in. */
    default InputFormat format() {
        if (this instanceof VoxelInput voxels) {
            return voxels.image().isVolume() ? InputFormat.VOLUME : InputFormat.IMAGE;
        }
        if (this instanceof ChainComplexInput) {
            return InputFormat.MATRICES;
        }
        return this instanceof PosetInput ? InputFormat.POSET : InputFormat.SIMPLICIAL;
    }

    /** Milliseconds spent reading it. */
    double readMillis();
}
