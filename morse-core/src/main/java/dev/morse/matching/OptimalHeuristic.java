package dev.morse.matching;

import dev.morse.complex.ChainComplex;

/**
 * The optimal Morse matching of {@link OptimalMatchingSolver} (Joswig and Pfetsch 2006) as a heuristic
 * among the others: proven optimal when the solver finishes within {@link MatchingOptions#timeLimit()},
 * otherwise the best matching found by then. Callers that need the proof status or the bound call
 * {@link OptimalMatchingSolver#solve} directly. The seed only steers the random starting heuristic, so
 * repeated trials would at most trade one optimal matching for another: not a randomised heuristic.
 */
public final class OptimalHeuristic implements MatchingHeuristic {
    /** The name users type. */
    public static final String NAME = "optimal";

    @Override
    public String name() {
        return NAME;
    }

    @Override
    public Matching match(ChainComplex complex, MatchingOptions options) {
        return OptimalMatchingSolver.solve(complex, options).matching();
    }
}
