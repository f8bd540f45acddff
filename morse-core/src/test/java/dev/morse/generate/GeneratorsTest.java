package dev.morse.generate;

import dev.morse.poset.ChainCounts;
import dev.morse.complex.FaceCounts;
import dev.morse.poset.DownSetBitsets;
import dev.morse.poset.Mobius;
import dev.morse.poset.PosetBuilder;
import dev.morse.poset.PosetOperations;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.morse.complex.Facets;
import dev.morse.io.PosetReader;
import dev.morse.io.PosetWriter;
import dev.morse.poset.Poset;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.junit.jupiter.api.Test;

class GeneratorsTest {

    // ---- counting helpers: closed formulas, computed independently of the generators ----

    private static long binomial(int n, int k) {
        if (k < 0 || k > n) {
            return 0;
        }
        long c = 1;
        for (int i = 0; i < k; i++) {
            c = c * (n - i) / (i + 1);
        }
        return c;
    }

    private static long factorial(int n) {
        long f = 1;
        for (int i = 2; i <= n; i++) {
            f *= i;
        }
        return f;
    }

    private static long power(long base, int exponent) {
        long p = 1;
        for (int i = 0; i < exponent; i++) {
            p *= base;
        }
        return p;
    }

    /** Gaussian binomial [n choose k]_q = Π_{i<k} (q^(n-i) - 1) / (q^(i+1) - 1) (Stanley EC1, §1.7; from memory). */
    private static long gaussianBinomial(int n, int k, int q) {
        long num = 1;
        long den = 1;
        for (int i = 0; i < k; i++) {
            num *= power(q, n - i) - 1;
            den *= power(q, i + 1) - 1;
        }
        return num / den;
    }

    /** Elements per height. */
    private static long[] rankSizes(Poset p) {
        long[] sizes = new long[p.maxHeight() + 1];
        for (int x = 0; x < p.size(); x++) {
            sizes[p.height(x)]++;
        }
        return sizes;
    }

    private static long reducedEuler(Poset openInterval) {
        return FaceCounts.eulerCharacteristic(ChainCounts.perDimension(openInterval)) - 1;
    }

    // ---- partition lattices ----

    @Test
    void partitionLatticeSizesAreBellNumbers() {
        // Bell numbers 1, 2, 5, 15, 52, 203, 877 (OEIS A000110; from memory) ...
        long[] bell = {1, 2, 5, 15, 52, 203, 877};
        for (int n = 1; n <= 7; n++) {
            assertEquals(bell[n - 1], PartitionLattice.lattice(n).size(), "n = " + n);
        }
        // ... and the recurrence B_(n+1) = Σ_k C(n,k) B_k (common practice) reproduces them
        long[] b = new long[8];
        b[0] = 1;
        for (int n = 0; n < 7; n++) {
            for (int k = 0; k <= n; k++) {
                b[n + 1] += binomial(n, k) * b[k];
            }
        }
        for (int n = 1; n <= 7; n++) {
            assertEquals(b[n], bell[n - 1]);
        }
    }

    @Test
    void partitionLatticeRanksAreStirlingNumbers() {
        // partitions of [n] into k blocks: S(n,k) = k S(n-1,k) + S(n-1,k-1) (common practice);
        // height h means n - h blocks
        int n = 6;
        long[][] s = new long[n + 1][n + 1];
        s[0][0] = 1;
        for (int i = 1; i <= n; i++) {
            for (int k = 1; k <= i; k++) {
                s[i][k] = k * s[i - 1][k] + s[i - 1][k - 1];
            }
        }
        long[] sizes = rankSizes(PartitionLattice.lattice(n));
        for (int h = 0; h < n; h++) {
            assertEquals(s[n][n - h], sizes[h], "height " + h);
        }
    }

    @Test
    void partitionLatticeMobiusFunction() {
        // μ(Π_n) = (-1)^(n-1) (n-1)!  (Stanley, Enumerative Combinatorics I, §3.10; REFERENCES.md)
        for (int n = 1; n <= 6; n++) {
            long expected = (n % 2 == 1 ? 1 : -1) * factorial(n - 1);
            assertEquals(expected, Mobius.bottomToTop(PartitionLattice.lattice(n)), "n = " + n);
        }
    }

