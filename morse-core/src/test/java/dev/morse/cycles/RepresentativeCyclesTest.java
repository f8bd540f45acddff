package dev.morse.cycles;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.morse.complex.ChainComplex;
import dev.morse.complex.ComplexChoice;
import dev.morse.engine.Computation;
import dev.morse.engine.Engines;
import dev.morse.engine.Request;
import dev.morse.generate.Families;
import dev.morse.generate.Generated;
import dev.morse.generate.PartitionLattice;
import dev.morse.image.LoadedImage;
import dev.morse.image.VoxelSet;
import dev.morse.input.VoxelInput;
import dev.morse.io.InputException;
import dev.morse.generate.Triangulations;
import dev.morse.homology.Coefficients;
import dev.morse.homology.DenseSmithOracle;
import dev.morse.homology.SmithInvariants;
import dev.morse.homology.SparseIntegerMatrix;
import dev.morse.input.FacetInput;
import dev.morse.input.Input;
import dev.morse.input.PosetInput;
import dev.morse.matching.MatchingHeuristics;
import dev.morse.testing.RandomInputs;
import java.math.BigInteger;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * Representative cycles against facts from outside: the cycles are checked to be cycles by the
 * class itself; here the dense Smith normal form oracle, which shares no code with it, checks that
 * they generate the group: with Z the matrix of the cycles of dimension d, the columns of ∂_(d+1)
 * and Z together span exactly the d-cycles, with no torsion in the quotient, and each torsion
 * generator of order t has t·z a boundary and z not.
 */
class RepresentativeCyclesTest {
    private static Computation run(Input input, Coefficients ring, String matching) {
        return Engines.compute(input, Request.defaults().withHomology(ring, false).withMatching(matching, 1L, 1));
    }

    private static FacetInput facets(String name, dev.morse.complex.Facets f) {
        return new FacetInput(name, f, 0);
    }

    @Test
    void torusHasTwoOneCyclesThatGenerateItsFirstHomology() {
        // the 7-vertex torus: H_1 = Z^2 (REFERENCES.md; Hatcher, Algebraic Topology, 2002)
        Computation run = run(facets("torus", Triangulations.torus7()), Coefficients.INTEGERS, "coreduction");
        List<Cycle> cycles = RepresentativeCycles.of(run);
        List<Cycle> one = cycles.stream().filter(c -> c.dimension() == 1).toList();
        assertEquals(2, one.size());
        one.forEach(c -> assertEquals(BigInteger.ZERO, c.order()));
        assertGenerates(run.complex().orElseThrow(), 1, one);
        assertEquals(1, cycles.stream().filter(c -> c.dimension() == 2).count());
        assertEquals(1, cycles.stream().filter(c -> c.dimension() == 0).count());
    }

    @Test
    void projectivePlaneHasAOneCycleOfOrderTwoWhoseDoubleBounds() {
        // the 6-vertex RP^2: H_1 = Z/2 (Hatcher, Algebraic Topology, 2002, Example 2.42)
        for (String matching : List.of("coreduction", "collapse", "none")) {
            Computation run = run(facets("rp2", Triangulations.projectivePlane6()), Coefficients.INTEGERS, matching);
            List<Cycle> one = RepresentativeCycles.of(run).stream().filter(c -> c.dimension() == 1).toList();
            assertEquals(1, one.size(), matching);
            Cycle z = one.get(0);
            assertEquals(BigInteger.TWO, z.order(), matching);
            ChainComplex complex = run.complex().orElseThrow();
            SmithInvariants boundaries = DenseSmithOracle.compute(withColumns(complex, 2, List.of()));
            // 2z is a boundary: adding it changes neither rank nor invariant factors
            assertEquals(boundaries, DenseSmithOracle.compute(withColumns(complex, 2, List.of(scaled(z, 2)))), matching);
            // z is not
            assertNotEquals(boundaries, DenseSmithOracle.compute(withColumns(complex, 2, List.of(z))), matching);
            assertGenerates(complex, 1, one);
        }
    }

