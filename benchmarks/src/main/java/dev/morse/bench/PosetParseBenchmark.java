package dev.morse.bench;

import dev.morse.generate.VoxelBlock;
import dev.morse.io.PosetReader;
import dev.morse.poset.Poset;
import java.io.BufferedWriter;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.TearDown;
import org.openjdk.jmh.annotations.Warmup;

/**
 * Time to read a covers-only poset file and build its Hasse diagram (parse, intern labels,
 * transitive reduction, both CSR directions), on cubical grid face posets.
 */
@BenchmarkMode(Mode.SingleShotTime)
@Warmup(iterations = 1)
@Measurement(iterations = 3)
@Fork(value = 1, jvmArgsAppend = {"-Xmx4g"})
public class PosetParseBenchmark extends BenchmarkDefaults {
    /** Side of the cube block: 50 gives 1,030,301 elements. */
    @Param({"22", "50"})
    public int side;

    private Path file;

    /** Writes the input file once per trial. */
    @Setup(Level.Trial)
    public void writeInput() throws IOException {
        file = Files.createTempFile("morse-grid-" + side + "-", ".poset");
        try (BufferedWriter out = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
            VoxelBlock.of(side, 0, 0).write(out);
        }
    }

    /** Deletes the input file. */
    @TearDown(Level.Trial)
    public void deleteInput() throws IOException {
        Files.deleteIfExists(file);
    }

    /** Parse and build. */
    @Benchmark
    public Poset readAndBuild() throws IOException {
        return PosetReader.read(file);
    }
}
