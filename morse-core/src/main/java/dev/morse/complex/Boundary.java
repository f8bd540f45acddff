package dev.morse.complex;

import dev.morse.poset.CompressedRows;

/**
 * An immutable sparse integer incidence relation between cells, in CSR form: the entries of cell
 * {@code c} are at indices {@code start(c) .. end(c) - 1}, each a target cell and a nonzero
 * coefficient. Used for boundaries (faces with incidence numbers) and coboundaries.
 *
 * <p>Memory: 4 bytes per cell plus 8 bytes per entry.
 */
public final class Boundary extends CompressedRows {
    private final int[] coefficients;

    /**
     * Takes ownership of the arrays.
     *
     * @param offsets length cells + 1, non-decreasing, starting at 0
     * @param targets target cell of each entry
     * @param coefficients nonzero coefficient of each entry
     */
    public Boundary(int[] offsets, int[] targets, int[] coefficients) {
        super(offsets, targets);
        if (targets.length != coefficients.length) {
            throw new IllegalArgumentException("inconsistent CSR arrays: one coefficient per entry is needed");
        }
        this.coefficients = coefficients;
    }

    /** Number of cells (rows). */
    public int cellCount() {
        return rowCount();
    }

    /** Coefficient of entry {@code i}. */
    public int coefficient(int i) {
        return coefficients[i];
    }

    /** The coefficient of {@code target} in the row of {@code c}, or 0 (linear scan: rows are short). */
    public int coefficient(int c, int target) {
        for (int i = offsets[c]; i < offsets[c + 1]; i++) {
            if (targets[i] == target) {
                return coefficients[i];
            }
        }
        return 0;
    }

    /** The transposed relation over {@code targetCount} cells, rows sorted by target. */
    public Boundary transpose(int targetCount) {
        int[] tTargets = new int[targets.length];
        int[] tCoefficients = new int[targets.length];
        int[] tOffsets = transpose(targetCount, (i, c, slot) -> {
            tTargets[slot] = c;
            tCoefficients[slot] = coefficients[i];
        });
        return new Boundary(tOffsets, tTargets, tCoefficients);
    }
}
