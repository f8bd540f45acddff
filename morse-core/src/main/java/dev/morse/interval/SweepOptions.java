package dev.morse.interval;

import dev.morse.engine.Request;
import java.util.Objects;

/**
 * How to sweep the intervals of a poset.
 *
 * @param request how each interval's homology is computed; its coefficients are those of every
 *     verdict, and homology is always reduced
 * @param threads how many threads solve intervals at once (at least 1); the results never depend on it
 * @param firstFailure whether to stop at the first interval that fails the Cohen–Macaulay condition
 *     in sweep order
 */
public record SweepOptions(Request request, int threads, boolean firstFailure) {
    /** Validates. */
    public SweepOptions {
        Objects.requireNonNull(request, "request");
        if (threads < 1) {
            throw new IllegalArgumentException("threads must be at least 1, not " + threads);
        }
    }

    /** One thread, the whole sweep. */
    public static SweepOptions of(Request request) {
        return new SweepOptions(request, 1, false);
    }
}
