package dev.morse.matching;

import dev.morse.complex.ChainComplex;
import dev.morse.progress.Progress;
import it.unimi.dsi.fastutil.ints.IntArrayFIFOQueue;

/**
 * Elementary collapses (Whitehead 1939; as a Morse matching, Forman 1998): a cell {@code t} with
 * exactly one coface {@code s} left, joined by a unit incidence, is a free face; the pair is
 * collapsed away. Free faces wait in a queue fed by the faces of removed cells. When none is left,
 * the rule for a critical cell is: remove the last remaining cell in the numbering, which is one of
 * top dimension, and declare it critical; this frees faces below it and collapsing resumes
 * (top-down).
 *
 * <p>Acyclic: along a gradient path each step reaches a pair removed strictly later, since the lower
 * cell of a pair had no other coface left at its removal. Linear time; 9 bytes per cell of working
 * memory besides the coboundary.
 */
final class CollapsePairing implements MatchingHeuristic.Pairing {
    @Override
    public Matching match(ChainComplex complex, MatchingOptions options) {
        int n = complex.cellCount();
        FreeFaceState state = new FreeFaceState(complex);
        IntArrayFIFOQueue queue = new IntArrayFIFOQueue();
        state.offerFreeFaces(queue::enqueue);
        int next = n - 1;
        Progress progress = Progress.current();
        int pairs = 0;
        while (true) {
            while (!queue.isEmpty()) {
                int t = queue.dequeueInt();
                if (state.isFree(t) && state.collapse(t, queue::enqueue) && (++pairs & 0x7FF) == 0) {
                    progress.reached(2L * pairs);
                }
            }
            while (next >= 0 && state.isRemoved(next)) {
                next--;
            }
            if (next < 0) {
                return state.matching();
            }
            state.remove(next, queue::enqueue);
        }
    }
}
