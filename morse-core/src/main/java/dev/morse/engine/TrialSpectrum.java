package dev.morse.engine;

import dev.morse.matching.TrialCount;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * The spread of total critical cells over a randomized matching's seeded trials, set against the
 * Morse lower bound and, when the exact search ran, against its best matching: how many trials
 * reached each, and the least, median and greatest total. The median is the lower median, a total
 * some trial found. Immutable.
 *
 * @param trials how many trials ran
 * @param minTotal the fewest critical cells of any trial
 * @param medianTotal the lower median of the trials' totals
 * @param maxTotal the most critical cells of any trial
 * @param bound the Morse lower bound on the total
 * @param atBound trials whose total meets the bound
 * @param optimum the exact search's best total, when it ran
 * @param atOptimum trials whose total meets {@code optimum} (0 when it did not run)
 */
public record TrialSpectrum(int trials, long minTotal, long medianTotal, long maxTotal, long bound, int atBound,
        Optional<Long> optimum, int atOptimum) {
    /** Validates. */
    public TrialSpectrum {
        Objects.requireNonNull(optimum, "optimum");
        if (trials < 1 || minTotal > medianTotal || medianTotal > maxTotal) {
            throw new IllegalArgumentException("a spectrum needs at least one trial and ordered totals");
        }
    }

    /**
     * The spectrum of a tally of trials.
     *
     * @param tally each vector of critical cells that occurred and how often; not empty
     * @param bound the Morse lower bound on the total
     * @param optimum the best total the exact search found, if it ran
     */
    public static TrialSpectrum of(List<TrialCount> tally, long bound, Optional<Long> optimum) {
        int trials = tally.stream().mapToInt(TrialCount::count).sum();
        if (trials == 0) {
            throw new IllegalArgumentException("no trials");
        }
        long[] totals = new long[tally.size()];
        for (int i = 0; i < totals.length; i++) {
            totals[i] = total(tally.get(i));
        }
        long min = Long.MAX_VALUE;
        long max = Long.MIN_VALUE;
        int atBound = 0;
        int atOptimum = 0;
        for (int i = 0; i < totals.length; i++) {
            min = Math.min(min, totals[i]);
            max = Math.max(max, totals[i]);
            atBound += totals[i] == bound ? tally.get(i).count() : 0;
            atOptimum += optimum.isPresent() && totals[i] == optimum.get() ? tally.get(i).count() : 0;
        }
        // the lower median: the smallest total t with at least half of the trials (rounded up) at or below t
        int half = (trials + 1) / 2;
        long median = max;
        for (long candidate = min; candidate <= max; candidate++) {
            int atOrBelow = 0;
            for (int i = 0; i < totals.length; i++) {
                atOrBelow += totals[i] <= candidate ? tally.get(i).count() : 0;
            }
            if (atOrBelow >= half) {
                median = candidate;
                break;
            }
        }
        return new TrialSpectrum(trials, min, median, max, bound, atBound, optimum, atOptimum);
    }

    /** Critical cells of one vector in all dimensions. */
    public static long total(TrialCount trial) {
        return trial.critical().stream().mapToLong(Integer::longValue).sum();
    }
}
