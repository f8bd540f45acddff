package dev.morse.poset;

import dev.morse.progress.Progress;
import it.unimi.dsi.fastutil.ints.IntArrayList;
import it.unimi.dsi.fastutil.ints.IntArrays;
import java.util.Arrays;

/**
 * For every element of a poset, the elements strictly below it, ascending, in one CSR array: the
 * comparable pairs of the poset. Built in one pass over a linear extension, the down-set of x being
 * the union of {@code y} and the down-set of {@code y} over the elements y that x covers.
 *
 * <p>Memory: 4 bytes per comparable pair plus 4 bytes per element, so face posets of big complexes
 * (whose down-sets are small) fit where an n × n bit matrix would not. The number of pairs is
 * checked against a limit while building, before it can exhaust memory.
 */
public final class StrictDownSets extends CompressedRows {
    /** The most pairs one Java array holds (common practice). */
    public static final long MAX_PAIRS = Integer.MAX_VALUE - 8;

    private StrictDownSets(int[] offsets, int[] below) {
        super(offsets, below);
    }

    /**
     * The down-sets of every element of {@code poset}.
     *
     * @param maxPairs the most comparable pairs to hold
     * @throws IllegalStateException if the poset has more comparable pairs than {@code maxPairs}
     */
    public static StrictDownSets of(Poset poset, long maxPairs) {
        long limit = Math.min(maxPairs, MAX_PAIRS);
        int n = poset.size();
        Adjacency covers = poset.lowerCovers();
        int[] start = new int[n];
        int[] end = new int[n];
        int[] stamp = new int[n];
        Arrays.fill(stamp, -1);
        IntArrayList all = new IntArrayList();
        Progress progress = Progress.current();
        progress.begin("down-sets", "elements", n);
        int visited = 0;
        for (int x : poset.linearExtension()) {
            if ((++visited & 0x3FF) == 0) {
                progress.reached(visited);
            }
            int begin = all.size();
            for (int i = covers.start(x); i < covers.end(x); i++) {
                int y = covers.target(i);
                if (stamp[y] != x) {
                    stamp[y] = x;
                    all.add(y);
                }
                for (int j = start[y]; j < end[y]; j++) {
                    int z = all.getInt(j);
                    if (stamp[z] != x) {
                        stamp[z] = x;
                        all.add(z);
                    }
                }
                if (all.size() > limit) {
                    throw new IllegalStateException("the poset has more than " + limit + " comparable pairs");
                }
            }
            IntArrays.quickSort(all.elements(), begin, all.size());
            start[x] = begin;
            end[x] = all.size();
        }
        // regroup by element id, so that element x's down-set is at offsets[x] .. offsets[x + 1]
        int[] offsets = new int[n + 1];
        for (int x = 0; x < n; x++) {
            offsets[x + 1] = offsets[x] + (end[x] - start[x]);
        }
        int[] below = new int[all.size()];
        int[] flat = all.elements();
        for (int x = 0; x < n; x++) {
            System.arraycopy(flat, start[x], below, offsets[x], end[x] - start[x]);
        }
        return new StrictDownSets(offsets, below);
    }

    /** Number of elements. */
    public int size() {
        return rowCount();
    }

    /** Number of comparable pairs {@code y < x}. */
    public long pairCount() {
        return entryCount();
    }

    /** The element stored at index {@code i}. */
    public int element(int i) {
        return target(i);
    }

    /**
     * The up-sets: for every element the elements strictly above it, ascending, as the graph from
     * each element to those (the transpose of the down-sets). Memory: as much again.
     */
    public Adjacency upSets() {
        int[] above = new int[targets.length];
        int[] upOffsets = transpose(size(), (i, x, slot) -> above[slot] = x);
        return new Adjacency(upOffsets, above);
    }

    /** Whether {@code y < x}, by binary search. */
    public boolean isBelow(int y, int x) {
        return Arrays.binarySearch(targets, offsets[x], offsets[x + 1], y) >= 0;
    }
}