    @Test
    void projectivePlaneModTwoHasACycleInDimensionsOneAndTwo() {
        // H_*(RP^2; F_2) = F_2 in dimensions 0, 1 and 2 (universal coefficients; Hatcher 2002, §3.A)
        Computation run = run(facets("rp2", Triangulations.projectivePlane6()), Coefficients.modulo(2), "coreduction");
        List<Cycle> cycles = RepresentativeCycles.of(run);
        assertEquals(List.of(0, 1, 2), cycles.stream().map(Cycle::dimension).toList());
        for (Cycle c : cycles) {
            assertEquals(BigInteger.ZERO, c.order());
            c.terms().forEach(t -> assertEquals(BigInteger.ONE, t.coefficient()));
        }
        // the 2-cycle mod 2 is the sum of all ten triangles (the fundamental class mod 2, common practice)
        assertEquals(10, cycles.get(2).terms().size());
    }

    @Test
    void partitionLatticeTopHomologyHasTwentyFourCycles() {
        // the proper part of Π_5: a wedge of 4! = 24 spheres S^2 (Björner 1980)
        Input pi5 = new PosetInput("pi5", PartitionLattice.properPart(5), 0);
        Computation run = Engines.compute(pi5, Request.defaults().withComplex(ComplexChoice.ORDER));
        List<Cycle> two = RepresentativeCycles.of(run).stream().filter(c -> c.dimension() == 2).toList();
        assertEquals(24, two.size());
        assertGenerates(run.complex().orElseThrow(), 2, two);
        // each term is a maximal chain of three partitions written bottom to top
        two.forEach(c -> c.terms().forEach(t -> assertEquals(3, t.label().size())));
    }

    @Test
    void matchingComplexOfK7HasAThreeTorsionGenerator() {
        // the matching complex of K_7: H_1 = Z/3 (Bouc 1992; Shareshian and Wachs, Torsion in the
        // matching complex and chessboard complex, Adv. Math. 2007), H_2 = Z^20 (Euler characteristic)
        Generated.OfFacets m7 = (Generated.OfFacets) Families.matchingComplex(7);
        Computation run = run(facets("m7", m7.facets()), Coefficients.INTEGERS, "coreduction");
        List<Cycle> cycles = RepresentativeCycles.of(run);
        List<Cycle> one = cycles.stream().filter(c -> c.dimension() == 1).toList();
        assertEquals(1, one.size());
        Cycle z = one.get(0);
        assertEquals(BigInteger.valueOf(3), z.order());
        ChainComplex complex = run.complex().orElseThrow();
        SmithInvariants boundaries = DenseSmithOracle.compute(withColumns(complex, 2, List.of()));
        assertEquals(boundaries, DenseSmithOracle.compute(withColumns(complex, 2, List.of(scaled(z, 3)))));
        assertNotEquals(boundaries, DenseSmithOracle.compute(withColumns(complex, 2, List.of(z))));
        assertGenerates(complex, 1, one);
        List<Cycle> two = cycles.stream().filter(c -> c.dimension() == 2).toList();
        assertEquals(20, two.size());
        assertGenerates(complex, 2, two);
    }

    @Test
    void imageWithHolesHasOneCycleRoundEachHole() {
        // a 2-D foreground with k one-pixel holes deformation retracts onto a wedge of k circles, one
        // round each hole (common practice; Kaczynski, Mischaikow and Mrozek, Computational
        // Homology, 2004): H_1 = Z^k, and a cycle goes round a hole exactly when its intersection
        // number with a ray from the hole to the outside (its winding number) is ±1
        for (int k : List.of(1, 2, 5)) {
            int width = 3 * k + 2;
            int height = 5;
            VoxelSet.Builder image = VoxelSet.builder(width, height);
            for (int x = 0; x < width; x++) {
                for (int y = 0; y < height; y++) {
                    if (!(y == 2 && x % 3 == 2)) {
                        image.add(x, y);
                    }
                }
            }
            Input input = new VoxelInput("holes", new LoadedImage(image.build(), 1, 1, false), 0);
            for (String matching : List.of("coreduction", "collapse", "lexicographic")) {
                Computation run = run(input, Coefficients.INTEGERS, matching);
                List<Cycle> one = RepresentativeCycles.of(run).stream().filter(c -> c.dimension() == 1).toList();
                assertEquals(k, one.size(), matching);
                assertGenerates(run.complex().orElseThrow(), 1, one);
                int[] holesRounded = new int[k];
                for (Cycle c : one) {
                    int round = 0;
                    for (int h = 0; h < k; h++) {
                        int winding = winding(c, 3 * h + 2, 2);
                        if (winding != 0) {
                            assertEquals(1, Math.abs(winding), matching);
                            holesRounded[h]++;
                            round++;
                        }
                    }
                    assertEquals(1, round, "each cycle goes round exactly one hole (" + matching + ")");
                }
                for (int h = 0; h < k; h++) {
                    assertEquals(1, holesRounded[h], "one cycle per hole (" + matching + ")");
                }
            }
        }
    }

