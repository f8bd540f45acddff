package dev.morse.engine;

/**
 * How long one phase of a run took, in milliseconds of wall-clock time.
 *
 * @param phase a short lower-case name such as {@code read}
 * @param milliseconds the elapsed time, at least 0
 */
public record PhaseTiming(String phase, double milliseconds) {
    /** Validates. */
    public PhaseTiming {
        if (phase == null || phase.isBlank()) {
            throw new IllegalArgumentException("a phase needs a name");
        }
        if (!(milliseconds >= 0)) {
            throw new IllegalArgumentException("elapsed time must be at least 0, not " + milliseconds);
        }
    }

    /** The time elapsed since {@code startNanos}, a reading of {@link System#nanoTime()}. */
    public static PhaseTiming since(String phase, long startNanos) {
        return new PhaseTiming(phase, Math.max(0, System.nanoTime() - startNanos) / 1e6);
    }
}
