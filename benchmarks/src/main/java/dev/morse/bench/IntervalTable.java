package dev.morse.bench;

import dev.morse.engine.Request;
import dev.morse.generate.BooleanLattice;
import dev.morse.generate.BruhatOrder;
import dev.morse.generate.CubeFaces;
import dev.morse.generate.PartitionLattice;
import dev.morse.homology.Coefficients;
import dev.morse.interval.IntervalSweep;
import dev.morse.interval.PosetWithBounds;
import dev.morse.interval.SweepOptions;
import dev.morse.interval.SweepReport;
import dev.morse.poset.Poset;
import java.lang.management.ManagementFactory;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;

/**
 * Measures interval sweeps ({@link IntervalSweep}) with one thread and with more, on one generated
 * poset: intervals per second of wall-clock time, the process's CPU time, and the speedup over one
 * thread, with the time spent in garbage collection. Rounds alternate the thread counts and each keeps its fastest, to damp the noise of a shared
 * machine; the load average before the runs is printed too. Every sweep must give the same results.
 *
 * <p>Arguments: {@code family n rounds threads...} with family one of {@code cube} (boundary face
 * poset of the n-cube), {@code bruhat} (proper part of S_n), {@code boolean} (proper part of B_n),
 * {@code partition} (proper part of Π_n).
 */
public final class IntervalTable {
    private IntervalTable() {
    }

    /** Entry point. */
    public static void main(String[] args) throws Exception {
        String family = args[0];
        int n = Integer.parseInt(args[1]);
        int rounds = Integer.parseInt(args[2]);
        int[] threads = new int[args.length - 3];
        for (int i = 3; i < args.length; i++) {
            threads[i - 3] = Integer.parseInt(args[i]);
        }
        Poset poset = switch (family) {
            case "cube" -> CubeFaces.boundaryFacePoset(n);
            case "bruhat" -> BruhatOrder.properPart(n);
            case "boolean" -> BooleanLattice.properPart(n);
            case "partition" -> PartitionLattice.properPart(n);
            default -> throw new IllegalArgumentException("unknown family " + family);
        };
        Request request = Request.defaults().withHomology(Coefficients.RATIONALS, true);
        // warm the code paths up first (the engine's many small runs take a while to be compiled), so the
        // rows measure the work, not the JIT
        PosetWithBounds warm = PosetWithBounds.of(CubeFaces.boundaryFacePoset(6));
        for (int i = 0; i < 4; i++) {
            IntervalSweep.run(warm, "warm", new SweepOptions(request, threads[i % threads.length], false));
        }
        String load = Files.readString(Path.of("/proc/loadavg")).trim();
        PosetWithBounds hat = PosetWithBounds.of(poset);
        double[] best = new double[threads.length];
        double[] cpu = new double[threads.length];
        double[] gc = new double[threads.length];
        java.util.Arrays.fill(best, Double.MAX_VALUE);
        SweepReport first = null;
        for (int round = 0; round < rounds; round++) {
            for (int t = 0; t < threads.length; t++) {
                long cpuStart = processCpuNanos();
                long gcStart = gcMillis();
                long start = System.nanoTime();
                SweepReport report = IntervalSweep.run(hat, family + n, new SweepOptions(request, threads[t], false));
                double seconds = (System.nanoTime() - start) / 1e9;
                double cpuSeconds = (processCpuNanos() - cpuStart) / 1e9;
                double gcSeconds = (gcMillis() - gcStart) / 1e3;
                if (first == null) {
                    first = report;
                } else if (!first.results().equals(report.results())) {
                    throw new IllegalStateException("results differ with " + threads[t] + " threads");
                }
                if (seconds < best[t]) {
                    best[t] = seconds;
                    cpu[t] = cpuSeconds;
                    gc[t] = gcSeconds;
                }
            }
        }
        for (int t = 0; t < threads.length; t++) {
            System.out.printf(Locale.ROOT, "| %s %d | %,d | %,d | %,d / %,d | %d | %.2f | %,.0f | %.2f | %.2f | %.2f | %s |%n",
                    family, n, poset.size(), first.intervals(), first.computed(), first.skipped(), threads[t], best[t],
                    first.intervals() / best[t], cpu[t], gc[t], best[0] / best[t], load);
        }
    }

    private static long gcMillis() {
        long total = 0;
        for (var bean : ManagementFactory.getGarbageCollectorMXBeans()) {
            total += Math.max(0, bean.getCollectionTime());
        }
        return total;
    }

    private static long processCpuNanos() {
        return ((com.sun.management.OperatingSystemMXBean) ManagementFactory.getOperatingSystemMXBean())
                .getProcessCpuTime();
    }
}
