package dev.morse.image;

import java.util.Objects;
import java.util.Optional;
import java.util.OptionalInt;

/**
 * How to turn an image or volume into a set of voxels.
 *
 * @param threshold samples at or above it are the foreground; empty for each format's default
 *     (half the sample range for images, 1 for raw volumes)
 * @param invert whether the foreground is the samples below the threshold instead
 * @param rawSize the extents of a raw byte volume; present exactly when the input is one
 */
public record ImageOptions(OptionalInt threshold, boolean invert, Optional<VolumeSize> rawSize) {
    /** Validates. */
    public ImageOptions {
        Objects.requireNonNull(threshold, "threshold");
        Objects.requireNonNull(rawSize, "rawSize");
        if (threshold.isPresent() && threshold.getAsInt() < 0) {
            throw new IllegalArgumentException("the threshold must not be negative");
        }
    }

    /** Each format's default threshold, not inverted, no raw volume. */
    public static ImageOptions defaults() {
        return new ImageOptions(OptionalInt.empty(), false, Optional.empty());
    }
}
