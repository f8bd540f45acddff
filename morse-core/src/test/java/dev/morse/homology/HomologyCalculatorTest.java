package dev.morse.homology;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.morse.complex.ChainComplex;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

class HomologyCalculatorTest {
    private static final Coefficients Z = Coefficients.INTEGERS;
    private static final Coefficients Q = Coefficients.RATIONALS;

    /** "Z", "Z^2 + Z/2", "0", ... by dimension, as {@link HomologyGroup#toString()} writes them. */
    private static List<String> groups(Homology h) {
        List<String> s = new ArrayList<>();
        for (HomologyGroup g : h.groups()) {
            s.add(g.toString());
        }
        return s;
    }

    /** RP^n with one cell per dimension, the boundary of the k-cell being 1 + (-1)^k times the (k-1)-cell. */
    private static ChainComplex projectiveSpace(int n) {
        int[] counts = new int[n + 1];
        Arrays.fill(counts, 1);
        int[][][] boundaries = new int[n + 1][][];
        boundaries[0] = new int[0][];
        for (int k = 1; k <= n; k++) {
            boundaries[k] = k % 2 == 0 ? new int[][] {{0, 0, 2}} : new int[0][];
        }
        return TestComplexes.cellular(counts, boundaries);
    }

    @Test
    void realProjectiveSpacesHaveAlternatingTwoTorsion() {
        // Hatcher, Algebraic Topology, 2002, Example 2.42: H_k(RP^n) = Z/2 for odd k < n, 0 for
        // even 0 < k < n, Z for k = n odd; over Q only H_0 and (n odd) H_n survive; over Z/2 every
        // H_k is Z/2.
        for (int n = 1; n <= 7; n++) {
            Homology integral = HomologyCalculator.compute(projectiveSpace(n), Z);
            for (int k = 0; k <= n; k++) {
                String expected = k == 0 ? "Z" : k == n && n % 2 == 1 ? "Z" : k % 2 == 1 ? "Z/2" : "0";
                assertEquals(expected, integral.group(k).toString(), "H_" + k + "(RP^" + n + ")");
                int rational = k == 0 || (k == n && n % 2 == 1) ? 1 : 0;
                assertEquals(rational, HomologyCalculator.compute(projectiveSpace(n), Q).group(k).betti());
                assertEquals(rational, HomologyCalculator.compute(projectiveSpace(n), Coefficients.modulo(3)).group(k).betti());
                assertEquals(1, HomologyCalculator.compute(projectiveSpace(n), Coefficients.modulo(2)).group(k).betti());
            }
        }
    }

    @Test
    void sixVertexProjectivePlane() {
        // REFERENCES.md: RP^2 has H = Z, Z/2, 0 (Hatcher Example 2.42).
        ChainComplex rp2 = TestComplexes.simplicial(Triangulations.projectivePlane());
        assertEquals(List.of(6, 15, 10), List.of(rp2.cellCount(0), rp2.cellCount(1), rp2.cellCount(2)));
        assertEquals(List.of("Z", "Z/2", "0"), groups(HomologyCalculator.compute(rp2, Z)));
        assertEquals(List.of("Z", "0", "0"), groups(HomologyCalculator.compute(rp2, Q)));
        assertEquals(List.of("Z", "Z", "Z"), groups(HomologyCalculator.compute(rp2, Coefficients.modulo(2))));
    }

    @Test
    void sevenVertexTorus() {
        // The torus: Z, Z^2, Z (REFERENCES.md; Hatcher Example 2.3 and §2.1).
        ChainComplex torus = TestComplexes.simplicial(Triangulations.sevenVertexTorus());
        assertEquals(List.of(7, 21, 14), List.of(torus.cellCount(0), torus.cellCount(1), torus.cellCount(2)));
        assertEquals(List.of("Z", "Z^2", "Z"), groups(HomologyCalculator.compute(torus, Z)));
    }

    @Test
    void largeGridTorusAndKleinBottle() {
        // Hatcher §2.1 (square models): torus Z, Z^2, Z; Klein bottle Z, Z + Z/2, 0. A 40×40 grid
        // makes boundary matrices of a few thousand rows, all handled by the sparse path.
        ChainComplex torus = TestComplexes.simplicial(Triangulations.gridSurface(40, false));
        assertEquals(List.of("Z", "Z^2", "Z"), groups(HomologyCalculator.compute(torus, Z)));
        ChainComplex klein = TestComplexes.simplicial(Triangulations.gridSurface(40, true));
        assertEquals(List.of("Z", "Z + Z/2", "0"), groups(HomologyCalculator.compute(klein, Z)));
        assertEquals(List.of("Z", "Z", "0"), groups(HomologyCalculator.compute(klein, Q)));
        assertEquals(List.of("Z", "Z^2", "Z"), groups(HomologyCalculator.compute(klein, Coefficients.modulo(2))));
        assertEquals(List.of("Z", "Z", "0"), groups(HomologyCalculator.compute(klein, Coefficients.modulo(2147483647))));
    }

