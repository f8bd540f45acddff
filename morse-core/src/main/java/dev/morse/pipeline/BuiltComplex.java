package dev.morse.pipeline;

import dev.morse.complex.ChainComplex;
import dev.morse.cw.CwPosetVerdict;
import java.util.Objects;
import java.util.Optional;

/**
 * The chain complex built from an input, and why it is that one.
 *
 * @param complex the chain complex
 * @param cwCheck the CW poset verdict for a poset input, when the check was made
 * @param buildMillis how long building (and checking) took
 */
public record BuiltComplex(ChainComplex complex, Optional<CwPosetVerdict> cwCheck, double buildMillis) {
    /** Validates. */
    public BuiltComplex {
        Objects.requireNonNull(complex, "complex");
        Objects.requireNonNull(cwCheck, "cwCheck");
    }
}
