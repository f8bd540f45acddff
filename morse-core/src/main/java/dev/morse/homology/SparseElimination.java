package dev.morse.homology;

import java.util.Arrays;

/**
 * The pattern half of sparse elimination on the active submatrix: which entries are nonzero, by
 * rows (sorted column indices) and by columns (unordered row lists), and a Markowitz pivot search
 * over lines bucketed by their number of entries. Subclasses own the values, row by row in step
 * with {@link #rowColumns}, and say which entries are acceptable pivots.
 *
 * <p>Pivot rule: among acceptable entries, minimise the Markowitz cost
 * {@code (r - 1)(c - 1)}, r and c being the entry counts of its row and column (Markowitz, "The
 * elimination form of the inverse and its application to linear programming", Management Science,
 * 1957). As is common practice, the search visits rows and columns in order of increasing count
 * and stops after a few lines that hold an acceptable entry (a restricted search in the manner of
 * Zlatev, 1980), or as soon as no unvisited entry can be cheaper. A line found to hold no
 * acceptable entry is parked, and comes back only when one of its entries changes.
 *
 * <p>Memory: per active entry 4 bytes in its row and 4 in its column (plus up to half again as
 * growth slack); per line about 60 bytes of bookkeeping (array headers, lengths, and a place in
 * the search and parked bucket queues).
 */
abstract class SparseElimination {
    /** How many lines holding an acceptable pivot the search looks at before settling. */
    static final int SEARCH_LIMIT = 4;
    private static final int[] NO_ENTRIES = new int[0];

    final int rowCount;
    final int columnCount;
    /** Column indices of each row, ascending, in {@code [0, rowLength[row])}. */
    final int[][] rowColumns;
    final int[] rowLength;
    private final int[][] columnRows;
    private final int[] columnLength;
    private final CountBuckets rowSearch;
    private final CountBuckets rowParked;
    private final CountBuckets columnSearch;
    private final CountBuckets columnParked;
    /** A column being eliminated wholesale, whose row list is left stale until it is retired. */
    private int retiringColumn = -1;

    SparseElimination(int rowCount, int columnCount) {
        this.rowCount = rowCount;
        this.columnCount = columnCount;
        rowColumns = new int[rowCount][];
        rowLength = new int[rowCount];
        columnRows = new int[columnCount][];
        columnLength = new int[columnCount];
        rowSearch = new CountBuckets(rowCount, columnCount);
        rowParked = new CountBuckets(rowCount, columnCount);
        columnSearch = new CountBuckets(columnCount, rowCount);
        columnParked = new CountBuckets(columnCount, rowCount);
    }

    /** Whether the entry at {@code position} of {@code row} may serve as a pivot now. */
    abstract boolean acceptable(int row, int position);

    /**
     * Installs the initial pattern of {@code row}, taking ownership of {@code columns} (ascending,
     * distinct, capacity at least {@code length}). Call once per row, then {@link #startSearch()}.
     */
    final void initialPattern(int row, int[] columns, int length) {
        rowColumns[row] = columns;
        rowLength[row] = length;
    }

    /** Builds the column lists and the search buckets from the initial rows. */
    final void startSearch() {
        for (int r = 0; r < rowCount; r++) {
            for (int k = 0; k < rowLength[r]; k++) {
                columnLength[rowColumns[r][k]]++;
            }
        }
        for (int c = 0; c < columnCount; c++) {
            // Slack of two: a row operation often adds an entry just before the pivot row leaves.
            columnRows[c] = columnLength[c] == 0 ? NO_ENTRIES : new int[columnLength[c] + 2];
            columnLength[c] = 0;
        }
        for (int r = 0; r < rowCount; r++) {
            for (int k = 0; k < rowLength[r]; k++) {
                int c = rowColumns[r][k];
                columnRows[c][columnLength[c]++] = r;
            }
            if (rowLength[r] > 0) {
                rowSearch.add(r, rowLength[r]);
            } else {
                rowColumns[r] = NO_ENTRIES;
            }
        }
        for (int c = 0; c < columnCount; c++) {
            if (columnLength[c] > 0) {
                columnSearch.add(c, columnLength[c]);
            }
        }
    }

