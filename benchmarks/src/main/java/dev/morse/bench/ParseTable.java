package dev.morse.bench;

import dev.morse.progress.HeapPeaks;
import dev.morse.generate.VoxelBlock;
import dev.morse.io.PosetReader;
import dev.morse.poset.Poset;
import java.io.BufferedWriter;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * Prints one table row per grid side: elements, covers, file size, time to read and build the
 * Hasse diagram, and the peak heap used by the JVM during the run. Run each side in its own JVM
 * (see {@code benchmarks/morse-table.sh}) so that peaks do not mix.
 */
public final class ParseTable {
    private ParseTable() {
    }

    /** Arguments: grid sides. */
    public static void main(String[] args) throws IOException {
        for (String arg : args) {
            int side = Integer.parseInt(arg);
            Path file = Files.createTempFile("morse-grid-" + side + "-", ".poset");
            try {
                try (BufferedWriter out = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
                    VoxelBlock.of(side, 0, 0).write(out);
                }
                System.gc();
                HeapPeaks.reset();
                long start = System.nanoTime();
                Poset poset = PosetReader.read(file);
                long millis = (System.nanoTime() - start) / 1_000_000;
                long peak = HeapPeaks.peakBytes();
                System.gc();
                Runtime rt = Runtime.getRuntime();
                long retained = rt.totalMemory() - rt.freeMemory();
                System.out.printf("| %d^3 grid | %,d | %,d | %,d | %,d | %.1f | %.1f |%n", side, poset.size(),
                        poset.coverCount(), Files.size(file), millis, peak / 1048576.0, retained / 1048576.0);
                if (poset.size() == 0) {
                    throw new AssertionError("keeps the poset reachable until measured");
                }
            } finally {
                Files.deleteIfExists(file);
            }
        }
    }
}
