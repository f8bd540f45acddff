package dev.morse.bench;

import dev.morse.cycles.Cycle;
import dev.morse.cycles.RepresentativeCycles;
import dev.morse.engine.Computation;
import dev.morse.engine.Engines;
import dev.morse.engine.Request;
import dev.morse.input.InputReaders;
import dev.morse.io.InputException;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.stream.Stream;

/**
 * The terms of the representative cycles of every corpus input, as first lifted and after the
 * greedy shortening by boundaries, per input and summed: one Markdown row per input (the default
 * run, as {@code morse homology --cycles} does it) and a total row. Inputs the cycles refuse (too
 * many critical cells) are listed as refused.
 *
 * <p>Arguments: the corpus directory (default {@code corpus}) and optionally a matching name
 * (default: the default run's).
 */
public final class ShorteningTable {
    private ShorteningTable() {
    }

    /** Entry point. */
    public static void main(String[] args) throws IOException {
        Path dir = Path.of(args.length > 0 ? args[0] : "corpus");
        List<Path> files;
        try (Stream<Path> list = Files.list(dir)) {
            files = list.filter(f -> f.toString().endsWith(".poset") || f.toString().endsWith(".simplicial")).sorted()
                    .toList();
        }
        Request request = args.length > 1 ? Request.defaults().withMatching(args[1], 1L, 1) : Request.defaults();
        long lifted = 0;
        long shortened = 0;
        int inputs = 0;
        for (Path file : files) {
            Computation run = Engines.compute(InputReaders.read(file), request);
            List<Cycle> cycles;
            try {
                cycles = RepresentativeCycles.of(run);
            } catch (InputException refused) {
                System.out.printf(Locale.ROOT, "| %s | refused: %s | | |%n", file.getFileName(), refused.problem());
                continue;
            }
            long before = cycles.stream().mapToLong(Cycle::liftedTerms).sum();
            long after = cycles.stream().mapToLong(c -> c.terms().size()).sum();
            System.out.printf(Locale.ROOT, "| %s | %d | %,d | %,d |%n", file.getFileName(), cycles.size(), before, after);
            lifted += before;
            shortened += after;
            inputs++;
        }
        System.out.printf(Locale.ROOT, "| **all %d inputs** | | **%,d** | **%,d** (%.1f%% fewer) |%n", inputs, lifted,
                shortened, 100.0 * (lifted - shortened) / Math.max(1, lifted));
    }
}
