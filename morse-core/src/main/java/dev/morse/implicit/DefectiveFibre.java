package dev.morse.implicit;

import it.unimi.dsi.fastutil.ints.IntArrayList;

/**
 * The sequential element matching on the fibre of one facet whose fibre is not resolved by a single
 * element (see {@link FacetReach}): the facet's interior elements are taken from the bottom up, and
 * each pairs every two members of the fibre that differ only in it and are both still unmatched
 * (Jonsson, "Simplicial Complexes of Graphs", 2008, element matchings; the union is acyclic,
 * recalled from memory and proved again in {@link ImplicitHomology}). The empty chain is not a member.
 *
 * <p>Members contain the restriction, so they are indexed by subsets of the f free positions; this
 * holds one byte per subset, {@code 2^f} bytes, and refuses f above {@link #MAX_FREE}.
 */
final class DefectiveFibre {
    /** The most free positions handled. */
    static final int MAX_FREE = 26;

    private static final byte OUTSIDE = -1;
    private static final byte UNMATCHED = -2;

    private final FacetReach facet;
    private final int[] free;
    private final byte[] step;

    DefectiveFibre(FacetReach facet) {
        this.facet = facet;
        IntArrayList positions = new IntArrayList();
        for (int p = 1; p < facet.top(); p++) {
            if (!facet.inRestriction(p)) {
                positions.add(p);
            }
        }
        free = positions.toIntArray();
        if (free.length > MAX_FREE) {
            throw new IllegalStateException("the element order leaves a maximal chain of " + (facet.top() - 1)
                    + " elements whose fibre is not resolved and has " + free.length + " free elements, more than the "
                    + MAX_FREE + " the implicit engine enumerates; try another element order");
        }
        step = new byte[1 << free.length];
        for (int s = 0; s < step.length; s++) {
            step[s] = isMember(s) ? UNMATCHED : OUTSIDE;
        }
        for (int t = 0; t < free.length; t++) {
            int bit = 1 << t;
            for (int s = 0; s < step.length; s++) {
                if ((s & bit) == 0 && step[s] == UNMATCHED && step[s | bit] == UNMATCHED) {
                    step[s] = (byte) t;
                    step[s | bit] = (byte) t;
                }
            }
        }
    }

    /** Whether the chain given by the free subset {@code s} (plus the restriction) lies in the fibre. */
    private boolean isMember(int s) {
        int previous = 0;
        int count = 0;
        int t = 0;
        for (int p = 1; p <= facet.top(); p++) {
            boolean chosen;
            if (p == facet.top()) {
                chosen = true;
            } else if (t < free.length && free[t] == p) {
                chosen = (s & (1 << t)) != 0;
                t++;
            } else {
                chosen = true;
            }
            if (chosen) {
                if (!facet.allowed(previous, p)) {
                    return false;
                }
                previous = p;
                if (p < facet.top()) {
                    count++;
                }
            }
        }
        return count > 0;
    }

    /** The free subset of a member given by its positions in the facet, ascending. */
    int subsetOf(int[] positions, int length) {
        int s = 0;
        int t = 0;
        for (int i = 0; i < length; i++) {
            while (t < free.length && free[t] < positions[i]) {
                t++;
            }
            if (t < free.length && free[t] == positions[i]) {
                s |= 1 << t;
            }
        }
        return s;
    }

    /**
     * The facet position whose element the member with free subset {@code s} gains or loses in the
     * matching, or {@link FacetReach#NONE} if it is critical.
     *
     * @throws IllegalArgumentException if {@code s} is not a member of the fibre
     */
    int partnerPosition(int s) {
        byte b = step[s];
        if (b == OUTSIDE) {
            throw new IllegalArgumentException("the chain is not in this fibre");
        }
        return b == UNMATCHED ? FacetReach.NONE : free[b];
    }

    /** Calls {@code sink} with the interior positions of each critical member, ascending. */
    void forEachCritical(CriticalSink sink) {
        int[] positions = new int[facet.top()];
        for (int s = 0; s < step.length; s++) {
            if (step[s] != UNMATCHED) {
                continue;
            }
            int length = 0;
            int t = 0;
            for (int p = 1; p < facet.top(); p++) {
                if (t < free.length && free[t] == p) {
                    if ((s & (1 << t)) != 0) {
                        positions[length++] = p;
                    }
                    t++;
                } else {
                    positions[length++] = p;
                }
            }
            sink.accept(positions, length);
        }
    }

    /** Receives the positions of one critical chain. */
    @FunctionalInterface
    interface CriticalSink {
        /** {@code positions[0..length)}, ascending; the array is reused. */
        void accept(int[] positions, int length);
    }
}
