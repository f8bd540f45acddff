package dev.morse.progress;

import java.io.PrintWriter;

/**
 * Shows a {@link ProgressCounter} as one line on a terminal, rewritten in place with a carriage
 * return: a daemon thread waits {@code delay}, so that short runs print nothing, then rewrites the
 * line every {@code period}. The computing thread never waits for it. Closing stops the thread and
 * blanks the line, so that whatever is printed next starts on a clean line.
 */
public final class ProgressDisplay implements AutoCloseable {
    private final PrintWriter terminal;
    private final ProgressCounter counter;
    private final Object lock = new Object();
    private final Thread thread;
    private int shownLength;
    private boolean stopped;

    private ProgressDisplay(PrintWriter terminal, ProgressCounter counter, long delayMillis, long periodMillis) {
        this.terminal = terminal;
        this.counter = counter;
        this.thread = new Thread(() -> loop(delayMillis, periodMillis), "morse-progress");
        thread.setDaemon(true);
    }

    /**
     * Starts showing {@code counter} on {@code terminal}.
     *
     * @param delayMillis how long to stay quiet first
     * @param periodMillis how often to rewrite the line afterwards
     */
    public static ProgressDisplay start(PrintWriter terminal, ProgressCounter counter, long delayMillis,
            long periodMillis) {
        if (delayMillis < 0 || periodMillis <= 0) {
            throw new IllegalArgumentException("the delay must not be negative and the period must be positive");
        }
        ProgressDisplay display = new ProgressDisplay(terminal, counter, delayMillis, periodMillis);
        display.thread.start();
        return display;
    }

    /** A display whose thread is never started: {@link #refresh()} draws on demand. For tests. */
    static ProgressDisplay manual(PrintWriter terminal, ProgressCounter counter) {
        return new ProgressDisplay(terminal, counter, 0, 1);
    }

    private void loop(long delayMillis, long periodMillis) {
        try {
            Thread.sleep(delayMillis);
            while (refresh()) {
                Thread.sleep(periodMillis);
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }

    /** Rewrites the line from the counter's latest state; false once closed. */
    boolean refresh() {
        synchronized (lock) {
            if (stopped) {
                return false;
            }
            ProgressSnapshot snapshot = counter.snapshot();
            if (snapshot != null) {
                String line = snapshot.line();
                terminal.print('\r' + line + " ".repeat(Math.max(0, shownLength - line.length())));
                terminal.flush();
                // the padding keeps the longer line's width in use on the terminal
                shownLength = Math.max(shownLength, line.length());
            }
            return true;
        }
    }

    /** Stops the display and blanks its line if anything was shown. */
    @Override
    public void close() {
        synchronized (lock) {
            if (stopped) {
                return;
            }
            stopped = true;
            if (shownLength > 0) {
                terminal.print('\r' + " ".repeat(shownLength) + '\r');
                terminal.flush();
            }
        }
        thread.interrupt();
    }
}
