package dev.morse.matching;

import dev.morse.complex.ChainComplex;

/**
 * {@link FreeingCollapseHeuristic}, then Forman's cancellations ({@link GradientPathCancellation}).
 * The cancellation is published (Forman 1998); the choice of critical cells of freeing-collapse is
 * ours, so this combination as a whole is ours too. On the hard library it reaches the fewest
 * critical cells of any heuristic here, the proven optimum on every complex
 * (benchmarks/RESULTS.md).
 *
 * <p>Time and memory: those of freeing-collapse plus those of the cancellations, as for
 * {@link CancellingCollapseHeuristic}.
 */
public final class CancellingFreeingCollapseHeuristic implements MatchingHeuristic {
    @Override
    public String name() {
        return "cancelling-freeing-collapse";
    }

    @Override
    public Matching match(ChainComplex complex, MatchingOptions options) {
        return GradientPathCancellation.improve(complex, new FreeingCollapseHeuristic().match(complex, options));
    }
}
