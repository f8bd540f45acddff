package dev.morse.bench;

import dev.morse.progress.HeapPeaks;
import dev.morse.generate.BooleanLattice;
import dev.morse.generate.PartitionLattice;
import dev.morse.generate.SubspaceLattice;
import dev.morse.homology.Coefficients;
import dev.morse.homology.Homology;
import dev.morse.homology.HomologyGroup;
import dev.morse.implicit.ElementOrder;
import dev.morse.implicit.ImplicitHomology;
import dev.morse.io.PosetWriter;
import dev.morse.poset.Adjacency;
import dev.morse.poset.OrderCycleException;
import dev.morse.poset.Poset;
import dev.morse.poset.PosetBuilder;
import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.Locale;
import java.util.StringJoiner;

/**
 * Homology of order complexes too large to store, by the implicit engine: the proper parts of the
 * partition lattices Π_n (a wedge of (n-1)! spheres S^(n-3), Björner 1980), of the subspace lattices
 * of F_q^n (a wedge of q^C(n,2) spheres S^(n-2), Solomon–Tits) and of the Boolean lattices B_n (the
 * sphere S^(n-2)). Checks the answer against the theorem and prints one Markdown table row.
 *
 * <p>Arguments: {@code CASE [ORDER]} with CASE {@code pi:n}, {@code sub:q:n} or {@code bool:n},
 * optionally followed by {@code ~seed} to renumber the elements at random (which changes the
 * {@code ids} order, not the others), and ORDER an element order (default down-sets); or
 * {@code write CASE FILE} to write the poset file.
 */
public final class ImplicitTable {
    private ImplicitTable() {
    }

    /** Entry point. */
    public static void main(String[] args) throws IOException {
        if (args[0].equals("write")) {
            Poset poset = generate(args[1]);
            try (Writer out = Files.newBufferedWriter(Path.of(args[2]), StandardCharsets.UTF_8)) {
                PosetWriter.write(poset, out);
            }
            return;
        }
        ElementOrder order = args.length > 1 ? ElementOrder.parse(args[1]) : ElementOrder.DOWN_SETS;
        long start = System.nanoTime();
        Poset poset = generate(args[0]);
        double generated = (System.nanoTime() - start) / 1e6;
        HeapPeaks.reset();
        long t0 = System.nanoTime();
        ImplicitHomology.Outcome outcome = ImplicitHomology.run(poset, new ImplicitHomology.Options(order, Coefficients.INTEGERS));
        double engine = (System.nanoTime() - t0) / 1e6;
        long peak = HeapPeaks.peakBytes();
        int[] wedge = wedge(args[0]);
        check(outcome.homology(), wedge[0], wedge[1]);
        long chains = Arrays.stream(outcome.cells()).sum();
        long bound = 1 + wedge[1];
        StringJoiner phases = new StringJoiner(" / ");
        outcome.times().millis().values().forEach(ms -> phases.add(String.format(Locale.ROOT, "%.0f", ms)));
        System.out.printf(Locale.ROOT, "| %s | %s | %,d | %.2e | %,d / %,d | %s | %,d | %d | %.0f | %s | %.0f | %.0f |%n",
                args[0], order.optionName(), poset.size(), (double) chains, outcome.search().facets(),
                outcome.search().skippedSubtrees(), Arrays.toString(outcome.critical()), bound,
                outcome.totalCritical() - bound, generated, phases, engine, peak / 1048576.0);
    }

    private static Poset generate(String name) {
        int tilde = name.indexOf('~');
        if (tilde >= 0) {
            return shuffled(generate(name.substring(0, tilde)), Long.parseLong(name.substring(tilde + 1)));
        }
        String[] p = name.split(":");
        return switch (p[0]) {
            case "pi" -> PartitionLattice.properPart(Integer.parseInt(p[1]));
            case "sub" -> SubspaceLattice.properPart(Integer.parseInt(p[1]), Integer.parseInt(p[2]));
            case "bool" -> BooleanLattice.properPart(Integer.parseInt(p[1]));
            default -> throw new IllegalArgumentException("unknown case " + name);
        };
    }

    /** The same poset with its elements numbered in a random order. */
    private static Poset shuffled(Poset poset, long seed) {
        int n = poset.size();
        int[] order = new int[n];
        for (int i = 0; i < n; i++) {
            order[i] = i;
        }
        java.util.SplittableRandom random = new java.util.SplittableRandom(seed);
        for (int i = n - 1; i > 0; i--) {
            int j = random.nextInt(i + 1);
            int t = order[i];
            order[i] = order[j];
            order[j] = t;
        }
        PosetBuilder b = new PosetBuilder();
        int[] id = new int[n];
        for (int x : order) {
            id[x] = b.element(poset.label(x));
        }
        for (int x = 0; x < n; x++) {
            Adjacency lower = poset.lowerCovers();
            for (int i = lower.start(x); i < lower.end(x); i++) {
                b.relate(id[lower.target(i)], id[x], 0);
            }
        }
        try {
            return b.build();
        } catch (OrderCycleException e) {
            throw new AssertionError("a renumbered poset has no cycle", e);
        }
    }

    /** Dimension and number of the spheres of the wedge the theorem gives. */
    private static int[] wedge(String name) {
        name = name.replaceAll("~.*", "");
        String[] p = name.split(":");
        return switch (p[0]) {
            case "pi" -> {
                int n = Integer.parseInt(p[1]);
                int f = 1;
                for (int k = 2; k < n; k++) {
                    f *= k;
                }
                yield new int[] {n - 3, f};
            }
            case "sub" -> {
                int q = Integer.parseInt(p[1]);
                int n = Integer.parseInt(p[2]);
                yield new int[] {n - 2, (int) Math.pow(q, n * (n - 1) / 2)};
            }
            default -> new int[] {Integer.parseInt(p[1]) - 2, 1};
        };
    }

    private static void check(Homology homology, int d, int spheres) {
        Homology reduced = homology.toReduced();
        for (int k = 0; k < reduced.groups().size(); k++) {
            if (!reduced.group(k).equals(HomologyGroup.free(k, k == d ? spheres : 0))) {
                throw new AssertionError("dimension " + k + ": " + reduced.group(k));
            }
        }
    }
}
