package dev.morse.spark;

import dev.morse.batch.BatchItem;
import dev.morse.batch.BatchOptions;
import dev.morse.batch.BatchOutcome;
import dev.morse.batch.BatchRun;
import dev.morse.engine.Request;
import dev.morse.graph.GraphComplex;
import dev.morse.image.ImageOptions;
import dev.morse.input.ReadOptions;
import dev.morse.report.BatchJsonWriter;
import java.io.Serializable;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.function.Consumer;
import org.apache.spark.api.java.JavaSparkContext;

/**
 * A batch on Spark: one task per input, each computed by {@link BatchRun#compute} and rendered to its
 * JSON line by {@link BatchJsonWriter} on the executor, the lines gathered in input order, exactly
 * those of {@code morse batch}. An input that fails (bad input, too large, out of memory) is its own
 * error line and the batch goes on. The executors read the inputs by the paths given, so on a cluster
 * they must see the same files (a shared file system).
 */
public final class SparkBatch {
    private SparkBatch() {
    }

    /** One input's line. */
    record Line(int index, String text, boolean failed) implements Serializable {
        private static final long serialVersionUID = 1L;
    }

    /**
     * Runs the batch.
     *
     * @param graphAs what graph files stand for, as {@code --graph-as} says
     * @param cohenMacaulay whether each line also gets the Cohen–Macaulay verdict
     * @param emit receives the lines in the order of the inputs, each ending with a newline
     * @return how many inputs failed
     */
    public static int run(JavaSparkContext spark, List<BatchItem> items, Request request, GraphComplex graphAs,
            boolean cohenMacaulay, Consumer<String> emit) {
        if (items.isEmpty()) {
            return 0;
        }
        List<Line> lines = new ArrayList<>(spark.parallelize(items, items.size())
                .map(item -> computeOne(item, request, graphAs, cohenMacaulay))
                .collect());
        lines.sort(Comparator.comparingInt(Line::index));
        int failed = 0;
        for (Line line : lines) {
            emit.accept(line.text());
            if (line.failed()) {
                failed++;
            }
        }
        return failed;
    }

    /** One input on an executor: the same options as {@code morse batch} gives, one thread per task. */
    static Line computeOne(BatchItem item, Request request, GraphComplex graphAs, boolean cohenMacaulay) {
        BatchOptions options = new BatchOptions(request, new ReadOptions(ImageOptions.defaults(), graphAs), 1, cohenMacaulay);
        BatchOutcome outcome;
        try {
            outcome = BatchRun.compute(item, options);
        } catch (StackOverflowError e) {
            outcome = new BatchOutcome.Failed(item, item.path() + ": nests too deeply for the executor's stack");
        }
        return new Line(item.index(), BatchJsonWriter.toJsonLine(outcome, cohenMacaulay),
                outcome instanceof BatchOutcome.Failed);
    }
}
