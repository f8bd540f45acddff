package dev.morse.poset;

import it.unimi.dsi.fastutil.objects.Object2IntOpenHashMap;
import java.util.Arrays;
import java.util.Optional;

/**
 * A finite poset on the ints {@code 0..n-1}, each with a label, stored as its Hasse diagram: the
 * covers in both directions as CSR arrays. Immutable.
 *
 * <p>Memory: about 8 bytes per element (offsets) plus 8 bytes per cover (both directions), plus
 * 8 bytes per element for heights and the linear extension, plus the labels (strings, or for a
 * poset read from a file its label bytes and 4 bytes per element: {@link ElementLabels}).
 */
public final class Poset {
    private final ElementLabels labels;
    private final Adjacency lowerCovers;
    private final Adjacency upperCovers;
    private final int[] heights;
    private final int[] linearExtension;
    private volatile Object2IntOpenHashMap<String> index;

    Poset(ElementLabels labels, Adjacency lowerCovers, Adjacency upperCovers, int[] heights, int[] linearExtension) {
        this.labels = labels;
        this.lowerCovers = lowerCovers;
        this.upperCovers = upperCovers;
        this.heights = heights;
        this.linearExtension = linearExtension;
    }

    /** Number of elements. */
    public int size() {
        return labels.size();
    }

    /** Number of cover relations (edges of the Hasse diagram). */
    public int coverCount() {
        return lowerCovers.edgeCount();
    }

    /** The label of element {@code x}. */
    public String label(int x) {
        return labels.get(x);
    }

    /** The element with this label, if any. */
    public Optional<Integer> find(String label) {
        Object2IntOpenHashMap<String> map = index;
        if (map == null) {
            int n = labels.size();
            map = new Object2IntOpenHashMap<>(n);
            map.defaultReturnValue(-1);
            for (int i = 0; i < n; i++) {
                map.put(labels.get(i), i);
            }
            index = map;
        }
        int id = map.getInt(label);
        return id < 0 ? Optional.empty() : Optional.of(id);
    }

    /** For each element, the elements it covers, ascending. */
    public Adjacency lowerCovers() {
        return lowerCovers;
    }

    /** For each element, the elements covering it, ascending. */
    public Adjacency upperCovers() {
        return upperCovers;
    }

    /**
     * The height of {@code x}: the number of covers in a longest chain from a minimal element up to
     * {@code x}. Minimal elements have height 0.
     */
    public int height(int x) {
        return heights[x];
    }

    /** The largest height, or -1 for the empty poset. */
    public int maxHeight() {
        int max = -1;
        for (int h : heights) {
            max = Math.max(max, h);
        }
        return max;
    }

    /**
     * Whether the poset is graded in the sense that every cover raises the height by exactly one, so
     * that all maximal chains of every lower interval have the same length; then the height is the
     * rank function (minimal elements at rank 0).
     */
    public boolean isGraded() {
        for (int x = 0; x < size(); x++) {
            for (int i = lowerCovers.start(x); i < lowerCovers.end(x); i++) {
                if (heights[lowerCovers.target(i)] != heights[x] - 1) {
                    return false;
                }
            }
        }
        return true;
    }

    /** A linear extension: every element comes after all elements below it. A copy. */
    public int[] linearExtension() {
        return Arrays.copyOf(linearExtension, linearExtension.length);
    }

    /** Position of each element in {@link #linearExtension()}. */
    public int[] linearExtensionPositions() {
        int[] pos = new int[linearExtension.length];
        for (int i = 0; i < linearExtension.length; i++) {
            pos[linearExtension[i]] = i;
        }
        return pos;
    }

    /** Whether {@code x < y} (strictly), by a search down the Hasse diagram from {@code y}. */
    public boolean isBelow(int x, int y) {
        return x != y && heights[x] < heights[y] && PosetOperations.reach(lowerCovers, y, size())[x];
    }
}
