package dev.morse.implicit;

import dev.morse.poset.Adjacency;
import dev.morse.poset.Poset;
import java.util.Arrays;
import java.util.Comparator;

/**
 * A poset P with a bottom 0̂ and a top 1̂ adjoined, renumbered for chain walks: the elements of P
 * get the internal ids {@code 0..n-1} in order of height, then of their id in P, so the elements of
 * every chain ascend in internal id from the bottom up; 0̂ is {@code n} and 1̂ is {@code n + 1}. The
 * upper covers of each element are kept sorted by an {@link ElementOrder}, and comparability is
 * answered from the closed down-set of every element, held as a bit set over internal ids.
 *
 * <p>Memory: {@code n²/8} bytes for the down-sets, plus 4 bytes per cover and about 16 bytes per
 * element. Immutable.
 */
final class BoundedPoset {
    private final Poset poset;
    private final int n;
    private final int[] originalOf;
    private final int[] internalOf;
    private final int[] upStart;
    private final int[] upTargets;
    private final long[][] downSets;

    private BoundedPoset(Poset poset, int[] originalOf, int[] internalOf, long[][] downSets) {
        this.poset = poset;
        this.n = poset.size();
        this.originalOf = originalOf;
        this.internalOf = internalOf;
        this.downSets = downSets;
        this.upStart = new int[n + 3];
        this.upTargets = new int[poset.coverCount() + 2 * n + 1];
    }

    /**
     * The bounded poset of {@code poset} with covers tried by ascending rank, such as
     * {@code order::ranks} for an {@link ElementOrder}.
     *
     * @throws IllegalStateException if the down-sets would take more than {@code maxDownSetBytes}
     */
    static BoundedPoset of(Poset poset, Ranking ranking, long maxDownSetBytes) {
        int n = poset.size();
        long bytes = downSetBytes(n);
        if (bytes > maxDownSetBytes) {
            throw new IllegalStateException("the implicit engine keeps the down-set of every element, "
                    + (bytes >> 20) + " MiB for " + n + " elements, more than the " + (maxDownSetBytes >> 20)
                    + " MiB allowed (raise the heap with JAVA_OPTS=-Xmx...)");
        }
        Integer[] byHeight = new Integer[n];
        for (int x = 0; x < n; x++) {
            byHeight[x] = x;
        }
        Arrays.sort(byHeight, Comparator.comparingInt((Integer x) -> poset.height(x)).thenComparingInt(x -> x));
        int[] originalOf = new int[n];
        int[] internalOf = new int[n];
        for (int i = 0; i < n; i++) {
            originalOf[i] = byHeight[i];
            internalOf[byHeight[i]] = i;
        }
        long[][] downSets = closedDownSets(poset, originalOf, internalOf);
        BoundedPoset bounded = new BoundedPoset(poset, originalOf, internalOf, downSets);
        bounded.sortCovers(ranking.ranks(bounded));
        return bounded;
    }

    /** Bytes of the down-set bit sets for {@code n} elements. */
    static long downSetBytes(long n) {
        return n * (((n + 63) >>> 6) * 8 + 16);
    }

    /** A total order of the elements of P, as a rank for each internal id (lower ranks first). */
    @FunctionalInterface
    interface Ranking {
        /** Distinct ranks, one per internal id {@code 0..n-1}. */
        long[] ranks(BoundedPoset poset);
    }

    /** Internal ids increase with height, so each down-set is complete when the elements above need it. */
    private static long[][] closedDownSets(Poset poset, int[] originalOf, int[] internalOf) {
        int n = originalOf.length;
        int words = (n + 63) >>> 6;
        long[][] sets = new long[n][];
        Adjacency lower = poset.lowerCovers();
        for (int x = 0; x < n; x++) {
            long[] set = new long[words];
            set[x >>> 6] |= 1L << x;
            int original = originalOf[x];
            for (int i = lower.start(original); i < lower.end(original); i++) {
                long[] below = sets[internalOf[lower.target(i)]];
                for (int w = 0; w < words; w++) {
                    set[w] |= below[w];
                }
            }
            sets[x] = set;
        }
        return sets;
    }

