package dev.morse.input;

import dev.morse.image.LoadedImage;
import dev.morse.io.InputFormat;
import java.util.Objects;

/**
 * An image or volume as read: the foreground pixels or voxels; it stands for their cubical complex.
 *
 * @param source the name the input was given by (the files of a stack joined by spaces)
 * @param image the foreground and how it was found
 * @param readMillis milliseconds spent reading
 */
public record VoxelInput(String source, LoadedImage image, double readMillis) implements Input {
    /** Validates. */
    public VoxelInput {
        Objects.requireNonNull(source, "source");
        Objects.requireNonNull(image, "image");
    }

    @Override
    public InputFormat format() {
        return image.isVolume() ? InputFormat.VOLUME : InputFormat.IMAGE;
    }
}
