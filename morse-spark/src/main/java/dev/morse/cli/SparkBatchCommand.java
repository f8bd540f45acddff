package dev.morse.cli;

import dev.morse.batch.BatchItem;
import dev.morse.batch.BatchRun;
import dev.morse.spark.SparkBatch;
import dev.morse.spark.SparkContexts;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import org.apache.spark.api.java.JavaSparkContext;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code morse-spark batch FILE...}: {@code morse batch} with one Spark task per input, the same lines. */
@Command(name = "batch", mixinStandardHelpOptions = true,
        description = {
            "Computes on Spark the homology of many inputs, one task each, and prints the lines 'morse batch'"
                    + " prints, in the order given: the object 'homology --json' prints, or {\"input\": ...,"
                    + " \"error\": ...} for an input that fails; the batch goes on, and the exit code is 2 if any"
                    + " input failed.",
            "The executors read the files by the names given: on a cluster, name them on a file system every"
                    + " executor sees."
        })
final class SparkBatchCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Parameters(arity = "1..*", paramLabel = "FILE", description = "Poset, simplicial or image files, or directories of them.")
    private List<Path> files;

    @Mixin
    private EngineOptions engine;

    @Mixin
    private MatchingChoice matching;

    @Mixin
    private MatchingRuns runs;

    @Mixin
    private MasterOption master;

    // accepted so that the options of 'morse' work here too; the master sets how much runs at once
    @Mixin
    private ThreadsOption threads;

    @Option(names = "--cohen-macaulay", description = "Add \"cohen_macaulay\" to each line: the verdict of an interval"
            + " sweep over the coefficients, for posets and simplicial complexes (null for images).")
    private boolean cohenMacaulay;

    @Mixin
    private RunOptions run;

    @Override
    public Integer call() throws Exception {
        var request = engine.request(spec, runs, matching.name());
        MasterOption.warnAboutThreads(spec);
        List<BatchItem> items = BatchRun.items(files);
        PrintWriter out = spec.commandLine().getOut();
        int failed;
        try (JavaSparkContext spark = SparkContexts.start(master.master())) {
            failed = run.around(spec, () -> SparkBatch.run(spark, items, request, cohenMacaulay, line -> {
                out.print(line);
                out.flush();
            }));
        }
        return failed > 0 ? Failures.BAD_INPUT : 0;
    }
}
