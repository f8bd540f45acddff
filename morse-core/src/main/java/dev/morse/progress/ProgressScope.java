package dev.morse.progress;

/** While open, a sink is installed for one thread; closing it restores the one before. */
public final class ProgressScope implements AutoCloseable {
    private final Progress previous;
    private boolean closed;

    ProgressScope(Progress previous) {
        this.previous = previous;
    }

    /** Restores the previous sink; closing twice does nothing more. */
    @Override
    public void close() {
        if (!closed) {
            closed = true;
            ProgressContext.restore(previous);
        }
    }
}
