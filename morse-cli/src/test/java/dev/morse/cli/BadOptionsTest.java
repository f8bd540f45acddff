package dev.morse.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assumptions.assumeFalse;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Options out of range are usage errors: exactly one line on standard error naming what is wrong,
 * exit code 2, nothing on standard output, and no file written.
 */
class BadOptionsTest {
    @TempDir
    static Path dir;
    private static String square;

    @BeforeAll
    static void writeInputs() throws IOException {
        square = Inputs.write(dir, "square.poset", Inputs.SQUARE);
    }

    private static void assertRefused(String expectedLine, String... args) {
        CliRun run = CliRun.morse(args);
        assertEquals(2, run.code(), run.err());
        assertEquals("", run.out());
        assertEquals(List.of(expectedLine), run.errLines());
    }

    @Test
    void zeroTrialsIsRefused() {
        assertRefused("morse: trials must be in 1..1000000, got 0 (see 'morse homology --help')",
                "homology", square, "--trials", "0");
    }

    @Test
    void negativeTrialsIsRefusedByCompare() {
        assertRefused("morse: trials must be in 1..1000000, got -1 (see 'morse compare --help')",
                "compare", square, "--trials", "-1");
    }

    @Test
    void absurdTrialsIsRefusedWithTheCap() {
        assertRefused("morse: trials must be in 1..1000000, got 1000000000 (see 'morse homology --help')",
                "homology", square, "--matching", "random", "--trials", "1000000000");
    }

    @Test
    void negativeStoredChainLimitIsRefused() {
        assertRefused("morse: the stored chain limit must lie in 0..2^60 (see 'morse homology --help')",
                "homology", square, "--max-stored-chains", "-1");
    }

    @Test
    void aMatchingNamedTwiceIsRefused() {
        assertRefused("morse: matching 'none' is named twice (see 'morse compare --help')",
                "compare", square, "--matching", "none,none");
    }

    @Test
    void voxelBlockTooLargeForAnIntIndexIsRefusedBeforeAllocating() {
        Path target = dir.resolve("block.poset");
        assertRefused("morse: side must be in 1..1290, got 100000 (see 'morse generate voxel-block --help')",
                "generate", "voxel-block", "100000", "-o", target.toString());
        assertFalse(Files.exists(target));
    }

    @Test
    void anUnwritableOutputIsOneLine() {
        // /proc takes no new files (Linux proc(5)); the temporary file cannot be created there
        assertRefused("/proc/version: cannot be written: its directory does not take new files",
                "generate", "boolean", "3", "-o", "/proc/version");
    }

    @Test
    void anOutputInAReadOnlyDirectoryIsOneLine() throws IOException {
        Path locked = Files.createDirectory(dir.resolve("locked"));
        locked.toFile().setWritable(false);
        try {
            assumeFalse(Files.isWritable(locked), "the user can write anywhere (root): nothing to lock");
            Path target = locked.resolve("b3.poset");
            assertRefused(target + ": cannot be written: permission denied",
                    "generate", "boolean", "3", "-o", target.toString());
            assertFalse(Files.exists(target));
        } finally {
            locked.toFile().setWritable(true);
        }
    }
}
