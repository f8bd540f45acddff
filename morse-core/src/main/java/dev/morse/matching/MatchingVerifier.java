package dev.morse.matching;

import dev.morse.complex.Boundary;
import dev.morse.complex.ChainComplex;
import dev.morse.progress.Progress;

/**
 * Checks that a matching is a Morse matching (an acyclic matching with unit incidences, Forman 1998;
 * Chari 2000): partners are mutual, one dimension apart, their incidence number is ±1, and the
 * Hasse diagram with matched edges reversed has no directed cycle.
 *
 * <p>Independent of every heuristic: it reads only the complex's boundary and the partner array.
 * Linear time: the cycle test is Kahn's topological sort on the modified Hasse diagram, using one
 * in-degree counter and one queue slot per cell (8 bytes per cell).
 */
public final class MatchingVerifier {
    private MatchingVerifier() {
    }

    /**
     * Verifies a heuristic's matching and fails when it is not a valid acyclic matching: a defect in
     * the heuristic, never in the input, so the one place that says so for every caller.
     *
     * @param seed the seed it was made with, named in the message
     * @throws IllegalStateException naming the heuristic, the seed and the defect
     */
    public static MatchingVerdict requireValid(ChainComplex complex, Matching matching, MatchingHeuristic heuristic,
            long seed) {
        MatchingVerdict verdict = verify(complex, matching);
        if (!verdict.valid()) {
            throw new IllegalStateException("heuristic " + heuristic.name() + " produced an invalid matching with seed "
                    + seed + ": " + verdict.defect());
        }
        return verdict;
    }

    /** Verifies {@code matching} on {@code complex}. */
    public static MatchingVerdict verify(ChainComplex complex, Matching matching) {
        int n = complex.cellCount();
        if (matching.cellCount() != n) {
            return MatchingVerdict.invalid("the matching covers " + matching.cellCount() + " cells, the complex has " + n);
        }
        Boundary boundary = complex.boundary();
        for (int c = 0; c < n; c++) {
            int m = matching.mate(c);
            if (m == Matching.CRITICAL) {
                continue;
            }
            if (m < 0 || m >= n) {
                return MatchingVerdict.invalid("cell " + complex.cellName(c) + " has a partner out of range");
            }
            if (matching.mate(m) != c) {
                return MatchingVerdict.invalid("cells " + complex.cellName(c) + " and " + complex.cellName(m)
                        + " are not each other's partners");
            }
            if (complex.dimensionOf(m) == complex.dimensionOf(c) + 1) {
                int coefficient = boundary.coefficient(m, c);
                if (coefficient != 1 && coefficient != -1) {
                    return MatchingVerdict.invalid("cells " + complex.cellName(c) + " and " + complex.cellName(m)
                            + " are paired with incidence " + coefficient + ", not a unit");
                }
            } else if (complex.dimensionOf(m) != complex.dimensionOf(c) - 1) {
                return MatchingVerdict.invalid("cells " + complex.cellName(c) + " and " + complex.cellName(m)
                        + " are paired but not one dimension apart");
            }
        }
        return acyclic(complex, matching, boundary);
    }

    /**
     * Edges of the modified Hasse diagram: for each nonzero boundary entry σ → τ (τ a face of σ),
     * the edge points down, except when τ and σ are partners, when it points up.
     */
    private static MatchingVerdict acyclic(ChainComplex complex, Matching matching, Boundary boundary) {
        int n = complex.cellCount();
        int[] inDegree = new int[n];
        for (int s = 0; s < n; s++) {
            for (int i = boundary.start(s); i < boundary.end(s); i++) {
                int t = boundary.target(i);
                if (matching.mate(t) == s) {
                    inDegree[s]++;
                } else {
                    inDegree[t]++;
                }
            }
        }
        int[] queue = new int[n];
        int tail = 0;
        for (int c = 0; c < n; c++) {
            if (inDegree[c] == 0) {
                queue[tail++] = c;
            }
        }
        Progress progress = Progress.current();
        progress.begin("verify", "cells", n);
        for (int head = 0; head < tail; head++) {
            if ((head & 0xFFF) == 0) {
                progress.reached(head);
            }
            int c = queue[head];
            // out-edges of c: down to its faces unless the face is its partner; up to its partner if c is the lower one
            for (int i = boundary.start(c); i < boundary.end(c); i++) {
                int t = boundary.target(i);
                if (matching.mate(t) != c && --inDegree[t] == 0) {
                    queue[tail++] = t;
                }
            }
            int m = matching.mate(c);
            if (m != Matching.CRITICAL && complex.dimensionOf(m) == complex.dimensionOf(c) + 1
                    && --inDegree[m] == 0) {
                queue[tail++] = m;
            }
        }
        if (tail == n) {
            return MatchingVerdict.VALID;
        }
        return MatchingVerdict.invalid("the gradient has a closed path through cell "
                + complex.cellName(cellOnClosedPath(complex, matching, inDegree)));
    }

    /**
     * A cell on a closed path, given the in-degrees left by Kahn's sort: cells left with a positive
     * in-degree lie on a closed path or below one. Each of them has a predecessor that was left too,
     * so walking back from the first of them, always to the least such predecessor, must come round
     * to a cell already walked, which lies on a closed path. The choices make the answer depend on
     * the input alone.
     */
    private static int cellOnClosedPath(ChainComplex complex, Matching matching, int[] inDegree) {
        Boundary coboundary = complex.coboundary();
        int n = inDegree.length;
        int c = 0;
        while (inDegree[c] == 0) {
            c++;
        }
        boolean[] walked = new boolean[n];
        while (!walked[c]) {
            walked[c] = true;
            // predecessors of c: its cofaces other than its partner, and its partner if c is the upper one
            int back = Integer.MAX_VALUE;
            for (int i = coboundary.start(c); i < coboundary.end(c); i++) {
                int s = coboundary.target(i);
                if (matching.mate(c) != s && inDegree[s] > 0) {
                    back = Math.min(back, s);
                }
            }
            int m = matching.mate(c);
            if (m != Matching.CRITICAL && complex.dimensionOf(m) == complex.dimensionOf(c) - 1 && inDegree[m] > 0) {
                back = Math.min(back, m);
            }
            c = back;
        }
        return c;
    }
}
