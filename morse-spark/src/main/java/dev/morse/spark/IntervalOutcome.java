package dev.morse.spark;

import dev.morse.interval.IntervalResult;
import dev.morse.interval.IntervalTask;
import java.io.Serializable;
import java.util.Objects;
import java.util.Optional;

/**
 * What became of one interval on a worker: its result, or the one-line reason it could not be solved
 * (too large for the limits or the heap). A plain serialisable value.
 *
 * @param task the interval
 * @param result its result, {@code null} when it failed
 * @param error the reason it failed, {@code null} when it was solved
 */
public record IntervalOutcome(IntervalTask task, IntervalResult result, String error) implements Serializable {
    private static final long serialVersionUID = 1L;

    /** Validates: exactly one of result and error. */
    public IntervalOutcome {
        Objects.requireNonNull(task, "task");
        if ((result == null) == (error == null)) {
            throw new IllegalArgumentException("an outcome is a result or an error");
        }
    }

    /** The result, if the interval was solved. */
    public Optional<IntervalResult> solved() {
        return Optional.ofNullable(result);
    }

    /** Whether the interval failed. */
    public boolean failed() {
        return error != null;
    }
}
