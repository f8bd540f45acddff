package dev.morse.implicit;

import it.unimi.dsi.fastutil.ints.IntArrayList;
import java.util.ArrayList;
import java.util.List;

/**
 * The critical chains of the matching, by dimension, each as its internal ids ascending; a chain of
 * dimension d takes d + 1 consecutive ints. Memory: 4 bytes per element of each chain.
 */
final class CriticalChains {
    private final List<IntArrayList> byDimension;
    private final SearchStatistics statistics;

    CriticalChains(List<IntArrayList> byDimension, SearchStatistics statistics) {
        this.byDimension = new ArrayList<>(byDimension);
        this.statistics = statistics;
    }

    /** The highest dimension with a critical chain, or -1. */
    int dimension() {
        int d = byDimension.size() - 1;
        while (d >= 0 && byDimension.get(d).isEmpty()) {
            d--;
        }
        return d;
    }

    /** Critical chains of dimension {@code d}. */
    int count(int d) {
        return d < 0 || d >= byDimension.size() ? 0 : byDimension.get(d).size() / (d + 1);
    }

    /** Critical chains per dimension from 0 to {@code top}. */
    int[] counts(int top) {
        int[] counts = new int[top + 1];
        for (int d = 0; d <= top; d++) {
            counts[d] = count(d);
        }
        return counts;
    }

    /** Copies the k-th critical chain of dimension d into {@code out}. */
    void copy(int d, int k, int[] out) {
        byDimension.get(d).getElements(k * (d + 1), out, 0, d + 1);
    }

    /** What the search did. */
    SearchStatistics statistics() {
        return statistics;
    }
}
