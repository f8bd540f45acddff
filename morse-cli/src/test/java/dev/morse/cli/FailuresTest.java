package dev.morse.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.concurrent.Callable;
import org.junit.jupiter.api.Test;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

class FailuresTest {
    /** A command whose work fails in a way no input explains. */
    @Command(name = "broken")
    static final class Broken implements Callable<Integer> {
        @Option(names = "--debug")
        boolean debug;

        @Override
        public Integer call() {
            throw new IllegalStateException("the unexpected happened");
        }
    }

    private static CliRun broken(String... args) {
        Failures failures = new Failures();
        CommandLine command = new CommandLine(new Broken())
                .setExecutionExceptionHandler(failures)
                .setParameterExceptionHandler(failures);
        return CliRun.run(command, args);
    }

    @Test
    void unexpectedFailureIsOneLineAndExitCodeOne() {
        CliRun run = broken();
        assertEquals(1, run.code());
        assertEquals("", run.out());
        assertEquals(1, run.errLines().size(), run.err());
        assertTrue(run.err().startsWith("morse: internal error: java.lang.IllegalStateException: the unexpected happened"),
                run.err());
    }

    @Test
    void debugShowsTheStackTrace() {
        CliRun run = broken("--debug");
        assertEquals(1, run.code());
        assertTrue(run.errLines().size() > 1, run.err());
        assertTrue(run.err().contains("\tat dev.morse.cli.FailuresTest$Broken.call"), run.err());
    }

    @Test
    void unknownOptionIsAUsageError() {
        CliRun run = broken("--sideways");
        assertEquals(2, run.code());
        assertTrue(run.errLines().get(0).contains("--sideways"), run.err());
        assertTrue(run.errLines().size() <= 2, run.err());
    }
}
