package dev.morse.cli;

import dev.morse.batch.BatchItem;
import dev.morse.spark.SparkBatch;
import dev.morse.spark.SparkContexts;
import java.util.List;
import java.util.concurrent.Callable;
import org.apache.spark.api.java.JavaSparkContext;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
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

    @Mixin
    private BatchCommandOptions batch;

    @Mixin
    private MasterOption master;

    @Override
    public Integer call() throws Exception {
        var request = batch.request(spec);
        MasterOption.warnAboutThreads(spec);
        List<BatchItem> items = batch.items();
        try (JavaSparkContext spark = SparkContexts.start(master.master())) {
            return batch.run(spec, emit -> SparkBatch.run(spark, items, request, batch.readOptions().graphAs(),
                    batch.cohenMacaulay(), emit));
        }
    }
}
