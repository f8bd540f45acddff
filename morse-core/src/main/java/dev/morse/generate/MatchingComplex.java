package dev.morse.generate;

import dev.morse.complex.Facets;
import java.util.ArrayList;
import java.util.List;

/**
 * The matching complex {@code M_n} of the complete graph {@code K_n}: vertices are the edges of
 * {@code K_n}, labelled {@code i-j} with {@code i < j}, and faces are the matchings (sets of
 * pairwise disjoint edges). A matching of {@code K_n} is maximal exactly when it leaves at most one
 * vertex uncovered, so the facets are the matchings of {@code floor(n/2)} edges and the complex is
 * pure of dimension {@code floor(n/2) - 1}. The number of k-edge matchings is
 * {@code n! / (k! 2^k (n-2k)!)} (common practice).
 */
public final class MatchingComplex {
    /** Largest n accepted. */
    public static final int MAX_N = 14;

    private MatchingComplex() {
    }

    /** The maximal matchings of {@code K_n}, {@code n ≥ 2}, one facet each. */
    public static Facets facets(int n) {
        Sizes.inRange("n", n, 2, MAX_N);
        List<List<String>> out = new ArrayList<>();
        extend(new boolean[n + 1], 1, n % 2, new ArrayList<>(), out);
        return Facets.ofLabels(out);
    }

    /**
     * Matches the least unmatched vertex from {@code next} on, or leaves it single while
     * {@code singlesLeft > 0}; every maximal matching is reached once.
     */
    private static void extend(boolean[] used, int next, int singlesLeft, List<String> edges, List<List<String>> out) {
        int n = used.length - 1;
        while (next <= n && used[next]) {
            next++;
        }
        if (next > n) {
            out.add(List.copyOf(edges));
            return;
        }
        used[next] = true;
        for (int j = next + 1; j <= n; j++) {
            if (!used[j]) {
                used[j] = true;
                edges.add(next + "-" + j);
                extend(used, next + 1, singlesLeft, edges, out);
                edges.remove(edges.size() - 1);
                used[j] = false;
            }
        }
        if (singlesLeft > 0) {
            extend(used, next + 1, singlesLeft - 1, edges, out);
        }
        used[next] = false;
    }
}
