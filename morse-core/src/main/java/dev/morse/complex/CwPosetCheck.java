package dev.morse.complex;

import dev.morse.poset.Adjacency;
import dev.morse.poset.Poset;
import it.unimi.dsi.fastutil.ints.Int2IntOpenHashMap;
import it.unimi.dsi.fastutil.ints.IntArrayList;

/**
 * Decides whether a poset is a CW poset: after adjoining a bottom element every open lower interval
 * (0̂, x) must be a sphere of dimension rank(x) - 2 (Björner 1984). This check is exact for cells of
 * dimension at most 2, where the condition reads: an edge covers exactly two vertices, and the edges
 * and vertices below a 2-cell form one cycle. It declines posets with higher cells, so that callers
 * fall back to the order complex, which is always correct.
 */
public final class CwPosetCheck {
    private CwPosetCheck() {
    }

    /** The verdict on {@code poset}. */
    public static CwPosetVerdict check(Poset poset) {
        if (!poset.isGraded()) {
            return new CwPosetVerdict(false, "the poset is not graded");
        }
        Adjacency below = poset.lowerCovers();
        for (int x = 0; x < poset.size(); x++) {
            int height = poset.height(x);
            if (height == 1 && below.degree(x) != 2) {
                return new CwPosetVerdict(false, "'" + poset.label(x) + "' covers " + below.degree(x)
                        + " elements of height 0, but the boundary of an edge is two points");
            }
            if (height == 2 && !boundsOneCycle(poset, x)) {
                return new CwPosetVerdict(false, "the elements below '" + poset.label(x)
                        + "' do not form a circle");
            }
            if (height >= 3) {
                return new CwPosetVerdict(false, "'" + poset.label(x)
                        + "' would be a cell of dimension 3 or more, which this check does not decide");
            }
        }
        return new CwPosetVerdict(true, "every open lower interval is a sphere of the right dimension");
    }

    /** Whether the edges below {@code x} and their ends form a single cycle. */
    private static boolean boundsOneCycle(Poset poset, int x) {
        Adjacency below = poset.lowerCovers();
        int[] edges = below.neighbours(x);
        Int2IntOpenHashMap degree = new Int2IntOpenHashMap();
        for (int e : edges) {
            for (int i = below.start(e); i < below.end(e); i++) {
                degree.addTo(below.target(i), 1);
            }
        }
        for (int d : degree.values()) {
            if (d != 2) {
                return false;
            }
        }
        // walk the cycle from the first edge; connected exactly when the walk meets every edge
        boolean[] used = new boolean[edges.length];
        IntArrayList stack = new IntArrayList();
        stack.add(0);
        used[0] = true;
        int reached = 1;
        while (!stack.isEmpty()) {
            int i = stack.popInt();
            for (int j = 0; j < edges.length; j++) {
                if (!used[j] && shareEnd(below, edges[i], edges[j])) {
                    used[j] = true;
                    reached++;
                    stack.add(j);
                }
            }
        }
        return reached == edges.length;
    }

    private static boolean shareEnd(Adjacency below, int e, int f) {
        for (int i = below.start(e); i < below.end(e); i++) {
            if (below.contains(f, below.target(i))) {
                return true;
            }
        }
        return false;
    }
}
