package dev.morse.progress;

/**
 * Where a long phase says how far it is. A phase fetches {@link #current()} once, calls
 * {@link #begin} and then reports its count coarsely, every few thousand cells, so that hot loops
 * pay one well-predicted branch per cell and a volatile write now and then. Unless a caller has
 * installed a sink for the current thread with {@link #use}, {@link #current()} is {@link #SILENT},
 * which ignores everything.
 *
 * <p>Implementations must tolerate being told about any phase at any time, and must be cheap: they
 * are called from the computing thread and must not block it.
 */
public interface Progress {
    /** Ignores every report. */
    Progress SILENT = new Silent();

    /**
     * A new phase starts.
     *
     * @param phase a short lower-case name such as {@code match}
     * @param unit what is counted, plural, such as {@code cells} or {@code lines}
     * @param total how many there are in all, or 0 when not known in advance
     */
    void begin(String phase, String unit, long total);

    /** So many units of the current phase are done in all. */
    void reached(long done);

    /** So many more units of the current phase are done. */
    void advance(long delta);

    /** The sink installed for the current thread, or {@link #SILENT}. */
    static Progress current() {
        return ProgressContext.current();
    }

    /**
     * Installs {@code sink} for the current thread until the returned scope is closed, which restores
     * the sink that was there before. Meant for try-with-resources.
     */
    static ProgressScope use(Progress sink) {
        return ProgressContext.install(sink);
    }

    /** The sink that ignores everything. */
    final class Silent implements Progress {
        private Silent() {
        }

        @Override
        public void begin(String phase, String unit, long total) {
        }

        @Override
        public void reached(long done) {
        }

        @Override
        public void advance(long delta) {
        }
    }
}
