package dev.morse.complex;

import dev.morse.poset.Poset;

/**
 * The order complex Δ(P) of a poset: one simplex per nonempty chain {@code x0 < x1 < ... < xd},
 * of dimension d, with the simplicial boundary {@code Σ (-1)^i [x0 .. x̂i .. xd]} (orientation
 * along the order). Vertices are numbered as the poset's elements; the chains of each higher
 * dimension follow in lexicographic order of their element ids, bottom first.
 *
 * <p>Memory: a cell of dimension d costs {@code 4(d+1)} bytes for its elements and
 * {@code 4 + 8(d+1)} for its boundary row, {@code 12(d+1) + 4} bytes in all, and about as much
 * again for the coboundary once it is requested. Building needs, for a while, 4 bytes per
 * comparable pair (the up-sets) and 4 bytes per cell (the prefix tree of chains).
 */
public final class OrderComplex extends TupleComplex {
    private final Poset poset;

    private OrderComplex(Poset poset, GradedCells cells, int[][] chains, Boundary boundary) {
        super(ComplexKind.ORDER, cells, chains, boundary);
        this.poset = poset;
    }

    /**
     * The order complex of {@code poset}, with at most {@link #DEFAULT_CELL_LIMIT} cells.
     *
     * @throws IllegalStateException if the poset has more chains than that
     */
    public static OrderComplex of(Poset poset) {
        return of(poset, DEFAULT_CELL_LIMIT);
    }

    /**
     * The order complex of {@code poset}. The chains are counted before any is listed, so a
     * complex over the limit fails at once.
     *
     * @param maxCells the most cells (nonempty chains) allowed
     * @throws IllegalStateException if the poset has more than {@code maxCells} nonempty chains
     */
    public static OrderComplex of(Poset poset, long maxCells) {
        ChainEnumerator enumerator = new ChainEnumerator(poset, CellLimits.validLimit(maxCells));
        Boundary boundary = enumerator.run();
        return new OrderComplex(poset, new GradedCells(enumerator.counts()), enumerator.chains(), boundary);
    }

    /** The poset whose chains these are. */
    public Poset poset() {
        return poset;
    }

    /** The chain's elements, ascending in the order (bottom first). A copy. */
    public int[] chain(int cell) {
        return vertexTuple(cell);
    }

    /** The chain's labels joined bottom first, like {@code a<b<c}. */
    @Override
    public String cellName(int cell) {
        return tupleName(cell, poset::label, "", '<', "");
    }
}
