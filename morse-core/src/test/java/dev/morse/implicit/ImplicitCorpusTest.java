package dev.morse.implicit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.morse.complex.OrderComplex;
import dev.morse.generate.CorpusCase;
import dev.morse.generate.CorpusManifest;
import dev.morse.homology.Coefficients;
import dev.morse.homology.Homology;
import dev.morse.io.PosetReader;
import dev.morse.matching.MatchingHeuristics;
import dev.morse.matching.MatchingOptions;
import dev.morse.matching.MatchingVerdict;
import dev.morse.matching.MatchingVerifier;
import dev.morse.morsecomplex.MorseReduction;
import dev.morse.poset.Poset;
import java.io.IOException;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.stream.Stream;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.TestFactory;

/**
 * Every poset of the corpus with at most {@value #CHAIN_LIMIT} chains, for every element order: the
 * implicit engine's homology against the manifest (values from the literature, sources in
 * corpus/manifest.json), against the stored order complex reduced by the default matching, and
 * against the full Smith normal form on every chain; its matching written out on the stored complex
 * must pass the verifier.
 */
class ImplicitCorpusTest {
    private static final long CHAIN_LIMIT = 50_000;

    private static Path corpus() {
        return Path.of(System.getProperty("morse.corpus", "../corpus"));
    }

    @TestFactory
    Stream<DynamicTest> everySmallCorpusPosetAgreesWithTheStoredOrderComplex() throws IOException {
        return CorpusManifest.readDirectory(corpus()).stream()
                .filter(c -> c.isPoset() && c.totalCells() <= CHAIN_LIMIT)
                .map(c -> DynamicTest.dynamicTest(c.name(), () -> check(c)));
    }

    private static void check(CorpusCase c) throws IOException {
        Poset poset = PosetReader.read(c.path(corpus()));
        OrderComplex complex = OrderComplex.of(poset);
        Homology stored = MorseReduction.run(complex, new MorseReduction.Request(
                MatchingHeuristics.byName(MatchingHeuristics.DEFAULT).orElseThrow(), MatchingOptions.DEFAULT,
                Coefficients.INTEGERS, true)).homology();
        Homology full = Oracle.fullSmithNormalForm(poset, Coefficients.INTEGERS);
        for (ElementOrder order : ElementOrder.values()) {
            String where = c.name() + " with element order " + order.optionName();
            ImplicitHomology.Outcome outcome = ImplicitHomology.run(poset,
                    new ImplicitHomology.Options(order, Coefficients.INTEGERS));
            assertEquals(c.expected(), outcome.homology().groups(), where + " against the manifest");
            assertEquals(stored, outcome.homology(), where + " against the stored order complex");
            assertEquals(full, outcome.homology(), where + " against the full Smith normal form");
            assertEquals(Arrays.stream(complex.cellCounts()).asLongStream().boxed().toList(),
                    Arrays.stream(outcome.cells()).boxed().toList(), where + ": chains per dimension");
            MatchingVerdict verdict = MatchingVerifier.verify(complex,
                    Oracle.explicitMatching(complex, BoundedPoset.of(poset, order::ranks, Long.MAX_VALUE)));
            assertTrue(verdict.valid(), where + ": " + verdict.defect());
        }
    }
}
