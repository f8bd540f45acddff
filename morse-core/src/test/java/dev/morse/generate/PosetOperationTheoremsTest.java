package dev.morse.generate;

import dev.morse.complex.Subdivision;
import dev.morse.poset.ChainCounts;
import dev.morse.poset.Mobius;
import dev.morse.poset.PosetOperations;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.morse.cw.CwPosetCheck;
import dev.morse.complex.OrderComplex;
import dev.morse.homology.HomologyGroup;
import dev.morse.poset.Poset;
import dev.morse.testing.HomologyAlgebra;
import dev.morse.testing.RandomInputs;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.SplittableRandom;
import java.util.TreeSet;
import org.junit.jupiter.api.Test;

/**
 * Each operation on posets against the theorem about it, with homology computed on the order
 * complex by coreduction.
 */
class PosetOperationTheoremsTest {
    private static final Poset CIRCLE = BooleanLattice.properPart(3);
    private static final Poset SPHERE = BooleanLattice.properPart(4);
    private static final Poset RP2 = ProjectiveSpace.antipodalCubeQuotient(2);
    private static final Poset PI4 = PartitionLattice.properPart(4);

    private static List<HomologyGroup> homology(Poset p) {
        return FamiliesHomologyTest.homology(OrderComplex.of(p));
    }

    private static long reducedEuler(List<HomologyGroup> h) {
        long chi = -1;
        for (HomologyGroup g : h) {
            chi += (g.dimension() % 2 == 0 ? 1 : -1) * (long) g.betti();
        }
        return chi;
    }

    @Test
    void productsObeyKunneth() {
        // Walker 1988: Δ(P × Q) ≅ Δ(P) × Δ(Q); then the Künneth formula (Hatcher 2002, Thm 3B.6)
        List<Poset[]> pairs = List.of(new Poset[] {CIRCLE, SPHERE}, new Poset[] {RP2, CIRCLE},
                new Poset[] {PI4, RP2}, new Poset[] {RP2, PosetOperations.relabel(RP2, "b")},
                new Poset[] {DivisorLattice.openInterval(12), PI4});
        for (Poset[] pq : pairs) {
            List<HomologyGroup> expected = HomologyAlgebra.kunneth(homology(pq[0]), homology(pq[1]));
            assertEquals(expected, homology(PosetOperations.product(pq[0], pq[1])));
        }
    }

    @Test
    void kunnethOfTwoProjectivePlanesHasATorTerm() {
        // H(RP^2 x RP^2) = Z, Z/2 + Z/2, Z/2, Z/2, 0: H_3 is Tor(Z/2, Z/2) (Hatcher 2002, Example 3B.7, from memory)
        assertEquals(Expected.parse("Z, Z/2 + Z/2, Z/2, Z/2, 0"),
                HomologyAlgebra.kunneth(Expected.projectiveSpace(2), Expected.projectiveSpace(2)));
    }

    @Test
    void ordinalSumsObeyTheJoinFormula() {
        // Δ(P ⊕ Q) = Δ(P) * Δ(Q) (Wachs 2007), and the join formula for reduced homology
        List<Poset[]> pairs = List.of(new Poset[] {SmallPosets.antichain(2, "s"), PI4},
                new Poset[] {CIRCLE, PosetOperations.relabel(CIRCLE, "u")},
                new Poset[] {SmallPosets.antichain(3, "a"), SPHERE},
                new Poset[] {PosetOperations.relabel(RP2, "a"), PosetOperations.relabel(RP2, "b")});
        for (Poset[] pq : pairs) {
            List<HomologyGroup> expected = HomologyAlgebra.join(homology(pq[0]), homology(pq[1]));
            assertEquals(expected, homology(PosetOperations.ordinalSum(pq[0], pq[1])));
        }
        // RP^2 * RP^2: H~_3 = Z/2 (x) Z/2 and H~_4 = Tor(Z/2, Z/2)
        assertEquals(Expected.parse("Z, 0, 0, Z/2, Z/2, 0"),
                HomologyAlgebra.join(Expected.projectiveSpace(2), Expected.projectiveSpace(2)));
    }

