package dev.morse.matching;

import dev.morse.complex.Boundary;
import dev.morse.complex.ChainComplex;
import dev.morse.progress.Progress;
import java.util.Arrays;

/**
 * The coreduction method of Mrozek and Batko ("Coreduction homology algorithm", Discrete Comput.
 * Geom. 41, 2009): a cell whose boundary, within the cells not yet removed, is exactly one face with
 * a unit incidence forms a coreduction pair with that face, and both are removed. A coface becomes
 * a candidate when its faces left fall to one or none; candidates are taken least number first
 * ({@link PendingCells}) rather than in the order they came, which keeps the walk local in memory.
 * Only when no candidate is left is a cell declared critical, and then always one of lowest
 * dimension among those left (it has an empty boundary there).
 *
 * <p>The pairs form an acyclic matching whatever the order of the candidates: along a gradient path
 * each step reaches a pair removed strictly earlier, since the coface of a pair had no other face
 * left at its removal. Linear time in practice; working memory besides the coboundary is 8 bytes
 * per cell (the partner, and one int that counts the faces left or marks the cell removed) and the
 * candidates' bits.
 */
final class CoreductionPairing implements MatchingHeuristic.Pairing {
    /** In {@code facesLeft}: the cell is removed. */
    private static final int REMOVED = -1;

    @Override
    public Matching match(ChainComplex complex, MatchingOptions options) {
        int n = complex.cellCount();
        Boundary boundary = complex.boundary();
        Boundary coboundary = complex.coboundary();
        int[] mates = new int[n];
        Arrays.fill(mates, Matching.CRITICAL);
        // per cell: its faces not yet removed, or REMOVED
        int[] facesLeft = new int[n];
        for (int c = 0; c < n; c++) {
            facesLeft[c] = boundary.size(c);
        }
        PendingCells waiting = new PendingCells(n);
        Progress progress = Progress.current();
        int pairs = 0;
        // cells are numbered by dimension, so the first cell left is one of lowest dimension
        for (int next = 0; next < n; next++) {
            if (facesLeft[next] == REMOVED) {
                continue;
            }
            remove(next, facesLeft, coboundary, waiting);
            while (!waiting.isEmpty()) {
                int s = waiting.takeLeast();
                if (facesLeft[s] == 0) {
                    addCofaces(s, facesLeft, coboundary, waiting);
                } else if (facesLeft[s] == 1) {
                    int entry = lastFaceEntry(s, facesLeft, boundary);
                    int coefficient = boundary.coefficient(entry);
                    if (coefficient == 1 || coefficient == -1) {
                        int t = boundary.target(entry);
                        mates[s] = t;
                        mates[t] = s;
                        remove(s, facesLeft, coboundary, waiting);
                        remove(t, facesLeft, coboundary, waiting);
                        if ((++pairs & 0x7FF) == 0) {
                            progress.reached(2L * pairs);
                        }
                    }
                }
            }
        }
        return Matching.adopt(mates);
    }

    private static void remove(int c, int[] facesLeft, Boundary coboundary, PendingCells waiting) {
        facesLeft[c] = REMOVED;
        for (int i = coboundary.start(c); i < coboundary.end(c); i++) {
            int b = coboundary.target(i);
            int left = facesLeft[b];
            if (left != REMOVED) {
                facesLeft[b] = --left;
                if (left <= 1) {
                    waiting.add(b);
                }
            }
        }
    }

    private static void addCofaces(int c, int[] facesLeft, Boundary coboundary, PendingCells waiting) {
        for (int i = coboundary.start(c); i < coboundary.end(c); i++) {
            if (facesLeft[coboundary.target(i)] != REMOVED) {
                waiting.add(coboundary.target(i));
            }
        }
    }

    private static int lastFaceEntry(int s, int[] facesLeft, Boundary boundary) {
        for (int i = boundary.start(s); i < boundary.end(s); i++) {
            if (facesLeft[boundary.target(i)] != REMOVED) {
                return i;
            }
        }
        throw new IllegalStateException("face count out of step with the boundary");
    }
}
