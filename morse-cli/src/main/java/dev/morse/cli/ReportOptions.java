package dev.morse.cli;

import java.io.PrintWriter;
import java.util.concurrent.Callable;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;

/** How a command that prints one report shows it: {@code --json} or a table, and the progress line. */
final class ReportOptions {
    @Mixin
    private JsonOption output;

    @Mixin
    private RunOptions run;

    /** Whether JSON was asked for. */
    boolean json() {
        return output.json();
    }

    /** Prints {@code text} on standard output as it is and returns the exit code 0. */
    static int print(CommandSpec spec, String text) {
        PrintWriter out = spec.commandLine().getOut();
        out.print(text);
        out.flush();
        return 0;
    }

    /** Runs {@code work} with the progress line, unless {@code --quiet}. */
    <T> T around(CommandSpec spec, Callable<T> work) throws Exception {
        return run.around(spec, work);
    }
}