    @Test
    void partitionCoversMergeTwoBlocks() {
        // a partition with k blocks is covered by the C(k,2) partitions merging two of them
        Poset pi = PartitionLattice.lattice(5);
        for (int x = 0; x < pi.size(); x++) {
            int blocks = pi.label(x).split("\\|").length;
            assertEquals(binomial(blocks, 2), pi.upperCovers().degree(x), pi.label(x));
        }
    }

    // ---- subspace lattices ----

    @Test
    void subspaceCountsAreGaussianBinomials() {
        // subspaces of F_q^n of dimension k: [n choose k]_q (Stanley EC1, §1.7; from memory)
        int[][] cases = {{2, 1}, {2, 2}, {2, 3}, {2, 4}, {2, 5}, {3, 2}, {3, 3}, {3, 4}, {5, 3}};
        for (int[] qn : cases) {
            int q = qn[0];
            int n = qn[1];
            long[] sizes = rankSizes(SubspaceLattice.lattice(q, n));
            assertEquals(n + 1, sizes.length);
            for (int k = 0; k <= n; k++) {
                assertEquals(gaussianBinomial(n, k, q), sizes[k], "q = " + q + ", n = " + n + ", k = " + k);
            }
        }
    }

    @Test
    void subspaceTotalsAreGaloisNumbers() {
        // Galois numbers G_n(2) = 2, 5, 16, 67, 374 and G_n(3) = 2, 6, 28, 212 (OEIS A006116,
        // A006117; from memory)
        long[] two = {2, 5, 16, 67, 374};
        for (int n = 1; n <= 5; n++) {
            assertEquals(two[n - 1], SubspaceLattice.lattice(2, n).size());
        }
        long[] three = {2, 6, 28, 212};
        for (int n = 1; n <= 4; n++) {
            assertEquals(three[n - 1], SubspaceLattice.lattice(3, n).size());
        }
    }

    @Test
    void subspaceLatticeMobiusFunction() {
        // μ(0, F_q^n) = (-1)^n q^C(n,2)  (Stanley EC1, §3.10, from memory; Solomon-Tits with Philip Hall)
        int[][] cases = {{2, 1}, {2, 2}, {2, 3}, {2, 4}, {3, 2}, {3, 3}, {5, 2}};
        for (int[] qn : cases) {
            int q = qn[0];
            int n = qn[1];
            long expected = (n % 2 == 0 ? 1 : -1) * power(q, n * (n - 1) / 2);
            assertEquals(expected, Mobius.bottomToTop(SubspaceLattice.lattice(q, n)), "q = " + q + ", n = " + n);
        }
    }

    @Test
    void subspaceLabelsAreEchelonBases() {
        // in F_2^3: the line spanned by 110 lies in the plane x_3 = 0, the line of 001 does not
        Poset lattice = SubspaceLattice.lattice(2, 3);
        assertTrue(lattice.find("<>").isPresent());
        assertTrue(lattice.find("<100,010,001>").isPresent());
        int line = lattice.find("<110>").orElseThrow();
        int plane = lattice.find("<100,010>").orElseThrow();
        assertTrue(lattice.isBelow(line, plane));
        assertFalse(lattice.isBelow(lattice.find("<001>").orElseThrow(), plane));
    }

    @Test
    void subspaceLatticeRejectsOrdersWithoutAField() {
        // F_6 does not exist: 6 is not a prime power (common practice)
        assertThrows(IllegalArgumentException.class, () -> SubspaceLattice.lattice(6, 2));
    }

    // ---- Boolean and divisor lattices ----

    @Test
    void booleanLatticeCounts() {
        // |B_n| = 2^n, n 2^(n-1) covers, μ = (-1)^n (common practice)
        for (int n = 0; n <= 7; n++) {
            Poset b = BooleanLattice.lattice(n);
            assertEquals(1L << n, b.size());
            assertEquals(n * (1L << n) / 2, b.coverCount());
            assertEquals(n % 2 == 0 ? 1 : -1, Mobius.bottomToTop(b));
        }
        assertTrue(BooleanLattice.lattice(3).find("{1,3}").isPresent());
        assertTrue(BooleanLattice.lattice(3).find("{}").isPresent());
    }

