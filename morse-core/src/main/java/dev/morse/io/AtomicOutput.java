package dev.morse.io;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.AccessDeniedException;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;

/**
 * Writes a text file so that it appears whole or not at all: the text goes to a temporary file in
 * the same directory, which replaces the target by an atomic move only once everything is
 * written; on any failure the temporary file is deleted and the target is left as it was.
 */
public final class AtomicOutput {
    /** Writes text to a writer; may fail. */
    @FunctionalInterface
    public interface Content {
        /** Writes everything to {@code out}. */
        void writeTo(Writer out) throws IOException;
    }

    private AtomicOutput() {
    }

    /**
     * Writes {@code content} to {@code target} as UTF-8.
     *
     * @throws InputException when the target's directory does not exist, cannot be written, or the
     *     target is a directory
     * @throws IOException when writing fails
     */
    public static void write(Path target, Content content) throws IOException {
        Path absolute = target.toAbsolutePath();
        Path directory = absolute.getParent();
        if (Files.isDirectory(absolute)) {
            throw new InputException(target.toString(), InputException.NO_LINE, "is a directory; name a file to write");
        }
        if (directory == null || !Files.isDirectory(directory)) {
            throw new InputException(target.toString(), InputException.NO_LINE, "cannot be written: no such directory");
        }
        Path temporary;
        try {
            temporary = Files.createTempFile(directory, "." + absolute.getFileName() + ".", ".part");
        } catch (AccessDeniedException e) {
            throw new InputException(target.toString(), InputException.NO_LINE, "cannot be written: permission denied");
        }
        boolean done = false;
        try {
            try (Writer out = new BufferedWriter(new OutputStreamWriter(Files.newOutputStream(temporary),
                    StandardCharsets.UTF_8), 1 << 16)) {
                content.writeTo(out);
            }
            try {
                Files.move(temporary, absolute, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(temporary, absolute, StandardCopyOption.REPLACE_EXISTING);
            }
            done = true;
        } finally {
            if (!done) {
                Files.deleteIfExists(temporary);
            }
        }
    }
}
