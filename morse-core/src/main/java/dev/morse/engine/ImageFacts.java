package dev.morse.engine;

import java.util.List;

/**
 * The image or volume behind a cubical complex, and its shape in the words of imaging: β_0
 * components, β_1 tunnels (the holes of a 2D image) and β_2 cavities, from the unreduced homology.
 *
 * @param size pixels per axis (two axes) or voxels per axis (three)
 * @param slices files read: 1 for an image or raw volume, else the slices of the stack
 * @param foreground foreground pixels or voxels
 * @param threshold samples at or above it were the foreground (below it, when inverted)
 * @param inverted whether the foreground was the samples below the threshold
 * @param components β_0
 * @param tunnels β_1
 * @param cavities β_2 (0 for a 2D image)
 */
public record ImageFacts(List<Integer> size, int slices, long foreground, int threshold, boolean inverted,
        int components, int tunnels, int cavities) {
    /** Validates and copies. */
    public ImageFacts {
        size = List.copyOf(size);
        if (size.size() < 1 || size.size() > 3 || slices < 1 || foreground < 0 || components < 0 || tunnels < 0
                || cavities < 0) {
            throw new IllegalArgumentException("bad image facts");
        }
    }

    /** Whether the input was a volume (three axes). */
    public boolean isVolume() {
        return size.size() == 3;
    }
}