    private void sortCovers(long[] rank) {
        Adjacency upper = poset.upperCovers();
        int at = 0;
        for (int x = 0; x < n + 2; x++) {
            upStart[x] = at;
            if (x < n) {
                int original = originalOf[x];
                if (upper.degree(original) == 0) {
                    upTargets[at++] = top();
                } else {
                    for (int i = upper.start(original); i < upper.end(original); i++) {
                        upTargets[at++] = internalOf[upper.target(i)];
                    }
                }
            } else if (x == bottom()) {
                for (int y = 0; y < n && poset.lowerCovers().degree(originalOf[y]) == 0; y++) {
                    upTargets[at++] = y; // the minimal elements have height 0 and come first
                }
                if (n == 0) {
                    upTargets[at++] = top();
                }
            }
            sortByRank(upStart[x], at, rank);
        }
        upStart[n + 2] = at;
    }

    /** Insertion sort: cover lists are short. 1̂ is alone in its lists, so it needs no rank. */
    private void sortByRank(int from, int to, long[] rank) {
        for (int i = from + 1; i < to; i++) {
            int y = upTargets[i];
            int k = i - 1;
            while (k >= from && rank[upTargets[k]] > rank[y]) {
                upTargets[k + 1] = upTargets[k];
                k--;
            }
            upTargets[k + 1] = y;
        }
    }

    /** The poset P itself. */
    Poset poset() {
        return poset;
    }

    /** Number of elements of P. */
    int size() {
        return n;
    }

    /** The adjoined bottom 0̂. */
    int bottom() {
        return n;
    }

    /** The adjoined top 1̂. */
    int top() {
        return n + 1;
    }

    /** The id in P of internal element {@code x < n}. */
    int original(int x) {
        return originalOf[x];
    }

    /** The internal id of element {@code x} of P. */
    int internal(int x) {
        return internalOf[x];
    }

    /** Number of upper covers of {@code x} in P̂. */
    int coverCount(int x) {
        return upStart[x + 1] - upStart[x];
    }

    /** The {@code k}-th upper cover of {@code x} in the element order. */
    int cover(int x, int k) {
        return upTargets[upStart[x] + k];
    }

    /** Position of {@code y} among the upper covers of {@code x}, or -1. */
    int coverIndex(int x, int y) {
        for (int i = upStart[x]; i < upStart[x + 1]; i++) {
            if (upTargets[i] == y) {
                return i - upStart[x];
            }
        }
        return -1;
    }

    /** Whether {@code y ≤ x} in P̂. */
    boolean belowOrEqual(int y, int x) {
        if (y == x || x == top() || y == bottom()) {
            return true;
        }
        if (y == top() || x == bottom()) {
            return false;
        }
        return (downSets[x][y >>> 6] & (1L << y)) != 0;
    }

    /**
     * Compares the closed down-sets of two elements of P as words over the internal order: the set
     * holding the first element where they differ comes first. A total order, since an element is the
     * top of its closed down-set.
     */
    int compareDownSets(int a, int b) {
        long[] sa = downSets[a];
        long[] sb = downSets[b];
        for (int w = 0; w < sa.length; w++) {
            long diff = sa[w] ^ sb[w];
            if (diff != 0) {
                return (sa[w] & Long.lowestOneBit(diff)) != 0 ? -1 : 1;
            }
        }
        return 0;
    }

    /** Whether one of the first {@code k} covers of {@code x} lies below or at {@code target}. */
    boolean earlierCoverBelow(int x, int k, int target) {
        int start = upStart[x];
        for (int i = start; i < start + k; i++) {
            if (belowOrEqual(upTargets[i], target)) {
                return true;
            }
        }
        return false;
    }

    /** The first upper cover of {@code x} in the element order that lies below or at {@code target > x}. */
    int greedyStep(int x, int target) {
        for (int i = upStart[x]; i < upStart[x + 1]; i++) {
            if (belowOrEqual(upTargets[i], target)) {
                return upTargets[i];
            }
        }
        throw new IllegalArgumentException("no cover of the element lies below the target");
    }

    /** Number of elements in a longest chain of P̂, from 0̂ to 1̂ included. */
    int longestChain() {
        return poset.maxHeight() + 3;
    }
}
