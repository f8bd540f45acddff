package dev.morse.cli;

import picocli.CommandLine.Option;

/** {@code --master URL}: where Spark runs the work. */
final class MasterOption {
    @Option(names = "--master", paramLabel = "URL",
            description = "Spark master: local[N] for N threads of this machine, or a cluster's URL"
                    + " (default: the one spark-submit sets, else local[*], every core of this machine).")
    private String master;

    /** The master asked for, or {@code null} for the default. */
    String master() {
        return master;
    }
}
