package dev.morse.generate;

import dev.morse.poset.Mobius;
import dev.morse.poset.PosetOperations;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.morse.complex.ChainComplex;
import dev.morse.complex.ComplexChoice;
import dev.morse.engine.ComplexPolicy;
import dev.morse.complex.OrderComplex;
import dev.morse.complex.SimplicialComplex;
import dev.morse.homology.Coefficients;
import dev.morse.homology.HomologyGroup;
import dev.morse.image.CubicalComplex;
import dev.morse.io.InputFormat;
import dev.morse.io.PosetReader;
import dev.morse.io.SimplicialReader;
import dev.morse.matching.MatchingHeuristics;
import dev.morse.matching.MatchingOptions;
import dev.morse.morsecomplex.MorseReduction;
import dev.morse.poset.Poset;
import java.io.IOException;
import java.io.StringWriter;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Every family that {@code morse generate} offers, at several sizes, against the homology the
 * literature gives for it (the sources are in each test and in shared REFERENCES.md). Each input
 * goes through its text format and back, as a user's file would.
 */
class FamiliesHomologyTest {
    static List<HomologyGroup> homology(ChainComplex complex) {
        return MorseReduction.run(complex, new MorseReduction.Request(
                MatchingHeuristics.byName("coreduction").orElseThrow(), MatchingOptions.DEFAULT, Coefficients.INTEGERS,
                true)).homology().groups();
    }

    /** Writes the input, reads it back, and computes the homology of the complex it denotes. */
    static List<HomologyGroup> homology(Generated generated) {
        String text = text(generated);
        return generated.format() == InputFormat.SIMPLICIAL
                ? homology(SimplicialComplex.of(SimplicialReader.parse(text, "generated")))
                : homology(ComplexPolicy.storedComplex(PosetReader.parse(text, "generated"), ComplexChoice.AUTO));
    }

    static String text(Generated generated) {
        StringWriter out = new StringWriter();
        try {
            generated.write(out);
        } catch (IOException e) {
            throw new AssertionError(e);
        }
        return out.toString();
    }

    private static long factorial(int n) {
        long f = 1;
        for (int i = 2; i <= n; i++) {
            f *= i;
        }
        return f;
    }

    /** Catalan(n) = C(2n, n) / (n + 1) (common practice). */
    static long catalan(int n) {
        long c = 1;
        for (int i = 0; i < n; i++) {
            c = c * 2 * (2 * i + 1) / (i + 2);
        }
        return c;
    }

    @Test
    void booleanLatticeProperPartIsASphere() {
        // proper part of B_n: the sphere S^(n-2) (Wachs, Poset topology, 2007)
        for (int n = 2; n <= 6; n++) {
            assertEquals(Expected.sphere(n - 2), homology(Families.booleanLattice(n, true)), "n = " + n);
        }
        assertEquals(Expected.contractible(4), homology(Families.booleanLattice(4, false)), "B_4 has a least element");
    }

    @Test
    void polytopeBoundariesAreSpheresAndTheRestIsContractible() {
        // the boundary of a convex d-polytope is S^(d-1); the closed polytope and the face lattice
        // (with least and greatest elements) are contractible (standard; Bruggesser-Mani 1971)
        for (int d = 1; d <= 5; d++) {
            assertEquals(Expected.sphere(d - 1), homology(Families.simplex(d, FacePart.BOUNDARY)), "simplex " + d);
        }
        for (int d = 2; d <= 4; d++) {
            assertEquals(Expected.sphere(d - 1), homology(Families.cube(d, FacePart.BOUNDARY)), "cube " + d);
            assertEquals(Expected.sphere(d - 1), homology(Families.crossPolytope(d, FacePart.BOUNDARY)), "cross " + d);
            assertEquals(Expected.contractible(d), homology(Families.cube(d, FacePart.CLOSED)), "cube ball " + d);
            assertEquals(Expected.contractible(d), homology(Families.crossPolytope(d, FacePart.CLOSED)), "cross ball " + d);
            assertEquals(Expected.contractible(d), homology(Families.simplex(d, FacePart.CLOSED)), "simplex ball " + d);
            assertEquals(Expected.contractible(d + 1), homology(Families.cube(d, FacePart.LATTICE)), "cube lattice " + d);
            assertEquals(Expected.contractible(d + 1), homology(Families.crossPolytope(d, FacePart.LATTICE)),
                    "cross lattice " + d);
        }
    }

    @Test
    void partitionLatticeProperPartIsAWedgeOfFactorialManySpheres() {
        // Björner 1980: the proper part of Π_n is a wedge of (n-1)! spheres S^(n-3)
        for (int n = 3; n <= 6; n++) {
            int spheres = (int) factorial(n - 1);
            assertEquals(Expected.wedgeOfSpheres(spheres, n - 3, n - 3), homology(Families.partitionLattice(n, true)),
                    "n = " + n);
        }
    }

    @Test
    void noncrossingPartitionLatticeProperPartIsAWedgeOfCatalanManySpheres() {
        // Kreweras 1972 (μ(NC_n) = (-1)^(n-1) Catalan(n-1)) with Björner-Edelman shellability
        // (from memory): a wedge of Catalan(n-1) spheres S^(n-3); Catalan numbers 1, 2, 5, 14, 42
        for (int n = 3; n <= 6; n++) {
            int spheres = (int) catalan(n - 1);
            assertEquals(Expected.wedgeOfSpheres(spheres, n - 3, n - 3),
                    homology(Families.noncrossingPartitionLattice(n, true)), "n = " + n);
        }
    }

