package dev.morse.poset;

import java.util.Arrays;

/**
 * An immutable directed graph on ints 0..n-1 in compressed sparse row form: the neighbours of
 * {@code x} are {@code target(start(x)) .. target(end(x) - 1)}, ascending.
 *
 * <p>Memory: 4 bytes per vertex plus 4 bytes per edge.
 */
public final class Adjacency extends CompressedRows {

    /**
     * Wraps arrays without copying; callers hand over ownership.
     *
     * @param offsets length n + 1, non-decreasing, {@code offsets[0] == 0}
     * @param targets length {@code offsets[n]}
     */
    Adjacency(int[] offsets, int[] targets) {
        super(offsets, targets);
    }

    /** Builds an adjacency from edge lists; sorts each row. */
    public static Adjacency fromEdges(int vertexCount, int[] from, int[] to, int edgeCount) {
        int[] offsets = new int[vertexCount + 1];
        for (int e = 0; e < edgeCount; e++) {
            offsets[from[e] + 1]++;
        }
        for (int v = 0; v < vertexCount; v++) {
            offsets[v + 1] += offsets[v];
        }
        int[] fill = Arrays.copyOf(offsets, vertexCount);
        int[] targets = new int[edgeCount];
        for (int e = 0; e < edgeCount; e++) {
            targets[fill[from[e]]++] = to[e];
        }
        for (int v = 0; v < vertexCount; v++) {
            Arrays.sort(targets, offsets[v], offsets[v + 1]);
        }
        return new Adjacency(offsets, targets);
    }

    /** The targets array itself, for builders in this package that reuse it; never handed out. */
    int[] targetArray() {
        return targets;
    }

    /** Number of vertices. */
    public int vertexCount() {
        return rowCount();
    }

    /** Number of edges. */
    public int edgeCount() {
        return entryCount();
    }

    /**
     * The source of every edge, edges ordered by source and then target; with {@link #edgeTargets},
     * the list of edges. A new array.
     */
    public int[] edgeSources() {
        int[] sources = new int[targets.length];
        for (int x = 0; x < vertexCount(); x++) {
            Arrays.fill(sources, offsets[x], offsets[x + 1], x);
        }
        return sources;
    }

    /** The target of every edge, in the order of {@link #edgeSources}. A new array. */
    public int[] edgeTargets() {
        return targets.clone();
    }

    /** Number of neighbours of {@code x}. */
    public int degree(int x) {
        return size(x);
    }

    /** A copy of the neighbours of {@code x}. */
    public int[] neighbours(int x) {
        return Arrays.copyOfRange(targets, offsets[x], offsets[x + 1]);
    }

    /** Whether {@code y} is a neighbour of {@code x} (binary search). */
    public boolean contains(int x, int y) {
        return indexOf(x, y) >= 0;
    }

    /** The index of {@code y} among the edges of {@code x} (binary search), or -1 when it is no neighbour. */
    public int indexOf(int x, int y) {
        int i = Arrays.binarySearch(targets, offsets[x], offsets[x + 1], y);
        return i >= 0 ? i : -1;
    }

    /** The reversed graph. */
    public Adjacency transpose() {
        int[] tTargets = new int[targets.length];
        int[] tOffsets = transpose(vertexCount(), (i, x, slot) -> tTargets[slot] = x);
        return new Adjacency(tOffsets, tTargets);
    }
}
