package dev.morse.progress;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.morse.complex.ComplexChoice;
import dev.morse.homology.Coefficients;
import dev.morse.engine.Request;
import dev.morse.engine.Runs;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/** The long phases of a homology run report to the installed sink, within their totals. */
class PhaseReportsTest {
    /** The face poset of a square (a closed disk): a CW poset, so its cellular complex is used. */
    private static final String SQUARE = """
            morse-poset 1
            a
            b
            c
            d
            ab: a b
            bc: b c
            cd: c d
            da: d a
            face: ab bc cd da
            """;

    private static Map<String, PhaseRecorder.Phase> run(String text, Request options) {
        return run(text, options, new PhaseRecorder());
    }

    private static Map<String, PhaseRecorder.Phase> run(String text, Request options, PhaseRecorder recorder) {
        try (ProgressScope scope = Progress.use(recorder)) {
            Runs.run("square.poset", text, options);
        }
        for (PhaseRecorder.Phase p : recorder.phases()) {
            assertTrue(p.total() == 0 || p.largestCount() <= p.total(), p + " counts past its total");
        }
        return recorder.byName();
    }

    @Test
    void aMorseReductionReportsEveryPhaseFromReadingToHomology() {
        Map<String, PhaseRecorder.Phase> phases = run(SQUARE, Request.defaults());
        assertEquals(List.of("read", "hasse diagram", "cw check", "match", "verify", "sweep", "reduce", "homology"),
                List.copyOf(phases.keySet()));
        // 9 elements: 4 corners, 4 sides, 1 face
        assertEquals(9, phases.get("cw check").total());
        assertEquals(9, phases.get("match").total());
        assertEquals(9, phases.get("verify").total());
    }

    @Test
    void theFullSmithNormalFormReportsItsColumns() {
        Request none = Runs.request(ComplexChoice.AUTO, Coefficients.INTEGERS, false, "none");
        PhaseRecorder recorder = new PhaseRecorder();
        PhaseRecorder.Phase homology = run(SQUARE, none, recorder).get("homology");
        // columns of ∂_1 and ∂_2: 4 sides and 1 face
        assertEquals(5, homology.total());
        // once ∂_1 is done the count is set to its 4 columns, whatever the Smith normal form reported inside
        assertTrue(recorder.counts("homology").contains(4L), recorder.counts("homology").toString());
    }

    @Test
    void theOrderComplexReportsItsChains() {
        // without the poset reduction, which would shrink the closed disk to a point first
        PhaseRecorder.Phase chains = run(SQUARE, Request.defaults().withComplex(ComplexChoice.ORDER)
                .withPosetReduction(false)).get("order complex");
        // chains of the square's face poset: 9 elements, 16 comparable pairs, 8 maximal chains
        assertEquals(33, chains.total());
    }

    @Test
    void thePosetReductionReportsItsElements() {
        Map<String, PhaseRecorder.Phase> phases = run(SQUARE, Request.defaults().withComplex(ComplexChoice.ORDER));
        // up to three sweeps over the 9 elements; the disk has a greatest element, so one point is left
        assertEquals(27, phases.get("poset reduction").total());
        assertEquals(1, phases.get("order complex").total());
    }
}
