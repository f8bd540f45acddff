package dev.morse.bench;

import dev.morse.complex.ChainComplex;
import dev.morse.complex.ComplexChoice;
import dev.morse.engine.ComplexPolicy;
import dev.morse.generate.VoxelBlock;
import dev.morse.homology.Coefficients;
import dev.morse.matching.MatchingHeuristic;
import dev.morse.matching.MatchingHeuristics;
import dev.morse.matching.MatchingOptions;
import dev.morse.morsecomplex.MorseReduction;

/**
 * Time of homology on the cellular complex of a voxel block, from the built complex to the answer,
 * with the full Smith normal form on every cell ({@code none}) against a Morse reduction; the best
 * of three runs of each after one warm-up. Prints one Markdown table row per side.
 *
 * <p>Arguments: {@code heuristic side [side...]}.
 */
public final class SpeedupTable {
    private SpeedupTable() {
    }

    /** Entry point. */
    public static void main(String[] args) {
        MatchingHeuristic fast = MatchingHeuristics.byName(args[0]).orElseThrow();
        MatchingHeuristic none = MatchingHeuristics.byName("none").orElseThrow();
        for (int a = 1; a < args.length; a++) {
            VoxelBlock block = MorseTable.block(Integer.parseInt(args[a]));
            ChainComplex complex = ComplexPolicy.storedComplex(block.toPoset(), ComplexChoice.AUTO);
            double baseline = best(complex, none, block);
            double reduced = best(complex, fast, block);
            System.out.printf(java.util.Locale.ROOT, "| %d^3 | %,d | %.1f | %.2f | %.0fx |%n", block.side(),
                    complex.cellCount(), baseline, reduced, baseline / reduced);
        }
    }

    private static double best(ChainComplex complex, MatchingHeuristic heuristic, VoxelBlock block) {
        double best = Double.MAX_VALUE;
        for (int run = 0; run < 4; run++) {
            long start = System.nanoTime();
            MorseReduction.Outcome outcome = MorseReduction.run(complex,
                    new MorseReduction.Request(heuristic, MatchingOptions.DEFAULT, Coefficients.INTEGERS, true));
            double ms = (System.nanoTime() - start) / 1e6;
            if (!outcome.homology().groups().equals(block.expectedHomology())) {
                throw new AssertionError(heuristic.name() + " gave " + outcome.homology());
            }
            if (run > 0) {
                best = Math.min(best, ms);
            }
        }
        return best;
    }
}
