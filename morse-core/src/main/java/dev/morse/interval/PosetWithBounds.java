package dev.morse.interval;

import dev.morse.poset.Adjacency;
import dev.morse.poset.Poset;
import dev.morse.poset.StrictDownSets;
import java.util.Arrays;

/**
 * P̂: a poset P with a new least element 0̂ and a new greatest element 1̂, for sweeps over its
 * intervals. Elements of P keep their ids; 0̂ is {@code n} and 1̂ is {@code n+1}. The down-sets of P
 * are computed once ({@link StrictDownSets}) and the up-sets are their transpose, so that the
 * elements of every open interval are found by merging two sorted lists, never by a search.
 * Immutable, and safe to share between threads.
 *
 * <p>Memory: 8 bytes per comparable pair of P (down-sets and up-sets), plus about 20 bytes per element.
 */
public final class PosetWithBounds {
    /** The most elements a sweep handles: ids and heights must fit the packed sort keys of {@link IntervalSweep}. */
    public static final int MAX_ELEMENTS = (1 << 21) - 3;

    private final Poset poset;
    private final StrictDownSets down;
    private final Adjacency up;
    private final int[] positions;
    private final int[] linearExtension;
    private final boolean pure;
    private final int[] coverOffsets;
    private final int[] covers;

    private PosetWithBounds(Poset poset, StrictDownSets down, Adjacency up, int[] minimal, int[] maximal,
            boolean pure) {
        this.poset = poset;
        this.down = down;
        this.up = up;
        this.positions = poset.linearExtensionPositions();
        this.linearExtension = poset.linearExtension();
        this.pure = pure;
        // the lower covers of P̂: those of P, 0̂ below each minimal element, the maximal ones below 1̂
        int n = poset.size();
        Adjacency below = poset.lowerCovers();
        coverOffsets = new int[n + 3];
        covers = new int[below.edgeCount() + minimal.length + Math.max(1, maximal.length)];
        int k = 0;
        for (int z = 0; z < n; z++) {
            coverOffsets[z] = k;
            if (below.degree(z) == 0) {
                covers[k++] = n;
            }
            for (int i = below.start(z); i < below.end(z); i++) {
                covers[k++] = below.target(i);
            }
        }
        coverOffsets[n] = k;
        coverOffsets[n + 1] = k;
        if (n == 0) {
            covers[k++] = n;
        }
        for (int z : maximal) {
            covers[k++] = z;
        }
        coverOffsets[n + 2] = k;
    }

    /**
     * P̂ for {@code poset}.
     *
     * @throws IllegalArgumentException if the poset has more than {@link #MAX_ELEMENTS} elements
     * @throws IllegalStateException if it has more comparable pairs than one array holds
     */
    public static PosetWithBounds of(Poset poset) {
        int n = poset.size();
        if (n > MAX_ELEMENTS) {
            throw new IllegalArgumentException(n + " elements, more than the " + MAX_ELEMENTS + " an interval sweep takes");
        }
        StrictDownSets down = StrictDownSets.of(poset, StrictDownSets.MAX_PAIRS);
        int[] minimal = extremes(poset.lowerCovers());
        int[] maximal = extremes(poset.upperCovers());
        boolean pure = poset.isGraded();
        for (int x : maximal) {
            pure &= poset.height(x) == poset.maxHeight();
        }
        return new PosetWithBounds(poset, down, down.upSets(), minimal, maximal, pure);
    }

    private static int[] extremes(Adjacency covers) {
        return java.util.stream.IntStream.range(0, covers.vertexCount()).filter(x -> covers.degree(x) == 0).toArray();
    }

    /** The poset P. */
    public Poset poset() {
        return poset;
    }

    /** The number of elements of P. */
    public int size() {
        return poset.size();
    }

    /** The id of 0̂. */
    public int bottom() {
        return poset.size();
    }

    /** The id of 1̂. */
    public int top() {
        return poset.size() + 1;
    }

    /** The label of an element of P, or {@code null} for 0̂ and 1̂. */
    public String label(int x) {
        return x < poset.size() ? poset.label(x) : null;
    }

