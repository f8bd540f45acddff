package dev.morse.io;

import dev.morse.complex.Boundary;
import dev.morse.poset.Adjacency;
import java.util.Arrays;

/**
 * One boundary matrix as read from a file: its size and its nonzero entries column by column (a
 * column per cell of the higher dimension, a row per cell of the lower), rows ascending within a
 * column, held as a {@link Boundary} whose cells are the columns. Memory: 8 bytes per entry and 4
 * per column. Immutable.
 */
public final class BoundaryMatrix {
    private final String source;
    private final int rows;
    private final Boundary byColumn;

    private BoundaryMatrix(String source, int rows, Boundary byColumn) {
        this.source = source;
        this.rows = rows;
        this.byColumn = byColumn;
    }

    /**
     * Sorts entries given in any order into columns.
     *
     * @param lines the line of each entry, to name when a position is given twice
     * @throws InputException when a position is given twice
     */
    static BoundaryMatrix of(String source, int rows, int columns, int[] entryRows, int[] entryColumns, int[] values,
            int[] lines) {
        int n = entryRows.length;
        int[] entryIndex = new int[n];
        Arrays.setAll(entryIndex, i -> i);
        // each column's entries, by index
        Adjacency entriesOf = Adjacency.fromEdges(columns, entryColumns, entryIndex, n);
        int[] offsets = new int[columns + 1];
        int[] rowIndex = new int[n];
        int[] sortedValues = new int[n];
        for (int c = 0; c < columns; c++) {
            int from = entriesOf.start(c);
            int to = entriesOf.end(c);
            offsets[c + 1] = to;
            // rows within a column, ascending; columns are short, and the writer's are already sorted
            Integer[] slice = new Integer[to - from];
            for (int k = from; k < to; k++) {
                slice[k - from] = entriesOf.target(k);
            }
            Arrays.sort(slice, (a, b) -> a.equals(b) ? 0
                    : entryRows[a] != entryRows[b] ? Integer.compare(entryRows[a], entryRows[b]) : Integer.compare(a, b));
            for (int k = from; k < to; k++) {
                int entry = slice[k - from];
                if (k > from && entryRows[slice[k - from - 1]] == entryRows[entry]) {
                    throw new InputException(source, lines[entry], "the entry at row " + (entryRows[entry] + 1)
                            + ", column " + (c + 1) + " is given a second time (first on line "
                            + lines[slice[k - from - 1]] + ")");
                }
                rowIndex[k] = entryRows[entry];
                sortedValues[k] = values[entry];
            }
        }
        return new BoundaryMatrix(source, rows, new Boundary(offsets, rowIndex, sortedValues));
    }

    /** The file it was read from, as given. */
    public String source() {
        return source;
    }

    /** Number of rows: cells of the lower dimension. */
    public int rows() {
        return rows;
    }

    /** Number of columns: cells of the higher dimension. */
    public int columns() {
        return byColumn.cellCount();
    }

    /** Number of nonzero entries. */
    public int nonZeros() {
        return byColumn.entryCount();
    }

    /** Index of the first entry of column {@code c}. */
    public int start(int c) {
        return byColumn.start(c);
    }

    /** Index past the last entry of column {@code c}. */
    public int end(int c) {
        return byColumn.end(c);
    }

    /** The 0-based row of entry {@code i}. */
    public int row(int i) {
        return byColumn.target(i);
    }

    /** The value of entry {@code i}, never 0. */
    public int value(int i) {
        return byColumn.coefficient(i);
    }
}
