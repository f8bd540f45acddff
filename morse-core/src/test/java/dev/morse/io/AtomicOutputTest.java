package dev.morse.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class AtomicOutputTest {
    @TempDir
    Path dir;

    private List<String> names() throws IOException {
        try (var files = Files.list(dir)) {
            return files.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }

    @Test
    void severalFilesAppearTogether() throws IOException {
        Map<Path, AtomicOutput.Content> files = new LinkedHashMap<>();
        files.put(dir.resolve("a.txt"), out -> out.write("a\n"));
        files.put(dir.resolve("b.txt"), out -> out.write("b\n"));
        AtomicOutput.writeAll(files);
        assertEquals(List.of("a.txt", "b.txt"), names());
        assertEquals("b\n", Files.readString(dir.resolve("b.txt")));
        assertEquals(0, AtomicOutput.pendingCount());
    }

    @Test
    void aFailureOfTheLastFileLeavesEveryTargetAsItWas() throws IOException {
        Files.writeString(dir.resolve("a.txt"), "old\n");
        Map<Path, AtomicOutput.Content> files = new LinkedHashMap<>();
        files.put(dir.resolve("a.txt"), out -> out.write("new\n"));
        files.put(dir.resolve("b.txt"), out -> {
            throw new IOException("No space left on device");
        });
        InputException e = assertThrows(InputException.class, () -> AtomicOutput.writeAll(files));
        assertEquals(dir.resolve("b.txt") + ": cannot be written: No space left on device", e.getMessage());
        assertEquals(List.of("a.txt"), names());
        assertEquals("old\n", Files.readString(dir.resolve("a.txt")));
        assertEquals(0, AtomicOutput.pendingCount());
    }

    @Test
    void stoppingTheJvmMidWriteRemovesTheTemporaryFile() throws Exception {
        Path target = dir.resolve("out.txt");
        Process process = new ProcessBuilder(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-cp", System.getProperty("java.class.path"), SlowWriter.class.getName(), target.toString())
                .redirectError(ProcessBuilder.Redirect.DISCARD).start();
        try (BufferedReader out = new BufferedReader(new InputStreamReader(process.getInputStream(),
                StandardCharsets.UTF_8))) {
            assertEquals("writing", out.readLine());
            assertEquals(1, names().size(), "the temporary file exists while writing");
            assertTrue(names().get(0).endsWith(".part"), names().toString());
            process.destroy(); // SIGTERM on Linux: shutdown hooks run
            assertTrue(process.waitFor(1, TimeUnit.MINUTES));
        }
        assertEquals(List.of(), names());
    }
}
