package dev.morse.parallel;

import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import java.util.function.LongSupplier;
import dev.morse.progress.Progress;
import java.util.concurrent.atomic.AtomicIntegerArray;
import java.util.function.IntConsumer;

/**
 * The worker threads shared by the parallel phases (reading, the CW poset check, ...). The number
 * of threads is the system property {@code morse.threads} if set, else the number of processors.
 * A phase runs one body per worker, indexed {@code 0..workers-1}, with worker 0 on the calling
 * thread; the others come from one cached pool of daemon threads, so nothing is left running and
 * an idle program holds no threads for long.
 */
public final class Workers {
    /** The system property that fixes the number of threads. */
    public static final String THREADS_PROPERTY = "morse.threads";
    /** How often a waiting caller shows progress. */
    private static final long POLL_MILLIS = 200;

    private static final ExecutorService POOL = Executors.newCachedThreadPool(task -> {
        Thread t = new Thread(task, "morse-worker");
        t.setDaemon(true);
        return t;
    });

    private Workers() {
    }

    /** The number of threads parallel phases use: at least 1. */
    public static int threads() {
        String fixed = System.getProperty(THREADS_PROPERTY);
        if (fixed != null && !fixed.isBlank()) {
            try {
                return Math.max(1, Integer.parseInt(fixed.strip()));
            } catch (NumberFormatException e) {
                throw new IllegalArgumentException(THREADS_PROPERTY + " must be a whole number, not '" + fixed + "'", e);
            }
        }
        return Math.max(1, Runtime.getRuntime().availableProcessors());
    }

    /**
     * Runs {@code body.accept(w)} for workers {@code w} in {@code 0..workers-1} at once and returns
     * when all that started have finished. Worker 0 runs on the calling thread; a worker whose
     * thread has not started by the time worker 0 is done is not run at all, so that a busy machine
     * never makes the caller wait for a thread only to find the work gone. Bodies must therefore
     * share their work through a common counter rather than split it in advance. The first failure
     * of any worker is rethrown here after all have stopped; everything the workers wrote is
     * visible to the caller afterwards.
     */
    public static void share(int workers, IntConsumer body) {
        if (workers <= 1) {
            body.accept(0);
            return;
        }
        Future<?>[] others = new Future<?>[workers - 1];
        // per worker: 0 while waiting for a thread, 1 once started, 2 once given up by the caller
        AtomicIntegerArray state = new AtomicIntegerArray(workers);
        for (int w = 1; w < workers; w++) {
            int worker = w;
            others[w - 1] = POOL.submit(() -> {
                if (state.compareAndSet(worker, 0, 1)) {
                    body.accept(worker);
                }
            });
        }
        Throwable failure = null;
        try {
            body.accept(0);
        } catch (RuntimeException | Error e) {
            failure = e;
        }
        for (int w = 1; w < workers; w++) {
            if (state.compareAndSet(w, 0, 2)) {
                continue; // never started, and now never will: its share was done by the others
            }
            try {
                others[w - 1].get();
            } catch (ExecutionException e) {
                failure = failure != null ? failure : e.getCause();
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                failure = failure != null ? failure : e;
            }
        }
        if (failure instanceof RuntimeException r) {
            throw r;
        }
        if (failure instanceof Error e) {
            throw e;
        }
        if (failure != null) {
            throw new IllegalStateException("a worker failed", failure);
        }
    }

    /**
     * Waits for {@code future}, showing the count {@code done} on {@code progress} while it runs. When
     * the task failed, {@code onFailure} runs first (to stop its fellow tasks) and the failure is
     * thrown on as it was: a RuntimeException or Error unchanged, anything else wrapped.
     *
     * @param what what is waited for, named when the wait is interrupted
     */
    public static <T> T await(Future<T> future, LongSupplier done, Progress progress, Runnable onFailure,
            String what) {
        while (true) {
            try {
                return future.get(POLL_MILLIS, TimeUnit.MILLISECONDS);
            } catch (TimeoutException e) {
                progress.reached(done.getAsLong());
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new IllegalStateException("interrupted while " + what, e);
            } catch (ExecutionException e) {
                onFailure.run();
                Throwable cause = e.getCause();
                if (cause instanceof RuntimeException runtime) {
                    throw runtime;
                }
                if (cause instanceof Error error) {
                    throw error;
                }
                throw new IllegalStateException(cause);
            }
        }
    }
}
