package dev.morse.engine;

import dev.morse.matching.TrialCount;
import java.util.List;
import java.util.Objects;

/**
 * One matching heuristic's run in a comparison. Immutable.
 *
 * @param matching the heuristic's name
 * @param critical critical cells per dimension of its matching
 * @param timings its phases ({@code match}, {@code verify}, {@code sweep}, {@code reduce},
 *     {@code homology}) in the order they ran
 * @param peakHeapBytes the approximate peak of heap use while it ran (the sum of the heap pools'
 *     peaks, the complex included), or -1 when the JVM does not tell
 * @param trials for a randomized heuristic run several times: each vector of critical cells that
 *     occurred and how often; otherwise empty
 */
public record MatchingRun(String matching, List<Integer> critical, List<PhaseTiming> timings, long peakHeapBytes,
        List<TrialCount> trials) {
    /** Validates and copies. */
    public MatchingRun {
        Objects.requireNonNull(matching, "matching");
        critical = List.copyOf(critical);
        timings = List.copyOf(timings);
        trials = List.copyOf(trials);
    }

    /** Total number of critical cells. */
    public long totalCritical() {
        return critical.stream().mapToLong(Integer::longValue).sum();
    }

    /** Milliseconds of the named phase, or -1 if it did not run. */
    public double millis(String phase) {
        return timings.stream().filter(t -> t.phase().equals(phase)).mapToDouble(PhaseTiming::milliseconds)
                .findFirst().orElse(-1);
    }

    /** Milliseconds over all phases. */
    public double totalMillis() {
        return timings.stream().mapToDouble(PhaseTiming::milliseconds).sum();
    }

    /** How many trials ran: the sum of the counts. */
    public int trialCount() {
        return trials.stream().mapToInt(TrialCount::count).sum();
    }
}
