package dev.morse.spark;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.morse.engine.Request;
import dev.morse.generate.AllPosets;
import dev.morse.generate.BruhatOrder;
import dev.morse.generate.ChessboardComplex;
import dev.morse.generate.CorpusCase;
import dev.morse.generate.CorpusManifest;
import dev.morse.generate.PartitionLattice;
import dev.morse.homology.Coefficients;
import dev.morse.input.FacetInput;
import dev.morse.input.Input;
import dev.morse.input.InputReaders;
import dev.morse.interval.IntervalSweep;
import dev.morse.interval.PosetWithBounds;
import dev.morse.interval.SweepInputs;
import dev.morse.interval.SweepOptions;
import dev.morse.interval.SweepReport;
import dev.morse.poset.Poset;
import dev.morse.report.IntervalJsonWriter;
import java.util.ArrayList;
import java.util.List;
import org.apache.spark.api.java.JavaSparkContext;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/**
 * The sweep on Spark (local mode, two task slots) against the sweep on one machine, which
 * morse-core's tests hold to published values: every interval's homology and every verdict the same,
 * on the corpus and on families. One context for the whole class: starting Spark costs seconds.
 */
class SparkSweepAgreementTest {
    private static JavaSparkContext spark;

    @BeforeAll
    static void start() {
        spark = SparkContexts.start("local[2]");
    }

    @AfterAll
    static void stop() {
        spark.close();
    }

    /** Asserts that both paths give the same report, interval by interval, and returns the number of intervals. */
    private static long assertSameSweep(Poset poset, String name, SweepOptions options, int blockSize) {
        PosetWithBounds hat = PosetWithBounds.of(poset);
        SweepReport here = IntervalSweep.run(hat, name, options);
        SparkSweep.Outcome there = SparkSweep.run(spark, hat, name, options, blockSize);
        assertEquals(List.of(), there.failures(), name);
        SweepReport report = there.report().orElseThrow();
        assertEquals(here.results(), report.results(), name);
        assertEquals(here.pure(), report.pure(), name);
        assertEquals(here.cohenMacaulay(), report.cohenMacaulay(), name);
        assertEquals(here.witness(), report.witness(), name);
        assertEquals(here.spherical(), report.spherical(), name);
        assertEquals(here.eulerian(), report.eulerian(), name);
        assertEquals(here.gorensteinStar(), report.gorensteinStar(), name);
        // and what the commands print, Möbius table and interval lines included
        assertEquals(IntervalJsonWriter.toJson(here, true), IntervalJsonWriter.toJson(report, true), name);
        assertEquals(IntervalJsonWriter.toJsonLines(here), IntervalJsonWriter.toJsonLines(report), name);
        return hat.intervalCount();
    }

    @Test
    void everyCorpusCaseGivesTheSameIntervalsAndVerdicts() throws Exception {
        List<String> swept = new ArrayList<>();
        for (CorpusCase c : CorpusManifest.readDirectory(SparkFixtures.corpus())) {
            if (c.heavy()) {
                continue;
            }
            Input input = InputReaders.read(SparkFixtures.corpus().resolve(c.file()));
            Poset poset = SweepInputs.posetOf(input);
            // integers, so that torsion (the projective planes) must agree too
            SweepOptions options = new SweepOptions(Request.defaults().withHomology(Coefficients.INTEGERS, true), 1, false);
            assertSameSweep(poset, input.source(), options, 37);
            swept.add(c.name());
        }
        assertTrue(swept.size() >= 50, "corpus cases swept: " + swept);
    }

    @Test
    void allPosetsOnFiveElementsGiveTheSameIntervalsAndVerdicts() {
        // a family sweep: every poset on 5 elements, 63 of them (OEIS A000112, from memory), many not pure
        List<Poset> family = AllPosets.of(5);
        assertEquals(63, family.size());
        SweepOptions options = new SweepOptions(Request.defaults(), 1, false);
        for (int i = 0; i < family.size(); i++) {
            assertSameSweep(family.get(i), "poset-5-" + i, options, 3);
        }
    }

