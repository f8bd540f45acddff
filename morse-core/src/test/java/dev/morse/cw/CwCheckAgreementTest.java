package dev.morse.cw;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.morse.complex.Fixtures;
import dev.morse.generate.CorpusCase;
import dev.morse.generate.CorpusManifest;
import dev.morse.generate.FacePart;
import dev.morse.generate.Families;
import dev.morse.generate.Generated;
import dev.morse.io.PosetReader;
import dev.morse.poset.Adjacency;
import dev.morse.poset.Poset;
import dev.morse.poset.PosetBuilder;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.SplittableRandom;
import java.util.stream.Stream;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestFactory;

/**
 * The CW poset check with its coreduction sphere test and its parallel driver gives exactly what
 * the one-element-at-a-time check with a full Smith normal form per lower set gave
 * ({@link ReferenceCwCheck}): the same verdict, the same reason word for word, and the same
 * incidence signs, with one thread or several.
 */
class CwCheckAgreementTest {
    private static final int[] THREADS = {1, 2, 3};

    private static void assertAgrees(Poset poset, String name) {
        CwStructure expected = ReferenceCwCheck.analyse(poset);
        for (int threads : THREADS) {
            CwStructure actual = CwPosetCheck.analyse(poset, threads);
            assertEquals(expected.verdict(), actual.verdict(), name + " with " + threads + " threads");
            assertArrayEquals(expected.coverSigns(), actual.coverSigns(), name + " signs with " + threads + " threads");
        }
    }

    private static Poset poset(Generated generated) {
        return ((Generated.OfPoset) generated).poset();
    }

    @TestFactory
    Stream<DynamicTest> everyCorpusPoset() throws IOException {
        Path corpus = Path.of(System.getProperty("morse.corpus", "../corpus"));
        List<DynamicTest> tests = new ArrayList<>();
        for (CorpusCase c : CorpusManifest.readDirectory(corpus)) {
            if (c.isPoset()) {
                tests.add(DynamicTest.dynamicTest(c.name(), () -> assertAgrees(PosetReader.read(c.path(corpus)), c.name())));
            }
        }
        return tests.stream();
    }

    @Test
    void classicalFamilies() {
        for (int d = 1; d <= 6; d++) {
            for (FacePart part : List.of(FacePart.BOUNDARY, FacePart.CLOSED)) {
                assertAgrees(poset(Families.cube(d, part)), "cube " + d + " " + part);
                assertAgrees(poset(Families.simplex(d, part)), "simplex " + d + " " + part);
            }
        }
        for (int d = 2; d <= 5; d++) {
            assertAgrees(poset(Families.crossPolytope(d, FacePart.BOUNDARY)), "cross-polytope " + d);
            assertAgrees(poset(Families.projectiveSpace(d)), "RP^" + d);
        }
        for (int n = 2; n <= 9; n++) {
            assertAgrees(poset(Families.booleanLattice(n, true)), "proper part of B_" + n);
            assertAgrees(poset(Families.booleanLattice(n, false)), "B_" + n);
        }
        assertAgrees(poset(Families.partitionLattice(5, true)), "proper part of Pi_5");
        assertAgrees(dev.morse.generate.VoxelBlock.of(9, 1, 1).toPoset(), "voxel block");
    }

    @Test
    void lowerSetsThatAreNotSpheresGiveTheSameReasons() {
        Poset circle = Fixtures.poset(CwPosetCheckTest.CIRCLE);
        // a 3-cell on the torus: H1 = Z^2; a 3-cell on RP^2: H1 = Z/2 (Hatcher, Example 2.42)
        Poset torusCell = Fixtures.withTop(Fixtures.product(circle, circle), "T");
        Poset projectiveCell = Fixtures.withTop(Fixtures.antipodalCubeQuotient(3), "B");
        assertFalse(CwPosetCheck.check(torusCell).isCwPoset());
        assertFalse(CwPosetCheck.check(projectiveCell).isCwPoset());
        assertAgrees(torusCell, "torus cell");
        assertAgrees(projectiveCell, "projective cell");
        // a 4-cell on the boundary of the 4-cube: a sphere, so it passes (standard)
        Poset ball = Fixtures.withTop(Fixtures.cubeBoundary(4), "top");
        assertTrue(CwPosetCheck.check(ball).isCwPoset());
        assertAgrees(ball, "4-cell on the 4-cube");
    }

