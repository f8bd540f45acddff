package dev.morse.bench;

import dev.morse.poset.ChainCounts;
import dev.morse.generate.Families;
import dev.morse.generate.Generated;
import dev.morse.generate.PartitionLattice;
import dev.morse.io.PosetWriter;
import dev.morse.engine.Computation;
import dev.morse.engine.Engines;
import dev.morse.engine.Request;
import dev.morse.input.InputReaders;
import dev.morse.poset.Poset;
import dev.morse.posetreduction.PosetReduction;
import dev.morse.posetreduction.ReductionResult;
import dev.morse.posetreduction.ReductionStats;
import dev.morse.engine.PhaseTiming;
import java.util.Locale;

/**
 * Measures the poset reductions on generated lattices: elements before and after, what removed
 * them, the time of the reduction, the cells of the order complex with and without it, and the
 * time of the whole homology run both ways (through {@link Engines} on the poset text,
 * reading included). Prints one Markdown table row per case; each row should have its own JVM
 * (see {@code benchmarks/poset-reduction-table.sh}).
 *
 * <p>Arguments: {@code family n [q]} with family one of {@code partition}, {@code partition-proper},
 * {@code subspace}, {@code subspace-proper}, {@code noncrossing}, {@code noncrossing-proper},
 * {@code divisor-proper}, {@code random}, and {@code [q]} the field order of a subspace lattice or the
 * seed of a random poset (density 0.05).
 */
public final class PosetReductionTable {
    private PosetReductionTable() {
    }

    /** Entry point. */
    public static void main(String[] args) {
        String family = args[0];
        int n = Integer.parseInt(args[1]);
        int extra = args.length > 2 ? Integer.parseInt(args[2]) : 0;
        Generated generated = generate(family, n, extra);
        Poset poset = ((Generated.OfPoset) generated).poset();
        String text = PosetWriter.toText(poset);
        // warm the code paths up on small cases first, so the row measures the work, not the JIT
        String warm = PosetWriter.toText(PartitionLattice.properPart(5));
        for (int i = 0; i < 3; i++) {
            Engines.compute(InputReaders.parse("warm", warm), Request.defaults());
            Engines.compute(InputReaders.parse("warm", warm), Request.defaults().withPosetReduction(false));
        }
        ReductionResult reduced = PosetReduction.reduce(poset);
        ReductionStats s = reduced.stats();
        long cellsBefore = total(ChainCounts.perDimension(poset));
        long cellsAfter = total(ChainCounts.perDimension(reduced.poset()));
        // alternate the two ways three times and keep the fastest of each, to damp the noise of the machine
        Request off = Request.defaults().withPosetReduction(false);
        boolean unreducedFits = cellsBefore <= 3_000_000;
        Computation with = null;
        double withMs = Double.MAX_VALUE;
        double withoutMs = Double.MAX_VALUE;
        for (int round = 0; round < 3; round++) {
            if (unreducedFits) {
                withoutMs = Math.min(withoutMs, runMillis(Engines.compute(InputReaders.parse(family, text), off)));
            }
            with = Engines.compute(InputReaders.parse(family, text), Request.defaults());
            withMs = Math.min(withMs, runMillis(with));
        }
        String without = unreducedFits ? String.format(Locale.ROOT, "%.0f", withoutMs) : "(too large)";
        System.out.printf(Locale.ROOT, "| %s | %,d | %,d | %,d | %,d | %,d | %.1f | %,d | %,d | %.0f | %s | %s |%n",
                generated.description(), s.elementsBefore(), s.elementsAfter(), s.beatPointsRemoved(),
                s.acyclicLinksRemoved(), s.linksSkipped(), s.milliseconds(), cellsBefore, cellsAfter, withMs,
                without, betti(with));
    }

    private static Generated generate(String family, int n, int extra) {
        return switch (family) {
            case "partition" -> Families.partitionLattice(n, false);
            case "partition-proper" -> Families.partitionLattice(n, true);
            case "subspace" -> Families.subspaceLattice(extra, n, false);
            case "subspace-proper" -> Families.subspaceLattice(extra, n, true);
            case "noncrossing" -> Families.noncrossingPartitionLattice(n, false);
            case "noncrossing-proper" -> Families.noncrossingPartitionLattice(n, true);
            case "divisor-proper" -> Families.divisorLattice(n, true);
            case "random" -> Families.randomPoset(n, 0.05, extra);
            default -> throw new IllegalArgumentException("unknown family " + family);
        };
    }

    private static long total(long[] counts) {
        long t = 0;
        for (long c : counts) {
            t = Math.addExact(t, c);
        }
        return t;
    }

    /** Milliseconds of the run after reading: reduction, complex, matching and homology. */
    private static double runMillis(Computation report) {
        double ms = 0;
        for (PhaseTiming t : report.timings()) {
            if (!t.phase().equals("read")) {
                ms += t.milliseconds();
            }
        }
        return ms;
    }

    private static String betti(Computation report) {
        return java.util.Arrays.toString(report.homology().bettiNumbers());
    }
}