    @Test
    void familiesWithHeavyLowerEndsGiveTheSameIntervals() {
        // blocks of 5 split 0^ (n + 1 intervals) and the minimal elements of these into many tasks
        SweepOptions options = new SweepOptions(Request.defaults().withHomology(Coefficients.INTEGERS, true), 1, false);
        assertSameSweep(PartitionLattice.properPart(5), "partition-5", options, 5);
        assertSameSweep(BruhatOrder.properPart(4), "bruhat-4", options, 5);
        Poset chessboard = SweepInputs.posetOf(new FacetInput("chessboard-3x4", ChessboardComplex.facets(3, 4), 0));
        assertSameSweep(chessboard, "chessboard-3x4", options, 5);
    }

    @Test
    void firstFailureStopsAtTheSameWitness() throws Exception {
        // three disjoint edges (the matching complex M_4) are not Cohen–Macaulay: disconnected in dimension 1,
        // H~_0 = Z^2 below the top dimension (Reisner 1976; the corpus manifest gives H_0 = Z^3)
        Poset p = SweepInputs.posetOf(InputReaders.read(SparkFixtures.corpus().resolve("matching-4.simplicial")));
        SweepOptions options = new SweepOptions(Request.defaults(), 1, true);
        assertSameSweep(p, "matching-4", options, 2);
        SparkSweep.Outcome there = SparkSweep.run(spark, PosetWithBounds.of(p), "matching-4", options, 2);
        assertTrue(there.report().orElseThrow().witness().isPresent());
        assertFalse(there.report().orElseThrow().cohenMacaulay());
    }

    @Test
    void anIntervalPastTheCellLimitIsAnErrorAndTheOthersAreSolved() {
        // the proper part of the partition lattice Π_5: its whole interval (0^, 1^) goes to the engine with far
        // more than 20 cells (its order complex is a wedge of 24 two-spheres: Björner 1980), as the small
        // intervals do not; a limit of 20 stored cells stands for an executor too small for it
        Poset p = PartitionLattice.properPart(5);
        PosetWithBounds hat = PosetWithBounds.of(p);
        Request small = Request.defaults().withMaxStoredCells(20);
        SparkSweep.Outcome outcome = SparkSweep.run(spark, hat, "partition-5", new SweepOptions(small, 1, false), 16);
        assertTrue(outcome.report().isEmpty());
        assertEquals(hat.intervalCount(), outcome.outcomes().size());
        List<IntervalOutcome> failures = outcome.failures();
        assertFalse(failures.isEmpty());
        IntervalOutcome whole = outcome.outcomes().get(outcome.outcomes().size() - 1);
        assertTrue(whole.failed());
        assertEquals(hat.bottom(), whole.task().lower());
        assertEquals(hat.top(), whole.task().upper());
        assertTrue(whole.error().startsWith("partition-5 interval (0^, 1^): too large to compute: "), whole.error());
        // every interval that did not fail has the result of the sweep without the limit
        SweepReport full = IntervalSweep.run(hat, "partition-5", new SweepOptions(Request.defaults(), 1, false));
        for (int i = 0; i < full.results().size(); i++) {
            IntervalOutcome o = outcome.outcomes().get(i);
            if (!o.failed()) {
                assertEquals(full.results().get(i), o.result());
            }
        }
    }

    @Test
    void aSweepRunAgainInOtherTasksGivesTheSameOutcomes() {
        // what a retried task does: the same intervals solved again, here cut into other tasks
        Poset p = PartitionLattice.properPart(5);
        PosetWithBounds hat = PosetWithBounds.of(p);
        SweepOptions options = new SweepOptions(Request.defaults().withMatching("random", 7, 1), 1, false);
        SparkSweep.Outcome a = SparkSweep.run(spark, hat, "p", options, 3);
        SparkSweep.Outcome b = SparkSweep.run(spark, hat, "p", options, 200);
        assertEquals(a.outcomes(), b.outcomes());
        assertTrue(a.tasks() > b.tasks());
    }
}
