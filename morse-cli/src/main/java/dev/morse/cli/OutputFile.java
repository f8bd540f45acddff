package dev.morse.cli;

import dev.morse.generate.Generated;
import dev.morse.io.AtomicOutput;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.function.Supplier;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/**
 * The options every writing command shares: the output file, help and {@code --debug}; and the
 * writing itself, whole or not at all, followed by one line on standard output saying what was written.
 */
final class OutputFile {
    @Spec(Spec.Target.MIXEE)
    private CommandSpec spec;

    @Option(names = {"-o", "--output"}, paramLabel = "FILE", required = true,
            description = "The file to write. It appears only once complete; on an error it is left as it was.")
    private Path file;

    // read by Failures through the parse result, which is where it matters
    @Option(names = "--debug", description = "Show stack traces of failures.")
    private boolean debug;

    /**
     * Makes the input with {@code make} and writes it. Bad arguments of a generator (an
     * IllegalArgumentException) become a usage error naming the command.
     */
    int write(Supplier<Generated> make) throws IOException {
        Generated generated;
        try {
            generated = make.get();
        } catch (IllegalArgumentException e) {
            throw new ParameterException(spec.commandLine(), e.getMessage(), e);
        }
        AtomicOutput.write(file, generated::write);
        PrintWriter out = spec.commandLine().getOut();
        out.println("wrote " + file + ": " + generated.description() + "; " + generated.size() + " ("
                + generated.format().header() + ")");
        out.flush();
        return 0;
    }
}
