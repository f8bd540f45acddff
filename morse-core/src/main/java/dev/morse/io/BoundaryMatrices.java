package dev.morse.io;

import dev.morse.complex.Boundary;
import dev.morse.complex.ChainComplex;
import dev.morse.complex.ComplexKind;
import dev.morse.complex.GradedCells;
import dev.morse.complex.ListedComplex;
import java.math.BigInteger;
import java.nio.file.Path;
import java.util.List;

/**
 * A chain complex given by its boundary matrices ∂_1 .. ∂_n (and optionally ∂_0, a matrix with no
 * rows whose columns are the vertices), the convention of the export command: cells are the basis
 * elements, ∂_d has a row per cell of dimension d - 1 and a column per cell of dimension d. Checks
 * that consecutive matrices fit together and that ∂_{d-1} ∂_d = 0, so that what is read is a chain
 * complex; both errors name the two files. Stateless.
 */
public final class BoundaryMatrices {
    private BoundaryMatrices() {
    }

    /**
     * Assembles the complex.
     *
     * @param matrices the matrices in order of dimension
     * @param firstDimension 0 when the first matrix is ∂_0 (no rows), 1 when it is ∂_1
     * @param names per dimension, the names of its cells in the order of the rows and columns, or
     *     null for a dimension without names (then cell j of dimension d is called {@code c<d>.<j>},
     *     j counted from 1 as in the matrices)
     * @throws InputException when the matrices do not fit together or are not a chain complex
     */
    public static ChainComplex assemble(List<BoundaryMatrix> matrices, int firstDimension, List<String[]> names) {
        if (matrices.isEmpty() || firstDimension < 0 || firstDimension > 1) {
            throw new IllegalArgumentException("one matrix or more, the first of them ∂_0 or ∂_1");
        }
        if (firstDimension == 0 && matrices.get(0).rows() != 0) {
            throw new InputException(matrices.get(0).source(), InputException.NO_LINE, "∂_0 must have no rows (a vertex"
                    + " has no boundary), but this one has " + matrices.get(0).rows());
        }
        int top = firstDimension + matrices.size() - 1;
        int[] counts = new int[top + 1];
        counts[0] = firstDimension == 0 ? matrices.get(0).columns() : matrices.get(0).rows();
        for (int k = 0; k < matrices.size(); k++) {
            int d = firstDimension + k;
            BoundaryMatrix m = matrices.get(k);
            if (d >= 1 && m.rows() != counts[d - 1]) {
                BoundaryMatrix below = matrices.get(k - 1);
                throw new InputException(m.source(), InputException.NO_LINE, "∂_" + d + " has " + m.rows()
                        + " rows, but " + name(below) + " (∂_" + (d - 1) + ") has " + counts[d - 1]
                        + " columns; the rows of ∂_" + d + " are the columns of ∂_" + (d - 1));
            }
            counts[d] = m.columns();
        }
        for (int k = 1; k < matrices.size(); k++) {
            requireComposableToZero(matrices.get(k - 1), matrices.get(k), firstDimension + k);
        }
        GradedCells cells = new GradedCells(counts);
        if (names.size() > top + 1) {
            throw new IllegalArgumentException("names for more dimensions than there are");
        }
        for (int d = 0; d < names.size(); d++) {
            if (names.get(d) != null && names.get(d).length != counts[d]) {
                throw new IllegalArgumentException("names for " + names.get(d).length + " cells of dimension " + d
                        + ", which has " + counts[d]);
            }
        }
        Boundary boundary = boundary(matrices, firstDimension, cells);
        String[][] named = names.toArray(new String[0][]);
        return new ListedComplex(ComplexKind.GIVEN, cells, boundary, cell -> {
            int d = cells.dimensionOf(cell);
            int j = cell - cells.firstCell(d);
            return d < named.length && named[d] != null ? named[d][j] : "c" + d + "." + (j + 1);
        });
    }

    private static Boundary boundary(List<BoundaryMatrix> matrices, int firstDimension, GradedCells cells) {
        int total = cells.cellCount();
        int[] offsets = new int[total + 1];
        long entries = 0;
        for (int k = 0; k < matrices.size(); k++) {
            entries += matrices.get(k).nonZeros();
        }
        if (entries > Integer.MAX_VALUE - 8) {
            throw new IllegalStateException(entries + " nonzero entries, more than one array holds");
        }
        int[] targets = new int[(int) entries];
        int[] coefficients = new int[(int) entries];
        int at = 0;
        int cell = cells.cellCount(0);
        // vertices have empty rows: their offsets stay 0
        for (int k = 0; k < matrices.size(); k++) {
            int d = firstDimension + k;
            BoundaryMatrix m = matrices.get(k);
            if (d == 0 || m.columns() == 0) {
                continue;
            }
            int below = cells.firstCell(d - 1);
            for (int c = 0; c < m.columns(); c++) {
                for (int i = m.start(c); i < m.end(c); i++) {
                    targets[at] = below + m.row(i);
                    coefficients[at] = m.value(i);
                    at++;
                }
                offsets[++cell] = at;
            }
        }
        return new Boundary(offsets, targets, coefficients);
    }

    /**
     * Checks ∂_{d-1} ∂_d = 0 column by column of ∂_d, accumulating in longs with overflow detection
     * and recomputing an overflowing entry exactly.
     */
    private static void requireComposableToZero(BoundaryMatrix lower, BoundaryMatrix upper, int d) {
        long[] sum = new long[lower.rows()];
        boolean[] overflowed = new boolean[lower.rows()];
        boolean[] listed = new boolean[lower.rows()];
        int[] touched = new int[lower.rows()];
        for (int c = 0; c < upper.columns(); c++) {
            int touchedCount = 0;
            for (int i = upper.start(c); i < upper.end(c); i++) {
                long a = upper.value(i);
                int middle = upper.row(i);
                for (int j = lower.start(middle); j < lower.end(middle); j++) {
                    int r = lower.row(j);
                    if (!listed[r]) {
                        listed[r] = true;
                        touched[touchedCount++] = r;
                    }
                    try {
                        sum[r] = Math.addExact(sum[r], a * lower.value(j));
                    } catch (ArithmeticException e) {
                        overflowed[r] = true;
                    }
                }
            }
            for (int t = 0; t < touchedCount; t++) {
                int r = touched[t];
                BigInteger value = overflowed[r] ? exactEntry(lower, upper, r, c) : BigInteger.valueOf(sum[r]);
                if (value.signum() != 0) {
                    throw new InputException(upper.source(), InputException.NO_LINE, name(lower) + " times "
                            + name(upper) + " (∂_" + (d - 1) + " ∂_" + d + ") is not zero: its entry at row " + (r + 1)
                            + ", column " + (c + 1) + " is " + value + "; the boundary of a boundary must vanish");
                }
                sum[r] = 0;
                overflowed[r] = false;
                listed[r] = false;
            }
        }
    }

    private static BigInteger exactEntry(BoundaryMatrix lower, BoundaryMatrix upper, int r, int c) {
        BigInteger total = BigInteger.ZERO;
        for (int i = upper.start(c); i < upper.end(c); i++) {
            int middle = upper.row(i);
            for (int j = lower.start(middle); j < lower.end(middle); j++) {
                if (lower.row(j) == r) {
                    total = total.add(BigInteger.valueOf(upper.value(i)).multiply(BigInteger.valueOf(lower.value(j))));
                }
            }
        }
        return total;
    }

    /** The file's own name, which is enough beside the full name at the start of the line. */
    private static String name(BoundaryMatrix m) {
        Path file = Path.of(m.source()).getFileName();
        return file == null ? m.source() : file.toString();
    }
}
