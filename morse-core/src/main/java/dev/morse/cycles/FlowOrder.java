package dev.morse.cycles;

import dev.morse.complex.Boundary;
import dev.morse.complex.ChainComplex;
import dev.morse.matching.Matching;
import it.unimi.dsi.fastutil.ints.IntArrayFIFOQueue;
import it.unimi.dsi.fastutil.ints.IntHeapPriorityQueue;
import it.unimi.dsi.fastutil.ints.IntOpenHashSet;
import java.util.Arrays;

/**
 * The cells of one dimension that the matching pairs in one direction, in an order of the gradient
 * flow (Kahn's algorithm; a closed path is a closed gradient path): upward, each cell before every
 * face of its partner matched upward too, as lifting a chain along the flow needs; downward, each
 * cell before every coface of its partner matched downward too, as lifting a cochain along the
 * reversed flow needs.
 *
 * @param first the first cell of the dimension
 * @param cells the matched cells in flow order
 * @param place the place of each cell of the dimension in {@code cells}, or -1
 */
record FlowOrder(int first, int[] cells, int[] place) {
    /**
     * The flow order of dimension {@code d}: of the cells matched upward, along {@code complex}'s
     * boundary, when {@code upward}; else of those matched downward, along its coboundary.
     *
     * @throws IllegalStateException when the flow has a closed path: the matching is not acyclic
     */
    static FlowOrder of(ChainComplex complex, Matching matching, int d, boolean upward) {
        Boundary step = upward ? complex.boundary() : complex.coboundary();
        int partnerDimension = upward ? d + 1 : d - 1;
        int first = complex.firstCell(d);
        int count = complex.cellCount(d);
        boolean[] matched = new boolean[count];
        int total = 0;
        for (int c = first; c < first + count; c++) {
            int mate = matching.mate(c);
            if (mate != Matching.CRITICAL && complex.dimensionOf(mate) == partnerDimension) {
                matched[c - first] = true;
                total++;
            }
        }
        int[] indegree = new int[count];
        for (int c = first; c < first + count; c++) {
            if (matched[c - first]) {
                int partner = matching.mate(c);
                for (int i = step.start(partner); i < step.end(partner); i++) {
                    int f = step.target(i);
                    if (f != c && matched[f - first]) {
                        indegree[f - first]++;
                    }
                }
            }
        }
        IntArrayFIFOQueue ready = new IntArrayFIFOQueue();
        for (int c = first; c < first + count; c++) {
            if (matched[c - first] && indegree[c - first] == 0) {
                ready.enqueue(c);
            }
        }
        int[] order = new int[total];
        int k = 0;
        while (!ready.isEmpty()) {
            int c = ready.dequeueInt();
            order[k++] = c;
            int partner = matching.mate(c);
            for (int i = step.start(partner); i < step.end(partner); i++) {
                int f = step.target(i);
                if (f != c && matched[f - first] && --indegree[f - first] == 0) {
                    ready.enqueue(f);
                }
            }
        }
        if (k != total) {
            throw new IllegalStateException("the " + (upward ? "" : "reversed ")
                    + "gradient flow has a closed path: the matching is not acyclic");
        }
        int[] place = new int[count];
        Arrays.fill(place, -1);
        for (int i = 0; i < order.length; i++) {
            place[order[i] - first] = i;
        }
        return new FlowOrder(first, order, place);
    }

    /** Puts {@code cell}'s place on {@code pending} once, if the cell is in this order. */
    void enqueue(int cell, IntHeapPriorityQueue pending, IntOpenHashSet queued) {
        int at = place[cell - first];
        if (at >= 0 && queued.add(cell)) {
            pending.enqueue(at);
        }
    }
}
