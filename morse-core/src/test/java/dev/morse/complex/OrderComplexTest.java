package dev.morse.complex;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.morse.poset.Poset;
import dev.morse.poset.PosetBuilder;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

class OrderComplexTest {

    private static Poset chainOf(int n) {
        PosetBuilder b = new PosetBuilder();
        for (int i = 1; i < n; i++) {
            b.relate(b.element("c" + (i - 1)), b.element("c" + i), 0);
        }
        if (n == 1) {
            b.element("c0");
        }
        return Fixtures.build(b);
    }

    @Test
    void chainIsASimplex() {
        // every subset of a chain is a chain, so Δ of an n-element chain is the (n-1)-simplex:
        // f_d = C(n, d+1), and a simplex is contractible (standard; Wachs 2007)
        int n = 7;
        OrderComplex delta = OrderComplex.of(chainOf(n));
        assertArrayEquals(new int[] {7, 21, 35, 35, 21, 7, 1}, delta.cellCounts());
        Fixtures.assertChainComplex(delta);
        assertEquals(List.of("Z", "0", "0", "0", "0", "0", "0"), Fixtures.homology(delta));
    }

    @Test
    void properPartOfBooleanLatticeIsASphere() {
        // Wachs, "Poset topology: tools and applications", 2007: the proper part of B_n is S^(n-2);
        // its maximal chains are the n! orderings of {1..n} (standard)
        int factorial = 1;
        for (int n = 2; n <= 5; n++) {
            factorial *= n;
            OrderComplex delta = OrderComplex.of(Fixtures.booleanProperPart(n));
            Fixtures.assertChainComplex(delta);
            assertEquals(factorial, delta.cellCount(n - 2));
            List<String> sphere = new ArrayList<>(Collections.nCopies(n - 1, "0"));
            sphere.set(0, n == 2 ? "Z^2" : "Z");
            sphere.set(n - 2, n == 2 ? "Z^2" : "Z");
            assertEquals(sphere, Fixtures.homology(delta), "B_" + n);
        }
    }

    @Test
    void chainsAreListedBottomFirstAndNamedByLabels() {
        // the labels are listed top first, so element ids run against the order
        Poset p = Fixtures.poset("c: b\nb: a\n");
        OrderComplex delta = OrderComplex.of(p);
        int a = p.find("a").orElseThrow();
        int b = p.find("b").orElseThrow();
        int c = p.find("c").orElseThrow();
        int top = delta.firstCell(2);
        assertArrayEquals(new int[] {a, b, c}, delta.chain(top));
        assertEquals("a<b<c", delta.cellName(top));
        assertArrayEquals(new int[] {b}, delta.chain(b));
        // ∂[a<b<c] = [b<c] - [a<c] + [a<b]
        Boundary boundary = delta.boundary();
        List<String> faces = new ArrayList<>();
        for (int i = boundary.start(top); i < boundary.end(top); i++) {
            faces.add((boundary.coefficient(i) > 0 ? "+" : "-") + delta.cellName(boundary.target(i)));
        }
        assertEquals(List.of("+b<c", "-a<c", "+a<b"), faces);
    }

    @Test
    void cellCountsMatchBruteForceAndHallsTheorem() {
        // Philip Hall's theorem (Rota 1964): the reduced Euler characteristic of Δ(P) is μ(0̂, 1̂) of P
        // with a bottom and top adjoined; the f-vector is checked against all subsets.
        Random random = new Random(20240611L);
        for (int trial = 0; trial < 40; trial++) {
            int n = 8 + random.nextInt(7);
            Poset p = Fixtures.randomPoset(random, n, 0.15 + 0.35 * random.nextDouble());
            OrderComplex delta = OrderComplex.of(p);
            Fixtures.assertChainComplex(delta);
            boolean[][] below = new boolean[n][n];
            for (int x = 0; x < n; x++) {
                for (int y = 0; y < n; y++) {
                    below[x][y] = p.isBelow(x, y);
                }
            }
            long[] f = new long[n];
            for (int s = 1; s < 1 << n; s++) {
                if (isChain(s, below, n)) {
                    f[Integer.bitCount(s) - 1]++;
                }
            }
            long reducedEuler = -1;
            for (int d = 0; d < n; d++) {
                assertEquals(f[d], delta.cellCount(d), "f_" + d + " in trial " + trial);
                reducedEuler += (d % 2 == 0 ? 1 : -1) * f[d];
            }
            assertEquals(mobiusBottomToTop(p, below), reducedEuler, "trial " + trial);
        }
    }

    private static boolean isChain(int s, boolean[][] below, int n) {
        for (int x = 0; x < n; x++) {
            for (int y = x + 1; y < n; y++) {
                if ((s >> x & 1) == 1 && (s >> y & 1) == 1 && !below[x][y] && !below[y][x]) {
                    return false;
                }
            }
        }
        return true;
    }

    /** μ(0̂, 1̂) by μ(0̂, y) = -Σ_{0̂ <= z < y} μ(0̂, z) (Stanley, Enumerative Combinatorics I, §3.7). */
    private static long mobiusBottomToTop(Poset p, boolean[][] below) {
        long[] mu = new long[p.size()];
        long total = 1; // μ(0̂, 0̂)
        for (int y : p.linearExtension()) {
            long s = 1;
            for (int z = 0; z < p.size(); z++) {
                if (below[z][y]) {
                    s += mu[z];
                }
            }
            mu[y] = -s;
            total += mu[y];
        }
        return -total;
    }

    @Test
    void emptyPosetHasTheEmptyComplex() {
        OrderComplex delta = OrderComplex.of(Fixtures.poset(""));
        assertEquals(-1, delta.dimension());
        assertEquals(0, delta.cellCount());
    }

    @Test
    void tallChainIsRefusedBeforeListing() {
        // a chain of 40 elements has 2^40 - 1 subchains
        IllegalStateException e = assertThrows(IllegalStateException.class, () -> OrderComplex.of(chainOf(40)));
        assertTrue(e.getMessage().contains("2^40"), e.getMessage());
    }

    @Test
    void limitIsHonoured() {
        // B_4's proper part has 14 + 36 + 24 = 74 chains (f-vector of the barycentric subdivision of ∂Δ^3)
        Poset b4 = Fixtures.booleanProperPart(4);
        assertEquals(74, OrderComplex.of(b4, 74).cellCount());
        IllegalStateException e = assertThrows(IllegalStateException.class, () -> OrderComplex.of(b4, 73));
        assertTrue(e.getMessage().contains("73"), e.getMessage());
    }

    @Test
    void wideShallowPosetIsRefusedByCount() {
        // 300 minimal elements below one element below 300 maximal ones: 601 vertices, edges a<m, m<b
        // and a<b, and the 90 000 triangles a<m<b
        PosetBuilder b = new PosetBuilder();
        int middle = b.element("m");
        for (int i = 0; i < 300; i++) {
            b.relate(b.element("a" + i), middle, 0);
            b.relate(middle, b.element("b" + i), 0);
        }
        Poset p = Fixtures.build(b);
        assertThrows(IllegalStateException.class, () -> OrderComplex.of(p, 50_000));
        assertArrayEquals(new int[] {601, 300 + 300 + 90_000, 90_000}, OrderComplex.of(p).cellCounts());
    }
}
