package dev.morse.implicit;

import it.unimi.dsi.fastutil.ints.IntArrayList;
import java.util.ArrayList;
import java.util.List;

/**
 * Finds the critical chains of the matching of {@link ChainMatching} by one depth-first walk over
 * the maximal chains {@code 0̂ = x_0 ⋖ x_1 ⋖ ... ⋖ x_m = 1̂} of P̂, covers taken in the element order,
 * never storing more than the current chain. Each maximal chain F stands for its fibre (the chains
 * whose first maximal chain is F), and the fibres partition the chains.
 *
 * <p>The walk learns {@code reach(i)} (see {@link FacetReach}) as the chain grows: at depth b it
 * checks, for each step i whose reach is still open, whether an earlier cover of {@code x_i} lies
 * below {@code x_b}; if so {@code reach(i) = b - 1}. Position p is in the restriction once
 * {@code reach(p-1) = p} is known, so the lowest free position j is known at depth {@code j + 1}. A
 * whole subtree is then skipped when its fibres are all resolved, which the prefix already decides:
 * <ul>
 * <li>if {@code reach(j-1)} is still open (so at least b) and some {@code reach(i) = c} with
 *     {@code j ≤ i} is known, no gap from j reaches past c, so {@code reach(j-1) > c ≥} the farthest
 *     allowed gap from j: resolved;
 * <li>if {@code reach(j-1)} becomes known as c at depth {@code c + 1}, every reach that could end a
 *     gap from j before c + 1 is known too: resolved if some {@code reach(i) ≤ c} with
 *     {@code j ≤ i ≤ c}, and otherwise the gap from j to c + 1 is allowed and every fibre below is
 *     defective, to be matched by {@link DefectiveFibre} at the leaves.
 * </ul>
 * A leaf whose positions are all in the restriction is a falling chain and critical. On a poset whose
 * element order gives an EL-labelling no fibre is defective, and the walk visits only the falling
 * prefixes and their one-step extensions.
 *
 * <p>Memory: the current chain and the critical chains found, 4 bytes per element of each.
 */
final class CriticalChainSearch {
    private static final int OPEN = -1;

    private final BoundedPoset poset;
    private final long criticalLimit;
    private final int[] chain;
    private final int[] choice;
    private final int[] reach;
    private final int[] capped;
    private int cappedCount;
    private int lowestFree;
    private boolean defective;
    private final List<IntArrayList> critical = new ArrayList<>();
    private long criticalTotal;
    private long nodes;
    private long leaves;
    private long skipped;
    private long defectiveLeaves;

    private CriticalChainSearch(BoundedPoset poset, long criticalLimit) {
        this.poset = poset;
        this.criticalLimit = criticalLimit;
        int longest = poset.longestChain();
        chain = new int[longest];
        choice = new int[longest];
        reach = new int[longest];
        capped = new int[longest];
    }

    /**
     * The critical chains of the matching on {@code poset}.
     *
     * @throws IllegalStateException when more than {@code criticalLimit} are found
     */
    static CriticalChains run(BoundedPoset poset, long criticalLimit) {
        CriticalChainSearch search = new CriticalChainSearch(poset, criticalLimit);
        return search.walk();
    }

    private CriticalChains walk() {
        if (poset.size() == 0) {
            return new CriticalChains(List.of(), new SearchStatistics(0, 0, 0, 0));
        }
        // the first maximal chain's fibre holds all its subchains; its lowest element is matched with
        // the empty chain, which is not a cell, so it stays critical
        emit(new int[] {poset.cover(poset.bottom(), 0)}, 1);
        chain[0] = poset.bottom();
        lowestFree = FacetReach.NONE;
        descend(1);
        return new CriticalChains(critical, new SearchStatistics(nodes, leaves, skipped, defectiveLeaves));
    }

    /** Tries every cover of {@code chain[b - 1]} as {@code chain[b]}. */
    private void descend(int b) {
        int x = chain[b - 1];
        int covers = poset.coverCount(x);
        for (int k = 0; k < covers; k++) {
            choice[b - 1] = k;
            reach[b - 1] = OPEN;
            chain[b] = poset.cover(x, k);
            visit(b);
        }
    }

    private void visit(int b) {
        nodes++;
        int undo = cappedCount;
        int target = chain[b];
        for (int i = 0; i <= b - 2; i++) {
            if (reach[i] == OPEN && choice[i] > 0 && poset.earlierCoverBelow(chain[i], choice[i], target)) {
                reach[i] = b - 1;
                capped[cappedCount++] = i;
            }
        }
        int savedLowestFree = lowestFree;
        boolean savedDefective = defective;
        boolean skip = false;
        if (lowestFree == FacetReach.NONE && b >= 2 && reach[b - 2] != b - 1) {
            lowestFree = b - 1;
        }
        if (lowestFree != FacetReach.NONE && !defective) {
            int j = lowestFree;
            if (reach[j - 1] == OPEN) {
                skip = knownReachFrom(j, b - 2);
            } else if (reach[j - 1] == b - 1) {
                skip = knownReachFrom(j, b - 2);
                defective = !skip;
            }
        }
        if (skip) {
            skipped++;
        } else if (target == poset.top()) {
            leaf(b);
        } else {
            descend(b + 1);
        }
        lowestFree = savedLowestFree;
        defective = savedDefective;
        while (cappedCount > undo) {
            reach[capped[--cappedCount]] = OPEN;
        }
    }

    /** Whether some {@code reach(i)} with {@code from ≤ i ≤ to} is known. */
    private boolean knownReachFrom(int from, int to) {
        for (int i = from; i <= to; i++) {
            if (reach[i] != OPEN) {
                return true;
            }
        }
        return false;
    }

    private void leaf(int m) {
        leaves++;
        if (lowestFree == FacetReach.NONE) {
            emit(chain, 1, m - 1);
            return;
        }
        if (!defective) {
            return;
        }
        defectiveLeaves++;
        int[] known = new int[m];
        for (int i = 0; i < m; i++) {
            known[i] = reach[i] == OPEN ? m : reach[i];
        }
        FacetReach facet = FacetReach.known(chain, m + 1, known);
        int[] elements = new int[m];
        new DefectiveFibre(facet).forEachCritical((positions, length) -> {
            for (int i = 0; i < length; i++) {
                elements[i] = facet.element(positions[i]);
            }
            emit(elements, length);
        });
    }

    private void emit(int[] elements, int length) {
        emit(elements, 0, length);
    }

    private void emit(int[] elements, int from, int length) {
        if (++criticalTotal > criticalLimit) {
            throw new IllegalStateException("the matching leaves more than " + criticalLimit
                    + " critical chains, more than the implicit engine keeps; try another element order");
        }
        int d = length - 1;
        while (critical.size() <= d) {
            critical.add(new IntArrayList());
        }
        critical.get(d).addElements(critical.get(d).size(), elements, from, length);
    }
}
