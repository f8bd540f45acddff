package dev.morse.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class AtomicOutputTest {
    @TempDir
    Path dir;

    private List<String> names() throws IOException {
        try (Stream<Path> files = Files.list(dir)) {
            return files.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }

    @Test
    void writesTheWholeText() throws IOException {
        Path target = dir.resolve("out.poset");
        AtomicOutput.write(target, out -> out.write("morse-poset 1\na\n"));
        assertEquals("morse-poset 1\na\n", Files.readString(target));
        assertEquals(List.of("out.poset"), names());
    }

    @Test
    void failureHalfWayLeavesTheOldFileAndNoTemporaryOne() throws IOException {
        Path target = Files.writeString(dir.resolve("out.poset"), "old\n");
        IOException e = assertThrows(IOException.class, () -> AtomicOutput.write(target, out -> {
            out.write("morse-poset 1\n".repeat(100_000));
            throw new IOException("disk full");
        }));
        assertEquals("disk full", e.getMessage());
        assertEquals("old\n", Files.readString(target));
        assertEquals(List.of("out.poset"), names());
    }

    @Test
    void failureOfAGeneratorLeavesNoFile() throws IOException {
        Path target = dir.resolve("new.poset");
        assertThrows(IllegalStateException.class, () -> AtomicOutput.write(target, out -> {
            out.write("morse-poset 1\n");
            throw new IllegalStateException("generator failed");
        }));
        assertEquals(List.of(), names());
    }

    @Test
    void missingDirectoryIsAnInputError() {
        Path target = dir.resolve("absent").resolve("out.poset");
        InputException e = assertThrows(InputException.class, () -> AtomicOutput.write(target, out -> out.write("x")));
        assertEquals(target + ": cannot be written: no such directory", e.getMessage());
    }
}
