package dev.morse.matching;

import dev.morse.complex.ChainComplex;
import java.util.Arrays;

/**
 * A partial pairing of cells of a chain complex: each matched cell has a partner one dimension above
 * or below; unmatched cells are critical. Immutable.
 *
 * <p>Memory: 4 bytes per cell.
 */
public final class Matching {
    /** The partner of a critical cell. */
    public static final int CRITICAL = -1;

    private final int[] mates;

    private Matching(int[] mates) {
        this.mates = mates;
    }

    /**
     * Wraps a partner array: {@code mates[c]} is the partner of {@code c} or {@link #CRITICAL}.
     * Copies; the verifier checks the content.
     */
    public static Matching of(int[] mates) {
        return new Matching(mates.clone());
    }

    /** Takes ownership of {@code mates} without copying; for heuristics in this package. */
    static Matching adopt(int[] mates) {
        return new Matching(mates);
    }

    /** The matching with every cell critical. */
    public static Matching empty(int cellCount) {
        int[] mates = new int[cellCount];
        Arrays.fill(mates, CRITICAL);
        return new Matching(mates);
    }

    /** Number of cells the matching is defined on. */
    public int cellCount() {
        return mates.length;
    }

    /** The partner of {@code cell}, or {@link #CRITICAL}. */
    public int mate(int cell) {
        return mates[cell];
    }

    /** Whether {@code cell} is unmatched. */
    public boolean isCritical(int cell) {
        return mates[cell] == CRITICAL;
    }

    /** Number of matched pairs. */
    public int pairCount() {
        int matched = 0;
        for (int m : mates) {
            if (m != CRITICAL) {
                matched++;
            }
        }
        return matched / 2;
    }

    /** Critical cells per dimension of {@code complex}, {@code [m0, m1, ...]}. */
    public int[] criticalCounts(ChainComplex complex) {
        int[] counts = new int[complex.dimension() + 1];
        for (int d = 0; d <= complex.dimension(); d++) {
            int first = complex.firstCell(d);
            for (int c = first; c < first + complex.cellCount(d); c++) {
                if (mates[c] == CRITICAL) {
                    counts[d]++;
                }
            }
        }
        return counts;
    }

    /** The critical cells of dimension {@code d}, ascending. */
    public int[] criticalCells(ChainComplex complex, int d) {
        int first = complex.firstCell(d);
        int end = first + complex.cellCount(d);
        int count = 0;
        for (int c = first; c < end; c++) {
            if (mates[c] == CRITICAL) {
                count++;
            }
        }
        int[] cells = new int[count];
        int k = 0;
        for (int c = first; c < end; c++) {
            if (mates[c] == CRITICAL) {
                cells[k++] = c;
            }
        }
        return cells;
    }
}
