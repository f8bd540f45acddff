package dev.morse.complex;

/**
 * A finite free chain complex over the integers with a basis of cells. Cells are ints numbered by
 * dimension: the cells of dimension {@code d} are {@code firstCell(d) .. firstCell(d) + cellCount(d) - 1}.
 * The boundary of a cell of dimension {@code d} is a sum of cells of dimension {@code d - 1}.
 * Implementations are immutable.
 */
public interface ChainComplex {
    /** Which construction this is. */
    ComplexKind kind();

    /** Where each dimension's cells start. */
    GradedCells grading();

    /** The top dimension, or -1 when there are no cells. */
    default int dimension() {
        return grading().dimension();
    }

    /** Total number of cells. */
    default int cellCount() {
        return grading().cellCount();
    }

    /** Number of cells of dimension {@code d}; 0 outside {@code 0..dimension()}. */
    default int cellCount(int d) {
        return grading().cellCount(d);
    }

    /** The first cell of dimension {@code d}, for {@code 0 <= d <= dimension() + 1}. */
    default int firstCell(int d) {
        return grading().firstCell(d);
    }

    /** The dimension of {@code cell}. */
    default int dimensionOf(int cell) {
        return grading().dimensionOf(cell);
    }

    /** For every cell, its faces with incidence numbers. */
    Boundary boundary();

    /** For every cell, the cells having it as a face, with incidence numbers. */
    Boundary coboundary();

    /** A short human-readable name of {@code cell}, for reports and pictures. */
    String cellName(int cell);

    /**
     * The vertices of {@code cell} as a tuple whose lexicographic order is the order that
     * lexicographic matchings follow: the chain's elements for an order complex, the vertex ids for a
     * simplex. By default a cell is its own single vertex.
     */
    default int[] vertexTuple(int cell) {
        return new int[] {cell};
    }

    /** Cells per dimension, {@code [f0, f1, ...]}. */
    default int[] cellCounts() {
        int[] counts = new int[dimension() + 1];
        for (int d = 0; d <= dimension(); d++) {
            counts[d] = cellCount(d);
        }
        return counts;
    }
}
