package dev.morse.matching;

import dev.morse.complex.ChainComplex;

/** Leaves every cell critical: the full Smith normal form baseline and oracle. */
public final class NoMatchingHeuristic implements MatchingHeuristic {
    @Override
    public String name() {
        return "none";
    }

    @Override
    public Matching match(ChainComplex complex, MatchingOptions options) {
        return Matching.empty(complex.cellCount());
    }
}
