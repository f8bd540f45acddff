package dev.morse.matching;

import dev.morse.complex.Boundary;
import dev.morse.complex.ChainComplex;
import java.util.Arrays;
import java.util.function.IntConsumer;

/**
 * The bookkeeping shared by collapsing heuristics: which cells are removed, how many cofaces each
 * cell has left, and the partners found so far. A cell with exactly one coface left is a free face.
 * 9 bytes per cell.
 */
final class FreeFaceState {
    private final Boundary boundary;
    private final Boundary coboundary;
    private final int[] mates;
    private final boolean[] removed;
    private final int[] cofacesLeft;

    FreeFaceState(ChainComplex complex) {
        int n = complex.cellCount();
        boundary = complex.boundary();
        coboundary = complex.coboundary();
        mates = new int[n];
        Arrays.fill(mates, Matching.CRITICAL);
        removed = new boolean[n];
        cofacesLeft = new int[n];
        for (int c = 0; c < n; c++) {
            cofacesLeft[c] = coboundary.size(c);
        }
    }

    /** Whether {@code t} is still present and has exactly one coface left. */
    boolean isFree(int t) {
        return !removed[t] && cofacesLeft[t] == 1;
    }

    /** Hands every free face of the complex as it is now to {@code sink}, in ascending order. */
    void offerFreeFaces(IntConsumer sink) {
        for (int c = 0; c < removed.length; c++) {
            if (isFree(c)) {
                sink.accept(c);
            }
        }
    }

    boolean isRemoved(int c) {
        return removed[c];
    }

    /** How many cofaces of {@code c} are left. */
    int cofacesLeft(int c) {
        return cofacesLeft[c];
    }

    /**
     * Collapses the free face {@code t} with its last coface when their incidence is a unit, telling
     * {@code newlyFree} of faces that become free; returns whether it did.
     */
    boolean collapse(int t, IntConsumer newlyFree) {
        int entry = remainingCofaceEntry(t);
        int coefficient = coboundary.coefficient(entry);
        if (coefficient != 1 && coefficient != -1) {
            return false;
        }
        int s = coboundary.target(entry);
        mates[s] = t;
        mates[t] = s;
        remove(s, newlyFree);
        remove(t, newlyFree);
        return true;
    }

    /** Removes {@code c}, which must have no coface left, telling {@code newlyFree} of freed faces. */
    void remove(int c, IntConsumer newlyFree) {
        removed[c] = true;
        for (int i = boundary.start(c); i < boundary.end(c); i++) {
            int f = boundary.target(i);
            if (!removed[f] && --cofacesLeft[f] == 1) {
                newlyFree.accept(f);
            }
        }
    }

    /** The matching found; the state must not be used afterwards. */
    Matching matching() {
        return Matching.adopt(mates);
    }

    private int remainingCofaceEntry(int t) {
        for (int i = coboundary.start(t); i < coboundary.end(t); i++) {
            if (!removed[coboundary.target(i)]) {
                return i;
            }
        }
        throw new IllegalStateException("coface count out of step with the coboundary");
    }
}
