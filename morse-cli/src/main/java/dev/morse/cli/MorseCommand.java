package dev.morse.cli;

import java.io.OutputStreamWriter;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.util.List;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/** The {@code morse} command: exact homology of posets and simplicial complexes. */
@Command(name = "morse", mixinStandardHelpOptions = true,
        description = "Exact homology of posets (order complexes), CW posets (cellular complexes) and simplicial complexes.",
        subcommands = {HomologyCommand.class, DemoCommand.class,
            InspectCommand.class, CompareCommand.class, DrawCommand.class, ExportCommand.class,
            GenerateCommand.class, OperationCommand.class, IntervalsCommand.class, BatchCommand.class,
            HardLibraryCommand.class,
            CompletionCommand.class,
            CommandLine.HelpCommand.class},
        footer = "%nExit codes: 0 success, 2 bad input or options, 1 internal failure.")
public final class MorseCommand extends CommandGroup {
    /** The command, without a command line around it; {@link #newCommandLine} gives one. */
    public MorseCommand() {
        super("a subcommand");
    }

    /** Runs the command line and exits with its exit code. */
    public static void main(String[] args) {
        System.exit(run("morse", newCommandLine(), args));
    }

    /**
     * Runs {@code line} on {@code args} with UTF-8 output and returns the exit code; failures outside
     * the commands (parsing, help) become one line under {@code name}, as the commands' own do.
     */
    static int run(String name, CommandLine line, String[] args) {
        PrintWriter out = new PrintWriter(new OutputStreamWriter(System.out, StandardCharsets.UTF_8), true);
        PrintWriter err = new PrintWriter(new OutputStreamWriter(System.err, StandardCharsets.UTF_8), true);
        int code;
        try {
            code = line.setOut(out).setErr(err).execute(args);
        } catch (OutOfMemoryError e) {
            // Failures turns the commands' Errors into messages; this is for one outside them (parsing, help)
            err.println(Failures.outOfMemory(Runtime.getRuntime().maxMemory()));
            code = Failures.BAD_INPUT;
        } catch (Throwable e) {
            err.println(name + ": internal error: " + e);
            if (List.of(args).contains("--debug")) {
                e.printStackTrace(err);
            }
            code = Failures.INTERNAL_FAILURE;
        }
        out.flush();
        err.flush();
        return code;
    }

    /**
     * A fresh command line with the shared failure handling installed. Set its output and error
     * writers before executing: they propagate to the subcommands registered here.
     */
    public static CommandLine newCommandLine() {
        return configured(new MorseCommand());
    }

    /** The command line of {@code root} with the shared failure handling and version on every command. */
    static CommandLine configured(Object root) {
        Failures failures = new Failures();
        CommandLine line = new CommandLine(root)
                .setExecutionStrategy(failures)
                .setExecutionExceptionHandler(failures)
                .setParameterExceptionHandler(failures);
        withVersion(line, new VersionProvider());
        return line;
    }

    /** Gives every command the one version provider, so that {@code --version} answers the same anywhere. */
    private static void withVersion(CommandLine line, VersionProvider provider) {
        line.getCommandSpec().versionProvider(provider);
        line.getSubcommands().values().forEach(sub -> withVersion(sub, provider));
    }
}
