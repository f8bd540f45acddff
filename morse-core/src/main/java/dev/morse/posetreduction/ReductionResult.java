package dev.morse.posetreduction;

import dev.morse.poset.Poset;
import java.util.Objects;

/**
 * A reduced poset, whose order complex has the integral homology of the given one's, and what the
 * reduction did.
 *
 * @param poset the elements left, with their labels, in the order of the given poset
 * @param stats counts and time
 */
public record ReductionResult(Poset poset, ReductionStats stats) {
    /** Validates. */
    public ReductionResult {
        Objects.requireNonNull(poset, "poset");
        Objects.requireNonNull(stats, "stats");
    }
}
