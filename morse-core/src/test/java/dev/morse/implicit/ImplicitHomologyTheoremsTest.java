package dev.morse.implicit;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.morse.generate.BooleanLattice;
import dev.morse.generate.PartitionLattice;
import dev.morse.generate.SubspaceLattice;
import dev.morse.homology.Coefficients;
import dev.morse.homology.Homology;
import dev.morse.homology.HomologyGroup;
import dev.morse.poset.Poset;
import dev.morse.poset.PosetBuilder;
import java.util.Arrays;
import org.junit.jupiter.api.Test;

/** The implicit engine on posets whose homology, and best possible matching, theorems give. */
class ImplicitHomologyTheoremsTest {
    private static ImplicitHomology.Outcome run(Poset poset) {
        return ImplicitHomology.run(poset, new ImplicitHomology.Options(ElementOrder.DOWN_SETS, Coefficients.INTEGERS));
    }

    /** One critical vertex and {@code spheres} critical chains in dimension {@code d}: the Morse lower bound. */
    private static int[] perfect(int d, int spheres) {
        int[] m = new int[d + 1];
        m[0] = 1;
        m[d] += spheres;
        return m;
    }

    /** The reduced homology of a wedge of {@code spheres} spheres of dimension {@code d}, as unreduced groups. */
    private static void assertWedge(Homology h, int d, int spheres) {
        Homology reduced = h.toReduced();
        for (int k = 0; k < reduced.groups().size(); k++) {
            assertEquals(HomologyGroup.free(k, k == d ? spheres : 0), reduced.group(k), "dimension " + k);
        }
    }

    private static int factorial(int n) {
        return n <= 1 ? 1 : n * factorial(n - 1);
    }

    @Test
    void partitionLatticesGetOneCriticalChainPerSphere() {
        // Björner 1980: the proper part of Π_n is a wedge of (n-1)! spheres S^(n-3)
        for (int n = 3; n <= 7; n++) {
            ImplicitHomology.Outcome outcome = run(PartitionLattice.properPart(n));
            assertWedge(outcome.homology(), n - 3, factorial(n - 1));
            assertArrayEquals(perfect(n - 3, factorial(n - 1)), outcome.critical(), "Π_" + n);
            assertEquals(0, outcome.search().defectiveFacets(), "Π_" + n);
        }
    }

    @Test
    void subspaceLatticesGetOneCriticalChainPerSphere() {
        // Solomon–Tits (Solomon 1969): the proper part of the subspace lattice of F_q^n is a wedge of q^C(n,2) spheres S^(n-2)
        int[][] cases = {{2, 2}, {2, 3}, {2, 4}, {3, 3}, {5, 3}};
        for (int[] c : cases) {
            int q = c[0];
            int n = c[1];
            int spheres = (int) Math.pow(q, n * (n - 1) / 2);
            ImplicitHomology.Outcome outcome = run(SubspaceLattice.properPart(q, n));
            assertWedge(outcome.homology(), n - 2, spheres);
            assertArrayEquals(perfect(n - 2, spheres), outcome.critical(), "q = " + q + ", n = " + n);
        }
    }

    @Test
    void booleanLatticesGetOneCriticalVertexAndOneTopChain() {
        // Wachs 2007: the proper part of B_n is the boundary of the (n-1)-simplex, a sphere S^(n-2)
        for (int n = 2; n <= 9; n++) {
            ImplicitHomology.Outcome outcome = run(BooleanLattice.properPart(n));
            assertWedge(outcome.homology(), n - 2, 1);
            assertArrayEquals(perfect(n - 2, 1), outcome.critical(), "B_" + n);
        }
    }

    @Test
    void anOrderComplexOfMoreThanAMillionMillionChainsIsAnswered() {
        // the chains of the proper part of B_n are the ordered set partitions of {1..n} into at least
        // two blocks: Fubini(13) - 1 = 526858348380 of them (Fubini numbers, OEIS A000670, from memory)
        ImplicitHomology.Outcome outcome = run(BooleanLattice.properPart(13));
        assertEquals(526_858_348_380L, Arrays.stream(outcome.cells()).sum());
        assertWedge(outcome.homology(), 11, 1);
        assertArrayEquals(perfect(11, 1), outcome.critical());
    }

    @Test
    void anAntichainKeepsEveryPointCritical() {
        // n points: H_0 = Z^n, and each vertex is a critical cell of any matching (common practice)
        PosetBuilder b = new PosetBuilder();
        for (int i = 0; i < 5; i++) {
            b.element("p" + i);
        }
        ImplicitHomology.Outcome outcome = run(build(b));
        assertArrayEquals(new int[] {5}, outcome.critical());
        assertEquals(HomologyGroup.free(0, 5), outcome.homology().group(0));
    }

    @Test
    void theEmptyPosetHasNoCells() {
        ImplicitHomology.Outcome outcome = run(build(new PosetBuilder()));
        assertEquals(0, outcome.cells().length);
        assertEquals(0, outcome.critical().length);
        assertTrue(outcome.homology().groups().isEmpty());
    }

    @Test
    void aChainIsContractibleWithOneCriticalVertex() {
        // Δ of a chain of k elements is a (k-1)-simplex, contractible (common practice)
        PosetBuilder b = new PosetBuilder();
        for (int i = 0; i < 40; i++) {
            b.element("c" + i);
            if (i > 0) {
                b.relate(i - 1, i, 0);
            }
        }
        ImplicitHomology.Outcome outcome = run(build(b));
        assertEquals((1L << 40) - 1, Arrays.stream(outcome.cells()).sum());
        assertEquals(1, outcome.totalCritical());
        assertWedge(outcome.homology(), 0, 0);
    }

    private static Poset build(PosetBuilder b) {
        try {
            return b.build();
        } catch (dev.morse.poset.OrderCycleException e) {
            throw new AssertionError(e);
        }
    }
}
