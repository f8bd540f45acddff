package dev.morse.cli;

import dev.morse.graph.GraphComplex;
import dev.morse.image.ImageOptions;
import dev.morse.image.VolumeSize;
import dev.morse.input.Input;
import dev.morse.input.InputReaders;
import dev.morse.input.ReadOptions;
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
                    + " slice images in order, a raw volume (with --dims), a graph (.dot, .graphml, .edges), a polygon"
                    + " mesh (.obj, .off), or Matrix Market boundary matrices (a directory of boundary-D.mtx, or the"
                    + " files).")
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

    @Option(names = "--graph-as", paramLabel = "COMPLEX", converter = OptionConverters.GraphComplexConverter.class,
            description = "What a graph file stands for: clique (its clique complex, the default), independence,"
                    + " matching, or connected-subgraphs (the poset of vertex sets inducing connected subgraphs).")
    private GraphComplex graphAs;

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
        return InputReaders.read(files, new ReadOptions(image, graphAs == null ? ReadOptions.DEFAULT_GRAPH_COMPLEX
                : graphAs));
    }

    private boolean isGraph() {
        if (files.size() != 1 || java.nio.file.Files.isDirectory(files.get(0))) {
            return false;
        }
        try {
            dev.morse.io.InputFormat format = dev.morse.io.InputFormat.sniff(files.get(0));
            return format == dev.morse.io.InputFormat.DOT || format == dev.morse.io.InputFormat.GRAPHML
                    || format == dev.morse.io.InputFormat.EDGES;
        } catch (IOException | RuntimeException e) {
            return false;
        }
    }

    /** Warnings for image options given with an input that is no image; see {@link Warnings}. */
    java.util.List<String> warnings(Input input) {
        java.util.List<String> found = new java.util.ArrayList<>(Warnings.imageOptions(input, threshold != null, invert));
        if (graphAs != null && !isGraph()) {
            found.add("--graph-as applies only to graph files (.dot, .graphml, .edges); " + input.source()
                    + " is not one");
        }
        return found;
    }
}
