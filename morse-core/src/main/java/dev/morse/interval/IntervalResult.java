package dev.morse.interval;

import java.io.Serializable;
import java.util.Objects;

/**
 * What one interval of a sweep came to. A plain serialisable value.
 *
 * @param task the interval
 * @param dimension the dimension of its order complex: the length of a longest chain of the open
 *     interval, {@code -1} when it is empty (r(y) - r(x) - 2 when P̂ is pure)
 * @param graded whether all maximal chains of the closed interval {@code [x, y]} have the same length
 * @param homology the reduced homology of the open interval's order complex
 * @param how how the homology was found
 */
public record IntervalResult(IntervalTask task, int dimension, boolean graded, IntervalHomology homology, How how)
        implements Serializable {
    private static final long serialVersionUID = 1L;

    /** How the homology of an interval was found. */
    public enum How {
        /** By the homology engine: poset reduction, cellular or order complex, Morse reduction. */
        COMPUTED,
        /** The order complex has dimension at most 1, a graph: its homology is read off by Euler's formula. */
        GRAPH,
        /** The open interval has a least or a greatest element, so its order complex is a cone. */
        CONE
    }

    /** Validates. */
    public IntervalResult {
        Objects.requireNonNull(task, "task");
        Objects.requireNonNull(homology, "homology");
        Objects.requireNonNull(how, "how");
    }

    /**
     * Whether this interval satisfies the Cohen–Macaulay condition (Munkres 1984; Baclawski 1980): it
     * is graded and its reduced homology vanishes below the dimension of its order complex.
     */
    public boolean cohenMacaulay() {
        return graded && homology.vanishesBelow(dimension);
    }

    /** Whether the open interval is a homology sphere of its dimension: rank one there, zero below. */
    public boolean homologySphere() {
        return cohenMacaulay() && homology.group(dimension).betti() == 1 && homology.group(dimension).torsion().isEmpty()
                && homology.topDimension() <= dimension;
    }
}