    /**
     * The signed number of times the 1-cycle crosses the vertical ray up from the centre of pixel
     * (hx, hy): the coefficients of its horizontal edges [hx, hx + 1] x [y, y] with y > hy.
     */
    private static int winding(Cycle c, int hx, int hy) {
        int sum = 0;
        for (Cycle.Term t : c.terms()) {
            List<?> x = (List<?>) t.label().get(0);
            List<?> y = (List<?>) t.label().get(1);
            if (x.get(0).equals(hx) && x.get(1).equals(hx + 1) && y.get(0).equals(y.get(1)) && (Integer) y.get(0) > hy) {
                sum += t.coefficient().intValueExact();
            }
        }
        return sum;
    }

    @Test
    void cyclesOfTheReducedPosetAreCyclesOfTheWholeOrderComplex() {
        // the poset reduction keeps a subposet of the same homotopy type (beat points: Stong 1966;
        // acyclic links: the inclusion is a homology isomorphism, common practice), so the cycles found
        // on the smaller order complex generate the homology of the order complex of the input poset
        for (String name : List.of("rp-2", "divisor-60-open", "cube-3-boundary", "two-discs-on-a-loop")) {
            Input input = corpusPoset(name);
            Computation reduced = Engines.compute(input, Request.defaults().withComplex(ComplexChoice.ORDER));
            assertTrue(reduced.posetReduction().isPresent(), name);
            Computation whole = Engines.compute(input, Request.defaults().withComplex(ComplexChoice.ORDER)
                    .withPosetReduction(false));
            assertCyclesGenerateOn(whole.complex().orElseThrow(), RepresentativeCycles.of(reduced), name);
        }
    }

    @Test
    void implicitEngineCyclesGenerateTheHomologyOfTheOrderComplex() {
        // checked on the stored order complex of the whole poset by the oracle; the groups are those
        // of REFERENCES.md: Π_4 proper part a wedge of 6 circles (Björner 1980), RP^2 and RP^3 (Hatcher 2002)
        for (String name : List.of("partition-4-proper", "rp-2", "rp-3", "boolean-4-proper")) {
            for (Coefficients ring : List.of(Coefficients.INTEGERS, Coefficients.modulo(2), Coefficients.RATIONALS)) {
                Input input = corpusPoset(name);
                Computation implicit = Engines.compute(input, Request.defaults().withComplex(ComplexChoice.IMPLICIT)
                        .withHomology(ring, false));
                assertEquals("implicit", implicit.engineName());
                Computation whole = Engines.compute(input, Request.defaults().withComplex(ComplexChoice.ORDER)
                        .withPosetReduction(false));
                List<Cycle> cycles = RepresentativeCycles.of(implicit);
                if (ring.equals(Coefficients.INTEGERS)) {
                    assertCyclesGenerateOn(whole.complex().orElseThrow(), cycles, name);
                } else {
                    assertEquals(implicit.homology().groups().stream().mapToInt(g -> g.betti()).sum(), cycles.size());
                }
            }
        }
    }

    @Test
    void implicitEngineRefusesBeyondItsLimitInOneLine() {
        Input input = corpusPoset("partition-5-proper");
        Computation implicit = Engines.compute(input, Request.defaults().withComplex(ComplexChoice.IMPLICIT));
        InputException e = assertThrows(InputException.class, () -> ImplicitCycles.of(implicit,
                implicit.implicitRun().orElseThrow(), implicit.plan().implicitPoset().orElseThrow(), 10));
        assertEquals("representative cycles on the implicit engine follow at most 10 chains of gradient paths per"
                + " generator, and one of dimension 2 needs more; --complex order stores the cells", e.problem());
    }

