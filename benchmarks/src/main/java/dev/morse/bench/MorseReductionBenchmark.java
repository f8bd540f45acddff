package dev.morse.bench;

import dev.morse.complex.ChainComplex;
import dev.morse.complex.ComplexChoice;
import dev.morse.cw.ComplexSelector;
import dev.morse.homology.Coefficients;
import dev.morse.matching.MatchingHeuristics;
import dev.morse.matching.MatchingOptions;
import dev.morse.morsecomplex.MorseReduction;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * Homology by Morse reduction (match, verify, sweep, reduce, finish) on the cellular complex of a
 * voxel block with tunnels and cavities, per heuristic.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 2)
@Measurement(iterations = 5)
@Fork(value = 1, jvmArgsAppend = {"-Xmx4g"})
public class MorseReductionBenchmark {
    /** Side of the block in voxels. */
    @Param({"22", "50"})
    public int side;

    /** The heuristic's name. */
    @Param({"coreduction", "collapse", "random"})
    public String heuristic;

    private ChainComplex complex;

    /** Builds the complex once per trial. */
    @Setup(Level.Trial)
    public void build() {
        complex = ComplexSelector.select(MorseTable.block(side).toPoset(), ComplexChoice.AUTO);
    }

    /** One full reduction. */
    @Benchmark
    public MorseReduction.Outcome reduce() {
        return MorseReduction.run(complex, new MorseReduction.Request(MatchingHeuristics.byName(heuristic).orElseThrow(),
                MatchingOptions.DEFAULT, Coefficients.INTEGERS, true));
    }
}
