package dev.morse.progress;

/** The sink of each thread: thread-local, so that concurrent runs (and tests) never mix their reports. */
final class ProgressContext {
    private static final ThreadLocal<Progress> SINK = ThreadLocal.withInitial(() -> Progress.SILENT);

    private ProgressContext() {
    }

    static Progress current() {
        return SINK.get();
    }

    static ProgressScope install(Progress sink) {
        if (sink == null) {
            throw new IllegalArgumentException("a progress sink is required; use Progress.SILENT for none");
        }
        Progress previous = SINK.get();
        SINK.set(sink);
        return new ProgressScope(previous);
    }

    static void restore(Progress previous) {
        if (previous == Progress.SILENT) {
            SINK.remove();
        } else {
            SINK.set(previous);
        }
    }
}
