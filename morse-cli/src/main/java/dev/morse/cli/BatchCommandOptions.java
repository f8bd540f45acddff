package dev.morse.cli;

import dev.morse.batch.BatchItem;
import dev.morse.batch.BatchRun;
import dev.morse.engine.Request;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.function.Consumer;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * What a batch is told, wherever it runs: the inputs, the request every input is computed with,
 * whether to add the Cohen–Macaulay verdict, and how to show progress. {@code morse batch} and the
 * batch on a cluster take these same options and print the same lines.
 */
final class BatchCommandOptions {
    @Parameters(arity = "1..*", paramLabel = "FILE", description = "Poset, simplicial or image files, or directories of them.")
    private List<Path> files;

    @Mixin
    private RequestOptions request;

    @Option(names = "--cohen-macaulay", description = "Add \"cohen_macaulay\" to each line: the verdict of an interval"
            + " sweep over the coefficients, for posets and simplicial complexes (null for images).")
    private boolean cohenMacaulay;

    @Mixin
    private RunOptions run;

    /** The inputs, directories expanded; see {@link BatchRun#items}. */
    List<BatchItem> items() throws IOException {
        return BatchRun.items(files);
    }

    /** The request every input is computed with. */
    Request request(CommandSpec spec) {
        return request.request(spec);
    }

    /** Whether each line gets the Cohen–Macaulay verdict. */
    boolean cohenMacaulay() {
        return cohenMacaulay;
    }

    /**
     * Runs {@code batch}, which hands each line to the consumer it is given, printing every line at
     * once, with the progress line unless {@code --quiet}; returns the exit code: 2 if any input failed.
     */
    int run(CommandSpec spec, BatchWork batch) throws Exception {
        PrintWriter out = spec.commandLine().getOut();
        int failed = run.around(spec, () -> batch.run(line -> {
            out.print(line);
            out.flush();
        }));
        return failed > 0 ? Failures.BAD_INPUT : 0;
    }

    /** A batch that emits its lines in order and returns how many inputs failed. */
    @FunctionalInterface
    interface BatchWork {
        /** Runs the batch. */
        int run(Consumer<String> emit) throws Exception;
    }
}
