package dev.morse.input;

import dev.morse.image.ImageOptions;
import dev.morse.io.InputFormat;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

/**
 * What the registry learnt about the files before choosing a reader: how many, whether the one file
 * is a directory, whether raw sizes were given, and the text header when the file is text.
 *
 * @param files the files as given
 * @param directory whether the single file is a directory
 * @param image whether the single file starts like an image
 * @param header the format named by the text header, for a single text file
 * @param options how images are to be read
 */
public record InputProbe(List<Path> files, boolean directory, boolean image, Optional<InputFormat> header,
        ImageOptions options) {
    /** Copies. */
    public InputProbe {
        files = List.copyOf(files);
    }
}
