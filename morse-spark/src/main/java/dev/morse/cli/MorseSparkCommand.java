package dev.morse.cli;

import picocli.CommandLine;
import picocli.CommandLine.Command;

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
public final class MorseSparkCommand extends CommandGroup {
    /** The command, without a command line around it; {@link #newCommandLine} gives one. */
    public MorseSparkCommand() {
        super("a subcommand");
    }

    /** Runs the command line and exits with its exit code. */
    public static void main(String[] args) {
        System.exit(MorseCommand.run("morse-spark", newCommandLine(), args));
    }

    /** A fresh command line with the shared failure handling installed, as {@code morse} has. */
    public static CommandLine newCommandLine() {
        return MorseCommand.configured(new MorseSparkCommand());
    }
}
