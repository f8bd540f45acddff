package dev.morse.cw;

import dev.morse.complex.ChainComplex;

import java.util.Objects;
import java.util.Optional;

/**
 * The chain complex built for a poset, and the CW poset verdict it was chosen by (absent when the
 * order complex was asked for outright and no check ran).
 */
public record ComplexSelection(ChainComplex complex, Optional<CwPosetVerdict> verdict) {
    /** Requires both. */
    public ComplexSelection {
        Objects.requireNonNull(complex, "complex");
        Objects.requireNonNull(verdict, "verdict");
    }
}
