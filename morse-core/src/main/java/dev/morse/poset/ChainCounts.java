package dev.morse.poset;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Counts the nonempty chains of a poset, the cells of its order complex, without listing them: one
 * pass over a linear extension, where the chains with top x are x alone and the chains with top
 * below x extended by x. The elements below x are found by a search down the Hasse diagram, so the
 * work is about the number of comparable pairs times the cover degree, and memory is 8 bytes per
 * element and dimension plus 8 bytes per element.
 */
public final class ChainCounts {
    private ChainCounts() {
    }

    /**
     * Nonempty chains by dimension: entry d counts the chains of d + 1 elements.
     *
     * @throws ArithmeticException if a count does not fit in a long
     */
    public static long[] perDimension(Poset poset) {
        int n = poset.size();
        long[] total = new long[poset.maxHeight() + 1];
        long[][] ending = new long[n][];
        DownSearch search = new DownSearch(poset);
        for (int x : poset.linearExtension()) {
            long[] mine = new long[poset.height(x) + 1];
            mine[0] = 1;
            int count = search.below(x);
            for (int t = 0; t < count; t++) {
                long[] theirs = ending[search.found(t)];
                for (int d = 0; d < theirs.length; d++) {
                    mine[d + 1] = Math.addExact(mine[d + 1], theirs[d]);
                }
            }
            ending[x] = mine;
            for (int d = 0; d < mine.length; d++) {
                total[d] = Math.addExact(total[d], mine[d]);
            }
        }
        return total;
    }

    /**
     * Nonempty chains by dimension, exactly however many: counted in longs by
     * {@link #perDimension} and, should a count overflow, counted again in BigInteger by the same pass.
     */
    public static List<BigInteger> exact(Poset poset) {
        try {
            List<BigInteger> exact = new ArrayList<>();
            for (long c : perDimension(poset)) {
                exact.add(BigInteger.valueOf(c));
            }
            return exact;
        } catch (ArithmeticException overflow) {
            return inBigIntegers(poset);
        }
    }

    private static List<BigInteger> inBigIntegers(Poset poset) {
        BigInteger[] total = new BigInteger[poset.maxHeight() + 1];
        Arrays.fill(total, BigInteger.ZERO);
        BigInteger[][] ending = new BigInteger[poset.size()][];
        DownSearch search = new DownSearch(poset);
        for (int x : poset.linearExtension()) {
            BigInteger[] mine = new BigInteger[poset.height(x) + 1];
            Arrays.fill(mine, BigInteger.ZERO);
            mine[0] = BigInteger.ONE;
            int count = search.below(x);
            for (int t = 0; t < count; t++) {
                BigInteger[] theirs = ending[search.found(t)];
                for (int d = 0; d < theirs.length; d++) {
                    mine[d + 1] = mine[d + 1].add(theirs[d]);
                }
            }
            ending[x] = mine;
            for (int d = 0; d < mine.length; d++) {
                total[d] = total[d].add(mine[d]);
            }
        }
        return List.of(total);
    }

    /**
     * The number of nonempty chains if it is at most {@code limit}, and otherwise some number above
     * {@code limit}; stops as soon as the count passes the limit, so the work stays about
     * {@code limit} times the cover degree however large the poset is.
     *
     * @param limit at most {@code 2^60}
     */
    public static long totalUpTo(Poset poset, long limit) {
        if (limit < 0 || limit > 1L << 60) {
            throw new IllegalArgumentException("the limit must lie in 0..2^60");
        }
        int n = poset.size();
        long[] ending = new long[n];
        long total = 0;
        DownSearch search = new DownSearch(poset);
        for (int x : poset.linearExtension()) {
            long mine = 1;
            int count = search.below(x);
            for (int t = 0; t < count && mine <= limit; t++) {
                mine += ending[search.found(t)];
            }
            ending[x] = mine;
            total += mine;
            if (total > limit || mine > limit) {
                return Math.max(total, mine);
            }
        }
        return total;
    }

    /** Lists the elements strictly below one element at a time, reusing its arrays. */
    private static final class DownSearch {
        private final Adjacency lower;
        private final int[] stamp;
        private final int[] found;
        private int round;

        DownSearch(Poset poset) {
            lower = poset.lowerCovers();
            stamp = new int[poset.size()];
            found = new int[poset.size()];
            Arrays.fill(stamp, -1);
        }

        /** Finds the elements strictly below {@code x}; returns how many. */
        int below(int x) {
            round++;
            int count = 0;
            int scanned = 0;
            found[count++] = x;
            stamp[x] = round;
            while (scanned < count) {
                int z = found[scanned++];
                for (int i = lower.start(z); i < lower.end(z); i++) {
                    int w = lower.target(i);
                    if (stamp[w] != round) {
                        stamp[w] = round;
                        found[count++] = w;
                    }
                }
            }
            return count - 1;
        }

        /** The t-th element found below, {@code 0 ≤ t <} the count; x itself sits before them. */
        int found(int t) {
            return found[t + 1];
        }
    }
}
