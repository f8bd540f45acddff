package dev.morse.generate;

import dev.morse.poset.Poset;
import dev.morse.poset.PosetBuilder;
import it.unimi.dsi.fastutil.longs.LongArrayList;
import it.unimi.dsi.fastutil.longs.LongOpenHashSet;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Every poset on n elements up to isomorphism, for {@code n ≤ 7}. Each poset on n elements arises from
 * one on n - 1 elements by adding a new maximal element above an order ideal (a down-closed subset,
 * possibly empty) of it, so all of them come from extending each poset of the level below by each of
 * its order ideals; isomorphic copies are merged by a canonical form: the least strict-order matrix,
 * read as a bit string, over the relabellings that keep elements sorted by (height, number below,
 * number above), invariants that any isomorphism keeps. There are 1, 1, 2, 5, 16, 63, 318, 2045 posets
 * on 0..7 elements (OEIS A000112, from memory). Elements are labelled {@code 1..n} in a linear extension.
 */
public final class AllPosets {
    /** The largest n offered: 2045 posets on 7 elements, 16999 on 8. */
    public static final int MAX_N = 7;

    private AllPosets() {
    }

    /** All posets on {@code n} elements, one per isomorphism class, in the order of their canonical forms. */
    public static List<Poset> of(int n) {
        Sizes.inRange("n", n, 0, MAX_N);
        LongArrayList level = new LongArrayList(new long[] {0L});
        for (int m = 1; m <= n; m++) {
            level = extend(level, m - 1);
        }
        long[] codes = level.toLongArray();
        Arrays.sort(codes);
        List<Poset> out = new ArrayList<>();
        for (long code : codes) {
            out.add(toPoset(code, n));
        }
        return out;
    }

    /** The canonical forms on m + 1 elements made from those on m elements. */
    private static LongArrayList extend(LongArrayList level, int m) {
        LongOpenHashSet seen = new LongOpenHashSet();
        LongArrayList next = new LongArrayList();
        for (long code : level) {
            // re-index the m-element order into an (m+1)-element matrix whose last element is new
            long base = 0;
            for (int i = 0; i < m; i++) {
                for (int j = 0; j < m; j++) {
                    if (below(code, m, i, j)) {
                        base |= bit(m + 1, i, j);
                    }
                }
            }
            for (int ideal = 0; ideal < 1 << m; ideal++) {
                if (!downClosed(code, m, ideal)) {
                    continue;
                }
                long extended = base;
                for (int i = 0; i < m; i++) {
                    if ((ideal >>> i & 1) != 0) {
                        extended |= bit(m + 1, i, m);
                    }
                }
                long canonical = canonical(extended, m + 1);
                if (seen.add(canonical)) {
                    next.add(canonical);
                }
            }
        }
        return next;
    }

    private static boolean downClosed(long code, int m, int set) {
        for (int j = 0; j < m; j++) {
            if ((set >>> j & 1) == 0) {
                continue;
            }
            for (int i = 0; i < m; i++) {
                if (below(code, m, i, j) && (set >>> i & 1) == 0) {
                    return false;
                }
            }
        }
        return true;
    }

    private static long bit(int n, int i, int j) {
        return 1L << (i * n + j);
    }

    private static boolean below(long code, int n, int i, int j) {
        return (code & bit(n, i, j)) != 0;
    }

    /**
     * The least code over relabellings that sort elements by their invariants, blocks of equal
     * invariants permuted in every way. Invariants put lower elements first (by height), so the
     * canonical labelling is a linear extension.
     */
    static long canonical(long code, int n) {
        long[] key = new long[n];
        for (int x = 0; x < n; x++) {
            int down = 0;
            int up = 0;
            for (int y = 0; y < n; y++) {
                down += below(code, n, y, x) ? 1 : 0;
                up += below(code, n, x, y) ? 1 : 0;
            }
            key[x] = ((long) height(code, n, x) << 40) | ((long) down << 20) | up;
        }
        Integer[] sorted = new Integer[n];
        for (int x = 0; x < n; x++) {
            sorted[x] = x;
        }
        Arrays.sort(sorted, (a, b) -> Long.compare(key[a], key[b]));
        int[] order = new int[n];
        for (int i = 0; i < n; i++) {
            order[i] = sorted[i];
        }
        long[] best = {Long.MAX_VALUE};
        permuteBlocks(code, n, key, order, 0, best);
        return best[0];
    }

    /** Tries every order of each block of equal keys; {@code order[i]} is the element given label i. */
    private static void permuteBlocks(long code, int n, long[] key, int[] order, int from, long[] best) {
        if (from == n) {
            long c = 0;
            for (int i = 0; i < n; i++) {
                for (int j = 0; j < n; j++) {
                    if (below(code, n, order[i], order[j])) {
                        c |= bit(n, i, j);
                    }
                }
            }
            best[0] = Math.min(best[0], c);
            return;
        }
        int to = from;
        while (to < n && key[order[to]] == key[order[from]]) {
            to++;
        }
        permuteWithin(code, n, key, order, from, from, to, best);
    }

    private static void permuteWithin(long code, int n, long[] key, int[] order, int blockStart, int i, int blockEnd,
            long[] best) {
        if (i == blockEnd) {
            permuteBlocks(code, n, key, order, blockEnd, best);
            return;
        }
        for (int k = i; k < blockEnd; k++) {
            swap(order, i, k);
            permuteWithin(code, n, key, order, blockStart, i + 1, blockEnd, best);
            swap(order, i, k);
        }
    }

    private static void swap(int[] a, int i, int j) {
        int t = a[i];
        a[i] = a[j];
        a[j] = t;
    }

    private static int height(long code, int n, int x) {
        int h = 0;
        for (int y = 0; y < n; y++) {
            if (below(code, n, y, x)) {
                h = Math.max(h, height(code, n, y) + 1);
            }
        }
        return h;
    }

    private static Poset toPoset(long code, int n) {
        PosetBuilder b = new PosetBuilder();
        for (int x = 0; x < n; x++) {
            b.element(Integer.toString(x + 1));
        }
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                if (below(code, n, i, j)) {
                    b.relate(i, j, 0);
                }
            }
        }
        return b.buildKnownAcyclic();
    }
}
