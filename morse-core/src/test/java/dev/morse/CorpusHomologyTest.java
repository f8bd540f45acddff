package dev.morse;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.morse.complex.ChainComplex;
import dev.morse.cw.CwPosetCheck;
import dev.morse.cw.CwPosetVerdict;
import dev.morse.complex.OrderComplex;
import dev.morse.complex.SimplicialComplex;
import dev.morse.generate.CorpusCase;
import dev.morse.generate.CorpusManifest;
import dev.morse.homology.Coefficients;
import dev.morse.homology.Homology;
import dev.morse.homology.HomologyCalculator;
import dev.morse.io.PosetReader;
import dev.morse.io.SimplicialReader;
import dev.morse.matching.MatchingHeuristic;
import dev.morse.matching.MatchingHeuristics;
import dev.morse.matching.MatchingOptions;
import dev.morse.morsecomplex.MorseReduction;
import dev.morse.poset.Poset;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.TestFactory;

/**
 * Every corpus case, through the order complex and (for CW posets) the cellular complex, by the
 * full Smith normal form and by every matching heuristic, against the homology its manifest gives
 * from the literature (sources in corpus/manifest.json).
 */
class CorpusHomologyTest {
    /** Largest complex given to the full Smith normal form on every cell. */
    private static final long FULL_SNF_LIMIT = Long.getLong("morse.test.fullLimit", 60_000);
    /** Largest order complex built for the heuristics. */
    private static final long ORDER_LIMIT = 250_000;

    private static List<CorpusCase> cases() {
        try {
            return CorpusManifest.readDirectory(corpus());
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static Path corpus() {
        return Path.of(System.getProperty("morse.corpus", "../corpus"));
    }

    @TestFactory
    Stream<DynamicTest> fullSmithNormalFormOnEveryComplexMatchesTheManifest() {
        return cases().stream().map(c -> DynamicTest.dynamicTest(c.name(), () -> {
            for (ChainComplex complex : complexes(c, FULL_SNF_LIMIT)) {
                Homology h = HomologyCalculator.compute(complex, Coefficients.INTEGERS);
                assertEquals(c.expected(), h.groups(), c.name() + " via the " + complex.kind().reportName() + " complex");
            }
        }));
    }

    @TestFactory
    Stream<DynamicTest> cwPosetCheckAgreesWithTheManifest() {
        return cases().stream().filter(CorpusCase::isPoset).map(c -> DynamicTest.dynamicTest(c.name(), () -> {
            CwPosetVerdict verdict = CwPosetCheck.check(PosetReader.read(c.path(corpus())));
            assertEquals(c.cwPoset(), verdict.isCwPoset(), c.name() + ": " + verdict.reason());
        }));
    }

    @TestFactory
    Stream<DynamicTest> everyHeuristicOnEveryComplexMatchesTheManifest() {
        List<DynamicTest> tests = new ArrayList<>();
        for (CorpusCase c : cases()) {
            tests.add(DynamicTest.dynamicTest(c.name(), () -> {
                for (ChainComplex complex : complexes(c, ORDER_LIMIT)) {
                    for (MatchingHeuristic h : MatchingHeuristics.all().values()) {
                        if (h.name().equals("none") && complex.cellCount() > FULL_SNF_LIMIT) {
                            continue;
                        }
                        MorseReduction.Outcome outcome = MorseReduction.run(complex,
                                new MorseReduction.Request(h, MatchingOptions.DEFAULT, Coefficients.INTEGERS, true));
                        String where = c.name() + " via the " + complex.kind().reportName() + " complex with " + h.name();
                        assertEquals(c.expected(), outcome.homology().groups(), where);
                        assertTrue(outcome.excess() >= 0, where);
                    }
                }
            }));
        }
        return tests.stream();
    }

    /** The complexes a case denotes: simplicial; or the order complex, and the cellular one for CW posets. */
    private static List<ChainComplex> complexes(CorpusCase c, long orderLimit) throws IOException {
        List<ChainComplex> complexes = new ArrayList<>();
        if (!c.isPoset()) {
            if (c.totalCells() <= orderLimit) {
                complexes.add(SimplicialComplex.of(SimplicialReader.read(c.path(corpus()))));
            }
            return complexes;
        }
        Poset poset = PosetReader.read(c.path(corpus()));
        if (c.totalCells() <= orderLimit) {
            complexes.add(OrderComplex.of(poset));
        }
        if (c.cwPoset()) {
            complexes.add(CwPosetCheck.cellularComplex(poset));
        }
        return complexes;
    }
}
