package dev.morse.example;

import dev.morse.complex.Boundary;
import dev.morse.complex.ChainComplex;
import dev.morse.matching.Matching;
import dev.morse.matching.MatchingHeuristic;
import dev.morse.matching.MatchingOptions;
import java.util.Arrays;

/**
 * The lower-star matching, in the manner of Robins, Wood and Sheppard ("Theory and algorithms for
 * constructing discrete Morse complexes from grayscale digital images", IEEE Trans. PAMI 33, 2011;
 * after King, Knudson and Mramor, 2005). The vertices are ordered (here by cell number, which is
 * input order), every cell goes to the lower star of its highest vertex, and each lower star is
 * matched on its own, by coreduction (Mrozek and Batko 2009) restricted to the lower star: a cell
 * whose faces within the lower star, not yet removed, are exactly one, with a unit incidence, is
 * paired with it; when none is left, a lowest-dimensional cell of the lower star is critical.
 *
 * <p>The vertices of a cell are the vertices below it through the boundary, so this works on any
 * chain complex: simplicial, order and cellular alike.
 *
 * <p>Why the matching is acyclic. The map taking a cell to its highest vertex is order-preserving
 * (a face has fewer vertices), so a gradient path never climbs to a higher lower star, and a
 * closed one stays in a single lower star; by the patchwork (cluster) lemma it suffices that each
 * lower star's matching is acyclic (Jonsson, Simplicial Complexes of Graphs, 2008, Lemma 4.2;
 * Kozlov, Combinatorial Algebraic Topology, 2008, Theorem 11.10; both from memory). Within a lower
 * star, a gradient path from a pair goes down to another face of its upper cell, which was removed
 * before the pair was made, so each step reaches a pair made strictly earlier: no path closes.
 *
 * <p>Linear time and about 25 bytes per cell of working memory besides the coboundary.
 */
public final class LowerStarHeuristic implements MatchingHeuristic {
    /** The name users type after {@code --matching}. */
    public static final String NAME = "lower-star";

    @Override
    public String name() {
        return NAME;
    }

    @Override
    public Matching match(ChainComplex complex, MatchingOptions options) {
        int n = complex.cellCount();
        Boundary boundary = complex.boundary();
        Boundary coboundary = complex.coboundary();
        int[] star = highestVertices(complex, boundary);
        int[] order = byStar(star, n);
        int[] mates = new int[n];
        Arrays.fill(mates, Matching.CRITICAL);
        boolean[] removed = new boolean[n];
        int[] facesLeft = new int[n];
        for (int c = 0; c < n; c++) {
            for (int i = boundary.start(c); i < boundary.end(c); i++) {
                if (star[boundary.target(i)] == star[c]) {
                    facesLeft[c]++;
                }
            }
        }
        int[] queue = new int[n];
        for (int begin = 0; begin < n; ) {
            int end = begin;
            while (end < n && star[order[end]] == star[order[begin]]) {
                end++;
            }
            matchLowerStar(order, begin, end, star, boundary, coboundary, mates, removed, facesLeft, queue);
            begin = end;
        }
        return Matching.of(mates);
    }

    /**
     * For each cell the number of its highest vertex; -1 for a cell with no vertex below it. Cells
     * are numbered by dimension, so a cell's faces come before it.
     */
    private static int[] highestVertices(ChainComplex complex, Boundary boundary) {
        int n = complex.cellCount();
        int[] star = new int[n];
        for (int c = 0; c < n; c++) {
            if (complex.dimensionOf(c) == 0) {
                star[c] = c;
                continue;
            }
            int highest = -1;
            for (int i = boundary.start(c); i < boundary.end(c); i++) {
                highest = Math.max(highest, star[boundary.target(i)]);
            }
            star[c] = highest;
        }
        return star;
    }

    /** The cells grouped by lower star (stars ascending), by cell number, so by dimension, within each. */
    private static int[] byStar(int[] star, int n) {
        int[] start = new int[n + 2];
        for (int c = 0; c < n; c++) {
            start[star[c] + 2]++;
        }
        for (int s = 0; s <= n; s++) {
            start[s + 1] += start[s];
        }
        int[] order = new int[n];
        for (int c = 0; c < n; c++) {
            order[start[star[c] + 1]++] = c;
        }
        return order;
    }

    /** Coreduction on the cells {@code order[begin..end)} of one lower star. */
    private static void matchLowerStar(int[] order, int begin, int end, int[] star, Boundary boundary,
            Boundary coboundary, int[] mates, boolean[] removed, int[] facesLeft, int[] queue) {
        int head = 0;
        int tail = 0;
        for (int k = begin; k < end; k++) {
            if (facesLeft[order[k]] == 1) {
                queue[tail++] = order[k];
            }
        }
        int next = begin;
        while (true) {
            while (head < tail) {
                int s = queue[head++];
                if (removed[s] || facesLeft[s] != 1) {
                    continue;
                }
                int entry = remainingFace(s, star, boundary, removed);
                int coefficient = boundary.coefficient(entry);
                if (coefficient == 1 || coefficient == -1) {
                    int t = boundary.target(entry);
                    mates[s] = t;
                    mates[t] = s;
                    tail = remove(s, star, coboundary, removed, facesLeft, queue, tail);
                    tail = remove(t, star, coboundary, removed, facesLeft, queue, tail);
                }
            }
            head = 0;
            tail = 0;
            while (next < end && removed[order[next]]) {
                next++;
            }
            if (next == end) {
                return;
            }
            // a lowest-dimensional cell left has no face left in the lower star: it is critical
            tail = remove(order[next], star, coboundary, removed, facesLeft, queue, tail);
        }
    }

    private static int remove(int c, int[] star, Boundary coboundary, boolean[] removed, int[] facesLeft, int[] queue,
            int tail) {
        removed[c] = true;
        for (int i = coboundary.start(c); i < coboundary.end(c); i++) {
            int up = coboundary.target(i);
            if (!removed[up] && star[up] == star[c] && --facesLeft[up] == 1) {
                queue[tail++] = up;
            }
        }
        return tail;
    }

    private static int remainingFace(int s, int[] star, Boundary boundary, boolean[] removed) {
        for (int i = boundary.start(s); i < boundary.end(s); i++) {
            int t = boundary.target(i);
            if (!removed[t] && star[t] == star[s]) {
                return i;
            }
        }
        throw new IllegalStateException("face count out of step with the boundary");
    }
}