    /**
     * The number of intervals {@code x < y} of P̂: the comparable pairs of P, each element of P above 0̂
     * and below 1̂, and 0̂ below 1̂.
     */
    public long intervalCount() {
        return down.pairCount() + 2L * poset.size() + 1;
    }

    /**
     * Whether P̂ is pure (graded): all its maximal chains have the same length. That holds exactly when
     * every cover of P raises the height by one and all maximal elements of P have the same height.
     */
    public boolean isPure() {
        return pure;
    }

    /**
     * The height of an element of P̂: the length of a longest chain from 0̂ up to it; the rank function
     * when P̂ is pure.
     */
    public int height(int x) {
        if (x == bottom()) {
            return 0;
        }
        if (x == top()) {
            return poset.maxHeight() + 2;
        }
        return poset.height(x) + 1;
    }

    /** Whether {@code x < y} in P̂. */
    public boolean isBelow(int x, int y) {
        if (x == y || x == top() || y == bottom()) {
            return false;
        }
        if (x == bottom() || y == top()) {
            return true;
        }
        return down.isBelow(x, y);
    }

    /**
     * The ids of P̂ strictly above {@code x}, ascending: the upper ends of the intervals whose lower end is
     * {@code x}. For 0̂ every element of P and 1̂; for an element of P its up-set and 1̂; none for 1̂.
     */
    public int[] uppers(int x) {
        if (x == top()) {
            return new int[0];
        }
        if (x == bottom()) {
            int[] all = new int[size() + 1];
            for (int z = 0; z <= size(); z++) {
                all[z] = z == size() ? top() : z;
            }
            return all;
        }
        int[] above = Arrays.copyOf(up.neighbours(x), up.degree(x) + 1);
        above[above.length - 1] = top();
        return above;
    }

    /** Position of an element of P in the linear extension of P. */
    int position(int x) {
        return positions[x];
    }

    /** The element of P at a position of its linear extension. */
    int atPosition(int p) {
        return linearExtension[p];
    }

    /** First index in {@link #lowerCover} of the elements {@code z} covers in P̂. */
    int lowerCoverStart(int z) {
        return coverOffsets[z];
    }

    /** One past the last index of the elements {@code z} covers in P̂. */
    int lowerCoverEnd(int z) {
        return coverOffsets[z + 1];
    }

    /** The element at an index of the lower covers of P̂. */
    int lowerCover(int i) {
        return covers[i];
    }

    /** The strict down-sets of P. */
    StrictDownSets downSets() {
        return down;
    }

    /** First index in {@link #upElement} of the elements of P strictly above {@code x}. */
    int upStart(int x) {
        return up.start(x);
    }

    /** One past the last index of the elements of P strictly above {@code x}. */
    int upEnd(int x) {
        return up.end(x);
    }

    /** The index of {@code y} among the elements above {@code x} in P, or -1 when {@code y} is not above it. */
    int upIndex(int x, int y) {
        return up.indexOf(x, y);
    }

    /** The element at an index of the up-sets. */
    int upElement(int i) {
        return up.target(i);
    }

    /**
     * Writes the elements of P strictly between {@code x} and {@code y} in P̂ into {@code out},
     * ascending, and returns how many there are. {@code out} must hold {@code n} ints.
     */
    int openInterval(int x, int y, int[] out) {
        int n = poset.size();
        if (x == bottom() && y == top()) {
            for (int z = 0; z < n; z++) {
                out[z] = z;
            }
            return n;
        }
        if (x == bottom()) {
            int k = 0;
            for (int i = down.start(y); i < down.end(y); i++) {
                out[k++] = down.element(i);
            }
            return k;
        }
        if (y == top()) {
            int k = 0;
            for (int i = upStart(x); i < upEnd(x); i++) {
                out[k++] = up.target(i);
            }
            return k;
        }
        int i = upStart(x);
        int iEnd = upEnd(x);
        int j = down.start(y);
        int jEnd = down.end(y);
        int k = 0;
        while (i < iEnd && j < jEnd) {
            int a = up.target(i);
            int b = down.element(j);
            if (a == b) {
                out[k++] = a;
                i++;
                j++;
            } else if (a < b) {
                i++;
            } else {
                j++;
            }
        }
        return k;
    }
}
