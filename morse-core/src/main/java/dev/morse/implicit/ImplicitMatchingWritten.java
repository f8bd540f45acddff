package dev.morse.implicit;

import dev.morse.complex.OrderComplex;
import dev.morse.matching.Matching;
import java.util.Arrays;
import java.util.HashMap;
import java.util.Map;

/**
 * The implicit engine's matching written out on a stored order complex: for each chain, the partner
 * its rule gives. Meant for pictures and checks of small posets, where every chain can be listed; the
 * engine itself never does this. Memory: one map entry per chain.
 */
public final class ImplicitMatchingWritten {
    private ImplicitMatchingWritten() {
    }

    /**
     * The matching the implicit engine uses with {@code order} on the order complex of
     * {@code complex.poset()}, as a {@link Matching} of {@code complex}'s cells.
     */
    public static Matching of(OrderComplex complex, ElementOrder order) {
        BoundedPoset bounded = BoundedPoset.of(complex.poset(), order::ranks, Runtime.getRuntime().maxMemory() / 2);
        ChainMatching rule = new ChainMatching(bounded);
        int n = complex.cellCount();
        Map<String, Integer> cellOf = new HashMap<>();
        int[][] internal = new int[n][];
        for (int c = 0; c < n; c++) {
            int[] chain = complex.chain(c);
            int[] ids = new int[chain.length];
            for (int i = 0; i < chain.length; i++) {
                ids[i] = bounded.internal(chain[i]);
            }
            Arrays.sort(ids);
            internal[c] = ids;
            cellOf.put(Arrays.toString(ids), c);
        }
        int[] mates = new int[n];
        Arrays.fill(mates, Matching.CRITICAL);
        for (int c = 0; c < n; c++) {
            int[] ids = internal[c];
            int x = rule.partner(ids.clone(), ids.length);
            if (x == ChainMatching.CRITICAL) {
                continue;
            }
            int[] partner = toggled(ids, x);
            Integer other = cellOf.get(Arrays.toString(partner));
            if (other == null) {
                throw new IllegalStateException("the rule paired a chain with one that is not in the complex");
            }
            mates[c] = other;
        }
        return Matching.of(mates);
    }

    /** The chain with {@code x} added when absent or removed when present, ascending. */
    private static int[] toggled(int[] ids, int x) {
        int at = Arrays.binarySearch(ids, x);
        if (at >= 0) {
            int[] less = new int[ids.length - 1];
            System.arraycopy(ids, 0, less, 0, at);
            System.arraycopy(ids, at + 1, less, at, ids.length - at - 1);
            return less;
        }
        int[] more = Arrays.copyOf(ids, ids.length + 1);
        more[ids.length] = x;
        Arrays.sort(more);
        return more;
    }
}