    @Test
    void divisorLatticeMobiusIsTheNumberTheoreticOne() {
        // μ(1, N) in the divisor lattice is the classical Möbius function (Rota 1964; common practice)
        for (int n = 1; n <= 200; n++) {
            assertEquals(numberTheoreticMobius(n), Mobius.bottomToTop(DivisorLattice.lattice(n)), "N = " + n);
        }
    }

    private static int numberTheoreticMobius(int n) {
        int mu = 1;
        int rest = n;
        for (int p = 2; p <= rest; p++) {
            if (rest % p == 0) {
                rest /= p;
                if (rest % p == 0) {
                    return 0;
                }
                mu = -mu;
            }
        }
        return mu;
    }

    @Test
    void divisorLatticeSizeIsTheNumberOfDivisors() {
        // τ(360) = (3+1)(2+1)(1+1) = 24 (common practice)
        assertEquals(24, DivisorLattice.lattice(360).size());
        assertEquals(22, DivisorLattice.openInterval(360).size());
        assertEquals(1, DivisorLattice.lattice(1).size());
    }

    @Test
    void philipHallTheoremLinksMobiusAndOpenIntervals() {
        // Philip Hall: μ(0̂, 1̂) is the reduced Euler characteristic of the order complex of the
        // open interval (Rota 1964); checks the chain counts against the Möbius recursion
        List<Poset> lattices = List.of(BooleanLattice.lattice(5), PartitionLattice.lattice(5),
                SubspaceLattice.lattice(2, 4), DivisorLattice.lattice(360), CubeFaces.faceLattice(3),
                CrossPolytopeFaces.of(FacePart.LATTICE, 4));
        for (Poset lattice : lattices) {
            assertEquals(Mobius.bottomToTop(lattice), reducedEuler(PosetOperations.properPart(lattice)));
        }
    }

    // ---- polytopes ----

    @Test
    void cubeFaceNumbers() {
        // the d-cube has C(d,k) 2^(d-k) faces of dimension k, 3^d nonempty faces (common practice)
        for (int d = 1; d <= 6; d++) {
            Poset closed = CubeFaces.closedFacePoset(d);
            assertEquals(power(3, d), closed.size());
            long[] sizes = rankSizes(closed);
            for (int k = 0; k <= d; k++) {
                assertEquals(binomial(d, k) * power(2, d - k), sizes[k], "d = " + d + ", k = " + k);
            }
            // each k-face has 2k facets (common practice)
            long covers = 0;
            for (int k = 1; k <= d; k++) {
                covers += sizes[k] * 2 * k;
            }
            assertEquals(covers, closed.coverCount());
            assertEquals(power(3, d) - 1, CubeFaces.boundaryFacePoset(d).size());
            assertEquals(power(3, d) + 1, CubeFaces.faceLattice(d).size());
        }
    }

    @Test
    void crossPolytopeFaceNumbers() {
        // the d-cross-polytope has 2^(k+1) C(d,k+1) faces of dimension k < d (common practice)
        for (int d = 1; d <= 6; d++) {
            long[] sizes = rankSizes(CrossPolytopeFaces.of(FacePart.BOUNDARY, d));
            assertEquals(d, sizes.length);
            for (int k = 0; k < d; k++) {
                assertEquals(power(2, k + 1) * binomial(d, k + 1), sizes[k], "d = " + d + ", k = " + k);
            }
            assertEquals(power(3, d) + 1, CrossPolytopeFaces.of(FacePart.LATTICE, d).size());
        }
    }

