package dev.morse.matching;

import dev.morse.complex.ChainComplex;
import dev.morse.progress.Progress;
import it.unimi.dsi.fastutil.ints.IntHeapPriorityQueue;

/**
 * The collapsing that the reverse-lexicographic heuristics share: free faces are collapsed, the
 * lexicographically last first (the rev-lex order of Benedetti and Lutz 2014), until none is left;
 * the heuristic then chooses a cell to make critical by its own rule, and collapsing resumes.
 * Memory: that of {@link FreeFaceState}, the ranks and the queue.
 */
final class RevLexCollapse {
    private final int[] rank;
    private final FreeFaceState state;
    private final IntHeapPriorityQueue freeFaces;
    private final Progress progress = Progress.current();
    private int pairs;

    RevLexCollapse(ChainComplex complex) {
        rank = LexicographicPairing.lexicographicRanks(complex);
        state = new FreeFaceState(complex);
        freeFaces = new IntHeapPriorityQueue((a, b) -> Integer.compare(rank[b], rank[a]));
        state.offerFreeFaces(freeFaces::enqueue);
    }

    /** The position of each cell in the lexicographic order of vertex tuples. */
    int rank(int cell) {
        return rank[cell];
    }

    /** What is removed, free and matched so far. */
    FreeFaceState state() {
        return state;
    }

    /** Collapses free faces until none is left. */
    void collapseAll() {
        while (!freeFaces.isEmpty()) {
            int t = freeFaces.dequeueInt();
            if (state.isFree(t) && state.collapse(t, freeFaces::enqueue) && (++pairs & 0x7FF) == 0) {
                progress.reached(2L * pairs);
            }
        }
    }

    /** Makes {@code cell}, which has no coface left, critical. */
    void makeCritical(int cell) {
        state.remove(cell, freeFaces::enqueue);
    }
}
