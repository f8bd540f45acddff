package dev.morse.cli;

import dev.morse.batch.BatchItem;
import dev.morse.batch.BatchRun;
import dev.morse.engine.Request;
import dev.morse.graph.GraphComplex;
import dev.morse.image.ImageOptions;
import dev.morse.input.ReadOptions;
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
    @Parameters(arity = "1..*", paramLabel = "FILE", description = "Poset, simplicial, image, graph or mesh files, or"
            + " directories of them; a directory of boundary-D.mtx matrices is one chain complex.")
    private List<Path> files;

    @Mixin
    private RequestOptions request;

    @Option(names = "--graph-as", paramLabel = "COMPLEX", converter = OptionConverters.GraphComplexConverter.class,
            description = "What graph files stand for: clique (the default), independence, matching or"
                    + " connected-subgraphs.")
    private GraphComplex graphAs;

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

    /** How every input is read: images as given, graphs as {@code --graph-as} says. */
    ReadOptions readOptions() {
        return new ReadOptions(ImageOptions.defaults(),
                graphAs == null ? ReadOptions.DEFAULT_GRAPH_COMPLEX : graphAs);
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
