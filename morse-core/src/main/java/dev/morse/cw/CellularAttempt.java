package dev.morse.cw;

import dev.morse.complex.ChainComplex;

import java.util.Objects;
import java.util.Optional;

/**
 * The outcome of trying the cellular complex on a poset: the CW poset verdict and, when it passed,
 * the cellular complex; the order complex is left to the caller, who may store it or not.
 */
public record CellularAttempt(CwPosetVerdict verdict, Optional<ChainComplex> cellular) {
    /** Requires the complex exactly when the verdict passed. */
    public CellularAttempt {
        Objects.requireNonNull(verdict, "verdict");
        Objects.requireNonNull(cellular, "cellular");
        if (verdict.isCwPoset() != cellular.isPresent()) {
            throw new IllegalArgumentException("the cellular complex comes exactly with a passed check");
        }
    }
}
