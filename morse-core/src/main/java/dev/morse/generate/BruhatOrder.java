package dev.morse.generate;

import dev.morse.poset.Poset;
import dev.morse.poset.PosetBuilder;
import it.unimi.dsi.fastutil.objects.Object2IntOpenHashMap;
import java.util.ArrayList;
import java.util.List;

/**
 * The Bruhat order of the symmetric group S_n, permutations in one-line notation ({@code 2314}).
 * Its covers are {@code w ⋖ w·(i j)} for positions {@code i < j} with {@code w(i) < w(j)} and no
 * position k between them with {@code w(i) < w(k) < w(j)}: exactly the transpositions that raise the
 * number of inversions by one (Björner–Brenti, Combinatorics of Coxeter Groups, 2005, Thm 2.1.5 and
 * Lemma 2.1.4, from memory). The order is graded by the number of inversions, with the identity at the
 * bottom and the reversal {@code n..21} at the top; every interval is Eulerian (Verma 1971) and the
 * order is Cohen–Macaulay, each open interval a shellable sphere (Björner–Wachs 1982).
 */
public final class BruhatOrder {
    /** The largest n offered: S_6 has 720 elements; S_7 would have 5040. */
    public static final int MAX_N = 6;

    private BruhatOrder() {
    }

    /** The Bruhat order of S_n, for {@code 1 ≤ n ≤ 6}. */
    public static Poset of(int n) {
        return build(n, false);
    }

    /** The Bruhat order of S_n without the identity and the reversal, for {@code 2 ≤ n ≤ 6}. */
    public static Poset properPart(int n) {
        return build(n, true);
    }

    private static Poset build(int n, boolean proper) {
        Sizes.inRange("n", n, proper ? 2 : 1, MAX_N);
        List<int[]> permutations = new ArrayList<>();
        permute(new int[n], new boolean[n], 0, permutations);
        PosetBuilder b = new PosetBuilder();
        Object2IntOpenHashMap<String> ids = new Object2IntOpenHashMap<>();
        ids.defaultReturnValue(-1);
        int top = n * (n - 1) / 2;
        for (int[] w : permutations) {
            int length = inversions(w);
            if (!proper || (length != 0 && length != top)) {
                ids.put(name(w), b.element(name(w)));
            }
        }
        for (int[] w : permutations) {
            int lower = ids.getInt(name(w));
            if (lower < 0) {
                continue;
            }
            for (int i = 0; i < n; i++) {
                for (int j = i + 1; j < n; j++) {
                    if (w[i] < w[j] && nothingBetween(w, i, j)) {
                        int[] v = w.clone();
                        v[i] = w[j];
                        v[j] = w[i];
                        int upper = ids.getInt(name(v));
                        if (upper >= 0) {
                            b.relate(lower, upper, 0);
                        }
                    }
                }
            }
        }
        return b.buildKnownAcyclic();
    }

    private static boolean nothingBetween(int[] w, int i, int j) {
        for (int k = i + 1; k < j; k++) {
            if (w[i] < w[k] && w[k] < w[j]) {
                return false;
            }
        }
        return true;
    }

    /** The number of inversions: the length of w in the Coxeter generators. */
    static int inversions(int[] w) {
        int count = 0;
        for (int i = 0; i < w.length; i++) {
            for (int j = i + 1; j < w.length; j++) {
                if (w[i] > w[j]) {
                    count++;
                }
            }
        }
        return count;
    }

    private static String name(int[] w) {
        StringBuilder s = new StringBuilder();
        for (int v : w) {
            s.append(v);
        }
        return s.toString();
    }

    /** All permutations of {@code 1..n} in lexicographic order. */
    private static void permute(int[] w, boolean[] used, int i, List<int[]> out) {
        if (i == w.length) {
            out.add(w.clone());
            return;
        }
        for (int v = 1; v <= w.length; v++) {
            if (!used[v - 1]) {
                used[v - 1] = true;
                w[i] = v;
                permute(w, used, i + 1, out);
                used[v - 1] = false;
            }
        }
    }
}
