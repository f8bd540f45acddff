package dev.morse.image;

import java.util.Objects;

/**
 * The foreground of an image or volume as read, with how it was found.
 *
 * @param voxels the foreground pixels (two axes) or voxels (three axes)
 * @param slices the number of files read: 1 for an image or a raw volume, the slice count of a stack
 * @param threshold the threshold applied (to the first file, when files had different defaults)
 * @param inverted whether the foreground is the samples below the threshold
 */
public record LoadedImage(VoxelSet voxels, int slices, int threshold, boolean inverted) {
    /** Validates. */
    public LoadedImage {
        Objects.requireNonNull(voxels, "voxels");
        if (slices < 1) {
            throw new IllegalArgumentException("at least one file is read");
        }
    }

    /** Whether this is a volume (three axes) rather than a 2D image. */
    public boolean isVolume() {
        return voxels.axes() == 3;
    }
}
