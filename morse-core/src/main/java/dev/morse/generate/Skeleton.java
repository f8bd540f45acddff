package dev.morse.generate;

import dev.morse.complex.Facets;
import java.util.ArrayList;
import java.util.List;

/**
 * Skeleta of simplices: the k-skeleton of the (n-1)-simplex on the vertices {@code 1..n} has as
 * facets all {@code (k+1)}-subsets, and its reduced homology is {@code Z^C(n-1,k+1)} in dimension k
 * and zero elsewhere (standard: it is a wedge of k-spheres). For {@code k = n-2} it is the
 * boundary of the simplex.
 */
public final class Skeleton {
    /** Largest number of facets accepted. */
    public static final long MAX_FACETS = 5_000_000;

    private Skeleton() {
    }

    /** The k-skeleton of the (n-1)-simplex, {@code 0 ≤ k ≤ n-1}. */
    public static Facets ofSimplex(int k, int n) {
        if (n < 1 || k < 0 || k > n - 1) {
            throw new IllegalArgumentException("need 0 ≤ k ≤ n-1, got k = " + k + ", n = " + n);
        }
        long count = 1;
        for (int i = 0; i < k + 1; i++) {
            count = count * (n - i) / (i + 1);
            if (count > MAX_FACETS) {
                throw new IllegalArgumentException("more than " + MAX_FACETS + " facets");
            }
        }
        List<List<String>> out = new ArrayList<>();
        subsets(n, k + 1, 1, new ArrayList<>(), out);
        return Facets.ofLabels(out);
    }

    private static void subsets(int n, int size, int from, List<String> chosen, List<List<String>> out) {
        if (chosen.size() == size) {
            out.add(List.copyOf(chosen));
            return;
        }
        for (int v = from; v <= n - (size - chosen.size()) + 1; v++) {
            chosen.add(Integer.toString(v));
            subsets(n, size, v + 1, chosen, out);
            chosen.remove(chosen.size() - 1);
        }
    }
}
