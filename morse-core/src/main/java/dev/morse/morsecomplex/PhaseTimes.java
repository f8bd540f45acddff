package dev.morse.morsecomplex;

import java.util.LinkedHashMap;
import java.util.Map;

/** Wall-clock milliseconds per named phase, in the order the phases ran. Immutable. */
public record PhaseTimes(Map<String, Double> millis) {
    /** Copies, keeping the order. */
    public PhaseTimes {
        millis = java.util.Collections.unmodifiableMap(new LinkedHashMap<>(millis));
    }

    /** Sum over phases. */
    public double total() {
        return millis.values().stream().mapToDouble(Double::doubleValue).sum();
    }
}
