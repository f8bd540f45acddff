package dev.morse.progress;

import java.util.Locale;

/**
 * One reading of a {@link ProgressCounter}.
 *
 * @param phase the phase under way
 * @param unit what it counts
 * @param done how many are done
 * @param total how many there are, or 0 when unknown
 * @param phaseNanos time since the phase began
 * @param runNanos time since the counter was made
 */
public record ProgressSnapshot(String phase, String unit, long done, long total, long phaseNanos, long runNanos) {
    private static final double NANOS_PER_SECOND = 1e9;

    /**
     * One line for a terminal, such as
     * {@code match: 1,200,000 of 5,000,000 cells (24%), 800,000 cells/s, 3.2 s elapsed}.
     * The rate is over the phase so far; the elapsed time is the whole run's.
     */
    public String line() {
        StringBuilder s = new StringBuilder(phase).append(": ");
        s.append(String.format(Locale.ROOT, "%,d", done));
        if (total > 0) {
            s.append(String.format(Locale.ROOT, " of %,d %s (%d%%)", total, unit, Math.min(100, done * 100 / total)));
        } else {
            s.append(' ').append(unit);
        }
        if (phaseNanos > 0) {
            s.append(String.format(Locale.ROOT, ", %,d %s/s", Math.round(done * NANOS_PER_SECOND / phaseNanos), unit));
        }
        s.append(String.format(Locale.ROOT, ", %.1f s elapsed", runNanos / NANOS_PER_SECOND));
        return s.toString();
    }
}