    /** Packs a pivot position into one long. */
    static long pivot(int row, int column) {
        return ((long) row << 32) | (column & 0xffffffffL);
    }

    /** The row of a packed pivot. */
    static int pivotRow(long pivot) {
        return (int) (pivot >>> 32);
    }

    /** The column of a packed pivot. */
    static int pivotColumn(long pivot) {
        return (int) pivot;
    }

    /**
     * An acceptable pivot of low Markowitz cost, packed by {@link #pivot}, or -1 when no active
     * entry is acceptable (then every active line is parked).
     */
    final long markowitzPivot() {
        long best = -1;
        long bestCost = Long.MAX_VALUE;
        int searched = 0;
        int k = 1;
        while (rowSearch.size() + columnSearch.size() > 0) {
            int kc = columnSearch.nextCount(k);
            int kr = rowSearch.nextCount(k);
            if (kc < 0 && kr < 0) {
                return best;
            }
            k = kc < 0 ? kr : kr < 0 ? kc : Math.min(kc, kr);
            // Every acceptable entry not yet seen lies in a row and a column of at least k entries.
            if (best >= 0 && bestCost <= (long) (k - 1) * (k - 1)) {
                return best;
            }
            for (int c = columnSearch.first(k); c >= 0; ) {
                int following = columnSearch.after(c);
                boolean found = false;
                int[] rows = columnRows[c];
                for (int t = 0; t < k; t++) {
                    int r = rows[t];
                    if (acceptable(r, position(r, c))) {
                        found = true;
                        long cost = (long) (rowLength[r] - 1) * (k - 1);
                        if (cost < bestCost) {
                            bestCost = cost;
                            best = pivot(r, c);
                        }
                    }
                }
                if (!found) {
                    columnSearch.remove(c);
                    columnParked.add(c, k);
                } else if (++searched >= SEARCH_LIMIT || bestCost == 0) {
                    return best;
                }
                c = following;
            }
            for (int r = rowSearch.first(k); r >= 0; ) {
                int following = rowSearch.after(r);
                boolean found = false;
                int[] columns = rowColumns[r];
                for (int t = 0; t < k; t++) {
                    if (acceptable(r, t)) {
                        found = true;
                        long cost = (long) (k - 1) * (columnLength[columns[t]] - 1);
                        if (cost < bestCost) {
                            bestCost = cost;
                            best = pivot(r, columns[t]);
                        }
                    }
                }
                if (!found) {
                    rowSearch.remove(r);
                    rowParked.add(r, k);
                } else if (++searched >= SEARCH_LIMIT || bestCost == 0) {
                    return best;
                }
                r = following;
            }
            k++;
        }
        return best;
    }

    /**
     * Up to {@code limit} parked lines of the fewest entries: rows when {@code rows}, else columns.
     * Used to pick a pivot once nothing is acceptable.
     */
    final int[] sparsestParked(boolean rows, int limit) {
        CountBuckets parked = rows ? rowParked : columnParked;
        int[] found = new int[Math.min(limit, parked.size())];
        int n = 0;
        for (int k = parked.nextCount(1); k >= 0; k = parked.nextCount(k + 1)) {
            for (int line = parked.first(k); line >= 0 && n < found.length; line = parked.after(line)) {
                found[n++] = line;
            }
            if (n == found.length) {
                break;
            }
        }
        return found;
    }

    /** Where {@code column} sits in {@code row}, or a negative number when the entry is zero. */
    final int position(int row, int column) {
        return Arrays.binarySearch(rowColumns[row], 0, rowLength[row], column);
    }

    /** Number of active entries of {@code column}. */
    final int columnLength(int column) {
        return columnLength[column];
    }

    /** Copies the rows of {@code column} into {@code into} (grown as needed); returns it. */
    final int[] rowsOf(int column, int[] into) {
        int n = columnLength[column];
        int[] target = into.length >= n ? into : new int[Math.max(n, 2 * into.length)];
        System.arraycopy(columnRows[column], 0, target, 0, n);
        return target;
    }

