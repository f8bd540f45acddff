package dev.morse.bench;

import dev.morse.generate.FacePart;
import dev.morse.generate.Families;
import dev.morse.generate.VoxelBlock;
import dev.morse.homology.HomologyGroup;
import dev.morse.io.PosetReader;
import dev.morse.parallel.Workers;
import dev.morse.engine.Computation;
import dev.morse.engine.Engines;
import dev.morse.engine.PhaseTiming;
import dev.morse.engine.Request;
import dev.morse.input.InputReaders;
import dev.morse.poset.Poset;
import java.io.BufferedWriter;
import java.io.IOException;
import java.io.InputStream;
import java.io.Writer;
import java.math.BigInteger;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * The ratios against the physical floor, in one JVM per input: the time to read and build a poset
 * file's Hasse diagram over the time a plain buffered read of the same file's bytes takes, and the
 * time of the full homology after reading over the time to read and build. Prints one Markdown row
 * per input and checks every answer against its known homology.
 *
 * <p>Arguments: inputs {@code block:SIDE} (a solid voxel block, {@code SIDE^3} voxels),
 * {@code cube:D} (the boundary of the D-cube, a sphere S^(D-1)) and {@code boolean:N} (the proper
 * part of B_N, a sphere S^(N-2)); optional {@code repeat=K} (best of K, default 3).
 */
public final class ScaleTable {
    private ScaleTable() {
    }

    /** Entry point. */
    public static void main(String[] args) throws IOException {
        int repeat = 3;
        List<String> inputs = new ArrayList<>();
        for (String a : args) {
            if (a.startsWith("repeat=")) {
                repeat = Integer.parseInt(a.substring("repeat=".length()));
            } else {
                inputs.add(a);
            }
        }
        for (String input : inputs) {
            row(input, repeat);
        }
    }

    private static void row(String input, int repeat) throws IOException {
        String[] parts = input.split(":");
        int size = Integer.parseInt(parts[1]);
        Path file = Files.createTempFile("morse-scale-" + parts[0] + size + "-", ".poset");
        try {
            List<HomologyGroup> expected = write(parts[0], size, file);
            double bytes = Double.MAX_VALUE;
            double build = Double.MAX_VALUE;
            double full = Double.MAX_VALUE;
            double readInFull = 0;
            long elements = 0;
            long covers = 0;
            for (int r = 0; r < repeat; r++) {
                long t0 = System.nanoTime();
                long sum = plainRead(file);
                bytes = Math.min(bytes, (System.nanoTime() - t0) / 1e6);
                if (sum == 42) {
                    System.out.print(""); // keeps the read from being optimised away
                }
                System.gc();
                long t1 = System.nanoTime();
                Poset poset = PosetReader.read(file);
                build = Math.min(build, (System.nanoTime() - t1) / 1e6);
                elements = poset.size();
                covers = poset.coverCount();
                poset = null;
                System.gc();
                long t2 = System.nanoTime();
                Computation report = fullHomology(file);
                double total = (System.nanoTime() - t2) / 1e6;
                if (!report.homology().groups().equals(expected)) {
                    throw new AssertionError(input + ": homology " + report.homology() + ", expected " + expected);
                }
                if (total < full) {
                    full = total;
                    readInFull = phase(report, "read");
                }
            }
            double after = full - readInFull;
            System.out.printf(Locale.ROOT, "| %s | %,d | %,d | %,d | %d | %.1f | %.0f | %.1f | %.0f | %.2f |%n",
                    name(parts[0], size), elements, covers, Files.size(file), Workers.threads(), bytes, build,
                    build / bytes, after, after / build);
        } finally {
            Files.deleteIfExists(file);
        }
    }

    /** The one place that runs the whole homology of a file through the library's pipeline. */
    private static Computation fullHomology(Path file) throws IOException {
        return Engines.compute(InputReaders.read(file), Request.defaults());
    }

    private static double phase(Computation report, String name) {
        for (PhaseTiming t : report.timings()) {
            if (t.phase().equals(name)) {
                return t.milliseconds();
            }
        }
        throw new IllegalStateException("no phase " + name + " in " + report.timings());
    }

    /** A plain buffered read of every byte: the floor any reader stands on. */
    private static long plainRead(Path file) throws IOException {
        long sum = 0;
        byte[] buffer = new byte[1 << 16];
        try (InputStream in = Files.newInputStream(file)) {
            for (int n = in.read(buffer); n >= 0; n = in.read(buffer)) {
                sum += n > 0 ? buffer[n - 1] : 0;
            }
        }
        return sum;
    }

    private static String name(String family, int size) {
        return switch (family) {
            case "block" -> size + "^3 voxel block";
            case "cube" -> "boundary of the " + size + "-cube";
            case "boolean" -> "proper part of B_" + size;
            default -> throw new IllegalArgumentException("unknown input " + family);
        };
    }

    /** Writes the input and returns its homology, known from its construction. */
    private static List<HomologyGroup> write(String family, int size, Path file) throws IOException {
        try (Writer out = new BufferedWriter(Files.newBufferedWriter(file, StandardCharsets.UTF_8), 1 << 16)) {
            switch (family) {
                case "block" -> {
                    VoxelBlock block = VoxelBlock.of(size, 0, 0);
                    block.write(out);
                    return block.expectedHomology();
                }
                case "cube" -> {
                    Families.cube(size, FacePart.BOUNDARY).write(out);
                    return sphere(size - 1);
                }
                case "boolean" -> {
                    Families.booleanLattice(size, true).write(out);
                    return sphere(size - 2);
                }
                default -> throw new IllegalArgumentException("unknown input " + family);
            }
        }
    }

    /** H(S^d) = Z in dimensions 0 and d (standard). */
    private static List<HomologyGroup> sphere(int d) {
        List<HomologyGroup> groups = new ArrayList<>();
        for (int k = 0; k <= d; k++) {
            groups.add(new HomologyGroup(k, k == 0 || k == d ? 1 : 0, List.<BigInteger>of()));
        }
        return groups;
    }
}