    @Test
    void crossPolytopeIsDualToCube() {
        // the face lattice of the cross-polytope is the dual of the cube's (common practice):
        // a cube face maps to the sign vector with * -> 0, 0 -> -, 1 -> +
        for (int d = 1; d <= 4; d++) {
            Poset cube = PosetOperations.dual(CubeFaces.faceLattice(d));
            Poset cross = CrossPolytopeFaces.of(FacePart.LATTICE, d);
            assertEquals(cube.size(), cross.size());
            assertEquals(cube.coverCount(), cross.coverCount());
            for (int x = 0; x < cube.size(); x++) {
                int image = cross.find(toSigns(cube.label(x), d)).orElseThrow();
                for (int i = cube.lowerCovers().start(x); i < cube.lowerCovers().end(x); i++) {
                    int y = cross.find(toSigns(cube.label(cube.lowerCovers().target(i)), d)).orElseThrow();
                    assertTrue(cross.lowerCovers().contains(image, y), cube.label(x));
                }
            }
        }
    }

    private static String toSigns(String cubeWord, int d) {
        if (cubeWord.equals(CubeFaces.EMPTY_FACE)) {
            return CrossPolytopeFaces.WHOLE;
        }
        return cubeWord.replace('*', 'z').replace('0', '-').replace('1', '+').replace('z', '0');
    }

    @Test
    void polytopeBoundariesHaveSphereEulerCharacteristic() {
        // Euler–Poincaré for S^(d-1): χ = 1 + (-1)^(d-1); counted on the faces themselves
        for (int d = 1; d <= 6; d++) {
            long expected = 1 + (d % 2 == 1 ? 1 : -1);
            assertEquals(expected, alternatingRankSum(CubeFaces.boundaryFacePoset(d)));
            assertEquals(expected, alternatingRankSum(CrossPolytopeFaces.of(FacePart.BOUNDARY, d)));
            assertEquals(expected, alternatingRankSum(SimplexFaces.boundaryFacePoset(d)));
            assertEquals(1, alternatingRankSum(CubeFaces.closedFacePoset(d)));
            assertEquals(1, alternatingRankSum(SimplexFaces.closedFacePoset(d)));
        }
    }

    private static long alternatingRankSum(Poset p) {
        return FaceCounts.eulerCharacteristic(rankSizes(p));
    }

    // ---- projective spaces ----

    @Test
    void projectiveSpaceHasHalfTheCubeBoundary() {
        // the antipodal map is free on faces and covers, so every count halves (derived)
        for (int d = 1; d <= 6; d++) {
            Poset rp = ProjectiveSpace.antipodalCubeQuotient(d);
            Poset sphere = CubeFaces.boundaryFacePoset(d + 1);
            assertEquals(sphere.size() / 2, rp.size());
            assertEquals(sphere.coverCount() / 2, rp.coverCount());
            assertTrue(rp.isGraded());
            long[] half = rankSizes(sphere);
            long[] cells = rankSizes(rp);
            for (int k = 0; k <= d; k++) {
                assertEquals(half[k] / 2, cells[k]);
            }
            // χ(RP^d) = 1 for even d, 0 for odd d (Hatcher, Algebraic Topology, Example 2.42)
            assertEquals(d % 2 == 0 ? 1 : 0, FaceCounts.eulerCharacteristic(cells));
        }
    }

    @Test
    void projectiveSpaceCellsAreRegular() {
        // each closed k-cell must map injectively: its closure has as many faces as a k-cube, 3^k
        for (int d = 1; d <= 5; d++) {
            Poset rp = ProjectiveSpace.antipodalCubeQuotient(d);
            DownSetBitsets below = DownSetBitsets.of(rp);
            for (int x = 0; x < rp.size(); x++) {
                assertEquals(power(3, rp.height(x)), below.countBelow(x) + 1L, rp.label(x));
            }
        }
    }

    @Test
    void projectiveSpaceRoundTripsThroughTheTextFormat() {
        Poset rp = ProjectiveSpace.antipodalCubeQuotient(3);
        Poset again = PosetReader.parse(PosetWriter.toText(rp), "rp3");
        assertEquals(rp.size(), again.size());
        assertEquals(rp.coverCount(), again.coverCount());
        for (int x = 0; x < rp.size(); x++) {
            int y = again.find(rp.label(x)).orElseThrow();
            assertEquals(rp.lowerCovers().degree(x), again.lowerCovers().degree(y));
        }
    }

