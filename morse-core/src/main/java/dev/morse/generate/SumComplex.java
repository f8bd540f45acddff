package dev.morse.generate;

import dev.morse.complex.Facets;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * The sum complexes of Linial, Meshulam and Rosenthal ("Sum complexes — a new family of hypertrees",
 * Discrete Comput. Geom. 44, 2010; arXiv:0903.1359, whose abstract states the facts used below): for {@code A} a set of {@code k + 1} residues modulo {@code n},
 * the k-dimensional complex {@code X_A} on the vertex set Z/n with the full (k − 1)-dimensional
 * skeleton whose k-faces are the (k + 1)-subsets of Z/n whose sum lies in A. Vertices are labelled
 * {@code 0 .. n-1}.
 *
 * <p>Their results used as checks: when k + 1 and n are coprime, X_A has C(n − 1, k) k-faces (the
 * sums of the (k + 1)-subsets are equidistributed, as adding 1 to every vertex adds k + 1 to the
 * sum); when n is prime, X_A is a k-hypertree, so its rational homology is that of a point and
 * H_(k−1)(X_A; Z) is finite; and for n prime, X_A is k-collapsible exactly when A is an arithmetic
 * progression. Non-progressions give the torsion that makes them hard for matching heuristics.
 */
public final class SumComplex {
    /** Largest modulus accepted. */
    public static final int MAX_MODULUS = 40;

    private SumComplex() {
    }

    /** The facets of {@code X_A}: every k-subset and the (k + 1)-subsets summing into A, k + 1 = |A|. */
    public static Facets facets(int n, int... residues) {
        if (n < 2 || n > MAX_MODULUS) {
            throw new IllegalArgumentException("the modulus must be in 2.." + MAX_MODULUS + ", got " + n);
        }
        boolean[] inA = new boolean[n];
        int size = 0;
        for (int a : residues) {
            int r = Math.floorMod(a, n);
            if (inA[r]) {
                throw new IllegalArgumentException("residue " + r + " repeated in " + Arrays.toString(residues));
            }
            inA[r] = true;
            size++;
        }
        if (size < 2 || size > n) {
            throw new IllegalArgumentException("A needs 2.." + n + " residues, got " + size);
        }
        List<List<String>> out = new ArrayList<>();
        subsets(n, size - 1, 0, new int[size - 1], 0, null, out);
        subsets(n, size, 0, new int[size], 0, inA, out);
        return Facets.ofLabels(out);
    }

    /** Adds the {@code k}-subsets of {@code 0..n-1} (summing into {@code sums} unless it is null). */
    private static void subsets(int n, int k, int from, int[] chosen, int depth, boolean[] sums, List<List<String>> out) {
        if (depth == k) {
            int sum = 0;
            List<String> face = new ArrayList<>(k);
            for (int v : chosen) {
                sum = (sum + v) % n;
                face.add(Integer.toString(v));
            }
            if (sums == null || sums[sum]) {
                out.add(face);
            }
            return;
        }
        for (int v = from; v < n; v++) {
            chosen[depth] = v;
            subsets(n, k, v + 1, chosen, depth + 1, sums, out);
        }
    }
}
