package dev.morse.cli;

import java.util.concurrent.Callable;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/**
 * A command that only groups subcommands ({@code morse}, {@code morse-spark}, {@code generate},
 * {@code op}): run without one, there is nothing to do, so it is a usage error naming them.
 */
abstract class CommandGroup implements Callable<Integer> {
    @Spec
    CommandSpec spec;

    private final String missing;

    /** @param missing what the error says is required, like {@code a family} */
    CommandGroup(String missing) {
        this.missing = missing;
    }

    /** Without a subcommand there is nothing to do: a usage error. */
    @Override
    public final Integer call() {
        throw new ParameterException(spec.commandLine(), missing + " is required: "
                + String.join(", ", spec.subcommands().keySet()));
    }
}