    // ---- simplicial families ----

    @Test
    void matchingComplexFaceNumbers() {
        // k-edge matchings of K_n: n! / (k! 2^k (n-2k)!) (common practice)
        for (int n = 2; n <= 9; n++) {
            Facets m = MatchingComplex.facets(n);
            long[] f = FaceCounts.ofSimplicial(m);
            assertEquals(n / 2, f.length);
            for (int k = 1; k <= n / 2; k++) {
                long expected = factorial(n) / (factorial(k) * power(2, k) * factorial(n - 2 * k));
                assertEquals(expected, f[k - 1], "n = " + n + ", k = " + k);
            }
            assertEquals(f[n / 2 - 1], m.faceCount());
        }
        // M_7: f-vector (21, 105, 105), so χ = 21 and the reduced χ is 20 (used in the manifest)
        assertArrayEquals(new long[] {21, 105, 105}, FaceCounts.ofSimplicial(MatchingComplex.facets(7)));
    }

    @Test
    void matchingComplexOfK5IsThePetersenGraph() {
        // the Petersen graph: 10 vertices, 15 edges, 3-regular (common practice)
        Facets m = MatchingComplex.facets(5);
        assertEquals(10, m.vertexCount());
        assertEquals(15, m.faceCount());
        int[] degree = new int[10];
        for (int f = 0; f < m.faceCount(); f++) {
            for (int v : m.face(f)) {
                degree[v]++;
            }
        }
        for (int d : degree) {
            assertEquals(3, d);
        }
    }

    @Test
    void chessboardComplexFaceNumbers() {
        // placements of k non-attacking rooks on an m × n board: C(m,k) C(n,k) k! (common practice)
        int[][] boards = {{1, 1}, {2, 3}, {3, 3}, {3, 4}, {4, 3}, {4, 5}};
        for (int[] mn : boards) {
            long[] f = FaceCounts.ofSimplicial(ChessboardComplex.facets(mn[0], mn[1]));
            int r = Math.min(mn[0], mn[1]);
            assertEquals(r, f.length);
            for (int k = 1; k <= r; k++) {
                assertEquals(binomial(mn[0], k) * binomial(mn[1], k) * factorial(k), f[k - 1]);
            }
        }
    }

    @Test
    void chessboardThreeByFourIsATorus() {
        // a connected closed orientable surface with χ = 0 is a torus (classification of surfaces)
        Facets board = ChessboardComplex.facets(3, 4);
        assertClosedSurface(board);
        assertEquals(0, FaceCounts.eulerCharacteristic(FaceCounts.ofSimplicial(board)));
        assertTrue(Surfaces.isOrientable(board));
    }

    @Test
    void chessboardThreeByThreeHasOnlyFreeEdges() {
        // every edge in exactly one triangle: each triangle collapses away through a free edge
        Map<Long, Integer> edges = Surfaces.edgeMultiplicities(ChessboardComplex.facets(3, 3));
        assertEquals(18, edges.size());
        assertTrue(edges.values().stream().allMatch(c -> c == 1));
    }

    @Test
    void skeletonFacetCounts() {
        // the k-skeleton of the (n-1)-simplex has C(n,k+1) facets (common practice)
        for (int n = 1; n <= 8; n++) {
            for (int k = 0; k < n; k++) {
                Facets s = Skeleton.ofSimplex(k, n);
                assertEquals(binomial(n, k + 1), s.faceCount());
                assertEquals(n, s.vertexCount());
            }
        }
    }

    // ---- classic triangulations ----

    private static void assertClosedSurface(Facets triangles) {
        Map<Long, Integer> edges = Surfaces.edgeMultiplicities(triangles);
        assertTrue(edges.values().stream().allMatch(c -> c == 2), "every edge in exactly two triangles");
        assertTrue(Surfaces.vertexLinksAreCircles(triangles), "every vertex link a circle");
    }

