package dev.morse.cli;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.List;
import picocli.CommandLine;

/** One in-process run of a command line: exit code and everything written to out and err. */
record CliRun(int code, String out, String err) {
    /** Runs {@code morse ARGS} in this JVM. */
    static CliRun morse(String... args) {
        return run(MorseCommand.newCommandLine(), args);
    }

    /** Runs {@code command} with captured output. */
    static CliRun run(CommandLine command, String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        command.setOut(new PrintWriter(out, true));
        command.setErr(new PrintWriter(err, true));
        int code = command.execute(args);
        return new CliRun(code, out.toString(), err.toString());
    }

    /** The lines written to standard error. */
    List<String> errLines() {
        return err.lines().toList();
    }
}