    @Test
    void subspaceLatticeProperPartIsAWedgeOfSolomonTitsSpheres() {
        // Solomon-Tits (Solomon 1969): the proper part of L(F_q^n) is a wedge of q^C(n,2) spheres
        // S^(n-2), for every prime power q; 4, 8 and 9 are fields F_(p^k) of more than p elements
        int[][] cases = {{2, 3}, {2, 4}, {3, 3}, {5, 3}, {4, 3}, {8, 3}, {9, 3}, {4, 2}};
        for (int[] qn : cases) {
            int q = qn[0];
            int n = qn[1];
            int spheres = (int) Math.pow(q, n * (n - 1) / 2);
            assertEquals(Expected.wedgeOfSpheres(spheres, n - 2, n - 2), homology(Families.subspaceLattice(q, n, true)),
                    "q = " + q + ", n = " + n);
        }
        assertThrows(IllegalArgumentException.class, () -> Families.subspaceLattice(6, 2, true));
    }

    @Test
    void divisorIntervalIsASphereExactlyForSquarefreeNumbers() {
        // (1, N) is S^(k-2) for N a product of k distinct primes, contractible otherwise (standard)
        assertEquals(Expected.sphere(1), homology(Families.divisorLattice(30, true)));
        assertEquals(Expected.sphere(2), homology(Families.divisorLattice(210, true)));
        assertEquals(Expected.sphere(3), homology(Families.divisorLattice(2310, true)));
        assertEquals(Expected.contractible(1), homology(Families.divisorLattice(12, true)));
        assertEquals(Expected.contractible(4), homology(Families.divisorLattice(360, true)));
        assertEquals(Expected.contractible(6), homology(Families.divisorLattice(360, false)));
    }

    @Test
    void projectiveSpacesHaveTheirClassicalHomology() {
        // Hatcher, Algebraic Topology, 2002, Example 2.42
        for (int d = 1; d <= 5; d++) {
            assertEquals(Expected.projectiveSpace(d), homology(Families.projectiveSpace(d)), "RP^" + d);
        }
    }

    @Test
    void matchingComplexes() {
        // M(K_4): three points; M(K_5): the Petersen graph, H_1 = Z^6 (standard);
        // M(K_7): H_1 = Z/3 (Bouc 1992) and H_2 = Z^20 (from the Euler characteristic, corpus manifest)
        assertEquals(Expected.parse("Z^3, 0"), homology(Families.matchingComplex(4)));
        assertEquals(Expected.parse("Z, Z^6"), homology(Families.matchingComplex(5)));
        assertEquals(Expected.parse("Z, Z/3, Z^20"), homology(Families.matchingComplex(7)));
    }

    @Test
    void chessboardComplexes() {
        // 2 x 3: a hexagon (derived: six rooks' squares, each attacking-free pair an edge, every
        // square in two such pairs, one cycle); 3 x 4: a torus (from memory; GeneratorsTest checks
        // it is a closed orientable surface of Euler characteristic 0)
        assertEquals(Expected.sphere(1), homology(Families.chessboardComplex(2, 3)));
        assertEquals(Expected.parse("Z, Z^2, Z"), homology(Families.chessboardComplex(3, 4)));
    }

    @Test
    void voxelBlockHasTheHomologyKnownByConstruction() {
        // Z, Z^t, Z^c, 0 (VoxelBlock: a handlebody of genus t with c sealed cavities)
        assertEquals(Expected.parse("Z, Z^2, Z^3, 0"), homology(Families.voxelBlock(9, 2, 3)));
    }

    @Test
    void randomVoxelsWrittenAsAFacePosetAgreeWithTheirCubicalComplex() {
        for (long seed = 1; seed <= 4; seed++) {
            Generated.OfVoxels g = (Generated.OfVoxels) Families.randomVoxels(new int[] {6, 5, 4}, 0.4, seed);
            assertEquals(homology(CubicalComplex.of(g.voxels())), homology(g), "seed " + seed);
        }
    }

    @Test
    void randomPosetsObeyPhilipHall() {
        // Philip Hall (Rota 1964): for P with 0̂ and 1̂ adjoined, μ(0̂, 1̂) = χ̃(Δ(P))
        for (long seed = 1; seed <= 30; seed++) {
            Generated g = Families.randomPoset(4 + (int) (seed % 9), 0.3, seed);
            Poset p = ((Generated.OfPoset) g).poset();
            Poset bounded = PosetOperations.ordinalSum(PosetOperations.ordinalSum(SmallPosets.chain(1, "bottom"), p),
                    SmallPosets.chain(1, "top"));
            List<HomologyGroup> h = homology(OrderComplex.of(p));
            long reducedEuler = -1;
            for (HomologyGroup group : h) {
                reducedEuler += (group.dimension() % 2 == 0 ? 1 : -1) * (long) group.betti();
            }
            assertEquals(Mobius.bottomToTop(bounded), reducedEuler, "seed " + seed);
        }
    }

    @Test
    void randomPosetsDependOnlyOnTheirSeed() {
        assertEquals(text(Families.randomPoset(30, 0.2, 7)), text(Families.randomPoset(30, 0.2, 7)));
        assertTrue(!text(Families.randomPoset(30, 0.2, 7)).equals(text(Families.randomPoset(30, 0.2, 8))));
    }

    @Test
    void writtenFilesSayWhatTheyAre() {
        assertTrue(text(Families.partitionLattice(4, true)).startsWith(
                "morse-poset 1\n# the partition lattice Pi_4, proper part\n"));
        assertTrue(text(Families.matchingComplex(5)).startsWith("morse-simplicial 1\n# the matching complex of K_5\n"));
    }
}
