package dev.morse.batch;

import dev.morse.engine.Request;
import dev.morse.input.ReadOptions;
import java.util.Objects;

/**
 * How to run a batch.
 *
 * @param request how each input is computed
 * @param read how images and graphs among the inputs are read
 * @param threads how many inputs are computed at once (at least 1); the output never depends on it
 * @param cohenMacaulay whether each poset and simplicial complex also gets the Cohen–Macaulay verdict
 *     over the request's coefficients
 */
public record BatchOptions(Request request, ReadOptions read, int threads, boolean cohenMacaulay) {
    /** Validates. */
    public BatchOptions {
        Objects.requireNonNull(request, "request");
        Objects.requireNonNull(read, "read");
        if (threads < 1) {
            throw new IllegalArgumentException("threads must be at least 1, not " + threads);
        }
    }
}
