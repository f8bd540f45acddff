package dev.morse.cli;

import dev.morse.batch.BatchItem;
import dev.morse.batch.BatchOptions;
import dev.morse.batch.BatchRun;
import dev.morse.image.ImageOptions;
import dev.morse.input.ReadOptions;
import dev.morse.report.BatchJsonWriter;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code morse batch FILE...}: the homology of many inputs, one JSON line each. */
@Command(name = "batch", mixinStandardHelpOptions = true,
        description = {
            "Computes the homology of many inputs, each on its own, and prints one JSON line per input in the"
                    + " order given: the object 'homology --json' prints, or {\"input\": ..., \"error\": ...} for an"
                    + " input that fails; the batch goes on, and the exit code is 2 if any input failed.",
            "A directory stands for the files directly in it, by name; @LIST reads further arguments from the"
                    + " file LIST, separated by white space or new lines."
        })
final class BatchCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Parameters(arity = "1..*", paramLabel = "FILE", description = "Poset, simplicial, image, graph or mesh files, or directories of them; a directory of"
                    + " boundary-D.mtx matrices is one chain complex.")
    private List<Path> files;

    @Mixin
    private EngineOptions engine;

    @Mixin
    private MatchingChoice matching;

    @Mixin
    private MatchingRuns runs;

    @Mixin
    private ThreadsOption threads;

    @Option(names = "--graph-as", paramLabel = "COMPLEX", converter = OptionConverters.GraphComplexConverter.class,
            description = "What graph files stand for: clique (the default), independence, matching or"
                    + " connected-subgraphs.")
    private dev.morse.graph.GraphComplex graphAs;

    @Option(names = "--cohen-macaulay", description = "Add \"cohen_macaulay\" to each line: the verdict of an interval"
            + " sweep over the coefficients, for posets and simplicial complexes (null for images).")
    private boolean cohenMacaulay;

    @Mixin
    private RunOptions run;

    @Override
    public Integer call() throws Exception {
        BatchOptions options = new BatchOptions(engine.request(spec, runs, matching.name()),
                new ReadOptions(new ImageOptions(OptionalInt.empty(), false, Optional.empty()),
                        graphAs == null ? ReadOptions.DEFAULT_GRAPH_COMPLEX : graphAs), threads.threads(spec), cohenMacaulay);
        List<BatchItem> items = BatchRun.items(files);
        PrintWriter out = spec.commandLine().getOut();
        int failed = run.around(spec, () -> BatchRun.run(items, options,
                outcome -> BatchJsonWriter.toJsonLine(outcome, cohenMacaulay), line -> {
                    out.print(line);
                    out.flush();
                }));
        return failed > 0 ? Failures.BAD_INPUT : 0;
    }
}
