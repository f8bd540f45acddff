package dev.morse.bench;

import dev.morse.complex.ChainComplex;
import dev.morse.generate.HardComplex;
import dev.morse.generate.HardLibrary;
import dev.morse.homology.Coefficients;
import dev.morse.homology.HomologyCalculator;
import dev.morse.matching.MatchingHeuristic;
import dev.morse.matching.MatchingHeuristics;
import dev.morse.matching.MatchingOptions;
import dev.morse.matching.MatchingVerifier;
import dev.morse.matching.OptimalMatching;
import dev.morse.matching.OptimalMatchingSolver;
import dev.morse.morsecomplex.MorseReduction;
import java.time.Duration;
import java.util.Arrays;
import java.util.List;

/**
 * The table of benchmarks/RESULTS.md for the hard library: per complex its cells, the Morse lower
 * bound, the total critical cells of every heuristic, and what the exact solver found within the time
 * limit given in seconds as the first argument (default 20).
 */
public final class HardLibraryTable {
    private HardLibraryTable() {
    }

    /** Prints the table in Markdown. */
    public static void main(String[] args) {
        Duration limit = Duration.ofSeconds(args.length > 0 ? Long.parseLong(args[0]) : 20);
        List<String> names = List.of("coreduction", "collapse", "lexicographic", "random", "last-free-face",
                "freeing-collapse", "cancelling-collapse", "cancelling-freeing-collapse");
        System.out.println("| complex | cells | Morse bound | " + String.join(" | ", names)
                + " | optimal | proven | bound found | solver ms |");
        System.out.println("|---|---|---|" + "---|".repeat(names.size()) + "---|---|---|---|");
        long[] excess = new long[names.size() + 1];
        for (HardComplex hard : HardLibrary.all()) {
            ChainComplex complex = hard.complex();
            long bound = MorseReduction.lowerBound(HomologyCalculator.compute(complex, Coefficients.INTEGERS));
            StringBuilder row = new StringBuilder("| " + hard.name() + " | " + complex.cellCount() + " | " + bound + " | ");
            for (int i = 0; i < names.size(); i++) {
                MatchingHeuristic h = MatchingHeuristics.byName(names.get(i)).orElseThrow();
                int[] critical = h.match(complex, MatchingOptions.DEFAULT).criticalCounts(complex);
                long total = Arrays.stream(critical).sum();
                excess[i] += total - bound;
                row.append(total).append(" | ");
            }
            OptimalMatching best = OptimalMatchingSolver.solve(complex, new MatchingOptions(1L, limit));
            if (!MatchingVerifier.verify(complex, best.matching()).valid()) {
                throw new IllegalStateException("invalid optimal matching on " + hard.name());
            }
            excess[names.size()] += best.criticalTotal() - bound;
            row.append(Arrays.toString(best.critical())).append(" = ").append(best.criticalTotal()).append(" | ")
                    .append(best.proven() ? "yes" : "no").append(" | ").append(best.lowerBound()).append(" | ")
                    .append(best.elapsed().toMillis()).append(" |");
            System.out.println(row);
        }
        StringBuilder total = new StringBuilder("| total excess over the bound | | | ");
        for (long e : excess) {
            total.append(e).append(" | ");
        }
        System.out.println(total.append("| | |"));
    }
}
