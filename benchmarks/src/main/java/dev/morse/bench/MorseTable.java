package dev.morse.bench;

import dev.morse.progress.HeapPeaks;
import dev.morse.complex.ChainComplex;
import dev.morse.complex.ComplexChoice;
import dev.morse.engine.ComplexPolicy;
import dev.morse.generate.VoxelBlock;
import dev.morse.homology.Coefficients;
import dev.morse.io.PosetReader;
import dev.morse.matching.MatchingHeuristic;
import dev.morse.matching.MatchingHeuristics;
import dev.morse.matching.MatchingOptions;
import dev.morse.morsecomplex.MorseReduction;
import dev.morse.poset.Poset;
import java.io.BufferedWriter;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.Map;

/**
 * Measures the whole path on voxel blocks with tunnels and cavities: read the poset file and build
 * the Hasse diagram, check the CW poset and build the cellular complex, then match, verify, sweep,
 * reduce and finish the homology. Prints one Markdown table row per run; each run should have its
 * own JVM (see {@code benchmarks/morse-table.sh}) so that peak memory is its own.
 *
 * <p>Arguments: {@code side heuristic [heuristic...]}.
 */
public final class MorseTable {
    private MorseTable() {
    }

    /** Entry point. */
    public static void main(String[] args) throws IOException {
        int side = Integer.parseInt(args[0]);
        VoxelBlock block = block(side);
        Path file = Files.createTempFile("morse-voxels-" + side + "-", ".poset");
        try {
            try (BufferedWriter out = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
                block.write(out);
            }
            for (int a = 1; a < args.length; a++) {
                run(block, file, MatchingHeuristics.byName(args[a]).orElseThrow());
            }
        } finally {
            Files.deleteIfExists(file);
        }
    }

    /** A block with as many tunnels as fit in one layer (at most 8) and up to 8 cavities. */
    static VoxelBlock block(int side) {
        int slots = Math.max(0, (side - 3) / 3);
        int tunnels = Math.min(8, slots);
        int cavities = slots >= 2 ? Math.min(8, slots * slots * (slots - 1)) : 0;
        return VoxelBlock.of(side, tunnels, cavities);
    }

    private static void run(VoxelBlock block, Path file, MatchingHeuristic heuristic) throws IOException {
        System.gc();
        HeapPeaks.reset();
        long t0 = System.nanoTime();
        Poset poset = PosetReader.read(file);
        long t1 = System.nanoTime();
        ChainComplex complex = ComplexPolicy.storedComplex(poset, ComplexChoice.AUTO);
        long t2 = System.nanoTime();
        MorseReduction.Outcome outcome = MorseReduction.run(complex,
                new MorseReduction.Request(heuristic, MatchingOptions.DEFAULT, Coefficients.INTEGERS, true));
        long t3 = System.nanoTime();
        long peak = HeapPeaks.peakBytes();
        if (!outcome.homology().groups().equals(block.expectedHomology())) {
            throw new AssertionError("wrong homology " + outcome.homology() + " for " + block.expectedHomology());
        }
        double read = (t1 - t0) / 1e6;
        double build = (t2 - t1) / 1e6;
        double morse = (t3 - t2) / 1e6;
        long cells = poset.size();
        long covers = poset.coverCount();
        Map<String, Double> phases = outcome.times().millis();
        System.out.printf(java.util.Locale.ROOT,
                "| %d^3 | %s | %,d | %,d | %.0f | %.0f | %s | %.0f | %.2f | %.0f | %.1f | %s | %s |%n",
                block.side(), heuristic.name(), cells, covers, read, build, phaseList(phases), build + morse,
                (build + morse) / read, peak / 1048576.0, (double) peak / (cells + covers),
                Arrays.toString(outcome.critical()), outcome.excess());
    }

    private static String phaseList(Map<String, Double> phases) {
        StringBuilder s = new StringBuilder();
        phases.forEach((name, ms) -> s.append(s.length() == 0 ? "" : " / ").append(String.format(java.util.Locale.ROOT, "%.0f", ms)));
        return s.toString();
    }
}
