package dev.morse.bench;

import dev.morse.complex.ChainComplex;
import dev.morse.generate.HardComplex;
import dev.morse.generate.HardLibrary;
import dev.morse.homology.Coefficients;
import dev.morse.homology.HomologyCalculator;
import dev.morse.matching.Matching;
import dev.morse.matching.MatchingHeuristic;
import dev.morse.matching.MatchingHeuristics;
import dev.morse.matching.MatchingOptions;
import dev.morse.morsecomplex.MorseReduction;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import org.openjdk.jmh.annotations.AuxCounters;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * Every heuristic over the whole hard library ({@link HardLibrary}) in one invocation: the time to
 * match all its complexes, and as auxiliary counters the total critical cells and the total excess
 * over the Morse lower bound Σ(β_k + t_k + t_(k−1)). The exact solver runs with the time limit
 * {@link #seconds} per complex.
 * <pre>
 * java -jar benchmarks/target/benchmarks.jar HardLibraryBenchmark -f 1 -wi 1 -i 3
 * </pre>
 */
@Warmup(iterations = 1, time = 1)
@Measurement(iterations = 3, time = 1)
public class HardLibraryBenchmark extends BenchmarkDefaults {
    /** The heuristic's name, as after {@code --matching}. */
    @Param({"coreduction", "collapse", "lexicographic", "random", "last-free-face", "freeing-collapse",
        "cancelling-collapse", "cancelling-freeing-collapse", "optimal"})
    public String heuristic;

    /** The exact solver's time limit per complex, in seconds (the default time limit is 20). */
    @Param({"20"})
    public int seconds;

    private final List<ChainComplex> complexes = new ArrayList<>();
    private long bound;
    private MatchingHeuristic chosen;
    private MatchingOptions options;

    /** Totals of the last invocation over the library. */
    @State(Scope.Thread)
    @AuxCounters(AuxCounters.Type.EVENTS)
    public static class Totals {
        /** Critical cells over the library. */
        public long critical;
        /** Critical cells beyond the Morse lower bound over the library. */
        public long excess;
    }

    /** Builds the library's complexes and their Morse bound once. */
    @Setup(Level.Trial)
    public void build() {
        chosen = MatchingHeuristics.byName(heuristic).orElseThrow();
        options = new MatchingOptions(1L, Duration.ofSeconds(seconds));
        bound = 0;
        for (HardComplex hard : HardLibrary.all()) {
            ChainComplex complex = hard.complex();
            complexes.add(complex);
            bound += MorseReduction.lowerBound(HomologyCalculator.compute(complex, Coefficients.INTEGERS));
        }
    }

    /** Matches every complex of the library. */
    @Benchmark
    public long matchTheLibrary(Totals totals) {
        long critical = 0;
        for (ChainComplex complex : complexes) {
            Matching m = chosen.match(complex, options);
            critical += complex.cellCount() - 2L * m.pairCount();
        }
        totals.critical = critical;
        totals.excess = critical - bound;
        return critical;
    }
}
