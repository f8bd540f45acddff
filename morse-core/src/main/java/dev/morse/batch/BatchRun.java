package dev.morse.batch;

import dev.morse.parallel.Workers;
import dev.morse.engine.Computation;
import dev.morse.engine.Engines;
import dev.morse.input.ChainComplexInput;
import dev.morse.input.Input;
import dev.morse.input.InputReaders;
import dev.morse.input.VoxelInput;
import dev.morse.interval.IntervalSweep;
import dev.morse.interval.PosetWithBounds;
import dev.morse.interval.SweepInputs;
import dev.morse.interval.SweepOptions;
import dev.morse.io.InputException;
import dev.morse.progress.Progress;
import dev.morse.progress.ProgressScope;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicLong;
import java.util.function.Consumer;
import java.util.function.Function;

/**
 * Runs a batch: every input read and computed on its own ({@link InputReaders}, {@link Engines}),
 * with the Cohen–Macaulay verdict of an interval sweep when asked, on a bounded pool of threads. An
 * input that fails becomes a {@link BatchOutcome.Failed} and the batch goes on. Each outcome is turned
 * into text by the caller's renderer on the worker thread (so that no computation outlives its
 * input), and the texts are handed on in the order of the inputs, each as soon as it and all before it
 * are done.
 */
public final class BatchRun {

    private BatchRun() {
    }

    /**
     * The inputs named by {@code paths}: each directory stands for the regular files directly in it,
     * by name, hidden ones left out, unless it holds boundary matrices ({@code boundary-D.mtx}), when
     * it is one chain complex; anything else stands for itself (a missing file fails in its turn).
     *
     * @throws InputException if a directory cannot be listed
     */
    public static List<BatchItem> items(List<Path> paths) {
        List<BatchItem> items = new ArrayList<>();
        for (Path path : paths) {
            if (Files.isDirectory(path) && !holdsMatrices(path)) {
                try (var listing = Files.list(path)) {
                    for (Path file : listing.filter(Files::isRegularFile)
                            .filter(f -> !f.getFileName().toString().startsWith(".")).sorted().toList()) {
                        items.add(new BatchItem(items.size(), file.toString()));
                    }
                } catch (IOException | UncheckedIOException e) {
                    throw new InputException(path.toString(), InputException.NO_LINE, "cannot be listed: " + e.getMessage());
                }
            } else {
                items.add(new BatchItem(items.size(), path.toString()));
            }
        }
        return items;
    }

    private static boolean holdsMatrices(Path directory) {
        try (var listing = Files.list(directory)) {
            return listing.anyMatch(f -> f.getFileName().toString().matches("boundary-\\d{1,9}\\.mtx"));
        } catch (IOException | UncheckedIOException e) {
            throw new InputException(directory.toString(), InputException.NO_LINE, "cannot be listed: " + e.getMessage());
        }
    }

    /**
     * Computes one input; never throws for a problem of the input.
     */
    public static BatchOutcome compute(BatchItem item, BatchOptions options) {
        try (ProgressScope silent = Progress.use(Progress.SILENT)) {
            Input input = InputReaders.read(List.of(Path.of(item.path())), options.read());
            Computation run = Engines.compute(input, options.request());
            Optional<Boolean> cm = Optional.empty();
            if (options.cohenMacaulay() && !(input instanceof VoxelInput) && !(input instanceof ChainComplexInput)) {
                PosetWithBounds hat = PosetWithBounds.of(SweepInputs.posetOf(input));
                cm = Optional.of(IntervalSweep.run(hat, input.source(), new SweepOptions(options.request(), 1, true))
                        .cohenMacaulay());
            }
            return new BatchOutcome.Done(item, run, cm);
        } catch (InputException e) {
            return new BatchOutcome.Failed(item, e.getMessage());
        } catch (IOException | UncheckedIOException e) {
            return new BatchOutcome.Failed(item, item.path() + ": cannot be read: " + e.getMessage());
        } catch (OutOfMemoryError e) {
            return new BatchOutcome.Failed(item, item.path() + ": out of memory");
        } catch (RuntimeException e) {
            return new BatchOutcome.Failed(item, item.path() + ": " + (e.getMessage() != null ? e.getMessage() : e));
        }
    }

    /**
     * Runs the batch.
     *
     * @param render turns an outcome into its text, on the worker thread
     * @param emit receives the texts in the order of the inputs, on the calling thread
     * @return how many inputs failed
     */
    public static int run(List<BatchItem> items, BatchOptions options, Function<BatchOutcome, String> render,
            Consumer<String> emit) {
        Progress progress = Progress.current();
        progress.begin("batch", "inputs", items.size());
        AtomicLong done = new AtomicLong();
        ExecutorService pool = Executors.newFixedThreadPool(options.threads(), runnable -> {
            Thread t = new Thread(runnable, "batch");
            t.setDaemon(true);
            return t;
        });
        int failed = 0;
        try {
            List<Future<Rendered>> futures = new ArrayList<>();
            for (BatchItem item : items) {
                futures.add(pool.submit(() -> {
                    BatchOutcome outcome = compute(item, options);
                    String text = render.apply(outcome);
                    done.incrementAndGet();
                    return new Rendered(text, outcome instanceof BatchOutcome.Failed);
                }));
            }
            for (Future<Rendered> future : futures) {
                Rendered r = Workers.await(future, done::get, progress, () -> { }, "running a batch");
                emit.accept(r.text());
                if (r.failed()) {
                    failed++;
                }
            }
        } finally {
            pool.shutdownNow();
        }
        return failed;
    }

    private record Rendered(String text, boolean failed) {
    }
}
