package dev.morse.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.Callable;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
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

    /** A command that runs out of heap, as a Callable and as a command method (which picocli wraps). */
    @Command(name = "greedy")
    static final class Greedy implements Callable<Integer> {
        @Override
        public Integer call() {
            throw new OutOfMemoryError("Java heap space");
        }

        @Command(name = "method")
        int method() {
            throw new OutOfMemoryError("Java heap space");
        }
    }

    private static CliRun broken(String... args) {
        return handled(new Broken(), args);
    }

    private static CliRun handled(Object command, String... args) {
        Failures failures = new Failures();
        CommandLine line = new CommandLine(command)
                .setExecutionStrategy(failures)
                .setExecutionExceptionHandler(failures)
                .setParameterExceptionHandler(failures);
        return CliRun.run(line, args);
    }

    @Test
    void outOfMemoryInACallableIsTheAdviceAndExitCodeTwo() {
        CliRun run = handled(new Greedy());
        assertEquals(2, run.code());
        assertEquals(List.of(Failures.outOfMemory(Runtime.getRuntime().maxMemory())), run.errLines());
        assertEquals("", run.out());
    }

    @Test
    void outOfMemoryInACommandMethodIsUnwrapped() {
        // picocli wraps an Error of a command method in its ExecutionException
        CliRun run = handled(new Greedy(), "method");
        assertEquals(2, run.code());
        assertEquals(List.of(Failures.outOfMemory(Runtime.getRuntime().maxMemory())), run.errLines());
    }

    @Test
    void theAdviceNamesALargerHeapThanTheOneInForce() {
        // 64 MiB: twice is 128 MiB, rounded up to whole GiB
        assertEquals("morse: out of memory: the JVM's heap of 64 MiB was not enough; try a larger one, e.g."
                + " JAVA_OPTS=-Xmx1g", Failures.outOfMemory(64L << 20));
        assertTrue(Failures.outOfMemory(8L << 30).endsWith("-Xmx16g"));
        // 3.5 GiB: twice is 7 GiB
        assertTrue(Failures.outOfMemory(7L << 29).endsWith("-Xmx7g"));
        // exactly 1 GiB must not be advised again
        assertTrue(Failures.outOfMemory(1L << 30).endsWith("-Xmx2g"));
    }

    @Test
    void outOfMemoryOfGenerateInASmallHeapIsTheAdvice(@TempDir Path dir) throws Exception {
        // Pi_10 has Bell(10) = 115,975 elements (OEIS A000110, from memory): far more than 32 MiB hold
        Path target = dir.resolve("pi10.poset");
        Process process = new ProcessBuilder(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-Xmx32m", "-cp", System.getProperty("java.class.path"), MorseCommand.class.getName(),
                "generate", "partition", "10", "-o", target.toString())
                .redirectOutput(ProcessBuilder.Redirect.DISCARD).start();
        String err = new String(process.getErrorStream().readAllBytes(), StandardCharsets.UTF_8);
        assertTrue(process.waitFor(2, TimeUnit.MINUTES));
        assertEquals(2, process.exitValue(), err);
        assertTrue(err.matches("morse: out of memory: the JVM's heap of [0-9,]+ MiB was not enough; try a larger one,"
                + " e\\.g\\. JAVA_OPTS=-Xmx1g\n"), err);
        assertFalse(Files.exists(target));
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
        assertEquals(1, run.errLines().size(), run.err());
    }
}
