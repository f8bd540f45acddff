package dev.morse.matching;

import java.time.Duration;
import java.util.Objects;

/**
 * What the exact solver found: the best acyclic matching it knows, whether it proved that no Morse
 * matching leaves fewer critical cells, and the proven lower bound on the number of critical cells.
 * When {@code proven}, the bound equals the matching's total. Immutable.
 *
 * @param matching the best Morse matching found, verified by {@link MatchingVerifier}
 * @param critical critical cells per dimension of {@code matching}
 * @param proven whether {@code matching} is proven optimal (no Morse matching has more pairs)
 * @param lowerBound no Morse matching of the complex leaves fewer critical cells than this
 * @param elapsed wall-clock time of the search
 * @param solves integer programs solved (0 when the bounds met the incumbent without one)
 * @param cuts constraints added for acyclicity (cycle and core cuts)
 */
public record OptimalMatching(Matching matching, int[] critical, boolean proven, long lowerBound, Duration elapsed,
        int solves, int cuts) {
    /** Copies and checks that the bound is consistent with the matching. */
    public OptimalMatching {
        Objects.requireNonNull(matching, "matching");
        Objects.requireNonNull(elapsed, "elapsed");
        critical = critical.clone();
        long total = total(critical);
        if (lowerBound > total || (proven && lowerBound != total)) {
            throw new IllegalArgumentException("bound " + lowerBound + " inconsistent with " + total + " critical cells"
                    + (proven ? " proven optimal" : ""));
        }
    }

    /** A copy. */
    @Override
    public int[] critical() {
        return critical.clone();
    }

    /** Total critical cells of the matching. */
    public long criticalTotal() {
        return total(critical);
    }

    private static long total(int[] critical) {
        long total = 0;
        for (int m : critical) {
            total += m;
        }
        return total;
    }

    /** Critical cells beyond the proven lower bound: 0 when proven optimal. */
    public long gap() {
        return criticalTotal() - lowerBound;
    }
}
