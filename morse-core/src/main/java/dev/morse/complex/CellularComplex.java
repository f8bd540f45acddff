package dev.morse.complex;

import dev.morse.poset.Adjacency;
import dev.morse.poset.Poset;

/**
 * The cellular chain complex of a CW poset: one cell per element, of dimension its height, with
 * boundary {@code ∂x = Σ ε(x, y) y} over the elements y covered by x, where the incidence signs
 * ε = ±1 are those found by the CW poset check. When the poset is the face poset of a regular CW
 * complex this computes the homology of that complex, which is that of the order complex (its
 * barycentric subdivision; Björner 1984), with one cell per element instead of one per chain.
 * Cells are numbered by dimension, then by element id.
 *
 * <p>Memory: 12 bytes per cell (element, cell and boundary offset) plus 8 bytes per cover, and
 * as much again for the coboundary once requested; the poset itself is shared.
 */
public final class CellularComplex extends StoredComplex {
    private final Poset poset;
    private final int[] elementOfCell;
    private final int[] cellOfElement;

    private CellularComplex(Poset poset, GradedCells cells, int[] elementOfCell, int[] cellOfElement, Boundary boundary) {
        super(ComplexKind.CELLULAR, cells, boundary);
        this.poset = poset;
        this.elementOfCell = elementOfCell;
        this.cellOfElement = cellOfElement;
    }

    /**
     * Builds the cellular complex of a CW poset from incidence signs already found (by
     * {@code dev.morse.cw.CwPosetCheck}), indexed like the lower-cover entries of the poset.
     * The signs are trusted: this does not check that they square the boundary to zero.
     */
    public static CellularComplex withIncidences(Poset poset, byte[] coverSigns) {
        int n = poset.size();
        int top = poset.maxHeight();
        int[] counts = new int[top + 1];
        for (int x = 0; x < n; x++) {
            counts[poset.height(x)]++;
        }
        GradedCells cells = new GradedCells(counts);
        int[] next = new int[top + 1];
        for (int d = 0; d <= top; d++) {
            next[d] = cells.firstCell(d);
        }
        int[] elementOfCell = new int[n];
        int[] cellOfElement = new int[n];
        for (int x = 0; x < n; x++) {
            int c = next[poset.height(x)]++;
            elementOfCell[c] = x;
            cellOfElement[x] = c;
        }
        Adjacency lower = poset.lowerCovers();
        int[] offsets = new int[n + 1];
        int[] targets = new int[poset.coverCount()];
        int[] coefficients = new int[poset.coverCount()];
        int e = 0;
        for (int c = 0; c < n; c++) {
            int x = elementOfCell[c];
            for (int i = lower.start(x); i < lower.end(x); i++) {
                targets[e] = cellOfElement[lower.target(i)];
                coefficients[e] = coverSigns[i];
                e++;
            }
            offsets[c + 1] = e;
        }
        return new CellularComplex(poset, cells, elementOfCell, cellOfElement, new Boundary(offsets, targets, coefficients));
    }

    /** The CW poset. */
    public Poset poset() {
        return poset;
    }

    /** The poset element of {@code cell}. */
    public int element(int cell) {
        return elementOfCell[cell];
    }

    /** The cell of poset element {@code element}. */
    public int cell(int element) {
        return cellOfElement[element];
    }

    /** The element's label. */
    @Override
    public String cellName(int cell) {
        return poset.label(elementOfCell[cell]);
    }

    /** The cell's element alone: cells are ordered as the poset lists its elements. */
    @Override
    public int[] vertexTuple(int cell) {
        return new int[] {elementOfCell[cell]};
    }
}
