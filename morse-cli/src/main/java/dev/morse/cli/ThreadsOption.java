package dev.morse.cli;

import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;

/** {@code --threads N}: how many threads a sweep or a batch uses; by default every core of this machine. */
final class ThreadsOption {
    @Option(names = "--threads", paramLabel = "N",
            description = "Threads working at once (default: the number of cores)."
                    + " The results never depend on it.")
    private Integer threads;

    /**
     * The number of threads.
     *
     * @throws ParameterException unless it is at least 1
     */
    int threads(CommandSpec spec) {
        int n = threads == null ? Runtime.getRuntime().availableProcessors() : threads;
        if (n < 1) {
            throw new ParameterException(spec.commandLine(), "--threads must be at least 1, not " + n);
        }
        return n;
    }
}
