package dev.morse.cli;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import dev.morse.input.Input;
import dev.morse.interval.PosetWithBounds;
import dev.morse.interval.SweepInputs;
import dev.morse.interval.SweepOptions;
import dev.morse.io.TextOutput;
import dev.morse.spark.IntervalOutcome;
import dev.morse.spark.SparkContexts;
import dev.morse.spark.SparkSweep;
import java.io.PrintWriter;
import java.util.List;
import java.util.concurrent.Callable;
import org.apache.spark.api.java.JavaSparkContext;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
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

    @Mixin
    private SweepCommandOptions sweep;

    @Mixin
    private MasterOption master;

    @Override
    public Integer call() throws Exception {
        // the sweep of 'morse intervals' on one thread per task, so that every interval is computed alike
        SweepOptions options = sweep.options(1);
        MasterOption.warnAboutThreads(spec);
        Input read = sweep.read();
        PosetWithBounds hat = PosetWithBounds.of(SweepInputs.posetOf(read));
        SparkSweep.Outcome outcome;
        try (JavaSparkContext spark = SparkContexts.start(master.master())) {
            outcome = sweep.around(spec, () -> SparkSweep.run(spark, hat, read.source(), options));
        }
        if (outcome.report().isEmpty()) {
            PrintWriter out = spec.commandLine().getOut();
            out.print(errorLines(read.source(), hat, outcome.failures()));
            out.flush();
            return Failures.BAD_INPUT;
        }
        return sweep.print(spec, outcome.report().get());
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
