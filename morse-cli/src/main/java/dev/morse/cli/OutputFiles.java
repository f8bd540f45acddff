package dev.morse.cli;

import dev.morse.io.AtomicOutput;
import dev.morse.io.InputException;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * Writes the files a command produces, once all of them are ready, so that a failure of the
 * computation leaves nothing behind. A path that cannot be written is reported like bad input:
 * one line naming it, exit code 2.
 */
final class OutputFiles {
    private OutputFiles() {
    }

    /** Writes one file, whole or not at all ({@link AtomicOutput}); its directory must exist. */
    static void write(Path file, String text) {
        try {
            AtomicOutput.write(file, out -> out.write(text));
        } catch (IOException e) {
            throw new InputException(file.toString(), InputException.NO_LINE, "cannot be written: " + e.getMessage());
        }
    }

    /**
     * Creates {@code directory} if needed and writes every file, by name, into it: all or none
     * ({@link AtomicOutput#writeAll}); a directory created here is removed again on failure.
     */
    static void writeAll(Path directory, Map<String, String> files) {
        if (Files.exists(directory) && !Files.isDirectory(directory)) {
            throw new InputException(directory.toString(), InputException.NO_LINE, "exists and is not a directory");
        }
        boolean created = !Files.exists(directory);
        try {
            Files.createDirectories(directory);
        } catch (IOException e) {
            throw new InputException(directory.toString(), InputException.NO_LINE,
                    "cannot be created: " + e.getMessage());
        }
        Map<Path, AtomicOutput.Content> contents = new LinkedHashMap<>();
        files.forEach((name, text) -> contents.put(directory.resolve(name), out -> out.write(text)));
        boolean done = false;
        try {
            AtomicOutput.writeAll(contents);
            done = true;
        } catch (IOException e) {
            throw new InputException(directory.toString(), InputException.NO_LINE, "cannot be written: "
                    + e.getMessage());
        } finally {
            if (!done && created) {
                try {
                    Files.deleteIfExists(directory);
                } catch (IOException e) {
                    // not empty or not ours to remove after all: leave it
                }
            }
        }
    }
}