    /**
     * Announces that every entry of {@code column} except the pivot's is about to be cancelled by
     * row operations, so its row list need not be kept up to date until {@link #retire}.
     */
    final void beginRetiring(int column) {
        retiringColumn = column;
    }

    /**
     * Gives {@code row} the pattern {@code columns[0 .. length)} (ascending, distinct), updating
     * column lists and buckets. Every line touched becomes eligible for the search again. The caller
     * stores the matching values afterwards.
     */
    final void replacePattern(int row, int[] columns, int length) {
        int[] old = rowColumns[row];
        int oldLength = rowLength[row];
        int p = 0;
        int q = 0;
        while (p < oldLength || q < length) {
            int was = p < oldLength ? old[p] : Integer.MAX_VALUE;
            int now = q < length ? columns[q] : Integer.MAX_VALUE;
            if (was < now) {
                dropFromColumn(was, row);
                p++;
            } else {
                if (was > now) {
                    addToColumn(now, row);
                } else {
                    p++;
                }
                unparkColumn(now);
                q++;
            }
        }
        int[] store = old.length >= length ? old : new int[Math.max(length, old.length + (old.length >> 1))];
        System.arraycopy(columns, 0, store, 0, length);
        rowLength[row] = length;
        rowColumns[row] = store;
        if (rowParked.contains(row)) {
            rowParked.remove(row);
        }
        if (length == 0) {
            if (rowSearch.contains(row)) {
                rowSearch.remove(row);
            }
        } else if (rowSearch.contains(row)) {
            rowSearch.move(row, length);
        } else {
            rowSearch.add(row, length);
        }
    }

    /**
     * Removes the pivot's row and column from the active submatrix. The column must hold no entry
     * but the pivot's (its row list may be stale if {@link #beginRetiring} was called for it).
     */
    final void retire(int row, int column) {
        retiringColumn = -1;
        int[] columns = rowColumns[row];
        for (int t = 0; t < rowLength[row]; t++) {
            if (columns[t] != column) {
                dropFromColumn(columns[t], row);
            }
        }
        removeLine(columnSearch, columnParked, column);
        columnLength[column] = 0;
        columnRows[column] = NO_ENTRIES;
        removeLine(rowSearch, rowParked, row);
        rowLength[row] = 0;
        rowColumns[row] = NO_ENTRIES;
    }

    private static void removeLine(CountBuckets search, CountBuckets parked, int line) {
        if (search.contains(line)) {
            search.remove(line);
        } else if (parked.contains(line)) {
            parked.remove(line);
        }
    }

    private void addToColumn(int column, int row) {
        int n = columnLength[column];
        int[] rows = columnRows[column];
        if (rows.length == n) {
            rows = Arrays.copyOf(rows, Math.max(4, n + (n >> 1) + 1));
            columnRows[column] = rows;
        }
        rows[n] = row;
        columnLength[column] = n + 1;
        if (columnParked.contains(column)) {
            columnParked.move(column, n + 1);
        } else if (columnSearch.contains(column)) {
            columnSearch.move(column, n + 1);
        } else {
            // Emptied for a moment by the first half of a 2x2 row operation, refilled by the second.
            columnSearch.add(column, n + 1);
        }
    }

    private void dropFromColumn(int column, int row) {
        if (column == retiringColumn) {
            return;
        }
        int n = columnLength[column];
        int[] rows = columnRows[column];
        int t = 0;
        while (rows[t] != row) {
            t++;
        }
        rows[t] = rows[n - 1];
        columnLength[column] = n - 1;
        CountBuckets queue = columnParked.contains(column) ? columnParked : columnSearch;
        if (n == 1) {
            queue.remove(column);
        } else {
            queue.move(column, n - 1);
        }
    }

    private void unparkColumn(int column) {
        if (column != retiringColumn && columnParked.contains(column)) {
            columnParked.remove(column);
            columnSearch.add(column, columnLength[column]);
        }
    }
}
