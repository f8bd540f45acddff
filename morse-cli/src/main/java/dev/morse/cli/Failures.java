package dev.morse.cli;

import dev.morse.io.InputException;
import java.io.PrintWriter;
import picocli.CommandLine;
import picocli.CommandLine.ExecutionException;
import picocli.CommandLine.IExecutionExceptionHandler;
import picocli.CommandLine.IExecutionStrategy;
import picocli.CommandLine.IParameterExceptionHandler;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.ParseResult;

/**
 * The one place where failures become messages and exit codes. Bad input is one line
 * {@code FILE:LINE: what is wrong} and exit code 2; a bad option is one line ending in a hint and
 * exit code 2; anything else is an internal failure, one line and exit code 1. A stack trace follows
 * only with {@code --debug}. Subcommands write their output only after success, so a failure leaves
 * standard output empty.
 */
final class Failures implements IExecutionExceptionHandler, IParameterExceptionHandler, IExecutionStrategy {
    /** Exit code for bad input or options. */
    static final int BAD_INPUT = 2;
    /** Exit code for internal failures. */
    static final int INTERNAL_FAILURE = 1;

    private static final String DEBUG_OPTION = "--debug";

    private static final long GIB = 1L << 30;

    /**
     * Runs the chosen command. picocli hands only Exceptions to the handler, and wraps an Error of a
     * command method in one but lets an Error of a Callable through; this turns both kinds into an
     * ExecutionException, so that {@link #handleExecutionException} sees every failure.
     */
    @Override
    public int execute(ParseResult parsed) {
        try {
            return new CommandLine.RunLast().execute(parsed);
        } catch (OutOfMemoryError | StackOverflowError e) {
            throw new ExecutionException(parsed.commandSpec().commandLine(), e.toString(), e);
        }
    }

    /**
     * The one message for a JVM out of heap: the heap in force and a larger one to try, twice the
     * current rounded up to whole GiB (so never the same as now).
     */
    static String outOfMemory(long maxHeapBytes) {
        if (maxHeapBytes == Long.MAX_VALUE) {
            return "morse: out of memory; the JVM has no heap limit set, so the machine itself ran out";
        }
        long suggested = Math.max(1, (2 * maxHeapBytes + GIB - 1) / GIB);
        return String.format(java.util.Locale.ROOT, "morse: out of memory: the JVM's heap of %,d MiB was not enough;"
                + " try a larger one, e.g. JAVA_OPTS=-Xmx%dg", maxHeapBytes >> 20, suggested);
    }

    /** The first Error or Exception in the cause chain of {@code e} that is of {@code kind}, if any. */
    private static <T extends Throwable> T causeOf(Throwable e, Class<T> kind) {
        for (Throwable t = e; t != null; t = t.getCause() == t ? null : t.getCause()) {
            if (kind.isInstance(t)) {
                return kind.cast(t);
            }
        }
        return null;
    }

    @Override
    public int handleParseException(ParameterException ex, String[] args) {
        CommandLine command = ex.getCommandLine();
        PrintWriter err = command.getErr();
        // one line, as for bad input: scripts read the first line of standard error
        err.println("morse: " + firstLine(ex.getMessage()) + " (see '" + command.getCommandSpec().qualifiedName()
                + " --help')");
        err.flush();
        return BAD_INPUT;
    }

    @Override
    public int handleExecutionException(Exception ex, CommandLine command, ParseResult parsed) {
        PrintWriter err = command.getErr();
        int code;
        InputException input = causeOf(ex, InputException.class);
        if (input != null) {
            err.println(firstLine(input.getMessage()));
            code = BAD_INPUT;
        } else if (causeOf(ex, OutOfMemoryError.class) != null) {
            // too large for this heap, like the refusals of inputs too large to compute: exit code 2
            err.println(outOfMemory(Runtime.getRuntime().maxMemory()));
            code = BAD_INPUT;
        } else if (causeOf(ex, StackOverflowError.class) != null) {
            err.println("morse: the input nests too deeply for the thread's stack; try JAVA_OPTS=-Xss64m");
            code = BAD_INPUT;
        } else {
            err.println("morse: internal error: " + firstLine(ex.toString())
                    + (debugRequested(parsed) ? "" : " (run with " + DEBUG_OPTION + " for the stack trace)"));
            code = INTERNAL_FAILURE;
        }
        if (debugRequested(parsed)) {
            ex.printStackTrace(err);
        }
        err.flush();
        return code;
    }

    private static boolean debugRequested(ParseResult parsed) {
        for (ParseResult p = parsed; p != null; p = p.subcommand()) {
            if (p.hasMatchedOption(DEBUG_OPTION)) {
                return true;
            }
        }
        return false;
    }

    /** The longest message line printed; a longer one (a huge label quoted, say) is cut. */
    static final int MAX_LINE = 1000;

    private static String firstLine(String message) {
        if (message == null) {
            return "(no message)";
        }
        int end = message.indexOf('\n');
        String line = (end < 0 ? message : message.substring(0, end)).strip();
        return line.length() <= MAX_LINE ? line
                : line.substring(0, MAX_LINE) + "… (" + (line.length() - MAX_LINE) + " more characters)";
    }
}
