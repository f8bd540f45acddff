package dev.morse.report;

import dev.morse.complex.ComplexKind;
import dev.morse.cw.CwPosetVerdict;
import dev.morse.engine.ComplexPlan;
import dev.morse.engine.Computation;
import dev.morse.homology.Homology;
import dev.morse.input.Input;
import dev.morse.io.SimplicialReader;
import dev.morse.complex.SimplicialComplex;
import dev.morse.morsecomplex.MorseComplex;
import dev.morse.morsecomplex.MorseOutcome;
import dev.morse.morsecomplex.PhaseTimes;
import dev.morse.morsecomplex.ReductionRound;
import dev.morse.posetreduction.ReductionStats;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/** Computations assembled from given parts, so that report tests can fix every value they check. */
final class ReportFixtures {
    private ReportFixtures() {
    }

    /** An engine's findings given outright. */
    record FixedOutcome(String matchingName, long[] cells, int[] critical, List<ReductionRound> rounds,
            Homology homology, PhaseTimes times) implements MorseOutcome {
        @Override
        public Optional<MorseComplex> morseComplex() {
            return Optional.empty();
        }

        @Override
        public List<String> criticalCellNames(int dimension) {
            return List.of();
        }
    }

    /**
     * A computation of {@code input} with the given findings; the plan's stored complex is a stand-in
     * (reports read the cells from the findings).
     */
    static Computation computation(Input input, ComplexKind kind, Optional<CwPosetVerdict> cw,
            Optional<ReductionStats> reduction, String matching, long[] cells, int[] critical, Homology unreduced,
            boolean reduced, double complexMillis, Map<String, Double> phases) {
        SimplicialComplex standIn = SimplicialComplex.of(SimplicialReader.parse("morse-simplicial 1\na\n", "stand-in"));
        ComplexPlan plan = new ComplexPlan(kind, Optional.of(standIn), Optional.empty(), new long[0], "", cw, reduction,
                -1, complexMillis);
        return Computation.of(input, plan, reduced, new FixedOutcome(matching, cells, critical, List.of(), unreduced,
                new PhaseTimes(phases)), List.of(), List.of());
    }
}
