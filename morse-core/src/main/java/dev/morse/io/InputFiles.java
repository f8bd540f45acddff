package dev.morse.io;

import dev.morse.poset.Poset;
import java.io.IOException;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;

/** Reading one input file of a known kind, with every failure of the file itself an {@link InputException}. */
public final class InputFiles {
    private InputFiles() {
    }

    /**
     * Reads a poset file.
     *
     * @throws InputException when the file is missing, unreadable, a directory, not in the poset
     *     format, or malformed
     */
    public static Poset readPoset(Path file) throws IOException {
        return readChecked(file, "a file", () -> {
            InputFormat format = InputFormat.detect(file);
            if (format != InputFormat.POSET) {
                throw new InputException(file.toString(), InputException.NO_LINE, "a poset file ("
                        + InputFormat.POSET.header() + ") is needed here, not a " + format.kind() + " file");
            }
            return PosetReader.read(file);
        });
    }

    /**
     * Runs {@code read} on {@code file}, with a missing file, a directory and a file that may not be
     * read each reported as an {@link InputException} on the file.
     *
     * @param kind what the file should have been, for the directory message: {@code "a file"}
     */
    public static <T> T readChecked(Path file, String kind, FileRead<T> read) throws IOException {
        String source = file.toString();
        if (!Files.exists(file)) {
            throw new InputException(source, InputException.NO_LINE, "no such file");
        }
        if (Files.isDirectory(file)) {
            throw new InputException(source, InputException.NO_LINE, "is a directory, not " + kind);
        }
        try {
            return read.read();
        } catch (NoSuchFileException e) {
            throw new InputException(source, InputException.NO_LINE, "no such file");
        } catch (AccessDeniedException e) {
            throw new InputException(source, InputException.NO_LINE, "cannot be read: permission denied");
        }
    }

    /** Reading one file, which may fail with an I/O error. */
    @FunctionalInterface
    public interface FileRead<T> {
        /** Reads the file. */
        T read() throws IOException;
    }
}
