package dev.morse.engine;

import dev.morse.input.Input;
import dev.morse.matching.MatchingHeuristic;
import dev.morse.matching.MatchingHeuristics;
import dev.morse.matching.MatchingTrials;
import dev.morse.matching.TrialCount;
import dev.morse.morsecomplex.MorseReduction;
import java.util.List;

/**
 * The engine for stored complexes: any complex, any matching heuristic, through
 * {@link MorseReduction} (match, verify, sweep, reduce, homology), and the tally of seeded trials
 * when several are asked for. Stateless.
 */
public final class StoredEngine implements ComputationEngine {
    /** The one instance. */
    public static final StoredEngine INSTANCE = new StoredEngine();
    /** Its name in reports. */
    public static final String NAME = "explicit";

    private StoredEngine() {
    }

    @Override
    public String name() {
        return NAME;
    }

    @Override
    public Computation run(Input input, ComplexPlan plan, Request request) {
        if (plan.stored().isEmpty()) {
            throw new IllegalArgumentException("the stored engine needs a stored complex");
        }
        MatchingHeuristic heuristic = MatchingHeuristics.byName(request.matching()).orElseThrow();
        MorseReduction.Outcome outcome = MorseReduction.run(plan.stored().get(), new MorseReduction.Request(heuristic,
                request.matchingOptions(), request.coefficients(), request.verify()));
        List<TrialCount> trials = List.of();
        List<PhaseTiming> after = List.of();
        if (request.trials() > 1) {
            long start = System.nanoTime();
            trials = MatchingTrials.run(plan.stored().get(), heuristic, request.seed(), request.trials());
            after = List.of(PhaseTiming.since("trials", start));
        }
        return Computation.of(input, plan, request, outcome, trials, after);
    }
}
