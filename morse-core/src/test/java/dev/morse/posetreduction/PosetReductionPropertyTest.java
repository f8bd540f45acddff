package dev.morse.posetreduction;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.morse.generate.CorpusCase;
import dev.morse.generate.CorpusManifest;
import dev.morse.io.PosetReader;
import dev.morse.poset.Poset;
import dev.morse.testing.RandomInputs;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.List;
import java.util.SplittableRandom;
import java.util.stream.Stream;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestFactory;

/**
 * The reductions keep the homology of the order complex: on random posets against the poset as
 * given, and on every poset of the corpus against the homology its manifest gives from the literature.
 */
class PosetReductionPropertyTest {
    private static final int RANDOM_POSETS = 400;

    @Test
    void reductionKeepsTheHomologyOfRandomPosets() {
        SplittableRandom random = new SplittableRandom(20_240_601);
        int shrunk = 0;
        for (int i = 0; i < RANDOM_POSETS; i++) {
            int n = 3 + random.nextInt(12);
            double density = new double[] {0.12, 0.25, 0.4, 0.6}[random.nextInt(4)];
            Poset p = RandomInputs.poset(random, n, density);
            ReductionLimits limits = i % 3 == 0 ? new ReductionLimits(1 + random.nextInt(6), 8, 0, 2)
                    : ReductionLimits.DEFAULT;
            ReductionResult r = PosetReduction.reduce(p, limits);
            String where = "poset " + i + " (n = " + n + ", density " + density + ")";
            assertEquals(PosetReductionTest.homology(p, p.maxHeight()),
                    PosetReductionTest.homology(r.poset(), p.maxHeight()), where);
            assertInducedSubposet(p, r.poset(), where);
            shrunk += r.stats().removed() > 0 ? 1 : 0;
        }
        assertTrue(shrunk > RANDOM_POSETS / 2, "most random posets shrink: " + shrunk);
    }

    /** The reduced poset is the subposet of the given one on the labels it kept. */
    private static void assertInducedSubposet(Poset p, Poset r, String where) {
        int[] original = new int[r.size()];
        for (int x = 0; x < r.size(); x++) {
            original[x] = p.find(r.label(x)).orElseThrow();
        }
        for (int x = 0; x < r.size(); x++) {
            for (int y = 0; y < r.size(); y++) {
                assertEquals(p.isBelow(original[x], original[y]), r.isBelow(x, y), where + ": " + r.label(x) + " < "
                        + r.label(y));
            }
        }
    }

    @TestFactory
    Stream<DynamicTest> reductionKeepsTheHomologyOfEveryCorpusPoset() throws IOException {
        Path corpus = Path.of(System.getProperty("morse.corpus", "../corpus"));
        List<CorpusCase> cases = CorpusManifest.readDirectory(corpus);
        return cases.stream().filter(CorpusCase::isPoset).map(c -> DynamicTest.dynamicTest(c.name(), () -> {
            Poset p = read(c.path(corpus));
            ReductionResult r = PosetReduction.reduce(p);
            assertEquals(p.size() - r.poset().size(), r.stats().removed());
            if (r.stats().removed() == 0) {
                assertEquals(p.size(), r.poset().size(), c.name()); // the poset itself: nothing to recompute
                return;
            }
            assertEquals(c.expected(), PosetReductionTest.homology(r.poset(), c.topDimension()),
                    c.name() + " reduced from " + p.size() + " to " + r.poset().size() + " elements");
        }));
    }

    private static Poset read(Path file) {
        try {
            return PosetReader.read(file);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
