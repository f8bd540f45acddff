package dev.morse.input;

import dev.morse.image.ImageInput;
import dev.morse.image.ImageOptions;
import dev.morse.io.InputException;
import dev.morse.io.InputFormat;
import dev.morse.io.MatrixMarketReader;
import java.io.IOException;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

/**
 * The one place where inputs are read: the registered {@link InputReader}s in the order they are
 * asked, and the translation of every problem with a file (missing, unreadable, a directory where a
 * file is needed, a device or pipe, an unknown header) into an {@link InputException} naming it.
 * Stateless.
 */
public final class InputReaders {
    private static final List<TextFileReader<?>> TEXT_READERS = List.of(TextFileReader.POSETS, TextFileReader.FACES);
    private static final List<InputReader> READERS = List.of(new MatrixFilesReader(), new GraphFileReader(),
            new MeshFileReader(), new ImageFileReader(), TextFileReader.POSETS, TextFileReader.FACES);

    private InputReaders() {
    }

    /** Reads one file, images at their default threshold. */
    public static Input read(Path file) throws IOException {
        return read(List.of(file), ReadOptions.defaults());
    }

    /** Reads the inputs with these image options, a graph as its clique complex. */
    public static Input read(List<Path> files, ImageOptions options) throws IOException {
        return read(files, ReadOptions.of(options));
    }

    /**
     * Reads the inputs: one poset, simplicial, image, graph or mesh file, the slices of one volume (a
     * directory, several image files in order, or one raw file when its sizes are given), or the
     * boundary matrices of a chain complex (a directory holding them, or the matrix files).
     *
     * @throws InputException for every problem with the files, naming the file
     * @throws IOException when reading fails for a reason that is not the files'
     */
    public static Input read(List<Path> files, ReadOptions options) throws IOException {
        if (files.isEmpty()) {
            throw new IllegalArgumentException("no input");
        }
        InputProbe probe = probe(files, options.image());
        for (InputReader reader : READERS) {
            if (reader.recognises(probe)) {
                try {
                    return reader.read(files, options);
                } catch (NoSuchFileException e) {
                    throw new InputException(pathOf(e, files), InputException.NO_LINE, "no such file");
                } catch (AccessDeniedException e) {
                    throw new InputException(pathOf(e, files), InputException.NO_LINE,
                            "cannot be read: permission denied");
                }
            }
        }
        throw new AssertionError("the probe names a header only when a reader takes it");
    }

    /**
     * Reads text held in memory; {@code source} names it in error messages.
     *
     * @throws InputException for bad input
     */
    public static Input parse(String source, String text) {
        InputFormat format = InputFormat.detect(text, source);
        InputProbe probe = new InputProbe(List.of(), false, false, Optional.of(format), ImageOptions.defaults());
        for (TextFileReader<?> reader : TEXT_READERS) {
            if (reader.recognises(probe)) {
                return reader.parse(source, text);
            }
        }
        throw new AssertionError("every text format has a reader");
    }

    private static InputProbe probe(List<Path> files, ImageOptions options) throws IOException {
        for (Path file : files) {
            requireExists(file);
        }
        Path first = files.get(0);
        boolean directory = files.size() == 1 && Files.isDirectory(first);
        if (directory && options.rawSize().isEmpty() && MatrixFilesReader.holdsMatrices(first)) {
            return new InputProbe(files, true, false, Optional.of(InputFormat.MATRICES), options);
        }
        if (options.rawSize().isPresent() || directory) {
            return new InputProbe(files, directory, false, Optional.empty(), options);
        }
        for (Path file : files) {
            requireRegular(file);
        }
        if (files.size() > 1 && startsLikeMatrix(first)) {
            for (Path file : files) {
                if (!startsLikeMatrix(file)) {
                    throw new InputException(file.toString(), InputException.NO_LINE, "several files starting with"
                            + " a Matrix Market file are read as the boundary matrices of one chain complex, so each"
                            + " must be a Matrix Market file, and this one is not");
                }
            }
            return new InputProbe(files, false, false, Optional.of(InputFormat.MATRICES), options);
        }
        if (files.size() > 1) {
            for (Path file : files) {
                if (!ImageInput.isImageFile(file)) {
                    throw new InputException(file.toString(), InputException.NO_LINE, "several files are read as"
                            + " the slices of one volume, so each must be an image, and this one is not");
                }
            }
            return new InputProbe(files, false, true, Optional.empty(), options);
        }
        if (ImageInput.isImageFile(first)) {
            return new InputProbe(files, false, true, Optional.empty(), options);
        }
        try {
            return new InputProbe(files, false, false, Optional.of(InputFormat.sniff(first)), options);
        } catch (NoSuchFileException e) {
            throw new InputException(first.toString(), InputException.NO_LINE, "no such file");
        } catch (AccessDeniedException e) {
            throw new InputException(first.toString(), InputException.NO_LINE, "cannot be read: permission denied");
        }
    }

    private static boolean startsLikeMatrix(Path file) throws IOException {
        byte[] start = new byte[MatrixMarketReader.BANNER.length()];
        int length;
        try (var in = Files.newInputStream(file)) {
            length = in.readNBytes(start, 0, start.length);
        } catch (AccessDeniedException e) {
            throw new InputException(file.toString(), InputException.NO_LINE, "cannot be read: permission denied");
        }
        return length == start.length && new String(start, java.nio.charset.StandardCharsets.US_ASCII)
                .equalsIgnoreCase(MatrixMarketReader.BANNER);
    }

    private static void requireExists(Path file) {
        if (!Files.exists(file)) {
            throw new InputException(file.toString(), InputException.NO_LINE, "no such file");
        }
    }

    /** A pipe or a device would block or never end; only regular files are read. */
    private static void requireRegular(Path file) {
        if (Files.isDirectory(file)) {
            throw new InputException(file.toString(), InputException.NO_LINE, "is a directory, not a file");
        }
        if (!Files.isRegularFile(file)) {
            throw new InputException(file.toString(), InputException.NO_LINE,
                    "is not a regular file (a pipe or a device?); save the input to a file first");
        }
    }

    private static String pathOf(java.nio.file.FileSystemException e, List<Path> files) {
        return e.getFile() != null ? e.getFile() : files.get(0).toString();
    }

    static double millisSince(long startNanos) {
        return Math.max(0, System.nanoTime() - startNanos) / 1e6;
    }
}