    @Test
    void randomCellsGluedOntoAGrid() {
        // large levels, so that several workers share each height and failures may arise on any of them
        Poset grid = Fixtures.cubicalGrid(9, 3);
        SplittableRandom random = new SplittableRandom(12);
        for (int trial = 0; trial < 40; trial++) {
            assertAgrees(glued(grid, random, 1 + random.nextInt(6)), "grid, trial " + trial);
        }
    }

    @Test
    void randomCellsGluedOntoSmallComplexes() {
        SplittableRandom random = new SplittableRandom(7);
        List<Poset> bases = List.of(Fixtures.cubeBoundary(3), Fixtures.cubeBoundary(4), Fixtures.booleanProperPart(5),
                Fixtures.antipodalCubeQuotient(4), Fixtures.cubicalGrid(2, 3));
        for (int trial = 0; trial < 300; trial++) {
            Poset base = bases.get(trial % bases.size());
            assertAgrees(glued(base, random, 1 + random.nextInt(3)), "trial " + trial);
        }
    }

    @Test
    void randomPosets() {
        Random random = new Random(3);
        for (int trial = 0; trial < 300; trial++) {
            assertAgrees(Fixtures.randomPoset(random, 4 + random.nextInt(20), random.nextDouble() * 0.5), "random " + trial);
        }
    }

    @Test
    void randomPosetsWithElementsNumberedInRandomOrder() {
        // element 0 may sit anywhere, also above others: scratch marks must not mistake it for a visited one
        assertAgrees(Fixtures.poset("a\nb: a\nc\nd\ne: c d\na: e\n"), "element 0 at height 2");
        SplittableRandom random = new SplittableRandom(5);
        List<Poset> bases = List.of(Fixtures.cubeBoundary(3), Fixtures.booleanProperPart(4), Fixtures.cubicalGrid(1, 3));
        for (int trial = 0; trial < 200; trial++) {
            Poset base = trial % 2 == 0 ? bases.get(trial / 2 % bases.size())
                    : Fixtures.randomPoset(new Random(trial), 4 + random.nextInt(12), 0.3);
            assertAgrees(renumbered(glued(base, random, random.nextInt(2)), random), "renumbered " + trial);
        }
    }

    /** The same poset with ids given in a random order. */
    private static Poset renumbered(Poset p, SplittableRandom random) {
        int n = p.size();
        int[] order = new int[n];
        for (int i = 0; i < n; i++) {
            int j = random.nextInt(i + 1);
            order[i] = order[j];
            order[j] = i;
        }
        PosetBuilder b = new PosetBuilder();
        for (int x : order) {
            b.element(p.label(x));
        }
        for (int x = 0; x < n; x++) {
            for (int y : p.lowerCovers().neighbours(x)) {
                b.relate(b.element(p.label(y)), b.element(p.label(x)), 0);
            }
        }
        return Fixtures.build(b);
    }

    /**
     * {@code base} with {@code extra} new elements, each covering a few random elements of one
     * random height, and now and then one cover of the base left out.
     */
    private static Poset glued(Poset base, SplittableRandom random, int extra) {
        PosetBuilder b = new PosetBuilder();
        for (int x = 0; x < base.size(); x++) {
            b.element(base.label(x));
        }
        Adjacency lower = base.lowerCovers();
        int dropped = random.nextInt(4) == 0 ? random.nextInt(Math.max(1, base.coverCount())) : -1;
        for (int x = 0; x < base.size(); x++) {
            for (int i = lower.start(x); i < lower.end(x); i++) {
                if (i != dropped) {
                    b.relate(lower.target(i), x, 0);
                }
            }
        }
        int top = base.maxHeight();
        for (int k = 0; k < extra; k++) {
            int h = random.nextInt(top + 1);
            int added = b.element("glued" + k);
            int wanted = 2 + random.nextInt(8);
            for (int tries = 0; tries < 50 * wanted && wanted > 0; tries++) {
                int y = random.nextInt(base.size());
                if (base.height(y) == h) {
                    b.relate(y, added, 0);
                    wanted--;
                }
            }
        }
        return Fixtures.build(b);
    }
}
