package dev.morse.complex;

import dev.morse.poset.Adjacency;
import dev.morse.poset.Poset;

/**
 * The cellular chain complex of a CW poset: one cell per element, of dimension its height, and
 * incidence numbers ±1 on covers. The signs are found cell by cell: an edge gets +1 and -1 on its
 * two ends; for a higher cell, any two faces meeting in a common codimension-one face must have
 * opposite products of signs across it, which fixes all signs once one is chosen, because the
 * boundary of a regular cell is a connected sphere (Björner, "Posets, regular CW complexes and
 * Bruhat order", 1984; Lundell and Weingram, The topology of CW complexes, 1969, §V.3).
 *
 * <p>Memory: 8 bytes per cell for the numbering plus 8 bytes per cover in each of the boundary and
 * the coboundary.
 */
public final class CellularComplex implements ChainComplex {
    private final Poset poset;
    private final GradedCells cells;
    private final int[] elementOfCell;
    private final Boundary boundary;
    private final Boundary coboundary;

    private CellularComplex(Poset poset, GradedCells cells, int[] elementOfCell, Boundary boundary) {
        this.poset = poset;
        this.cells = cells;
        this.elementOfCell = elementOfCell;
        this.boundary = boundary;
        this.coboundary = boundary.transpose(cells.cellCount());
    }

    /**
     * The cellular complex of {@code poset}.
     *
     * @throws IllegalArgumentException if the poset is not graded or no consistent signs exist
     */
    public static CellularComplex of(Poset poset) {
        if (!poset.isGraded()) {
            throw new IllegalArgumentException("a poset that is not graded has no cellular complex");
        }
        int n = poset.size();
        int[] counts = new int[poset.maxHeight() + 1];
        for (int x = 0; x < n; x++) {
            counts[poset.height(x)]++;
        }
        GradedCells cells = new GradedCells(counts);
        int[] next = new int[counts.length];
        for (int d = 0; d < counts.length; d++) {
            next[d] = cells.firstCell(d);
        }
        int[] cellOf = new int[n];
        int[] elementOf = new int[n];
        for (int x = 0; x < n; x++) {
            int c = next[poset.height(x)]++;
            cellOf[x] = c;
            elementOf[c] = x;
        }
        Adjacency below = poset.lowerCovers();
        int[] offsets = new int[n + 1];
        int[] targets = new int[below.edgeCount()];
        int[] signs = new int[below.edgeCount()];
        int k = 0;
        // cells come in order of dimension, so the signs of every face are known before they are needed
        for (int c = 0; c < n; c++) {
            int x = elementOf[c];
            int[] faces = below.neighbours(x);
            int[] faceSigns = signsOf(poset, x, faces, (y, z) -> {
                for (int i = offsets[cellOf[y]]; i < offsets[cellOf[y] + 1]; i++) {
                    if (targets[i] == cellOf[z]) {
                        return signs[i];
                    }
                }
                throw new IllegalStateException("no cover " + z + " < " + y);
            });
            for (int i = 0; i < faces.length; i++) {
                targets[k] = cellOf[faces[i]];
                signs[k] = faceSigns[i];
                k++;
            }
            offsets[c + 1] = k;
        }
        return new CellularComplex(poset, cells, elementOf, new Boundary(offsets, targets, signs));
    }

    private static int[] signsOf(Poset poset, int x, int[] faces, java.util.function.IntBinaryOperator known) {
        int[] sign = new int[faces.length];
        if (faces.length == 0) {
            return sign;
        }
        if (poset.height(x) == 1) {
            if (faces.length != 2) {
                throw new IllegalArgumentException("edge '" + poset.label(x) + "' does not have two ends");
            }
            sign[0] = 1;
            sign[1] = -1;
            return sign;
        }
        Adjacency below = poset.lowerCovers();
        // breadth-first over the faces: a fixed sign fixes the signs of the faces meeting it
        int[] queue = new int[faces.length];
        int head = 0;
        int tail = 0;
        sign[0] = 1;
        queue[tail++] = 0;
        while (head < tail) {
            int i = queue[head++];
            int y = faces[i];
            for (int a = below.start(y); a < below.end(y); a++) {
                int z = below.target(a);
                int yz = known.applyAsInt(y, z);
                for (int j = 0; j < faces.length; j++) {
                    if (j != i && below.contains(faces[j], z)) {
                        int wanted = -sign[i] * yz * known.applyAsInt(faces[j], z);
                        if (sign[j] == 0) {
                            sign[j] = wanted;
                            queue[tail++] = j;
                        } else if (sign[j] != wanted) {
                            throw new IllegalArgumentException("no consistent incidence signs on the boundary of '"
                                    + poset.label(x) + "'");
                        }
                    }
                }
            }
        }
        if (tail < faces.length) {
            throw new IllegalArgumentException("the boundary of '" + poset.label(x) + "' is not connected");
        }
        return sign;
    }

    /** The poset element behind {@code cell}. */
    public int element(int cell) {
        return elementOfCell[cell];
    }

    @Override
    public ComplexKind kind() {
        return ComplexKind.CELLULAR;
    }

    @Override
    public int dimension() {
        return cells.dimension();
    }

    @Override
    public int cellCount() {
        return cells.cellCount();
    }

    @Override
    public int cellCount(int d) {
        return cells.cellCount(d);
    }

    @Override
    public int firstCell(int d) {
        return cells.firstCell(d);
    }

    @Override
    public int dimensionOf(int cell) {
        return cells.dimensionOf(cell);
    }

    @Override
    public Boundary boundary() {
        return boundary;
    }

    @Override
    public Boundary coboundary() {
        return coboundary;
    }

    @Override
    public String cellName(int cell) {
        return poset.label(elementOfCell[cell]);
    }
}
