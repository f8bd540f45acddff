package dev.morse.io;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.AccessDeniedException;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
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

    /** The one line for a target the file system refuses: its name and the reason, no exception class. */
    private static InputException cannotBeWritten(Path target, IOException e) {
        String reason;
        if (e instanceof AccessDeniedException) {
            reason = "permission denied";
        } else if (e instanceof NoSuchFileException) {
            reason = "its directory does not take new files";
        } else if (e instanceof FileSystemException f && f.getReason() != null) {
            reason = f.getReason();
        } else {
            reason = e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage();
        }
        return new InputException(target.toString(), InputException.NO_LINE, "cannot be written: " + reason);
    }

    /**
     * Writes {@code content} to {@code target} as UTF-8.
     *
     * @throws InputException when the target's directory does not exist, cannot be written, or the
     *     target is a directory; also when the file system refuses the temporary file or the move
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
        } catch (IOException e) {
            throw cannotBeWritten(target, e);
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
        } catch (IOException e) {
            // a full disk or a refused move: the reader needs the reason, not the exception class
            throw cannotBeWritten(target, e);
        } finally {
            if (!done) {
                Files.deleteIfExists(temporary);
            }
        }
    }
}
