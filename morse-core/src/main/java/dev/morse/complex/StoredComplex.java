package dev.morse.complex;

/**
 * What every stored complex holds alike: its kind, its graded cells, its boundary and, computed on
 * first request, its coboundary (the transpose). Subclasses add only what makes them differ: how
 * their cells are named and what tuple of vertices each stands for.
 *
 * <p>Memory: that of the {@link Boundary}, plus as much again once the coboundary is requested.
 */
public abstract class StoredComplex implements ChainComplex {
    private final ComplexKind kind;
    private final GradedCells cells;
    private final Boundary boundary;
    private final CoboundaryCache coboundary;

    /**
     * @param kind the construction the complex stands for
     * @param cells where each dimension's cells start
     * @param boundary faces of every cell, each one dimension lower
     * @throws IllegalArgumentException when the boundary does not have one row per cell
     */
    protected StoredComplex(ComplexKind kind, GradedCells cells, Boundary boundary) {
        if (boundary.cellCount() != cells.cellCount()) {
            throw new IllegalArgumentException("the boundary has " + boundary.cellCount() + " rows for "
                    + cells.cellCount() + " cells");
        }
        this.kind = kind;
        this.cells = cells;
        this.boundary = boundary;
        this.coboundary = new CoboundaryCache(boundary);
    }

    @Override
    public final ComplexKind kind() {
        return kind;
    }

    @Override
    public final GradedCells grading() {
        return cells;
    }

    @Override
    public final Boundary boundary() {
        return boundary;
    }

    @Override
    public final Boundary coboundary() {
        return coboundary.get();
    }
}
