package dev.morse.input;

import dev.morse.image.LoadedImage;

/**
 * An image or volume as read: the foreground pixels or voxels; it stands for their cubical complex.
 *
 * @param source the name the input was given by (the files of a stack joined by spaces)
 * @param image the foreground and how it was found
 * @param readMillis milliseconds spent reading
 */
public record VoxelInput(String source, LoadedImage image, double readMillis) implements Input {
}