    @Test
    void torusHasSevenVerticesAndIsOrientable() {
        Facets torus = Triangulations.torus7();
        assertClosedSurface(torus);
        assertArrayEquals(new long[] {7, 21, 14}, FaceCounts.ofSimplicial(torus));
        assertTrue(Surfaces.isOrientable(torus));
    }

    @Test
    void kleinBottleHasEightVerticesAndIsNotOrientable() {
        // χ = 0 and non-orientable: the Klein bottle (classification of surfaces)
        Facets klein = Triangulations.kleinBottle8();
        assertClosedSurface(klein);
        assertArrayEquals(new long[] {8, 24, 16}, FaceCounts.ofSimplicial(klein));
        assertFalse(Surfaces.isOrientable(klein));
    }

    @Test
    void projectivePlaneHasSixVerticesAndIsNotOrientable() {
        // χ = 1 and non-orientable: the projective plane (classification of surfaces)
        Facets rp2 = Triangulations.projectivePlane6();
        assertClosedSurface(rp2);
        assertArrayEquals(new long[] {6, 15, 10}, FaceCounts.ofSimplicial(rp2));
        assertFalse(Surfaces.isOrientable(rp2));
    }

    @Test
    void dunceHatHasNoFreeEdge() {
        // Zeeman 1964: the dunce hat has no free edge; this triangulation has three edges in three
        // triangles (the glued side) and all others in two; χ = 8 - 24 + 17 = 1
        Facets hat = Triangulations.dunceHat8();
        assertArrayEquals(new long[] {8, 24, 17}, FaceCounts.ofSimplicial(hat));
        Map<Long, Integer> edges = Surfaces.edgeMultiplicities(hat);
        assertEquals(3, edges.values().stream().filter(c -> c == 3).count());
        assertEquals(21, edges.values().stream().filter(c -> c == 2).count());
        Set<List<Integer>> distinct = new HashSet<>();
        for (int f = 0; f < hat.faceCount(); f++) {
            int[] t = hat.face(f);
            java.util.Arrays.sort(t);
            distinct.add(List.of(t[0], t[1], t[2]));
        }
        assertEquals(17, distinct.size());
    }

    // ---- poset operations ----

    @Test
    void productSizesAndCovers() {
        // |P × Q| = |P||Q| and covers(P × Q) = covers(P)|Q| + |P| covers(Q) (common practice)
        Poset p = PartitionLattice.properPart(4);
        Poset q = BooleanLattice.properPart(3);
        Poset pq = PosetOperations.product(p, q);
        assertEquals(p.size() * q.size(), pq.size());
        assertEquals(p.coverCount() * q.size() + p.size() * q.coverCount(), pq.coverCount());
        assertEquals(p.maxHeight() + q.maxHeight(), pq.maxHeight());
        assertTrue(pq.find("(12|3|4,{1,2})").isPresent());
    }

    @Test
    void mobiusFunctionIsMultiplicativeOnProducts() {
        // μ_(P×Q)((x,y),(x',y')) = μ_P(x,x') μ_Q(y,y') (product theorem, Rota 1964; from memory)
        Poset p = PartitionLattice.lattice(4);
        Poset q = SubspaceLattice.lattice(2, 3);
        assertEquals(Mobius.bottomToTop(p) * Mobius.bottomToTop(q),
                Mobius.bottomToTop(PosetOperations.product(p, q)));
    }

    @Test
    void ordinalSumCovers() {
        // the new covers join every maximal element below to every minimal element above (common practice)
        Poset lower = SmallPosets.antichain(3, "a");
        Poset upper = BooleanLattice.properPart(3);
        Poset sum = PosetOperations.ordinalSum(lower, upper);
        assertEquals(9, sum.size());
        assertEquals(upper.coverCount() + 3 * 3, sum.coverCount());
        assertTrue(sum.isBelow(sum.find("a1").orElseThrow(), sum.find("{1,2}").orElseThrow()));
        assertThrows(IllegalArgumentException.class, () -> PosetOperations.ordinalSum(upper, upper));
    }