    @Test
    void threeTorusFollowsKunneth() {
        // Künneth (Hatcher Theorem 3B.6): H_k(T^3) = Z^C(3,k).
        ChainComplex t3 = TestComplexes.simplicial(Triangulations.threeTorus(4));
        assertEquals(List.of("Z", "Z^3", "Z^3", "Z"), groups(HomologyCalculator.compute(t3, Z)));
    }

    @Test
    void spheresAndReducedHomology() {
        // The boundary of the d-simplex is S^(d-1) (REFERENCES.md): reduced homology Z in
        // dimension d-1 only.
        for (int d = 1; d <= 5; d++) {
            ChainComplex sphere = TestComplexes.simplicial(Triangulations.simplexBoundary(d));
            Homology reduced = HomologyCalculator.compute(sphere, Z, true);
            assertTrue(reduced.reduced());
            for (int k = 0; k < d; k++) {
                assertEquals(k == d - 1 ? "Z" : "0", reduced.group(k).toString(), "H~_" + k + "(S^" + (d - 1) + ")");
            }
            Homology unreduced = HomologyCalculator.compute(sphere, Z, false);
            assertEquals(d == 1 ? 2 : 1, unreduced.group(0).betti());
        }
    }

    @Test
    void mooreSpaceCarriesLargeTorsion() {
        // One cell in each of dimensions 0, 1, 2, the 2-cell attached with degree m: H_1 = Z/m
        // (Hatcher Example 2.40, the Moore space M(Z/m, 1)).
        int m = Integer.MAX_VALUE;
        ChainComplex moore = TestComplexes.cellular(new int[] {1, 1, 1}, new int[0][], new int[0][], new int[][] {{0, 0, m}});
        Homology h = HomologyCalculator.compute(moore, Z);
        assertEquals(List.of(BigInteger.valueOf(m)), h.group(1).torsion());
        assertEquals(0, HomologyCalculator.compute(moore, Coefficients.modulo(3)).group(1).betti());
        assertEquals(1, HomologyCalculator.compute(moore, Coefficients.modulo(m)).group(1).betti());
    }

    @Test
    void universalCoefficientsRelateAllRings() {
        // Universal coefficient theorem (Hatcher Corollary 3A.6): dim H_k(X; Z/p) = β_k + t_k(p) +
        // t_(k-1)(p), t_k(p) counting the torsion factors of H_k(X; Z) divisible by p; and
        // β_k over Q is β_k over Z. Also Σ (-1)^k β_k = Σ (-1)^k f_k over every field (Euler-Poincaré).
        Random random = new Random(5L);
        List<ChainComplex> complexes = new ArrayList<>();
        complexes.add(TestComplexes.simplicial(Triangulations.projectivePlane()));
        complexes.add(TestComplexes.simplicial(Triangulations.gridSurface(6, true)));
        complexes.add(projectiveSpace(6));
        complexes.add(TestComplexes.cellular(new int[] {1, 2, 1}, new int[0][], new int[0][], new int[][] {{0, 0, 15}, {0, 1, 6}}));
        for (int n = 0; n < 60; n++) {
            int facets = 1 + random.nextInt(14);
            int[][] f = new int[facets][];
            for (int i = 0; i < facets; i++) {
                int size = 1 + random.nextInt(4);
                f[i] = random.ints(0, 9).distinct().limit(size).toArray();
            }
            complexes.add(TestComplexes.simplicial(f));
        }
        for (ChainComplex complex : complexes) {
            Homology integral = HomologyCalculator.compute(complex, Z);
            long chi = 0;
            for (int k = 0; k <= complex.dimension(); k++) {
                chi += (k % 2 == 0 ? 1 : -1) * (long) complex.cellCount(k);
            }
            assertEquals(chi, integral.eulerCharacteristic());
            assertEquals(Arrays.toString(integral.bettiNumbers()), Arrays.toString(HomologyCalculator.compute(complex, Q).bettiNumbers()));
            for (int p : new int[] {2, 3, 5}) {
                Homology modular = HomologyCalculator.compute(complex, Coefficients.modulo(p));
                assertEquals(chi, modular.eulerCharacteristic());
                for (int k = 0; k <= complex.dimension(); k++) {
                    int expected = integral.group(k).betti() + divisibleBy(integral.group(k), p) + divisibleBy(integral.group(k - 1), p);
                    assertEquals(expected, modular.group(k).betti(), "H_" + k + " over Z/" + p);
                }
            }
        }
    }

    private static int divisibleBy(HomologyGroup g, int p) {
        int n = 0;
        for (BigInteger t : g.torsion()) {
            n += t.mod(BigInteger.valueOf(p)).signum() == 0 ? 1 : 0;
        }
        return n;
    }
}
