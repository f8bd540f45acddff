package dev.morse.cli;

import java.io.OutputStreamWriter;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/**
 * The {@code morse-spark} command: {@code intervals} and {@code batch} of {@code morse}, distributed
 * over Apache Spark, with the options, output and exit codes of {@code morse} and its one failure
 * handling ({@link Failures}). It lives in the command line's package to share its option classes
 * without making them public API of morse-cli, which knows nothing of Spark.
 */
@Command(name = "morse-spark", mixinStandardHelpOptions = true,
        description = "Interval sweeps and batches of morse, distributed over Apache Spark.",
        subcommands = {SparkIntervalsCommand.class, SparkBatchCommand.class, CommandLine.HelpCommand.class},
        footer = "%nExit codes: 0 success, 2 bad input or options, 1 internal failure.")
public final class MorseSparkCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    /** Runs the command line and exits with its exit code. */
    public static void main(String[] args) {
        PrintWriter out = new PrintWriter(new OutputStreamWriter(System.out, StandardCharsets.UTF_8), true);
        PrintWriter err = new PrintWriter(new OutputStreamWriter(System.err, StandardCharsets.UTF_8), true);
        int code;
        try {
            code = newCommandLine().setOut(out).setErr(err).execute(args);
        } catch (Throwable e) {
            err.println("morse-spark: internal error: " + e);
            if (List.of(args).contains("--debug")) {
                e.printStackTrace(err);
            }
            code = Failures.INTERNAL_FAILURE;
        }
        out.flush();
        err.flush();
        System.exit(code);
    }

    /** A fresh command line with the shared failure handling installed. */
    public static CommandLine newCommandLine() {
        Failures failures = new Failures();
        CommandLine line = new CommandLine(new MorseSparkCommand())
                .setExecutionStrategy(failures)
                .setExecutionExceptionHandler(failures)
                .setParameterExceptionHandler(failures);
        VersionProvider provider = new VersionProvider();
        line.getCommandSpec().versionProvider(provider);
        line.getSubcommands().values().forEach(sub -> sub.getCommandSpec().versionProvider(provider));
        return line;
    }

    /** Without a subcommand there is nothing to do: a usage error. */
    @Override
    public Integer call() {
        throw new ParameterException(spec.commandLine(), "a subcommand is required: "
                + String.join(", ", spec.subcommands().keySet()));
    }
}
