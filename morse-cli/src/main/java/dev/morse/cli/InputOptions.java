package dev.morse.cli;

import dev.morse.image.ImageOptions;
import dev.morse.image.VolumeSize;
import dev.morse.input.Input;
import dev.morse.input.InputReaders;
import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Parameters;

/** The input of a command: the files, and how images among them are read. */
final class InputOptions {
    @Parameters(arity = "1..*", paramLabel = "FILE",
            description = "A morse-poset 1 or morse-simplicial 1 file, an image, a directory of slices, several"
                    + " slice images in order, or a raw volume (with --dims).")
    private List<Path> files;

    @Option(names = "--threshold", paramLabel = "T",
            description = "Image samples at or above T are the foreground (default: half the sample range, so the"
                    + " black pixels of a bitmap and samples 128..255 of an 8-bit image; 1 for raw volumes).")
    private Integer threshold;

    @Option(names = "--invert", description = "Take the image samples below the threshold as the foreground.")
    private boolean invert;

    @Option(names = "--dims", paramLabel = "X,Y[,Z]", converter = OptionConverters.VolumeSizeConverter.class,
            description = "Read FILE as a raw volume of unsigned bytes with these sizes, x varying fastest.")
    private VolumeSize dims;

    /**
     * Reads the input through morse-core's one registry of formats.
     *
     * @throws ParameterException for a negative threshold
     * @throws dev.morse.io.InputException for bad input
     */
    Input read(CommandSpec spec) throws IOException {
        if (threshold != null && threshold < 0) {
            throw new ParameterException(spec.commandLine(), "the threshold must not be negative, not " + threshold);
        }
        ImageOptions image = new ImageOptions(threshold == null ? OptionalInt.empty() : OptionalInt.of(threshold),
                invert, Optional.ofNullable(dims));
        return InputReaders.read(files, image);
    }

    /** Warnings for image options given with an input that is no image; see {@link Warnings}. */
    java.util.List<String> warnings(Input input) {
        return Warnings.imageOptions(input, threshold != null, invert);
    }
}
