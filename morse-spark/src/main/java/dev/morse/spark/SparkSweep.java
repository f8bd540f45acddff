package dev.morse.spark;

import dev.morse.engine.Request;
import dev.morse.interval.IntervalHomology;
import dev.morse.interval.IntervalResult;
import dev.morse.interval.IntervalSolver;
import dev.morse.interval.IntervalSweep;
import dev.morse.interval.IntervalTask;
import dev.morse.interval.PosetWithBounds;
import dev.morse.interval.SweepOptions;
import dev.morse.interval.SweepReport;
import dev.morse.io.InputException;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.UUID;
import org.apache.spark.api.java.JavaSparkContext;
import org.apache.spark.broadcast.Broadcast;

/**
 * An interval sweep on Spark. The driver cuts the intervals of P̂ into {@link IntervalBlock}s by lower
 * end and sends the poset once to every executor ({@link PosetShipment}, a broadcast); each task
 * solves its block with its own {@link IntervalSolver}, and the driver puts the results back in sweep
 * order and assembles the report with {@link IntervalSweep#assemble}, so that it is the report
 * {@link IntervalSweep#run} gives on one machine. An interval that cannot be solved (a complex past the
 * request's cell limit, a heap too small) becomes an error outcome on its worker and the sweep goes on;
 * then there is no report, only the outcomes. Solving is deterministic (the request fixes every seed),
 * so a task that Spark runs again gives the same outcomes.
 */
public final class SparkSweep {
    /** The fewest intervals a task gets unless the sweep has fewer. */
    public static final int MIN_BLOCK = 64;

    private SparkSweep() {
    }

    /**
     * What a distributed sweep came to.
     *
     * @param report the sweep's report, as one machine gives it; empty when an interval failed
     * @param outcomes every interval's outcome, in sweep order
     * @param tasks how many Spark tasks solved them
     */
    public record Outcome(Optional<SweepReport> report, List<IntervalOutcome> outcomes, int tasks) {
        /** Copies. */
        public Outcome {
            Objects.requireNonNull(report, "report");
            outcomes = List.copyOf(outcomes);
        }

        /** The intervals that failed, in sweep order. */
        public List<IntervalOutcome> failures() {
            return outcomes.stream().filter(IntervalOutcome::failed).toList();
        }
    }

    /** Sweeps with blocks sized for the context's parallelism. */
    public static Outcome run(JavaSparkContext spark, PosetWithBounds hat, String source, SweepOptions options) {
        int blockSize = IntervalBlock.blockSize(hat.intervalCount(), spark.defaultParallelism(), MIN_BLOCK);
        return run(spark, hat, source, options, blockSize);
    }

    /**
     * Sweeps the intervals of {@code hat} on {@code spark}, at most {@code blockSize} intervals per task.
     * {@code options.threads()} is not used: the cluster's task slots set how much runs at once.
     *
     * @throws IllegalStateException if an interval's homology contradicts Philip Hall's theorem (a defect)
     */
    public static Outcome run(JavaSparkContext spark, PosetWithBounds hat, String source, SweepOptions options,
            int blockSize) {
        int[] upperCounts = new int[hat.size() + 2];
        for (int x = 0; x < upperCounts.length; x++) {
            upperCounts[x] = hat.uppers(x).length;
        }
        List<IntervalBlock> blocks = IntervalBlock.plan(upperCounts, blockSize);
        Request request = options.request();
        Broadcast<PosetShipment> shipment = spark.broadcast(PosetShipment.of(hat.poset()));
        List<IntervalOutcome> solved;
        try {
            // broadcast ids start again in a new context, so each sweep has a key of its own
            String key = UUID.randomUUID().toString();
            solved = spark.parallelize(blocks, Math.max(1, blocks.size()))
                    .mapPartitions(part -> solveBlocks(part, ExecutorPosets.get(key, shipment.value()), request, source))
                    .collect();
        } finally {
            shipment.destroy();
        }
        return gather(hat, source, options, solved, blocks.size());
    }

    /** Puts the outcomes back in sweep order and, when none failed, assembles the report. */
    private static Outcome gather(PosetWithBounds hat, String source, SweepOptions options,
            List<IntervalOutcome> solved, int tasks) {
        Map<IntervalTask, IntervalOutcome> byTask = new HashMap<>(solved.size() * 2);
        for (IntervalOutcome o : solved) {
            if (byTask.put(o.task(), o) != null) {
                throw new IllegalStateException("interval " + o.task() + " came back twice");
            }
        }
        List<IntervalTask> order = IntervalSweep.order(hat);
        List<IntervalOutcome> ordered = new ArrayList<>(order.size());
        List<IntervalResult> results = new ArrayList<>(order.size());
        // one copy of each homology, as the sweep on one machine keeps them
        Map<IntervalHomology, IntervalHomology> shared = new HashMap<>();
        boolean failed = false;
        for (IntervalTask t : order) {
            IntervalOutcome o = byTask.get(t);
            if (o == null) {
                throw new IllegalStateException("interval " + t + " did not come back");
            }
            ordered.add(o);
            if (o.failed()) {
                failed = true;
            } else if (!failed) {
                IntervalResult r = o.result();
                IntervalHomology h = shared.computeIfAbsent(r.homology(), key -> key);
                results.add(new IntervalResult(r.task(), r.dimension(), r.graded(), h, r.how()));
            }
        }
        Optional<SweepReport> report = failed ? Optional.empty()
                : Optional.of(IntervalSweep.assemble(hat, source, options, results));
        return new Outcome(report, ordered, tasks);
    }

    /** Solves the blocks of one task, on an executor. */
    static Iterator<IntervalOutcome> solveBlocks(Iterator<IntervalBlock> blocks, PosetWithBounds hat, Request request,
            String source) {
        IntervalSolver solver = new IntervalSolver(hat, request, source);
        List<IntervalOutcome> out = new ArrayList<>();
        while (blocks.hasNext()) {
            IntervalBlock block = blocks.next();
            for (int run = 0; run < block.lowers().length; run++) {
                int lower = block.lowers()[run];
                int[] uppers = hat.uppers(lower);
                for (int i = block.from()[run]; i < block.to()[run]; i++) {
                    IntervalTask task = new IntervalTask(lower, uppers[i]);
                    out.add(solveOne(solver, task, hat, source));
                }
            }
        }
        return out.iterator();
    }

    /** One interval; a failure of this interval becomes its outcome, so the task and the sweep go on. */
    private static IntervalOutcome solveOne(IntervalSolver solver, IntervalTask task, PosetWithBounds hat,
            String source) {
        try {
            return new IntervalOutcome(task, solver.solve(task), null);
        } catch (InputException e) {
            return new IntervalOutcome(task, null, e.getMessage());
        } catch (OutOfMemoryError e) {
            return new IntervalOutcome(task, null, name(source, hat, task) + ": out of memory on the executor ("
                    + (Runtime.getRuntime().maxMemory() >> 20) + " MiB heap)");
        } catch (StackOverflowError e) {
            return new IntervalOutcome(task, null, name(source, hat, task) + ": nests too deeply for the executor's stack");
        } catch (RuntimeException e) {
            return new IntervalOutcome(task, null, name(source, hat, task) + ": " + e);
        }
    }

    private static String name(String source, PosetWithBounds hat, IntervalTask task) {
        return source + " interval (" + end(hat, task.lower()) + ", " + end(hat, task.upper()) + ")";
    }

    private static String end(PosetWithBounds hat, int x) {
        String label = hat.label(x);
        return label != null ? label : x == hat.bottom() ? "0^" : "1^";
    }
}
