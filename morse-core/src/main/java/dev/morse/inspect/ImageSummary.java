package dev.morse.inspect;

import java.util.List;

/**
 * What {@link ImageInspector} found about an image or volume and the cubical complex of its
 * foreground. Immutable.
 *
 * @param size pixels (two axes) or voxels (three) per axis
 * @param slices files read: 1 for an image or raw volume, else the slices of the stack
 * @param foreground foreground pixels or voxels
 * @param threshold samples at or above it are the foreground (below it, when inverted)
 * @param inverted whether the foreground is the samples below the threshold
 * @param cells elementary cubes of the cubical complex per dimension
 */
public record ImageSummary(List<Integer> size, int slices, long foreground, int threshold, boolean inverted,
        List<Long> cells) {
    /** Copies. */
    public ImageSummary {
        size = List.copyOf(size);
        cells = List.copyOf(cells);
    }

    /** Whether this is a volume (three axes). */
    public boolean isVolume() {
        return size.size() == 3;
    }

    /** The Euler characteristic c0 − c1 + c2 − ... of the cubical complex. */
    public long eulerCharacteristic() {
        long chi = 0;
        for (int d = 0; d < cells.size(); d++) {
            chi = d % 2 == 0 ? Math.addExact(chi, cells.get(d)) : Math.subtractExact(chi, cells.get(d));
        }
        return chi;
    }
}
