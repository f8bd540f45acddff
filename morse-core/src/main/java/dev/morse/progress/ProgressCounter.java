package dev.morse.progress;

/**
 * A {@link Progress} sink that only remembers the latest report, for another thread to read with
 * {@link #snapshot()}. One computing thread writes; any thread reads. A phase is one immutable value
 * behind a volatile reference and the count is a volatile long, so a reader sees each field whole
 * (the count of a phase that has just ended may briefly show beside the next phase's name; a
 * display shrugs that off). About 100 bytes, however long the run.
 */
public final class ProgressCounter implements Progress {
    private final Clock clock;
    private final long createdNanos;
    private volatile PhaseStart phase;
    private volatile long done;

    /** What the phase under way is and when it began. */
    private record PhaseStart(String name, String unit, long total, long startNanos) {
    }

    /** A counter timed by {@link System#nanoTime()}. */
    public ProgressCounter() {
        this(System::nanoTime);
    }

    /** A counter timed by {@code clock}, for tests. */
    public ProgressCounter(Clock clock) {
        this.clock = clock;
        this.createdNanos = clock.nanoTime();
    }

    /** A source of nanosecond readings, as {@link System#nanoTime()}. */
    @FunctionalInterface
    public interface Clock {
        /** The current reading. */
        long nanoTime();
    }

    @Override
    public void begin(String phase, String unit, long total) {
        done = 0;
        this.phase = new PhaseStart(phase, unit, Math.max(0, total), clock.nanoTime());
    }

    @Override
    public void reached(long done) {
        this.done = done;
    }

    @Override
    public void advance(long delta) {
        // one writer thread, so the read-modify-write needs no lock
        done += delta;
    }

    /** The latest state, or {@code null} before any phase began. */
    public ProgressSnapshot snapshot() {
        PhaseStart p = phase;
        if (p == null) {
            return null;
        }
        long now = clock.nanoTime();
        return new ProgressSnapshot(p.name(), p.unit(), done, p.total(), now - p.startNanos(), now - createdNanos);
    }
}
