package dev.morse.complex;

import java.util.function.IntFunction;

/**
 * A chain complex given outright by its graded cells, boundary and cell names; for small
 * complexes assembled on the way, such as the cells below one element of a poset, and for chain
 * complexes users build themselves. Memory: that of its {@link Boundary}, plus the coboundary once
 * requested.
 */
public final class ListedComplex extends StoredComplex {
    private final IntFunction<String> names;

    /**
     * @param kind the construction it stands for
     * @param cells where each dimension's cells start
     * @param boundary faces of every cell, each one dimension lower
     * @param names a short name for each cell
     */
    public ListedComplex(ComplexKind kind, GradedCells cells, Boundary boundary, IntFunction<String> names) {
        super(kind, cells, boundary);
        this.names = names;
    }

    @Override
    public String cellName(int cell) {
        return names.apply(cell);
    }
}
