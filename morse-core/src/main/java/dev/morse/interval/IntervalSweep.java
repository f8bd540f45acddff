package dev.morse.interval;

import dev.morse.parallel.Workers;
import dev.morse.progress.Progress;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.atomic.AtomicLong;

/**
 * Sweeps every interval {@code x < y} of P̂ in a fixed order (shortest intervals first, then by the ids
 * of their ends), solving each with an {@link IntervalSolver}, on a bounded pool of threads that take
 * intervals from the end of that order, longest first, or from its start with {@code firstFailure}.
 * Results are kept by their place in the order, so they never depend on the
 * number of threads; with {@code firstFailure} every interval before the first failing one is still
 * solved, so the witness is the same too. The Möbius function of every interval
 * ({@link MobiusTable}) is checked against the reduced Euler characteristic of the interval's order
 * complex, which Philip Hall's theorem says it equals (Rota 1964; Stanley, Enumerative
 * Combinatorics I, Prop. 3.8.5, from memory).
 *
 * <p>Progress: the calling thread reports the count of solved intervals to its
 * {@link Progress#current()} sink while the workers, silent themselves, solve.
 */
public final class IntervalSweep {
    private static final int CHUNK = 8;

    private IntervalSweep() {
    }

    /**
     * Sweeps the intervals of {@code hat}.
     *
     * @param source the input's name, for reports and messages
     * @throws dev.morse.io.InputException if the engine cannot take an interval
     * @throws IllegalStateException if an interval's homology contradicts Philip Hall's theorem (a defect)
     */
    public static SweepReport run(PosetWithBounds hat, String source, SweepOptions options) {
        long[] order = sweepOrder(hat);
        IntervalResult[] results = new IntervalResult[order.length];
        Swept swept = solveAll(hat, source, options, order, results);
        return report(hat, source, options, order, Arrays.asList(results).subList(0, swept.count()), swept.mobius());
    }

    /**
     * Every interval of {@code hat} in the order a sweep visits them: shorter intervals first, then by
     * the ids of their ends. Work solved elsewhere (on other machines, in any order) is put back in this
     * order for {@link #assemble}.
     */
    public static List<IntervalTask> order(PosetWithBounds hat) {
        return allTasks(sweepOrder(hat));
    }

    /**
     * The report of a sweep whose intervals were solved elsewhere, exactly as {@link #run} would give
     * it: with {@code firstFailure} the results after the first interval that fails the
     * Cohen–Macaulay condition are dropped, and every kept result is checked against Philip Hall's theorem.
     *
     * @param solved the result of every interval of {@link #order}, in that order
     * @throws IllegalArgumentException unless {@code solved} matches {@link #order} interval by interval
     * @throws IllegalStateException if an interval's homology contradicts Philip Hall's theorem (a defect)
     */
    public static SweepReport assemble(PosetWithBounds hat, String source, SweepOptions options,
            List<IntervalResult> solved) {
        long[] order = sweepOrder(hat);
        if (solved.size() != order.length) {
            throw new IllegalArgumentException(solved.size() + " results for " + order.length + " intervals");
        }
        int swept = order.length;
        for (int i = 0; i < order.length; i++) {
            IntervalResult r = solved.get(i);
            if (!r.task().equals(task(order[i]))) {
                throw new IllegalArgumentException("result " + i + " is for " + r.task() + ", not " + task(order[i]));
            }
            if (options.firstFailure() && !r.cohenMacaulay() && swept == order.length) {
                swept = i + 1;
            }
        }
        return report(hat, source, options, order, solved.subList(0, swept), MobiusTable.of(hat));
    }

    private static SweepReport report(PosetWithBounds hat, String source, SweepOptions options, long[] order,
            List<IntervalResult> kept, MobiusTable mobius) {
        for (IntervalResult r : kept) {
            BigInteger mu = mobius.value(r.task().lower(), r.task().upper());
            if (!mu.equals(BigInteger.valueOf(r.homology().reducedEulerCharacteristic()))) {
                throw new IllegalStateException("Philip Hall's theorem fails on " + r + ": mu = " + mu);
            }
        }
        return SweepReport.of(hat, source, options.request().coefficients(), kept, mobius, allTasks(order));
    }

