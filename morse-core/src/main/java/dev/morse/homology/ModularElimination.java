package dev.morse.homology;

/**
 * Sparse Gaussian elimination over the field Z/p, for a prime {@code p < 2^31}. Every nonzero
 * entry is a unit, so the pivot is simply the entry of least Markowitz cost found by
 * {@link SparseElimination}; each pivot clears its column by row operations and then leaves the
 * active submatrix. Values are kept reduced in {@code [1, p)} as ints; a product of two of them is
 * below {@code 2^62}, so {@code x + f·y} is computed in a long without overflow and reduced once.
 *
 * <p>Memory: 8 bytes per active entry (4 column index, 4 value) plus the pattern cost of
 * {@link SparseElimination}.
 */
final class ModularElimination extends SparseElimination {
    private final long p;
    private final int[][] rowValues;
    private int[] bufferColumns = new int[16];
    private int[] bufferValues = new int[16];
    private int[] pivotColumnRows = new int[16];
    private int rank;

    /** Loads {@code matrix} reduced modulo {@code prime}; repeated positions are summed. */
    ModularElimination(SparseIntegerMatrix matrix, int prime) {
        super(matrix.rows(), matrix.columns());
        p = prime;
        rowValues = new int[rowCount][];
        RowMajor entries = RowMajor.of(matrix);
        for (int r = 0; r < rowCount; r++) {
            int[] columns = entries.columns()[r];
            long[] values = entries.values()[r];
            int[] kept = new int[columns.length];
            int n = 0;
            for (int k = 0; k < columns.length; k++) {
                long v = Math.floorMod(values[k], p);
                if (n > 0 && columns[n - 1] == columns[k]) {
                    kept[n - 1] = (int) ((kept[n - 1] + v) % p);
                } else {
                    columns[n] = columns[k];
                    kept[n++] = (int) v;
                }
            }
            int m = 0;
            for (int k = 0; k < n; k++) {
                if (kept[k] != 0) {
                    columns[m] = columns[k];
                    kept[m++] = kept[k];
                }
            }
            rowValues[r] = kept;
            initialPattern(r, columns, m);
        }
        startSearch();
    }

    /** Eliminates until the active submatrix is empty; returns the rank over Z/p. */
    int run() {
        for (long pivot = markowitzPivot(); pivot >= 0; pivot = markowitzPivot()) {
            eliminate(pivotRow(pivot), pivotColumn(pivot));
        }
        return rank;
    }

    @Override
    boolean acceptable(int row, int position) {
        return true;
    }

    private void eliminate(int r, int c) {
        long inverse = inverse(rowValues[r][position(r, c)]);
        int n = columnLength(c);
        pivotColumnRows = rowsOf(c, pivotColumnRows);
        beginRetiring(c);
        for (int t = 0; t < n; t++) {
            int i = pivotColumnRows[t];
            if (i != r) {
                long a = rowValues[i][position(i, c)];
                // Row i plus f times row r, with f = -a / pivot, cancels column c.
                addMultiple(i, (p - a) * inverse % p, r);
            }
        }
        retire(r, c);
        rowValues[r] = null;
        rank++;
    }

    private void addMultiple(int x, long f, int y) {
        int[] cx = rowColumns[x];
        int[] cy = rowColumns[y];
        int[] vx = rowValues[x];
        int[] vy = rowValues[y];
        int nx = rowLength[x];
        int ny = rowLength[y];
        if (bufferColumns.length < nx + ny) {
            bufferColumns = new int[2 * (nx + ny)];
            bufferValues = new int[2 * (nx + ny)];
        }
        int a = 0;
        int b = 0;
        int n = 0;
        while (a < nx || b < ny) {
            int ca = a < nx ? cx[a] : Integer.MAX_VALUE;
            int cb = b < ny ? cy[b] : Integer.MAX_VALUE;
            long v;
            int column;
            if (ca < cb) {
                column = ca;
                v = vx[a++];
            } else if (ca > cb) {
                column = cb;
                v = f * vy[b++] % p;
            } else {
                column = ca;
                v = (vx[a++] + f * vy[b++]) % p;
            }
            if (v != 0) {
                bufferColumns[n] = column;
                bufferValues[n++] = (int) v;
            }
        }
        replacePattern(x, bufferColumns, n);
        int[] store = vx.length >= n ? vx : new int[Math.max(n, vx.length + (vx.length >> 1))];
        System.arraycopy(bufferValues, 0, store, 0, n);
        rowValues[x] = store;
    }

    /** The inverse of {@code v} modulo p, by the extended Euclidean algorithm. */
    private long inverse(long v) {
        long oldR = v;
        long r = p;
        long oldS = 1;
        long s = 0;
        while (r != 0) {
            long q = oldR / r;
            long next = oldR - q * r;
            oldR = r;
            r = next;
            next = oldS - q * s;
            oldS = s;
            s = next;
        }
        if (oldR != 1) {
            throw new IllegalArgumentException(p + " is not a prime: " + v + " has no inverse");
        }
        return Math.floorMod(oldS, p);
    }
}
