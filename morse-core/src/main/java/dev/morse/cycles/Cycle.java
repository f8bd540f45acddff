package dev.morse.cycles;

import java.math.BigInteger;
import java.util.List;
import java.util.Objects;

/**
 * A representative cycle of one generator of a homology group, on the complex the homology was
 * computed on. Immutable.
 *
 * @param dimension the dimension of its cells
 * @param order 0 for a free generator, else the torsion factor t of the group it generates
 * @param terms its nonzero terms, by ascending cell
 * @param liftedTerms the number of terms it had when first lifted, before it was shortened
 */
public record Cycle(int dimension, BigInteger order, List<Term> terms, int liftedTerms) {
    /**
     * One term: a coefficient and a cell, the cell named as the input names it.
     *
     * @param cell the cell's id in the complex
     * @param label the cell in the input's own terms: vertex or element labels, or for a cube one
     *     {@code [low, high]} pair per axis
     * @param coefficient nonzero; over a prime field in {@code 1..p-1}
     */
    public record Term(int cell, List<Object> label, BigInteger coefficient) {
        /** Copies and validates. */
        public Term {
            label = List.copyOf(label);
            Objects.requireNonNull(coefficient, "coefficient");
        }
    }

    /** A cycle that was not shortened. */
    public Cycle(int dimension, BigInteger order, List<Term> terms) {
        this(dimension, order, terms, terms.size());
    }

    /** Copies and validates. */
    public Cycle {
        Objects.requireNonNull(order, "order");
        terms = List.copyOf(terms);
        if (order.signum() < 0) {
            throw new IllegalArgumentException("an order is 0 (free) or positive");
        }
    }
}
