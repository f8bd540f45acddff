package dev.morse.cli;

import dev.morse.batch.BatchItem;
import dev.morse.batch.BatchOptions;
import dev.morse.batch.BatchRun;
import dev.morse.report.BatchJsonWriter;
import java.util.List;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
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

    @Mixin
    private BatchCommandOptions batch;

    @Mixin
    private ThreadsOption threads;

    @Override
    public Integer call() throws Exception {
        BatchOptions options = new BatchOptions(batch.request(spec), batch.readOptions(), threads.threads(spec),
                batch.cohenMacaulay());
        List<BatchItem> items = batch.items();
        return batch.run(spec, emit -> BatchRun.run(items, options,
                outcome -> BatchJsonWriter.toJsonLine(outcome, batch.cohenMacaulay()), emit));
    }
}