    /**
     * Every interval of P̂ as a packed key: the difference of heights, then the lower and the upper id,
     * 21 bits each, sorted, so that shorter intervals come first.
     */
    static long[] sweepOrder(PosetWithBounds hat) {
        long count = hat.intervalCount();
        if (count > Integer.MAX_VALUE - 8) {
            throw new IllegalStateException(count + " intervals, more than one sweep holds");
        }
        long[] keys = new long[(int) count];
        int k = 0;
        int n = hat.size();
        for (int x = 0; x < n; x++) {
            for (int i = hat.upStart(x); i < hat.upEnd(x); i++) {
                keys[k++] = key(hat, x, hat.upElement(i));
            }
            keys[k++] = key(hat, x, hat.top());
            keys[k++] = key(hat, hat.bottom(), x);
        }
        keys[k++] = key(hat, hat.bottom(), hat.top());
        Arrays.sort(keys);
        return keys;
    }

    private static long key(PosetWithBounds hat, int x, int y) {
        return ((long) (hat.height(y) - hat.height(x)) << 42) | ((long) x << 21) | y;
    }

    static IntervalTask task(long key) {
        return new IntervalTask((int) (key >>> 21) & 0x1FFFFF, (int) key & 0x1FFFFF);
    }

    private static List<IntervalTask> allTasks(long[] order) {
        return new java.util.AbstractList<>() {
            @Override
            public IntervalTask get(int index) {
                return task(order[index]);
            }

            @Override
            public int size() {
                return order.length;
            }
        };
    }

    /**
     * Solves intervals until all are done or, with firstFailure, in order until the first failure, and
     * computes the Möbius table of {@code hat} on the same threads.
     */
    private static Swept solveAll(PosetWithBounds hat, String source, SweepOptions options, long[] order,
            IntervalResult[] results) {
        AtomicInteger next = new AtomicInteger();
        AtomicInteger cutoff = new AtomicInteger(order.length);
        AtomicLong done = new AtomicLong();
        Map<IntervalHomology, IntervalHomology> shared = new ConcurrentHashMap<>();
        Progress progress = Progress.current();
        progress.begin("intervals", "intervals", order.length);
        int threads = options.threads();
        ExecutorService pool = Executors.newFixedThreadPool(threads, runnable -> {
            Thread t = new Thread(runnable, "interval-sweep");
            t.setDaemon(true);
            return t;
        });
        try {
            // the Möbius table goes first: with several threads it overlaps the sweep, with one it runs
            // before it, so the work is the same whatever the number of threads
            Future<MobiusTable> mobius = pool.submit(() -> MobiusTable.of(hat));
            List<Future<?>> workers = new ArrayList<>();
            for (int w = 0; w < threads; w++) {
                workers.add(pool.submit(() -> {
                    IntervalSolver solver = new IntervalSolver(hat, options.request(), source);
                    while (true) {
                        int start = next.getAndAdd(CHUNK);
                        if (start >= cutoff.get()) {
                            return null;
                        }
                        for (int p = start; p < Math.min(start + CHUNK, order.length); p++) {
                            if (p >= cutoff.get()) {
                                break;
                            }
                            // without a cutoff the longest intervals go first, so that no thread is
                            // left alone with the largest at the end (longest processing time first)
                            int i = options.firstFailure() ? p : order.length - 1 - p;
                            IntervalResult r = solver.solve(task(order[i]));
                            IntervalHomology h = shared.computeIfAbsent(r.homology(), key -> key);
                            results[i] = new IntervalResult(r.task(), r.dimension(), r.graded(), h, r.how());
                            if (options.firstFailure() && !r.cohenMacaulay()) {
                                cutoff.accumulateAndGet(i + 1, Math::min);
                            }
                            done.incrementAndGet();
                        }
                    }
                }));
            }
            for (Future<?> worker : workers) {
                Workers.await(worker, done::get, progress, () -> cutoff.set(-1), "sweeping intervals");
            }
            MobiusTable table = Workers.await(mobius, done::get, progress, () -> cutoff.set(-1), "sweeping intervals");
            progress.reached(done.get());
            return new Swept(cutoff.get(), table);
        } finally {
            pool.shutdownNow();
        }
    }

    /** How many of the first intervals in the order were solved, and the Möbius table of P̂. */
    private record Swept(int count, MobiusTable mobius) {
    }
}
