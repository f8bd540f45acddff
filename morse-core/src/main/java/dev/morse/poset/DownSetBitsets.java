package dev.morse.poset;

/**
 * For every element of a poset, the set of elements strictly below it, as a bit set. Built in one
 * pass over a linear extension. Memory: n²/8 bytes for n elements, so meant for posets of at most a
 * few tens of thousands of elements.
 */
public final class DownSetBitsets {
    private final long[][] below;

    private DownSetBitsets(long[][] below) {
        this.below = below;
    }

    /** The strict down-sets of every element of {@code poset}. */
    public static DownSetBitsets of(Poset poset) {
        int n = poset.size();
        int words = (n + 63) >>> 6;
        long[][] below = new long[n][];
        Adjacency covers = poset.lowerCovers();
        for (int x : poset.linearExtension()) {
            long[] set = new long[words];
            for (int i = covers.start(x); i < covers.end(x); i++) {
                int y = covers.target(i);
                long[] lower = below[y];
                for (int w = 0; w < words; w++) {
                    set[w] |= lower[w];
                }
                set[y >>> 6] |= 1L << y;
            }
            below[x] = set;
        }
        return new DownSetBitsets(below);
    }

    /** Whether {@code y < x}. */
    public boolean isBelow(int y, int x) {
        return (below[x][y >>> 6] & (1L << y)) != 0;
    }

    /** The number of elements strictly below {@code x}. */
    public int countBelow(int x) {
        int count = 0;
        for (long w : below[x]) {
            count += Long.bitCount(w);
        }
        return count;
    }

    /** The elements strictly below {@code x}, ascending. */
    int[] elementsBelow(int x) {
        int[] out = new int[countBelow(x)];
        int k = 0;
        long[] set = below[x];
        for (int w = 0; w < set.length; w++) {
            long bits = set[w];
            while (bits != 0) {
                out[k++] = (w << 6) + Long.numberOfTrailingZeros(bits);
                bits &= bits - 1;
            }
        }
        return out;
    }
}
