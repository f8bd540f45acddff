package dev.morse.inspect;

import dev.morse.complex.Boundary;
import dev.morse.complex.ChainComplex;
import java.util.ArrayList;
import java.util.List;

/**
 * What a chain complex given by its boundary matrices is apart from its homology: cells and nonzero
 * boundary entries per dimension, and whether every entry is ±1 (as in the cellular chain complex
 * of a regular CW complex). Immutable.
 *
 * @param cells cells per dimension
 * @param entries nonzero entries of ∂_d per dimension d (0 for d = 0)
 * @param unitEntries whether every entry is 1 or -1
 */
public record ChainComplexSummary(List<Integer> cells, List<Integer> entries, boolean unitEntries) {
    /** Copies. */
    public ChainComplexSummary {
        cells = List.copyOf(cells);
        entries = List.copyOf(entries);
    }

    /** Reads the summary off {@code complex}. */
    public static ChainComplexSummary of(ChainComplex complex) {
        List<Integer> cells = new ArrayList<>();
        List<Integer> entries = new ArrayList<>();
        Boundary boundary = complex.boundary();
        boolean units = true;
        for (int d = 0; d <= complex.dimension(); d++) {
            cells.add(complex.cellCount(d));
            int count = 0;
            for (int c = complex.firstCell(d); c < complex.firstCell(d + 1); c++) {
                for (int i = boundary.start(c); i < boundary.end(c); i++) {
                    count++;
                    units &= Math.abs(boundary.coefficient(i)) == 1;
                }
            }
            entries.add(count);
        }
        return new ChainComplexSummary(cells, entries, units);
    }

    /** The Euler characteristic c0 − c1 + c2 − ... */
    public long eulerCharacteristic() {
        long chi = 0;
        for (int d = 0; d < cells.size(); d++) {
            chi += d % 2 == 0 ? cells.get(d) : -(long) cells.get(d);
        }
        return chi;
    }
}