    @Test
    void ordinalSumOfAPosetWithItselfKeepsLabelsApart() {
        Poset sum = PosetOperations.ordinalSumKeepingLabelsApart(CIRCLE, CIRCLE);
        assertEquals(12, sum.size());
        assertTrue(sum.find("a.{1}").isPresent() && sum.find("b.{1}").isPresent());
        assertEquals(Expected.sphere(3), homology(sum), "S^1 * S^1 = S^3 (common practice)");
    }

    @Test
    void dualHasTheSameOrderComplex() {
        // the chains of P and of its dual are the same sets (common practice)
        SplittableRandom random = new SplittableRandom(5);
        List<Poset> posets = new ArrayList<>(List.of(PartitionLattice.properPart(5), ProjectiveSpace.antipodalCubeQuotient(3),
                NoncrossingPartitionLattice.properPart(5)));
        for (int i = 0; i < 10; i++) {
            posets.add(RandomInputs.poset(random, 12, 0.3));
        }
        for (Poset p : posets) {
            Poset dual = PosetOperations.dual(p);
            assertEquals(homology(p), homology(dual));
            assertEquals(java.util.Arrays.toString(ChainCounts.perDimension(p)),
                    java.util.Arrays.toString(ChainCounts.perDimension(dual)));
        }
    }

    @Test
    void philipHallLinksTheMobiusFunctionToTheOpenInterval() {
        // Philip Hall's theorem (Rota 1964): μ(0̂, 1̂) = χ̃(Δ((0̂, 1̂)))
        List<Poset> lattices = List.of(PartitionLattice.lattice(5), NoncrossingPartitionLattice.lattice(6),
                SubspaceLattice.lattice(3, 3), SubspaceLattice.lattice(4, 3), DivisorLattice.lattice(360),
                DivisorLattice.lattice(210), BooleanLattice.lattice(5),
                PosetOperations.product(BooleanLattice.lattice(2), PartitionLattice.lattice(4)));
        for (Poset lattice : lattices) {
            long mu = Mobius.bottomToTop(lattice);
            assertEquals(mu, reducedEuler(homology(PosetOperations.properPart(lattice))));
        }
    }

    @Test
    void openIntervalsOfBooleanAndPartitionLattices() {
        // [S, T] in B_n is B_|T - S| (standard), so (S, T) is the sphere S^(|T-S|-2) and [S, T] a cone;
        // (x, 1̂) in Π_n for x with k blocks is the proper part of Π_k (standard): k = 3 gives three points
        Poset b5 = BooleanLattice.lattice(5);
        int s = b5.find("{1}").orElseThrow();
        int t = b5.find("{1,2,3,4}").orElseThrow();
        assertEquals(Expected.sphere(1), homology(PosetOperations.openInterval(b5, s, t)));
        assertEquals(Expected.contractible(3), homology(PosetOperations.closedInterval(b5, s, t)));
        Poset pi5 = PartitionLattice.lattice(5);
        int x = pi5.find("12|34|5").orElseThrow();
        int top = pi5.find("12345").orElseThrow();
        assertEquals(Expected.wedgeOfSpheres(2, 0, 0), homology(PosetOperations.openInterval(pi5, x, top)));
        assertThrows(IllegalArgumentException.class, () -> PosetOperations.openInterval(pi5, top, x));
    }

    /** Permutations of {1..n} with descent set exactly {@code descents}, by listing them all. */
    private static int permutationsWithDescentSet(int n, Set<Integer> descents) {
        int[] perm = new int[n];
        for (int i = 0; i < n; i++) {
            perm[i] = i + 1;
        }
        int count = 0;
        while (true) {
            Set<Integer> d = new TreeSet<>();
            for (int i = 0; i + 1 < n; i++) {
                if (perm[i] > perm[i + 1]) {
                    d.add(i + 1);
                }
            }
            if (d.equals(descents)) {
                count++;
            }
            // next permutation in lexicographic order (common practice)
            int i = n - 2;
            while (i >= 0 && perm[i] > perm[i + 1]) {
                i--;
            }
            if (i < 0) {
                return count;
            }
            int j = n - 1;
            while (perm[j] < perm[i]) {
                j--;
            }
            int swap = perm[i];
            perm[i] = perm[j];
            perm[j] = swap;
            for (int a = i + 1, b = n - 1; a < b; a++, b--) {
                swap = perm[a];
                perm[a] = perm[b];
                perm[b] = swap;
            }
        }
    }

