package dev.morse.cli;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import dev.morse.engine.Request;
import dev.morse.homology.Coefficients;
import dev.morse.input.InputReaders;
import dev.morse.interval.PosetWithBounds;
import dev.morse.interval.SweepInputs;
import dev.morse.interval.SweepOptions;
import dev.morse.interval.SweepReport;
import dev.morse.io.TextOutput;
import dev.morse.report.IntervalJsonWriter;
import dev.morse.report.IntervalTextWriter;
import dev.morse.spark.IntervalOutcome;
import dev.morse.spark.SparkContexts;
import dev.morse.spark.SparkSweep;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import org.apache.spark.api.java.JavaSparkContext;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code morse-spark intervals FILE}: {@code morse intervals} with the intervals solved on Spark. The
 * options and the output are those of {@code morse intervals}, with {@code --master} in place of
 * {@code --threads} (accepted, with a warning). When an interval cannot be solved, standard output
 * gets one line {@code {"input", "lower", "upper", "error"}} per such interval instead of the report,
 * the other intervals are still solved, and the exit code is 2.
 */
@Command(name = "intervals", mixinStandardHelpOptions = true,
        description = {
            "Computes on Spark the reduced homology of the order complex of every open interval (x, y) of P-hat,"
                    + " the poset with a least element 0^ and a greatest element 1^ adjoined, and decides what"
                    + " 'morse intervals' decides, with the same output.",
            "An interval that cannot be solved (too large for the executor) gives one line {\"input\", \"lower\","
                    + " \"upper\", \"error\"} instead of the report; the others are still solved; exit code 2."
        })
final class SparkIntervalsCommand implements Callable<Integer> {
    private static final JsonFactory FACTORY = JsonFactory.builder().build();

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
    private MasterOption master;

    // accepted so that the options of 'morse' work here too; the master sets how much runs at once
    @Mixin
    private ThreadsOption threads;

    @Option(names = "--first-failure", description = "Report up to the first interval that fails the Cohen-Macaulay"
            + " condition (intervals are ordered shortest first), as 'morse intervals' does.")
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
        // the request of 'morse intervals', so that every interval is computed alike
        Request request = Request.defaults().withHomology(coefficients, true)
                .withMatching(matching.name(), runs.seed(), runs.trials()).withVerify(runs.verify());
        SweepOptions options = new SweepOptions(request, 1, firstFailure);
        MasterOption.warnAboutThreads(spec);
        var read = InputReaders.read(file);
        PosetWithBounds hat = PosetWithBounds.of(SweepInputs.posetOf(read));
        SparkSweep.Outcome outcome;
        try (JavaSparkContext spark = SparkContexts.start(master.master())) {
            outcome = run.around(spec, () -> SparkSweep.run(spark, hat, read.source(), options));
        }
        PrintWriter out = spec.commandLine().getOut();
        if (outcome.report().isEmpty()) {
            out.print(errorLines(read.source(), hat, outcome.failures()));
            out.flush();
            return Failures.BAD_INPUT;
        }
        SweepReport report = outcome.report().get();
        String text = output.json() ? IntervalJsonWriter.toJson(report, mobius) : IntervalTextWriter.toText(report, mobius);
        if (jsonl != null) {
            OutputFiles.write(jsonl, IntervalJsonWriter.toJsonLines(report));
        }
        out.print(text);
        out.flush();
        return 0;
    }

    /** One compact line per failed interval: {@code {"input", "lower", "upper", "error"}}, labels or null. */
    static String errorLines(String source, PosetWithBounds hat, List<IntervalOutcome> failures) {
        return TextOutput.render(w -> {
            for (IntervalOutcome f : failures) {
                try (JsonGenerator json = FACTORY.createGenerator(w)) {
                    json.disable(JsonGenerator.Feature.AUTO_CLOSE_TARGET);
                    json.writeStartObject();
                    json.writeStringField("input", source);
                    json.writeStringField("lower", hat.label(f.task().lower()));
                    json.writeStringField("upper", hat.label(f.task().upper()));
                    json.writeStringField("error", f.error());
                    json.writeEndObject();
                }
                w.write('\n');
            }
        });
    }
}
