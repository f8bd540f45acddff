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
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;

/**
 * Writes a text file so that it appears whole or not at all: the text goes to a temporary file in
 * the same directory, which replaces the target by an atomic move only once everything is
 * written; on any failure the temporary file is deleted and the target is left as it was. Should
 * the JVM be stopped while writing (SIGTERM, Ctrl-C), a shutdown hook deletes the temporary files.
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

    /** Temporary files being written: deleted by a shutdown hook should the JVM be stopped (SIGTERM, Ctrl-C). */
    private static final Set<Path> PENDING = ConcurrentHashMap.newKeySet();

    static {
        Runtime.getRuntime().addShutdownHook(new Thread(AtomicOutput::deletePending, "morse-remove-partial-output"));
    }

    /**
     * Writes {@code content} to {@code target} as UTF-8.
     *
     * @throws InputException when the target's directory does not exist, cannot be written, or the
     *     target is a directory; also when the file system refuses the temporary file or the move
     * @throws IOException when writing fails
     */
    public static void write(Path target, Content content) throws IOException {
        writeAll(Map.of(target, content));
    }

    /**
     * Writes several files, all or none: every one is staged as a temporary file beside its target
     * first, and only when all are complete are they moved into place. A failure while staging
     * leaves every target as it was.
     *
     * @throws InputException as {@link #write} does, naming the file to blame
     * @throws IOException when writing fails
     */
    public static void writeAll(Map<Path, Content> files) throws IOException {
        Map<Path, Path> staged = new LinkedHashMap<>();
        boolean done = false;
        try {
            for (Map.Entry<Path, Content> file : files.entrySet()) {
                staged.put(file.getKey(), stage(file.getKey(), file.getValue()));
            }
            for (Map.Entry<Path, Path> file : staged.entrySet()) {
                Path target = file.getKey();
                try {
                    try {
                        Files.move(file.getValue(), target.toAbsolutePath(), StandardCopyOption.ATOMIC_MOVE,
                                StandardCopyOption.REPLACE_EXISTING);
                    } catch (AtomicMoveNotSupportedException e) {
                        Files.move(file.getValue(), target.toAbsolutePath(), StandardCopyOption.REPLACE_EXISTING);
                    }
                } catch (IOException e) {
                    throw cannotBeWritten(target, e);
                }
                PENDING.remove(file.getValue());
            }
            done = true;
        } finally {
            if (!done) {
                for (Path temporary : staged.values()) {
                    Files.deleteIfExists(temporary);
                    PENDING.remove(temporary);
                }
            }
        }
    }

    /** Writes one file's content to a temporary file beside it and returns that file. */
    private static Path stage(Path target, Content content) throws IOException {
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
        PENDING.add(temporary);
        boolean done = false;
        try {
            try (Writer out = new BufferedWriter(new OutputStreamWriter(Files.newOutputStream(temporary),
                    StandardCharsets.UTF_8), 1 << 16)) {
                content.writeTo(out);
            }
            done = true;
            return temporary;
        } catch (IOException e) {
            // a full disk: the reader needs the reason, not the exception class
            throw cannotBeWritten(target, e);
        } finally {
            if (!done) {
                Files.deleteIfExists(temporary);
                PENDING.remove(temporary);
            }
        }
    }

    /** Deletes the temporary files still being written; run by the shutdown hook. */
    static void deletePending() {
        for (Path temporary : PENDING) {
            try {
                Files.deleteIfExists(temporary);
            } catch (IOException e) {
                // the JVM is stopping: nothing better to do than leave it
            }
        }
        PENDING.clear();
    }

    /** How many temporary files are being written now; for tests. */
    static int pendingCount() {
        return PENDING.size();
    }
}
