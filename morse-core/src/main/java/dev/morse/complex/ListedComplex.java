package dev.morse.complex;

import java.util.function.IntFunction;

/**
 * A chain complex given outright by its graded cells, boundary and cell names; for small
 * complexes assembled on the way, such as the cells below one element of a poset, and for chain
 * complexes users build themselves. Memory: that of its {@link Boundary}, plus the coboundary once
 * requested.
 */
public final class ListedComplex implements ChainComplex {
    private final ComplexKind kind;
    private final GradedCells cells;
    private final Boundary boundary;
    private final CoboundaryCache coboundary;
    private final IntFunction<String> names;

    /**
     * @param kind the construction it stands for
     * @param cells where each dimension's cells start
     * @param boundary faces of every cell, each one dimension lower
     * @param names a short name for each cell
     */
    public ListedComplex(ComplexKind kind, GradedCells cells, Boundary boundary, IntFunction<String> names) {
        if (boundary.cellCount() != cells.cellCount()) {
            throw new IllegalArgumentException("the boundary has " + boundary.cellCount() + " rows for "
                    + cells.cellCount() + " cells");
        }
        this.kind = kind;
        this.cells = cells;
        this.boundary = boundary;
        this.coboundary = new CoboundaryCache(boundary);
        this.names = names;
    }

    @Override
    public ComplexKind kind() {
        return kind;
    }

    @Override
    public GradedCells grading() {
        return cells;
    }

    @Override
    public Boundary boundary() {
        return boundary;
    }

    @Override
    public Boundary coboundary() {
        return coboundary.get();
    }

    @Override
    public String cellName(int cell) {
        return names.apply(cell);
    }
}
