package dev.morse.interval;

import java.io.Serializable;

/**
 * One unit of an interval sweep: the open interval {@code (lower, upper)} of P̂, the poset P with a least
 * element 0̂ and a greatest element 1̂ adjoined. Elements of P keep their ids {@code 0..n-1}; 0̂ is
 * {@code n} and 1̂ is {@code n+1} ({@link PosetWithBounds#bottom()}, {@link PosetWithBounds#top()}).
 * A plain serialisable value, so that the work can be shipped to other machines.
 *
 * @param lower the lower end, an id of P̂
 * @param upper the upper end, an id of P̂, strictly above {@code lower}
 */
public record IntervalTask(int lower, int upper) implements Serializable {
    private static final long serialVersionUID = 1L;

    /** Validates the ids. */
    public IntervalTask {
        if (lower < 0 || upper < 0 || lower == upper) {
            throw new IllegalArgumentException("an interval needs two distinct ids, not " + lower + " and " + upper);
        }
    }
}
