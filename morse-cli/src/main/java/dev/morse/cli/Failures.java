package dev.morse.cli;

import dev.morse.io.InputException;
import java.io.PrintWriter;
import picocli.CommandLine;
import picocli.CommandLine.IExecutionExceptionHandler;
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
final class Failures implements IExecutionExceptionHandler, IParameterExceptionHandler {
    /** Exit code for bad input or options. */
    static final int BAD_INPUT = 2;
    /** Exit code for internal failures. */
    static final int INTERNAL_FAILURE = 1;

    private static final String DEBUG_OPTION = "--debug";

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
        if (ex instanceof InputException) {
            err.println(firstLine(ex.getMessage()));
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

    private static String firstLine(String message) {
        if (message == null) {
            return "(no message)";
        }
        int end = message.indexOf('\n');
        return (end < 0 ? message : message.substring(0, end)).strip();
    }
}
