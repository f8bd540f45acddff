package dev.morse.implicit;

import it.unimi.dsi.fastutil.ints.IntArrayList;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * The acyclic matching on the nonempty chains of P, computed by rule for one chain at a time. A chain
 * G is filled to its lexicographically first maximal chain F (the greedy chain in every gap), F is
 * measured ({@link FacetReach}), and G's partner is G with the lowest free element of F added or
 * removed when F's fibre is resolved, else what {@link DefectiveFibre} says. The one critical vertex
 * is the first element of the first maximal chain, whose partner would be the empty chain.
 *
 * <p>Not thread-safe: it reuses scratch arrays, and keeps the last {@value #CACHED_FIBRES} defective
 * fibres it met.
 */
final class ChainMatching {
    /** The partner of a critical chain. */
    static final int CRITICAL = -1;

    private static final int CACHED_FIBRES = 64;

    private final BoundedPoset poset;
    private final int[] facet;
    private final int[] positions;
    private final Map<IntArrayList, DefectiveFibre> fibres = new LinkedHashMap<>(16, 0.75f, true) {
        @Override
        protected boolean removeEldestEntry(Map.Entry<IntArrayList, DefectiveFibre> eldest) {
            return size() > CACHED_FIBRES;
        }
    };

    ChainMatching(BoundedPoset poset) {
        this.poset = poset;
        this.facet = new int[poset.longestChain()];
        this.positions = new int[poset.longestChain()];
    }

    /**
     * The element that the chain {@code chain[0..length)} (internal ids, ascending, nonempty) gains or
     * loses in the matching, or {@link #CRITICAL}. The partner has one element more when the answer
     * is not in the chain, one fewer when it is.
     */
    int partner(int[] chain, int length) {
        int m = fill(chain, length);
        FacetReach reach = FacetReach.of(poset, facet, m + 1);
        for (int i = 0; i <= length; i++) {
            int a = i == 0 ? 0 : positions[i - 1];
            int b = i == length ? m : positions[i];
            if (!reach.allowed(a, b)) {
                throw new IllegalStateException("a greedy fill left a gap that is not greedy");
            }
        }
        int j = reach.lowestFree();
        if (j == FacetReach.NONE) {
            return CRITICAL; // a falling maximal chain is alone in its fibre
        }
        if (reach.resolvedAt(j)) {
            int x = reach.element(j);
            return length == 1 && chain[0] == x ? CRITICAL : x;
        }
        DefectiveFibre fibre = fibres.computeIfAbsent(IntArrayList.wrap(java.util.Arrays.copyOf(facet, m + 1)),
                key -> new DefectiveFibre(reach));
        int p = fibre.partnerPosition(fibre.subsetOf(positions, length));
        return p == FacetReach.NONE ? CRITICAL : reach.element(p);
    }

    /**
     * Fills {@code facet} with the first maximal chain through the chain and records the chain's
     * positions in it; returns the position m of 1̂.
     */
    private int fill(int[] chain, int length) {
        int at = 0;
        facet[0] = poset.bottom();
        for (int i = 0; i <= length; i++) {
            int goal = i == length ? poset.top() : chain[i];
            while (facet[at] != goal) {
                facet[at + 1] = poset.greedyStep(facet[at], goal);
                at++;
            }
            if (i < length) {
                positions[i] = at;
            }
        }
        return at;
    }
}
