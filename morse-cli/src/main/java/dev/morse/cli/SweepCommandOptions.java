package dev.morse.cli;

import dev.morse.engine.Request;
import dev.morse.homology.Coefficients;
import dev.morse.input.Input;
import dev.morse.input.InputReaders;
import dev.morse.interval.SweepOptions;
import dev.morse.interval.SweepReport;
import dev.morse.report.IntervalJsonWriter;
import dev.morse.report.IntervalTextWriter;
import java.io.IOException;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * What an interval sweep is told, wherever it runs: the file, the coefficients, the matching, the
 * cutoff and the outputs. {@code morse intervals} and the sweep on a cluster take these same
 * options and print the same report.
 */
final class SweepCommandOptions {
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

    @Option(names = "--first-failure", description = "Stop at the first interval that fails the Cohen-Macaulay"
            + " condition (intervals are swept shortest first).")
    private boolean firstFailure;

    @Option(names = "--mobius", description = "Also list the Mobius function mu(x, y) of every interval.")
    private boolean mobius;

    @Option(names = "--jsonl", paramLabel = "FILE",
            description = "Also write one JSON line per swept interval: lower, upper, dimension, homology.")
    private Path jsonl;

    @Mixin
    private ReportOptions shown;

    /** Reads the file to sweep; see {@link InputReaders#read}. */
    Input read() throws IOException {
        return InputReaders.read(file);
    }

    /** The sweep asked for, on {@code threads} threads: reduced homology over the coefficients. */
    SweepOptions options(int threads) {
        Request request = Request.defaults().withHomology(coefficients, true)
                .withMatching(matching.name(), runs.seed(), runs.trials()).withVerify(runs.verify());
        return new SweepOptions(request, threads, firstFailure);
    }

    /** Runs {@code work} with the progress line, unless {@code --quiet}. */
    <T> T around(CommandSpec spec, Callable<T> work) throws Exception {
        return shown.around(spec, work);
    }

    /** Prints the report as text or JSON and writes the {@code --jsonl} file if asked; returns 0. */
    int print(CommandSpec spec, SweepReport report) throws IOException {
        String text = shown.json() ? IntervalJsonWriter.toJson(report, mobius) : IntervalTextWriter.toText(report, mobius);
        if (jsonl != null) {
            OutputFiles.write(jsonl, IntervalJsonWriter.toJsonLines(report));
        }
        return ReportOptions.print(spec, text);
    }
}
