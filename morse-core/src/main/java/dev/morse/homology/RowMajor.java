package dev.morse.homology;

/**
 * The entries of a column-stored matrix regrouped by rows, in ascending column order within each
 * row (a counting-sort transpose). Entries that the source lists twice at one position stay as
 * adjacent duplicates; callers sum them in their own arithmetic.
 *
 * <p>Memory: 12 bytes per entry plus one pair of arrays per row.
 */
record RowMajor(int[][] columns, long[][] values) {
    /** Regroups {@code matrix} by rows. */
    static RowMajor of(SparseIntegerMatrix matrix) {
        int rows = matrix.rows();
        int[] counts = new int[rows];
        for (int i = 0; i < matrix.nonZeros(); i++) {
            counts[matrix.row(i)]++;
        }
        int[][] columns = new int[rows][];
        long[][] values = new long[rows][];
        for (int r = 0; r < rows; r++) {
            columns[r] = new int[counts[r]];
            values[r] = new long[counts[r]];
            counts[r] = 0;
        }
        for (int c = 0; c < matrix.columns(); c++) {
            for (int i = matrix.start(c); i < matrix.end(c); i++) {
                int r = matrix.row(i);
                columns[r][counts[r]] = c;
                values[r][counts[r]] = matrix.value(i);
                counts[r]++;
            }
        }
        return new RowMajor(columns, values);
    }
}
