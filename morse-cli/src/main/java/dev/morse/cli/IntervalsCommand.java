package dev.morse.cli;

import dev.morse.engine.Request;
import dev.morse.homology.Coefficients;
import dev.morse.input.InputReaders;
import dev.morse.interval.IntervalSweep;
import dev.morse.interval.PosetWithBounds;
import dev.morse.interval.SweepInputs;
import dev.morse.interval.SweepOptions;
import dev.morse.interval.SweepReport;
import dev.morse.report.IntervalJsonWriter;
import dev.morse.report.IntervalTextWriter;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code morse intervals FILE}: the homology of every open interval of P̂ and the verdicts built on them. */
@Command(name = "intervals", mixinStandardHelpOptions = true,
        description = {
            "Computes the reduced homology of the order complex of every open interval (x, y) of P-hat, the poset"
                    + " with a least element 0^ and a greatest element 1^ adjoined, and decides whether P is pure,"
                    + " Cohen-Macaulay over the coefficients (naming the first interval that fails), spherical"
                    + " (Delta(P) has homology only in its top dimension), Eulerian and Gorenstein*.",
            "A simplicial file is swept through its face poset. Every Mobius value is checked against the reduced"
                    + " Euler characteristic of its interval (Philip Hall's theorem)."
        })
final class IntervalsCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Parameters(index = "0", paramLabel = "FILE", description = "A morse-poset 1 or morse-simplicial 1 file.")
    private Path file;

    @Option(names = "--coefficients", paramLabel = "Z|Q|P", defaultValue = "Q",
            converter = OptionConverters.CoefficientsConverter.class,
            description = "Coefficients of the homology and the verdicts: Q (default), the integers Z, or Z/P for a prime P.")
    private Coefficients coefficients;

    @Mixin
    private MatchingChoice matching;

    @Mixin
    private MatchingRuns runs;

    @Mixin
    private ThreadsOption threads;

    @Option(names = "--first-failure", description = "Stop at the first interval that fails the Cohen-Macaulay"
            + " condition (intervals are swept shortest first).")
    private boolean firstFailure;

    @Option(names = "--mobius", description = "Also list the Mobius function mu(x, y) of every interval.")
    private boolean mobius;

    @Option(names = "--jsonl", paramLabel = "FILE",
            description = "Also write one JSON line per swept interval: lower, upper, dimension, homology.")
    private Path jsonl;

    @Mixin
    private JsonOption output;

    @Mixin
    private RunOptions run;

    @Override
    public Integer call() throws Exception {
        Request request = Request.defaults().withHomology(coefficients, true)
                .withMatching(matching.name(), runs.seed(), runs.trials()).withVerify(runs.verify());
        SweepOptions options = new SweepOptions(request, threads.threads(spec), firstFailure);
        SweepReport report = run.around(spec, () -> {
            var read = InputReaders.read(file);
            PosetWithBounds hat = PosetWithBounds.of(SweepInputs.posetOf(read));
            return IntervalSweep.run(hat, read.source(), options);
        });
        String text = output.json() ? IntervalJsonWriter.toJson(report, mobius) : IntervalTextWriter.toText(report, mobius);
        if (jsonl != null) {
            OutputFiles.write(jsonl, IntervalJsonWriter.toJsonLines(report));
        }
        PrintWriter out = spec.commandLine().getOut();
        out.print(text);
        out.flush();
        return 0;
    }
}