    @Test
    void rankSelectedBooleanLatticeIsAWedgeOfDescentClassSpheres() {
        // Stanley, EC I, Thm 3.13.1 (from memory): for S ⊆ {1..n-1}, Δ((B_n)_S) is Cohen-Macaulay,
        // a wedge of β_n(S) spheres S^(|S|-1), β_n(S) = #permutations of [n] with descent set S
        for (int n = 3; n <= 5; n++) {
            Poset bn = BooleanLattice.lattice(n);
            for (int mask = 1; mask < 1 << (n - 1); mask++) {
                Set<Integer> ranks = new TreeSet<>();
                for (int r = 1; r < n; r++) {
                    if ((mask & (1 << (r - 1))) != 0) {
                        ranks.add(r);
                    }
                }
                int beta = permutationsWithDescentSet(n, ranks);
                assertEquals(Expected.wedgeOfSpheres(beta, ranks.size() - 1, ranks.size() - 1),
                        homology(PosetOperations.rankSelection(bn, ranks)), "n = " + n + ", S = " + ranks);
            }
        }
    }

    @Test
    void rankSelectionOfACohenMacaulayPosetHasHomologyOnlyAtTheTop() {
        // Munkres 1984 / Stanley (from memory): rank selection keeps the Cohen-Macaulay property, so
        // Δ((Π_5)_S) has reduced homology only in dimension |S| - 1, of rank |μ| by Philip Hall
        Poset pi5 = PartitionLattice.lattice(5);
        for (Set<Integer> ranks : List.of(Set.of(1, 3), Set.of(2), Set.of(1, 2), Set.of(2, 3), Set.of(1, 2, 3))) {
            Poset selected = PosetOperations.rankSelection(pi5, ranks);
            Poset bounded = PosetOperations.ordinalSum(PosetOperations.ordinalSum(SmallPosets.chain(1, "bottom"),
                    selected), SmallPosets.chain(1, "top"));
            int top = ranks.size() - 1;
            int beta = (int) Math.abs(Mobius.bottomToTop(bounded));
            assertEquals(Expected.wedgeOfSpheres(beta, top, top), homology(selected), "S = " + ranks);
        }
    }

    @Test
    void rankSelectionKeepsTheOrder() {
        // ranks 0 and 2 of B_3: singletons below pairs containing them (standard)
        Poset selected = PosetOperations.rankSelection(BooleanLattice.lattice(3), Set.of(1, 3));
        assertEquals(4, selected.size());
        assertEquals(3, selected.coverCount());
        assertTrue(selected.isBelow(selected.find("{2}").orElseThrow(), selected.find("{1,2,3}").orElseThrow()));
    }

    @Test
    void subdivisionKeepsTheHomologyAndIsACwPoset() {
        // Δ of the face poset of Δ(P) is the barycentric subdivision of Δ(P), homeomorphic to it
        // (Munkres, Elements of Algebraic Topology, 1984, §15); the face poset of a simplicial
        // complex is a CW poset (Björner 1984)
        SplittableRandom random = new SplittableRandom(11);
        List<Poset> posets = new ArrayList<>(List.of(RP2, PI4, CIRCLE, DivisorLattice.openInterval(60)));
        for (int i = 0; i < 6; i++) {
            posets.add(RandomInputs.poset(random, 9, 0.3));
        }
        for (Poset p : posets) {
            Poset sd = Subdivision.of(p);
            long chains = 0;
            for (long f : ChainCounts.perDimension(p)) {
                chains += f;
            }
            assertEquals(chains, sd.size(), "one element per chain");
            assertEquals(homology(p), homology(sd));
            assertTrue(CwPosetCheck.check(sd).isCwPoset());
        }
    }

    @Test
    void properPartNeedsLeastAndGreatestElements() {
        assertThrows(IllegalArgumentException.class, () -> PosetOperations.properPart(CIRCLE));
        assertEquals(Expected.sphere(1), homology(PosetOperations.properPart(BooleanLattice.lattice(3))));
    }
}
