package dev.morse.cli;

import dev.morse.progress.Progress;
import dev.morse.progress.ProgressCounter;
import dev.morse.progress.ProgressDisplay;
import dev.morse.progress.ProgressScope;
import java.util.concurrent.Callable;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;

/**
 * Options of every command that computes: {@code --quiet}, which silences the progress line, and
 * {@code --debug}. On a terminal, a run longer than about two seconds shows its phase, count, rate
 * and elapsed time on standard error, rewritten in place and erased before the result is printed.
 * When standard error is not a terminal ({@code System.console()} is null) nothing is shown.
 */
final class RunOptions {
    /** How long a run stays quiet before its progress line appears. */
    static final long DELAY_MILLIS = 2000;
    /** How often the line is rewritten. */
    static final long PERIOD_MILLIS = 500;

    @Option(names = {"-q", "--quiet"},
            description = "No progress line on standard error (shown only on a terminal, for runs over about two seconds).")
    private boolean quiet;

    // read by Failures through the parse result, which is where it matters
    @Option(names = "--debug", description = "Show stack traces of failures.")
    private boolean debug;

    /** Runs {@code work}, showing its progress on the command's standard error when that is wanted. */
    <T> T around(CommandSpec spec, Callable<T> work) throws Exception {
        if (quiet || System.console() == null) {
            return work.call();
        }
        ProgressCounter counter = new ProgressCounter();
        try (ProgressScope scope = Progress.use(counter);
                ProgressDisplay display = ProgressDisplay.start(spec.commandLine().getErr(), counter, DELAY_MILLIS,
                        PERIOD_MILLIS)) {
            return work.call();
        }
    }
}