    @Test
    void ordinalSumOfChainsIsAChain() {
        // a 2-chain below a 3-chain is a 5-chain (common practice)
        Poset sum = PosetOperations.ordinalSum(SmallPosets.chain(2, "x"), SmallPosets.chain(3, "y"));
        assertEquals(5, sum.size());
        assertEquals(4, sum.coverCount());
        assertEquals(4, sum.maxHeight());
    }

    @Test
    void dualReversesTheOrder() {
        // 2 divides 4, so 4 is below 2 in the dual; dualising twice gives the poset back
        Poset p = DivisorLattice.lattice(12);
        Poset d = PosetOperations.dual(p);
        int two = d.find("2").orElseThrow();
        int four = d.find("4").orElseThrow();
        assertTrue(d.isBelow(four, two));
        Poset back = PosetOperations.dual(d);
        assertEquals(p.coverCount(), back.coverCount());
        for (int x = 0; x < p.size(); x++) {
            assertArrayEquals(p.lowerCovers().neighbours(x), back.lowerCovers().neighbours(x));
        }
    }

    @Test
    void properPartNeedsABoundedPoset() {
        // a hexagon has no least element; a k-chain loses its two ends
        assertThrows(IllegalArgumentException.class, () -> PosetOperations.properPart(BooleanLattice.properPart(3)));
        assertEquals(0, PosetOperations.properPart(SmallPosets.chain(1)).size());
        assertEquals(3, PosetOperations.properPart(SmallPosets.chain(5)).size());
    }

    @Test
    void intervalsOfTheDivisorLattice() {
        // [2, 12] in the divisors of 12 is {2, 4, 6, 12}; (1, 12) is {2, 3, 4, 6}
        Poset p = DivisorLattice.lattice(12);
        int one = p.find("1").orElseThrow();
        int two = p.find("2").orElseThrow();
        int twelve = p.find("12").orElseThrow();
        assertEquals(Set.of("2", "4", "6", "12"), labels(PosetOperations.closedInterval(p, two, twelve)));
        assertEquals(Set.of("4", "6"), labels(PosetOperations.openInterval(p, two, twelve)));
        assertEquals(labels(DivisorLattice.openInterval(12)), labels(PosetOperations.openInterval(p, one, twelve)));
        int three = p.find("3").orElseThrow();
        assertThrows(IllegalArgumentException.class, () -> PosetOperations.openInterval(p, two, three));
    }

    @Test
    void withoutBottomAndTop() {
        // B_3 has 8 elements: removing {} or {1,2,3} leaves 7
        Poset b = BooleanLattice.lattice(3);
        assertEquals(7, PosetOperations.withoutBottom(b).size());
        assertFalse(PosetOperations.withoutBottom(b).find("{}").isPresent());
        assertFalse(PosetOperations.withoutTop(b).find("{1,2,3}").isPresent());
    }

    private static Set<String> labels(Poset p) {
        Set<String> s = new HashSet<>();
        for (int x = 0; x < p.size(); x++) {
            s.add(p.label(x));
        }
        return s;
    }

    // ---- labels ----

    @Test
    void everyGeneratedLabelCanBeWritten() {
        // DESIGN.md: a label has no white space, ':' or '#'
        List<Poset> posets = new ArrayList<>(List.of(BooleanLattice.lattice(4), CubeFaces.faceLattice(3),
                CrossPolytopeFaces.of(FacePart.LATTICE, 3), PartitionLattice.lattice(5), SubspaceLattice.lattice(3, 2),
                SubspaceLattice.lattice(11, 2), DivisorLattice.lattice(360), ProjectiveSpace.antipodalCubeQuotient(3),
                NonRegularCells.loop(), NonRegularCells.twoDiscsOnALoop(),
                PosetOperations.product(BooleanLattice.properPart(3), PartitionLattice.properPart(4))));
        posets.add(PartitionLattice.lattice(10));
        for (Poset p : posets) {
            for (int x = 0; x < p.size(); x++) {
                assertEquals(p.label(x), PosetBuilder.requireWritableLabel(p.label(x)));
            }
        }
        assertTrue(PartitionLattice.lattice(10).find("1.10|2|3|4|5|6|7|8|9").isPresent());
    }
}