    private static Input corpusPoset(String name) {
        try {
            java.nio.file.Path file = java.nio.file.Path.of("..", "corpus", name + ".poset");
            return new PosetInput(name, dev.morse.io.PosetReader.parse(java.nio.file.Files.readString(file), name), 0);
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    /** The cycles, found by their chains' labels among the cells of {@code complex}, generate its homology. */
    static void assertCyclesGenerateOn(ChainComplex complex, List<Cycle> cycles, String name) {
        java.util.Map<List<Object>, Integer> cells = new java.util.HashMap<>();
        for (int c = 0; c < complex.cellCount(); c++) {
            cells.put(CellLabels.of(complex, c), c);
        }
        List<Cycle> found = cycles.stream().map(c -> new Cycle(c.dimension(), c.order(), c.terms().stream()
                .map(t -> new Cycle.Term(java.util.Objects.requireNonNull(cells.get(t.label()), name),
                        t.label(), t.coefficient())).toList())).toList();
        for (int d = 0; d <= complex.dimension(); d++) {
            int dimension = d;
            assertGenerates(complex, d, found.stream().filter(c -> c.dimension() == dimension).toList());
        }
    }

    @Test
    void randomComplexesGetCyclesThatGenerateTheirHomology() {
        SplittableRandom random = new SplittableRandom(101);
        for (int i = 0; i < 150; i++) {
            Input input = new FacetInput("random " + i, RandomInputs.simplicial(random, 3 + random.nextInt(7),
                    1 + random.nextInt(9), 2 + random.nextInt(3)), 0);
            String matching = MatchingHeuristics.builtInNames().get(i % MatchingHeuristics.builtInNames().size());
            Computation run = run(input, Coefficients.INTEGERS, matching);
            List<Cycle> cycles = RepresentativeCycles.of(run);
            ChainComplex complex = run.complex().orElseThrow();
            for (int d = 0; d <= complex.dimension(); d++) {
                int dimension = d;
                assertGenerates(complex, d, cycles.stream().filter(c -> c.dimension() == dimension).toList());
            }
        }
    }

    /**
     * The cycles Z of dimension d generate H_d: with the boundaries of dimension d + 1 they span a
     * lattice of rank n_d − rank ∂_d (all the cycles) with a torsion-free quotient, checked by the
     * oracle; and each torsion generator's multiple by its order is a boundary.
     */
    static void assertGenerates(ChainComplex complex, int d, List<Cycle> cycles) {
        int rankBelow = d == 0 ? 0 : DenseSmithOracle.compute(SparseIntegerMatrix.boundaryOf(complex, d)).rank();
        SmithInvariants spanned = DenseSmithOracle.compute(withColumns(complex, d + 1, cycles));
        assertEquals(complex.cellCount(d) - rankBelow, spanned.rank(), "rank of boundaries and cycles in dimension " + d);
        assertEquals(List.of(), spanned.nonUnitFactors(), "the cycles and boundaries span a saturated lattice");
        SmithInvariants boundaries = DenseSmithOracle.compute(withColumns(complex, d + 1, List.of()));
        for (Cycle c : cycles) {
            if (c.order().signum() > 0) {
                assertEquals(boundaries, DenseSmithOracle.compute(withColumns(complex, d + 1,
                        List.of(scaled(c, c.order().intValueExact())))), "order " + c.order());
            }
        }
        assertTrue(cycles.stream().allMatch(c -> c.dimension() == d));
    }

    static Cycle scaled(Cycle c, int factor) {
        return new Cycle(c.dimension(), c.order(), c.terms().stream().map(t -> new Cycle.Term(t.cell(), t.label(),
                t.coefficient().multiply(BigInteger.valueOf(factor)))).toList());
    }

    /** The dense matrix of ∂_above (columns: cells of dimension above) followed by the given chains of dimension above − 1. */
    static BigInteger[][] withColumns(ChainComplex complex, int above, List<Cycle> chains) {
        int d = above - 1;
        int rows = complex.cellCount(d);
        int first = complex.firstCell(d);
        int boundaryColumns = above <= complex.dimension() ? complex.cellCount(above) : 0;
        BigInteger[][] a = new BigInteger[rows][boundaryColumns + chains.size()];
        for (BigInteger[] row : a) {
            java.util.Arrays.fill(row, BigInteger.ZERO);
        }
        if (boundaryColumns > 0) {
            SparseIntegerMatrix b = SparseIntegerMatrix.boundaryOf(complex, above);
            for (int j = 0; j < boundaryColumns; j++) {
                for (int i = b.start(j); i < b.end(j); i++) {
                    a[b.row(i)][j] = BigInteger.valueOf(b.value(i));
                }
            }
        }
        for (int k = 0; k < chains.size(); k++) {
            for (Cycle.Term t : chains.get(k).terms()) {
                a[t.cell() - first][boundaryColumns + k] = t.coefficient();
            }
        }
        return a;
    }
}
