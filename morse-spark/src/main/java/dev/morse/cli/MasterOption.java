package dev.morse.cli;

import java.util.List;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;

/**
 * {@code --master URL}: where Spark runs the work; and {@code --threads}, accepted so that the
 * options of {@code morse} work here too, though the master sets how much runs at once.
 */
final class MasterOption {
    @Option(names = "--master", paramLabel = "URL",
            description = "Spark master: local[N] for N threads of this machine, or a cluster's URL"
                    + " (default: the one spark-submit sets, else local[*], every core of this machine).")
    private String master;

    @Mixin
    private ThreadsOption threads;

    /** Warns, as for any option that does not apply, when {@code --threads} was given. */
    static void warnAboutThreads(CommandSpec spec) {
        if (spec.commandLine().getParseResult().hasMatchedOption("--threads")) {
            Warnings.print(spec, List.of("--threads does not apply on Spark: the master sets how many tasks run at"
                    + " once (--master local[N] on this machine)"));
        }
    }

    /** The master asked for, or {@code null} for the default. */
    String master() {
        return master;
    }
}
