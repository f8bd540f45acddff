package dev.morse.bench;

import dev.morse.complex.ChainComplex;
import dev.morse.complex.ComplexChoice;
import dev.morse.engine.ComplexPolicy;
import dev.morse.homology.Coefficients;
import dev.morse.matching.Matching;
import dev.morse.matching.MatchingHeuristic;
import dev.morse.matching.MatchingHeuristics;
import dev.morse.matching.MatchingOptions;
import dev.morse.morsecomplex.MorseReduction;
import dev.morse.engine.Request;
import dev.morse.implicit.ElementOrder;
import dev.morse.input.InputReaders;
import java.io.IOException;
import java.nio.file.Path;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.Warmup;

/**
 * Any matching heuristic, built in or plugged in, on any input file or on a generated voxel block:
 * the matching alone ({@link #match}) and the whole Morse reduction ({@link #reduce}). A plug-in
 * is found by {@link MatchingHeuristics} like everywhere else, so its jar only needs to be on the
 * class path, for example:
 * <pre>
 * java -cp benchmarks/target/benchmarks.jar:their-heuristic.jar org.openjdk.jmh.Main HeuristicBenchmark \
 *     -p heuristic=their-name -p input=corpus/rp-4.poset
 * </pre>
 * The built-in heuristics on voxel blocks with tunnels and cavities:
 * {@code -p input=voxels:22,voxels:50 -p heuristic=coreduction,collapse,random}.
 */
@Warmup(iterations = 2)
@Measurement(iterations = 5)
@Fork(value = 1, jvmArgsAppend = {"-Xmx4g"})
public class HeuristicBenchmark extends BenchmarkDefaults {
    /** The prefix of {@link #input} that asks for a generated voxel block of the given side. */
    public static final String VOXELS = "voxels:";

    /** A morse-poset 1 or morse-simplicial 1 file, or {@code voxels:SIDE} for a generated block. */
    @Param({"voxels:22"})
    public String input;

    /** The heuristic's name, as after {@code --matching}. */
    @Param({"coreduction"})
    public String heuristic;

    /** For a poset: {@code auto}, {@code order} or {@code cellular}. */
    @Param({"auto"})
    public String complex;

    private ChainComplex cells;
    private MatchingHeuristic chosen;

    /** Reads or generates the input and builds its complex once per trial. */
    @Setup(Level.Trial)
    public void build() throws IOException {
        chosen = MatchingHeuristics.byName(heuristic).orElseThrow(() -> new IllegalArgumentException(
                "unknown heuristic '" + heuristic + "'; available: " + String.join(", ", MatchingHeuristics.names())));
        ComplexChoice choice = ComplexChoice.parse(complex);
        if (input.startsWith(VOXELS)) {
            int side = Integer.parseInt(input.substring(VOXELS.length()));
            cells = ComplexPolicy.storedComplex(MorseTable.block(side).toPoset(), choice);
        } else {
            cells = ComplexPolicy.plan(InputReaders.read(Path.of(input)), Request.defaults().withComplex(choice)
                    .withPosetReduction(false).withImplicit(ElementOrder.DOWN_SETS, Request.MAX_STORED_CHAIN_LIMIT)).stored().orElseThrow();
        }
    }

    /** The matching alone. */
    @Benchmark
    public Matching match() {
        return chosen.match(cells, MatchingOptions.DEFAULT);
    }

    /** Match, verify, sweep, reduce and finish the homology. */
    @Benchmark
    public MorseReduction.Outcome reduce() {
        return MorseReduction.run(cells, new MorseReduction.Request(chosen, MatchingOptions.DEFAULT,
                Coefficients.INTEGERS, true));
    }
}
