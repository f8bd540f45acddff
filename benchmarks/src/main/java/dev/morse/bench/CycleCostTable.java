package dev.morse.bench;

import dev.morse.cycles.Cycle;
import dev.morse.cycles.RepresentativeCycles;
import dev.morse.engine.Computation;
import dev.morse.engine.Engines;
import dev.morse.engine.Request;
import dev.morse.generate.VoxelBlock;
import dev.morse.homology.HomologyGroup;
import dev.morse.image.LoadedImage;
import dev.morse.input.Input;
import dev.morse.input.VoxelInput;
import java.util.List;
import java.util.Locale;

/**
 * What representative cycles cost on a voxel block with tunnels: the homology run alone, and the
 * same run followed by the cycles (lift, shortening and the verifier), each the minimum over K
 * repeats in one JVM after a warm-up run, and their ratio. Prints one Markdown row and checks the
 * homology against the block's known one (one H_1 generator per tunnel, one H_2 per cavity).
 *
 * <p>Arguments: {@code SIDE TUNNELS CAVITIES [repeat=K] [matching=NAME]} (K defaults to 5, the
 * matching to coreduction).
 */
public final class CycleCostTable {
    private CycleCostTable() {
    }

    /** Entry point. */
    public static void main(String[] args) {
        int side = Integer.parseInt(args[0]);
        int tunnels = Integer.parseInt(args[1]);
        int cavities = Integer.parseInt(args[2]);
        int repeat = 5;
        String matching = "coreduction";
        for (int i = 3; i < args.length; i++) {
            if (args[i].startsWith("repeat=")) {
                repeat = Integer.parseInt(args[i].substring("repeat=".length()));
            } else if (args[i].startsWith("matching=")) {
                matching = args[i].substring("matching=".length());
            }
        }
        VoxelBlock block = VoxelBlock.of(side, tunnels, cavities);
        Input input = new VoxelInput("block", new LoadedImage(block.voxels(), 1, 1, false), 0);
        Request request = Request.defaults().withMatching(matching, 1L, 1);
        Computation warm = Engines.compute(input, request);
        if (!warm.homology().groups().equals(block.expectedHomology())) {
            throw new IllegalStateException("wrong homology " + warm.homology().groups() + ", expected "
                    + block.expectedHomology());
        }
        RepresentativeCycles.of(warm);
        double alone = Double.MAX_VALUE;
        double withCycles = Double.MAX_VALUE;
        double cyclesOnly = Double.MAX_VALUE;
        List<Cycle> cycles = List.of();
        for (int r = 0; r < repeat; r++) {
            System.gc();
            long t0 = System.nanoTime();
            Engines.compute(input, request);
            alone = Math.min(alone, (System.nanoTime() - t0) / 1e6);
            System.gc();
            long t1 = System.nanoTime();
            Computation run = Engines.compute(input, request);
            long t2 = System.nanoTime();
            cycles = RepresentativeCycles.of(run);
            long t3 = System.nanoTime();
            withCycles = Math.min(withCycles, (t3 - t1) / 1e6);
            cyclesOnly = Math.min(cyclesOnly, (t3 - t2) / 1e6);
        }
        long terms = cycles.stream().mapToLong(c -> c.terms().size()).sum();
        long lifted = cycles.stream().mapToLong(Cycle::liftedTerms).sum();
        long cells = warm.outcome().cells().length == 0 ? 0 : java.util.Arrays.stream(warm.outcome().cells()).sum();
        System.out.printf(Locale.ROOT, "| %d^3, %d tunnels, %d cavities | %s | %,d | %s | %d | %,.0f | %,.0f | %,.0f | %.2f | %,d | %,d |%n",
                side, tunnels, cavities, matching, cells, groups(warm.homology().groups()), cycles.size(), alone,
                withCycles, cyclesOnly, withCycles / alone, lifted, terms);
    }

    private static String groups(List<HomologyGroup> groups) {
        StringBuilder b = new StringBuilder();
        for (HomologyGroup g : groups) {
            b.append(b.length() == 0 ? "" : ", ").append(g.betti());
        }
        return "β = " + b;
    }
}
