package dev.morse.matching;

import dev.morse.complex.Boundary;
import dev.morse.complex.ChainComplex;
import it.unimi.dsi.fastutil.ints.IntArrayList;
import java.util.Arrays;

/**
 * Cancels pairs of critical cells joined by exactly one gradient path (Forman, "Morse theory for cell
 * complexes", Adv. Math. 134, 1998, the cancellation theorem, Theorem 11.1 there (number from
 * memory)): when a critical cell σ of dimension d and a critical cell τ of dimension d − 1 are joined
 * by exactly one gradient path σ = s_0 ⊃ t_1 &lt; s_1 ⊃ t_2 &lt; ... &lt; s_(k−1) ⊃ t_k = τ, reversing
 * the path (pairing t_i with s_(i−1)) gives an acyclic matching with σ and τ matched and every other
 * cell as before. Only paths whose new pairs have unit incidences are reversed, so the result stays a
 * matching that {@link MatchingVerifier} accepts.
 *
 * <p>Passes run over the critical cells in increasing numbering, dimension by dimension from the
 * top, until a whole pass cancels nothing. For one critical cell the gradient paths leaving it form
 * an acyclic graph; the paths to each reachable cell are counted (capped at two) in a topological
 * order of that graph, so one search costs time linear in the part of the complex it reaches, and a
 * pass O(c · N) for c critical cells. Memory: four int arrays of the cell count.
 */
final class GradientPathCancellation {
    private final ChainComplex complex;
    private final Boundary boundary;
    private final int[] mates;
    /** Paths from the start to each cell, capped at two; valid where {@link #seen} holds the stamp. */
    private final int[] paths;
    /** The cell before each cell on its path from the start, when the path is unique. */
    private final int[] previous;
    private final int[] inDegree;
    private final int[] seen;
    private final IntArrayList reached = new IntArrayList();
    private final IntArrayList ready = new IntArrayList();
    private int stamp;

    /**
     * The acyclic matching {@code base} with every cancellation made that the passes find.
     *
     * @throws IllegalStateException if {@code base} has a closed gradient path
     */
    static Matching improve(ChainComplex complex, Matching base) {
        int[] mates = new int[complex.cellCount()];
        for (int c = 0; c < mates.length; c++) {
            mates[c] = base.mate(c);
        }
        new GradientPathCancellation(complex, mates).cancelAll();
        return Matching.adopt(mates);
    }

    /** Works on {@code mates}, an acyclic matching's partner array, in place. */
    private GradientPathCancellation(ChainComplex complex, int[] mates) {
        this.complex = complex;
        this.boundary = complex.boundary();
        this.mates = mates;
        int n = complex.cellCount();
        paths = new int[n];
        previous = new int[n];
        inDegree = new int[n];
        seen = new int[n];
        Arrays.fill(seen, -1);
    }

    /** Cancels until no pair of critical cells is joined by exactly one gradient path; returns the pairs cancelled. */
    int cancelAll() {
        int cancelled = 0;
        boolean changed = true;
        while (changed) {
            changed = false;
            for (int d = complex.dimension(); d >= 1; d--) {
                int first = complex.firstCell(d);
                for (int s = first; s < first + complex.cellCount(d); s++) {
                    if (mates[s] == Matching.CRITICAL && cancelFrom(s, d)) {
                        cancelled++;
                        changed = true;
                    }
                }
            }
        }
        return cancelled;
    }

    /** Searches the gradient paths from the critical d-cell {@code start}; cancels it with the first critical (d−1)-cell met along one path only. */
    private boolean cancelFrom(int start, int d) {
        stamp++;
        reached.clear();
        visit(start);
        // collect the part of the graph reachable from start, with in-degrees inside it
        for (int i = 0; i < reached.size(); i++) {
            forEachSuccessor(reached.getInt(i), d, y -> {
                if (seen[y] != stamp) {
                    visit(y);
                }
                inDegree[y]++;
            });
        }
        // count paths in topological order (Kahn), capped at two
        ready.clear();
        paths[start] = 1;
        ready.add(start);
        int processed = 0;
        for (int i = 0; i < ready.size(); i++) {
            int x = ready.getInt(i);
            processed++;
            int count = paths[x];
            forEachSuccessor(x, d, y -> {
                if (paths[y] == 0 && count == 1) {
                    previous[y] = x;
                }
                paths[y] = Math.min(2, paths[y] + count);
                if (--inDegree[y] == 0) {
                    ready.add(y);
                }
            });
        }
        if (processed != reached.size()) {
            throw new IllegalStateException("closed gradient path: the matching was not acyclic");
        }
        for (int i = 0; i < ready.size(); i++) {
            int t = ready.getInt(i);
            if (complex.dimensionOf(t) == d - 1 && mates[t] == Matching.CRITICAL && paths[t] == 1 && reversible(t, start)) {
                reverse(t, start);
                return true;
            }
        }
        return false;
    }

    private void visit(int cell) {
        seen[cell] = stamp;
        paths[cell] = 0;
        inDegree[cell] = 0;
        reached.add(cell);
    }

    /**
     * The next cells of gradient paths: from a d-cell its faces other than its partner; from a
     * (d−1)-cell its partner when that is a d-cell (a critical or downward-matched face ends the path).
     */
    private void forEachSuccessor(int x, int d, java.util.function.IntConsumer action) {
        if (complex.dimensionOf(x) == d) {
            for (int i = boundary.start(x); i < boundary.end(x); i++) {
                int t = boundary.target(i);
                if (mates[x] != t && boundary.coefficient(i) != 0) {
                    action.accept(t);
                }
            }
        } else {
            int up = mates[x];
            if (up != Matching.CRITICAL && complex.dimensionOf(up) == d) {
                action.accept(up);
            }
        }
    }

    /** Whether every pair the reversal of the unique path to {@code end} makes has a unit incidence. */
    private boolean reversible(int end, int start) {
        int t = end;
        while (true) {
            int s = previous[t];
            int c = boundary.coefficient(s, t);
            if (c != 1 && c != -1) {
                return false;
            }
            if (s == start) {
                return true;
            }
            t = previous[s];
        }
    }

    /** Pairs each (d−1)-cell of the unique path to {@code end} with the d-cell before it. */
    private void reverse(int end, int start) {
        int t = end;
        while (true) {
            int s = previous[t];
            int before = s == start ? -1 : previous[s];
            mates[t] = s;
            mates[s] = t;
            if (s == start) {
                return;
            }
            t = before;
        }
    }
}
