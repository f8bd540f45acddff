package dev.morse.example;

import dev.morse.cw.CwPosetCheck;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.morse.complex.ChainComplex;
import dev.morse.complex.OrderComplex;
import dev.morse.complex.SimplicialComplex;
import dev.morse.generate.CorpusCase;
import dev.morse.generate.CorpusManifest;
import dev.morse.homology.Coefficients;
import dev.morse.io.PosetReader;
import dev.morse.io.SimplicialReader;
import dev.morse.matching.Matching;
import dev.morse.matching.MatchingHeuristics;
import dev.morse.matching.MatchingOptions;
import dev.morse.matching.MatchingVerdict;
import dev.morse.matching.MatchingVerifier;
import dev.morse.morsecomplex.MorseReduction;
import dev.morse.poset.Poset;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

class LowerStarHeuristicTest {
    /** Corpus complexes up to this many cells are matched here; the rest would only slow the suite. */
    private static final long CELL_LIMIT = 60_000;

    private static Path corpus() {
        return Path.of(System.getProperty("morse.corpus", "../corpus"));
    }

    @Test
    void theServiceFileMakesTheHeuristicKnownByName() {
        assertInstanceOf(LowerStarHeuristic.class, MatchingHeuristics.byName("lower-star").orElseThrow());
        // plug-ins come after the built-in heuristics, which keep their names
        List<String> names = MatchingHeuristics.names();
        assertEquals(names.size() - 1, names.indexOf("lower-star"));
    }

    @Test
    void everyCorpusComplexGetsAVerifiedMatchingThatKeepsItsHomology() throws IOException {
        int checked = 0;
        for (CorpusCase c : CorpusManifest.readDirectory(corpus())) {
            if (c.totalCells() > CELL_LIMIT) {
                continue;
            }
            for (ChainComplex complex : complexes(c)) {
                String where = c.name() + " via the " + complex.kind().reportName() + " complex";
                Matching matching = new LowerStarHeuristic().match(complex, MatchingOptions.DEFAULT);
                MatchingVerdict verdict = MatchingVerifier.verify(complex, matching);
                assertTrue(verdict.valid(), where + ": " + verdict.defect());
                MorseReduction.Outcome outcome = MorseReduction.run(complex, new MorseReduction.Request(
                        new LowerStarHeuristic(), MatchingOptions.DEFAULT, Coefficients.INTEGERS, true));
                // expected homology from the literature, sources in corpus/manifest.json
                assertEquals(c.expected(), outcome.homology().groups(), where);
                // Forman's weak Morse inequalities: no fewer critical cells than the bound
                assertTrue(outcome.excess() >= 0, where);
                checked++;
            }
        }
        assertTrue(checked >= 40, "only " + checked + " complexes were small enough");
    }

    @Test
    void aSimplexIsMatchedPerfectly() {
        // a simplex is collapsible; in each lower star but the first, S ∪ {v} pairs with
        // S ∪ {v0, v} for S not holding the lowest vertex v0, so only v0 is left critical
        SimplicialComplex simplex = SimplicialComplex.of(SimplicialReader.parse(
                "morse-simplicial 1\na b c d e\n", "simplex.simplicial"));
        Matching matching = new LowerStarHeuristic().match(simplex, MatchingOptions.DEFAULT);
        assertTrue(MatchingVerifier.verify(simplex, matching).valid());
        assertEquals(List.of(1, 0, 0, 0, 0), boxed(matching.criticalCounts(simplex)));
    }

    private static List<Integer> boxed(int[] counts) {
        List<Integer> out = new ArrayList<>();
        for (int c : counts) {
            out.add(c);
        }
        return out;
    }

    private static List<ChainComplex> complexes(CorpusCase c) throws IOException {
        List<ChainComplex> complexes = new ArrayList<>();
        if (!c.isPoset()) {
            complexes.add(SimplicialComplex.of(SimplicialReader.read(c.path(corpus()))));
            return complexes;
        }
        Poset poset = PosetReader.read(c.path(corpus()));
        complexes.add(OrderComplex.of(poset));
        if (c.cwPoset()) {
            complexes.add(CwPosetCheck.cellularComplex(poset));
        }
        return complexes;
    }
}
