package dev.morse.homology;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Sparse elimination of an integer matrix, in exact arithmetic, in one of four modes that share
 * the machinery of {@link SparseElimination}:
 * <ul>
 *   <li>{@link Mode#UNITS}: pivots ±1 only, chosen by the Markowitz rule; stops when none is
 *       left. Each pivot clears its column by adding integer multiples of its row to the other
 *       rows, a unimodular change that needs no column operation: once the column is clear the
 *       row can be cleared by column operations that touch nothing else. Entries only grow by
 *       addition. Boundary matrices of complexes are almost wholly eliminated this way.</li>
 *   <li>{@link Mode#RANK}: as above, then pivots of any value; a pivot p clears an entry a by
 *       {@code row := (p/g)·row - (a/g)·pivot row}, {@code g = gcd(p, a)}. Every row produced is
 *       divided by the gcd of its entries. This keeps the row space over Q, hence the rank, and
 *       bounds the entries: each active row is a rational multiple of a row of the Schur
 *       complement, whose entries are ratios of minors of the input (Sylvester's identity), so
 *       the primitive integer row divides a vector of minors and no entry exceeds the Hadamard
 *       bound of the input's minors.</li>
 *   <li>{@link Mode#DETERMINANT}: rank mode that also tracks each row's rational scale, so that
 *       the product of the true (Schur complement) pivots, a nonzero r×r minor D of the input,
 *       is known at the end (r being the rank).</li>
 *   <li>{@link Mode#SMITH_MODULO}: unimodular elimination over Z/M: unit pivots, then Euclidean
 *       2×2 steps (Smith, "On systems of linear indeterminate equations and congruences",
 *       Phil. Trans. R. Soc. 1861) that make a pivot of least absolute value divide its row and
 *       column, each step strictly lowering it; every entry is kept as its residue in
 *       {@code (-M/2, M/2]}. Plain Euclidean elimination over Z lets entry lengths double with
 *       every pivot; modulo a multiple M of the determinantal divisor they stay below M
 *       (common practice since Domich, Kannan and Trotter, Math. Oper. Res. 1987).</li>
 * </ul>
 *
 * <p>Arithmetic: each row keeps its values as {@code long} (never {@link Long#MIN_VALUE}, so
 * negation and absolute value are safe) or, once they outgrow that, as {@link BigInteger}.
 * Every long operation is checked ({@link Math#multiplyExact}, {@link Math#addExact}); on overflow
 * that one row operation is redone from its unchanged inputs in BigInteger, and the row returns to
 * longs when its values fit again. An overflow costs one slow operation, never a wrong entry, and
 * the rest of the matrix stays on the fast path.
 *
 * <p>Memory: about 12 bytes per active entry in long rows (4 column index, 8 value), plus the
 * pattern cost of {@link SparseElimination}; BigInteger rows cost one object per entry.
 */
final class IntegerElimination extends SparseElimination {
    /** What the elimination may do and what it records; see the class comment. */
    enum Mode { UNITS, RANK, DETERMINANT, SMITH_MODULO }

    private static final BigInteger MINUS_ONE = BigInteger.ONE.negate();

    private Mode mode;
    private BigInteger modulus;
    /** The modulus when below 2^62, else 0. */
    private long smallModulus;
    private final long[][] rowValues;
    private final BigInteger[][] rowBig;
    /** Rational scale of each row relative to the Schur complement (DETERMINANT mode; null = 1). */
    private BigInteger[] scaleNumerator;
    private BigInteger[] scaleDenominator;
    /** Factors of the product of pivots, multiplied out at the end by a balanced product tree. */
    private final List<BigInteger> determinantNumerator = new ArrayList<>();
    private final List<BigInteger> determinantDenominator = new ArrayList<>();
    private final RowBuffer first = new RowBuffer();
    private final RowBuffer second = new RowBuffer();
    private int[] pivotColumnRows = new int[16];
    private int[] otherColumnRows = new int[16];
    private int[] seen;
    private int seenMark;
    private int pivotCount;
    private int overflowRecoveries;
    private final List<BigInteger> nonUnitPivots = new ArrayList<>();

    /**
     * Loads {@code matrix} to be eliminated in {@code mode} ({@link Mode#UNITS} or
     * {@link Mode#RANK}). Entries listed twice at one position are summed.
     */
    IntegerElimination(SparseIntegerMatrix matrix, Mode mode) {
        super(matrix.rows(), matrix.columns());
        this.mode = mode;
        rowValues = new long[rowCount][];
        rowBig = new BigInteger[rowCount][];
        RowMajor entries = RowMajor.of(matrix);
        for (int r = 0; r < rowCount; r++) {
            loadRow(r, entries.columns()[r], entries.values()[r]);
        }
        startSearch();
    }

    /** A copy of the active submatrix of {@code source}, to be eliminated in DETERMINANT mode. */
    private IntegerElimination(IntegerElimination source) {
        super(source.rowCount, source.columnCount);
        mode = Mode.DETERMINANT;
        rowValues = new long[rowCount][];
        rowBig = new BigInteger[rowCount][];
        scaleNumerator = new BigInteger[rowCount];
        scaleDenominator = new BigInteger[rowCount];
        for (int r = 0; r < rowCount; r++) {
            int n = source.rowLength[r];
            initialPattern(r, Arrays.copyOf(source.rowColumns[r], n), n);
            if (source.rowBig[r] != null) {
                rowBig[r] = Arrays.copyOf(source.rowBig[r], n);
            } else {
                rowValues[r] = n == 0 ? new long[0] : Arrays.copyOf(source.rowValues[r], n);
            }
        }
        startSearch();
    }

    /** An independent copy of what is left, for {@link Mode#DETERMINANT} elimination. */
    IntegerElimination copyForDeterminant() {
        return new IntegerElimination(this);
    }

    /**
     * Switches to {@link Mode#SMITH_MODULO} with modulus {@code m} (even, at least 2) and reduces
     * what is left; call {@link #run()} to continue.
     */
    IntegerElimination continueModulo(BigInteger m) {
        mode = Mode.SMITH_MODULO;
        modulus = m;
        smallModulus = m.bitLength() < 63 ? m.longValueExact() : 0;
        for (int r = 0; r < rowCount; r++) {
            if (rowLength[r] > 0) {
                copyRow(first, r);
                commit(r, first);
            }
        }
        return this;
    }

    private void loadRow(int r, int[] columns, long[] values) {
        boolean plain = true;
        for (int k = 0; k < columns.length; k++) {
            if (values[k] == Long.MIN_VALUE || (k > 0 && columns[k] == columns[k - 1])) {
                plain = false;
                break;
            }
        }
        if (plain) {
            rowValues[r] = values;
            initialPattern(r, columns, columns.length);
            return;
        }
        // Sum repeated positions exactly; keep BigInteger only if the sums need it.
        int n = 0;
        BigInteger[] sums = new BigInteger[columns.length];
        int[] kept = new int[columns.length];
        for (int k = 0; k < columns.length; k++) {
            BigInteger v = BigInteger.valueOf(values[k]);
            if (n > 0 && kept[n - 1] == columns[k]) {
                sums[n - 1] = sums[n - 1].add(v);
            } else {
                kept[n] = columns[k];
                sums[n++] = v;
            }
        }
        int m = 0;
        boolean fits = true;
        for (int k = 0; k < n; k++) {
            if (sums[k].signum() != 0) {
                kept[m] = kept[k];
                sums[m++] = sums[k];
                fits &= fitsRowValue(sums[k]);
            }
        }
        if (fits) {
            long[] small = new long[m];
            for (int k = 0; k < m; k++) {
                small[k] = sums[k].longValue();
            }
            rowValues[r] = small;
        } else {
            rowValues[r] = new long[0];
            rowBig[r] = Arrays.copyOf(sums, m);
        }
        initialPattern(r, kept, m);
    }

    /** Eliminates until the mode allows no further pivot. */
    IntegerElimination run() {
        while (true) {
            long pivot = markowitzPivot();
            if (pivot < 0) {
                pivot = mode == Mode.UNITS ? -1 : smallestParkedPivot();
                if (pivot < 0) {
                    return this;
                }
            }
            int r = pivotRow(pivot);
            int c = pivotColumn(pivot);
            int position = position(r, c);
            if (isUnit(r, position)) {
                eliminateWithUnit(r, c, position);
            } else if (mode == Mode.SMITH_MODULO) {
                eliminateEuclidean(r, c);
            } else {
                eliminateScaled(r, c);
            }
        }
    }

    /** Number of pivots so far: in the rank modes, at the end, the rank. */
    int pivotCount() {
        return pivotCount;
    }

    /** Absolute values of the pivots other than ±1 taken in SMITH_MODULO mode. */
    List<BigInteger> nonUnitPivots() {
        return nonUnitPivots;
    }

    /**
     * After DETERMINANT elimination: the product of the Schur complement pivots, which is up to
     * sign the r×r minor of the input on the pivot rows and columns.
     *
     * @throws IllegalStateException if the tracked product is not an integer (an internal error)
     */
    BigInteger pivotDeterminant() {
        BigInteger[] qr = product(determinantNumerator, 0, determinantNumerator.size())
                .divideAndRemainder(product(determinantDenominator, 0, determinantDenominator.size()));
        if (qr[1].signum() != 0) {
            throw new IllegalStateException("product of pivots is not an integer");
        }
        return qr[0];
    }

    /** The product of {@code factors[from, to)}, halving recursively to keep operands balanced. */
    private static BigInteger product(List<BigInteger> factors, int from, int to) {
        if (to - from <= 8) {
            BigInteger p = BigInteger.ONE;
            for (int i = from; i < to; i++) {
                p = p.multiply(factors.get(i));
            }
            return p;
        }
        int middle = (from + to) >>> 1;
        return product(factors, from, middle).multiply(product(factors, middle, to));
    }

    /** How many row operations overflowed long and were redone in BigInteger. */
    int overflowRecoveries() {
        return overflowRecoveries;
    }

    /** Number of rows that still have entries. */
    int activeRows() {
        int n = 0;
        for (int r = 0; r < rowCount; r++) {
            n += rowLength[r] > 0 ? 1 : 0;
        }
        return n;
    }

    /** Number of columns that still have entries. */
    int activeColumns() {
        int n = 0;
        for (int c = 0; c < columnCount; c++) {
            n += columnLength(c) > 0 ? 1 : 0;
        }
        return n;
    }

    @Override
    boolean acceptable(int row, int position) {
        return isUnit(row, position);
    }

    private boolean isUnit(int row, int position) {
        BigInteger[] big = rowBig[row];
        if (big != null) {
            return BigInteger.ONE.equals(big[position]) || MINUS_ONE.equals(big[position]);
        }
        long v = rowValues[row][position];
        return v == 1 || v == -1;
    }

    private BigInteger value(int row, int position) {
        BigInteger[] big = rowBig[row];
        return big != null ? big[position] : BigInteger.valueOf(rowValues[row][position]);
    }

    private void eliminateWithUnit(int r, int c, int position) {
        long unit = rowBig[r] != null ? rowBig[r][position].longValue() : rowValues[r][position];
        int n = columnLength(c);
        pivotColumnRows = rowsOf(c, pivotColumnRows);
        beginRetiring(c);
        for (int t = 0; t < n; t++) {
            int i = pivotColumnRows[t];
            if (i == r) {
                continue;
            }
            int at = position(i, c);
            // Row i minus (a / unit) times row r, and 1 / unit = unit.
            if (rowBig[i] == null) {
                combine(first, i, 1, r, -rowValues[i][at] * unit);
            } else {
                BigInteger a = rowBig[i][at];
                combine(first, i, BigInteger.ONE, r, unit == 1 ? a.negate() : a);
            }
            commit(i, first);
        }
        retirePivot(r, c);
    }

    private void eliminateEuclidean(int r, int c) {
        while (true) {
            int n = columnLength(c);
            pivotColumnRows = rowsOf(c, pivotColumnRows);
            for (int t = 0; t < n; t++) {
                int i = pivotColumnRows[t];
                int at = i == r ? -1 : position(i, c);
                if (at < 0) {
                    continue;
                }
                BigInteger a = value(i, at);
                BigInteger p = value(r, position(r, c));
                BigInteger[] quotient = a.divideAndRemainder(p);
                if (quotient[1].signum() == 0) {
                    combine(first, i, BigInteger.ONE, r, quotient[0].negate());
                    commit(i, first);
                } else {
                    // [s t; -a/g p/g] has determinant 1 and sends (p, a) to (g, 0).
                    BigInteger[] gst = extendedGcd(p, a);
                    BigInteger g = gst[0];
                    combine(first, r, gst[1], i, gst[2]);
                    combine(second, r, a.divide(g).negate(), i, p.divide(g));
                    commit(r, first);
                    commit(i, second);
                }
            }
            int pivotAt = position(r, c);
            BigInteger p = value(r, pivotAt);
            int j = -1;
            BigInteger b = null;
            for (int k = 0; k < rowLength[r]; k++) {
                if (k != pivotAt) {
                    BigInteger v = value(r, k);
                    if (v.remainder(p).signum() != 0) {
                        j = rowColumns[r][k];
                        b = v;
                        break;
                    }
                }
            }
            if (j < 0) {
                // Column c holds only p, which divides the rest of row r: column operations clear
                // the row without touching any other row.
                retirePivot(r, c);
                return;
            }
            BigInteger[] gst = extendedGcd(p, b);
            BigInteger g = gst[0];
            combineColumns(c, j, gst[1], gst[2], b.divide(g).negate(), p.divide(g));
        }
    }

    private void eliminateScaled(int r, int c) {
        BigInteger p = value(r, position(r, c));
        int n = columnLength(c);
        pivotColumnRows = rowsOf(c, pivotColumnRows);
        beginRetiring(c);
        for (int t = 0; t < n; t++) {
            int i = pivotColumnRows[t];
            if (i == r) {
                continue;
            }
            BigInteger a = value(i, position(i, c));
            BigInteger g = a.gcd(p);
            BigInteger multiplier = p.divide(g);
            combine(first, i, multiplier, r, a.divide(g).negate());
            if (scaleNumerator != null) {
                rescale(i, multiplier, BigInteger.ONE);
            }
            commit(i, first);
        }
        retirePivot(r, c);
    }

    /** The pivot of least absolute value, then least Markowitz cost, in the sparsest parked lines. */
    private long smallestParkedPivot() {
        long best = -1;
        BigInteger bestSize = null;
        long bestCost = Long.MAX_VALUE;
        for (int r : sparsestParked(true, SEARCH_LIMIT)) {
            for (int k = 0; k < rowLength[r]; k++) {
                BigInteger size = value(r, k).abs();
                long cost = (long) (rowLength[r] - 1) * (columnLength(rowColumns[r][k]) - 1);
                if (bestSize == null || size.compareTo(bestSize) < 0 || (size.equals(bestSize) && cost < bestCost)) {
                    best = pivot(r, rowColumns[r][k]);
                    bestSize = size;
                    bestCost = cost;
                }
            }
        }
        for (int c : sparsestParked(false, SEARCH_LIMIT)) {
            int n = columnLength(c);
            otherColumnRows = rowsOf(c, otherColumnRows);
            for (int t = 0; t < n; t++) {
                int r = otherColumnRows[t];
                BigInteger size = value(r, position(r, c)).abs();
                long cost = (long) (rowLength[r] - 1) * (n - 1);
                if (bestSize == null || size.compareTo(bestSize) < 0 || (size.equals(bestSize) && cost < bestCost)) {
                    best = pivot(r, c);
                    bestSize = size;
                    bestCost = cost;
                }
            }
        }
        return best;
    }

    private void retirePivot(int r, int c) {
        if (mode == Mode.DETERMINANT) {
            // The Schur complement pivot is the stored value divided by the row's scale.
            BigInteger p = value(r, position(r, c));
            if (!p.equals(BigInteger.ONE)) {
                determinantNumerator.add(p);
            }
            if (scaleNumerator[r] != null) {
                determinantNumerator.add(scaleDenominator[r]);
                determinantDenominator.add(scaleNumerator[r]);
            }
        } else if (mode == Mode.SMITH_MODULO) {
            BigInteger p = value(r, position(r, c)).abs();
            if (p.compareTo(BigInteger.ONE) > 0) {
                nonUnitPivots.add(p);
            }
        }
        retire(r, c);
        rowValues[r] = null;
        rowBig[r] = null;
        pivotCount++;
    }

    private static BigInteger scale(BigInteger[] scales, int row) {
        return scales[row] == null ? BigInteger.ONE : scales[row];
    }

    /** Multiplies the tracked scale of {@code row} by {@code times / by}, in lowest terms. */
    private void rescale(int row, BigInteger times, BigInteger by) {
        BigInteger numerator = scale(scaleNumerator, row).multiply(times);
        BigInteger denominator = scale(scaleDenominator, row).multiply(by);
        BigInteger g = numerator.gcd(denominator);
        scaleNumerator[row] = numerator.divide(g);
        scaleDenominator[row] = denominator.divide(g);
    }

    /**
     * Columns c and j become {@code s·c + t·j} and {@code u·c + v·j} (a unimodular change when
     * {@code sv - tu = 1}); touches the rows meeting either column.
     */
    private void combineColumns(int c, int j, BigInteger s, BigInteger t, BigInteger u, BigInteger v) {
        if (seen == null) {
            seen = new int[rowCount];
        }
        seenMark++;
        int nc = columnLength(c);
        pivotColumnRows = rowsOf(c, pivotColumnRows);
        int nj = columnLength(j);
        otherColumnRows = rowsOf(j, otherColumnRows);
        int[] touched = new int[nc + nj];
        int n = 0;
        for (int k = 0; k < nc + nj; k++) {
            int i = k < nc ? pivotColumnRows[k] : otherColumnRows[k - nc];
            if (seen[i] != seenMark) {
                seen[i] = seenMark;
                touched[n++] = i;
            }
        }
        for (int k = 0; k < n; k++) {
            int i = touched[k];
            int pc = position(i, c);
            int pj = position(i, j);
            BigInteger x = pc >= 0 ? value(i, pc) : BigInteger.ZERO;
            BigInteger y = pj >= 0 ? value(i, pj) : BigInteger.ZERO;
            rewriteTwo(first, i, c, s.multiply(x).add(t.multiply(y)), j, u.multiply(x).add(v.multiply(y)));
            commit(i, first);
        }
    }

    /** Row {@code row} with its entries in columns {@code c1} and {@code c2} replaced. */
    private void rewriteTwo(RowBuffer out, int row, int c1, BigInteger v1, int c2, BigInteger v2) {
        if (c1 > c2) {
            rewriteTwo(out, row, c2, v2, c1, v1);
            return;
        }
        boolean big = rowBig[row] != null || !fitsRowValue(v1) || !fitsRowValue(v2);
        int n = rowLength[row];
        int[] columns = rowColumns[row];
        out.reset(n + 2, big);
        boolean placed1 = false;
        boolean placed2 = false;
        for (int k = 0; k <= n; k++) {
            int column = k < n ? columns[k] : Integer.MAX_VALUE;
            if (!placed1 && c1 <= column) {
                out.appendIfNonZero(c1, v1);
                placed1 = true;
            }
            if (!placed2 && c2 <= column) {
                out.appendIfNonZero(c2, v2);
                placed2 = true;
            }
            if (k < n && column != c1 && column != c2) {
                if (big) {
                    out.appendIfNonZero(column, value(row, k));
                } else {
                    out.append(column, rowValues[row][k]);
                }
            }
        }
    }

    /** {@code out = xa·row x + ya·row y}; on long overflow redone wholly in BigInteger. */
    private void combine(RowBuffer out, int x, long xa, int y, long ya) {
        if (rowBig[x] == null && rowBig[y] == null) {
            try {
                combineLong(out, x, xa, y, ya);
                return;
            } catch (ArithmeticException overflow) {
                // The inputs are untouched: fall through to the exact computation.
                overflowRecoveries++;
            }
        }
        combineBig(out, x, BigInteger.valueOf(xa), y, BigInteger.valueOf(ya));
    }

    private void combine(RowBuffer out, int x, BigInteger xa, int y, BigInteger ya) {
        if (xa.bitLength() < 64 && ya.bitLength() < 64) {
            combine(out, x, xa.longValue(), y, ya.longValue());
        } else {
            combineBig(out, x, xa, y, ya);
        }
    }

    private void combineLong(RowBuffer out, int x, long xa, int y, long ya) {
        int[] cx = rowColumns[x];
        int[] cy = rowColumns[y];
        long[] vx = rowValues[x];
        long[] vy = rowValues[y];
        int nx = rowLength[x];
        int ny = rowLength[y];
        out.reset(nx + ny, false);
        int[] oc = out.columns;
        long[] ov = out.values;
        int p = 0;
        int q = 0;
        int n = 0;
        while (p < nx || q < ny) {
            int a = p < nx ? cx[p] : Integer.MAX_VALUE;
            int b = q < ny ? cy[q] : Integer.MAX_VALUE;
            long v;
            int column;
            if (a < b) {
                column = a;
                v = Math.multiplyExact(xa, vx[p++]);
            } else if (a > b) {
                column = b;
                v = Math.multiplyExact(ya, vy[q++]);
            } else {
                column = a;
                v = Math.addExact(Math.multiplyExact(xa, vx[p++]), Math.multiplyExact(ya, vy[q++]));
            }
            if (v != 0) {
                if (v == Long.MIN_VALUE) {
                    throw new ArithmeticException("long overflow");
                }
                oc[n] = column;
                ov[n++] = v;
            }
        }
        out.length = n;
    }

    private void combineBig(RowBuffer out, int x, BigInteger xa, int y, BigInteger ya) {
        int[] cx = rowColumns[x];
        int[] cy = rowColumns[y];
        int nx = rowLength[x];
        int ny = rowLength[y];
        out.reset(nx + ny, true);
        int p = 0;
        int q = 0;
        while (p < nx || q < ny) {
            int a = p < nx ? cx[p] : Integer.MAX_VALUE;
            int b = q < ny ? cy[q] : Integer.MAX_VALUE;
            if (a < b) {
                out.appendIfNonZero(a, xa.multiply(value(x, p++)));
            } else if (a > b) {
                out.appendIfNonZero(b, ya.multiply(value(y, q++)));
            } else {
                out.appendIfNonZero(a, xa.multiply(value(x, p++)).add(ya.multiply(value(y, q++))));
            }
        }
    }

    /** Copies the values of {@code row} into {@code out}. */
    private void copyRow(RowBuffer out, int row) {
        int n = rowLength[row];
        boolean big = rowBig[row] != null;
        out.reset(n, big);
        System.arraycopy(rowColumns[row], 0, out.columns, 0, n);
        if (big) {
            System.arraycopy(rowBig[row], 0, out.big, 0, n);
        } else {
            System.arraycopy(rowValues[row], 0, out.values, 0, n);
        }
        out.length = n;
    }

    /**
     * Makes {@code buffer} the content of {@code row}: reduced modulo M in SMITH_MODULO mode, made
     * primitive in the rank modes, and back in longs when the values allow.
     */
    private void commit(int row, RowBuffer buffer) {
        if (mode == Mode.SMITH_MODULO) {
            reduce(buffer);
        } else if (mode != Mode.UNITS) {
            BigInteger content = buffer.divideByContent();
            if (content != null && scaleNumerator != null) {
                rescale(row, BigInteger.ONE, content);
            }
        }
        replacePattern(row, buffer.columns, buffer.length);
        int n = buffer.length;
        if (buffer.isBig) {
            boolean fits = true;
            for (int k = 0; k < n && fits; k++) {
                fits = fitsRowValue(buffer.big[k]);
            }
            if (!fits) {
                rowBig[row] = Arrays.copyOf(buffer.big, n);
                return;
            }
            long[] store = longStore(row, n);
            for (int k = 0; k < n; k++) {
                store[k] = buffer.big[k].longValue();
            }
        } else {
            System.arraycopy(buffer.values, 0, longStore(row, n), 0, n);
        }
        rowBig[row] = null;
    }

    /** Replaces each value by its residue in {@code (-M/2, M/2]}, dropping those that vanish. */
    private void reduce(RowBuffer buffer) {
        int n = 0;
        if (!buffer.isBig && smallModulus > 0) {
            long half = smallModulus >> 1;
            for (int k = 0; k < buffer.length; k++) {
                long v = Math.floorMod(buffer.values[k], smallModulus);
                v = v > half ? v - smallModulus : v;
                if (v != 0) {
                    buffer.columns[n] = buffer.columns[k];
                    buffer.values[n++] = v;
                }
            }
        } else {
            if (!buffer.isBig) {
                if (modulus.bitLength() > 65) {
                    // Every long is already below M/2 in absolute value.
                    return;
                }
                buffer.toBig();
            }
            BigInteger half = modulus.shiftRight(1);
            for (int k = 0; k < buffer.length; k++) {
                BigInteger v = buffer.big[k].mod(modulus);
                v = v.compareTo(half) > 0 ? v.subtract(modulus) : v;
                if (v.signum() != 0) {
                    buffer.columns[n] = buffer.columns[k];
                    buffer.big[n++] = v;
                }
            }
        }
        buffer.length = n;
    }

    private long[] longStore(int row, int n) {
        long[] store = rowValues[row];
        if (store == null || store.length < n) {
            int old = store == null ? 0 : store.length;
            store = new long[Math.max(n, old + (old >> 1))];
            rowValues[row] = store;
        }
        return store;
    }

    /** Whether a row may hold {@code v} as a long: strictly inside (-2^62, 2^62) is ample and safe. */
    private static boolean fitsRowValue(BigInteger v) {
        return v.bitLength() < 63;
    }

    /** {@code {g, s, t}} with {@code g = gcd(p, a) > 0} and {@code s·p + t·a = g}; p and a not both 0. */
    static BigInteger[] extendedGcd(BigInteger p, BigInteger a) {
        BigInteger oldR = p;
        BigInteger r = a;
        BigInteger oldS = BigInteger.ONE;
        BigInteger s = BigInteger.ZERO;
        BigInteger oldT = BigInteger.ZERO;
        BigInteger t = BigInteger.ONE;
        while (r.signum() != 0) {
            BigInteger q = oldR.divide(r);
            BigInteger nextR = oldR.subtract(q.multiply(r));
            oldR = r;
            r = nextR;
            BigInteger nextS = oldS.subtract(q.multiply(s));
            oldS = s;
            s = nextS;
            BigInteger nextT = oldT.subtract(q.multiply(t));
            oldT = t;
            t = nextT;
        }
        if (oldR.signum() < 0) {
            return new BigInteger[] {oldR.negate(), oldS.negate(), oldT.negate()};
        }
        return new BigInteger[] {oldR, oldS, oldT};
    }

    /** A row under construction, in longs or in BigIntegers. */
    private static final class RowBuffer {
        int[] columns = new int[16];
        long[] values = new long[16];
        BigInteger[] big = new BigInteger[0];
        boolean isBig;
        int length;

        void reset(int capacity, boolean inBig) {
            if (columns.length < capacity) {
                columns = new int[Math.max(capacity, 2 * columns.length)];
            }
            if (inBig) {
                if (big.length < capacity) {
                    big = new BigInteger[Math.max(capacity, 2 * big.length)];
                }
            } else if (values.length < capacity) {
                values = new long[Math.max(capacity, 2 * values.length)];
            }
            isBig = inBig;
            length = 0;
        }

        void append(int column, long v) {
            columns[length] = column;
            values[length++] = v;
        }

        void appendIfNonZero(int column, BigInteger v) {
            if (v.signum() == 0) {
                return;
            }
            columns[length] = column;
            if (isBig) {
                big[length++] = v;
            } else {
                values[length++] = v.longValueExact();
            }
        }

        /** Switches the values held to BigInteger. */
        void toBig() {
            if (big.length < length) {
                big = new BigInteger[Math.max(length, 2 * big.length)];
            }
            for (int k = 0; k < length; k++) {
                big[k] = BigInteger.valueOf(values[k]);
            }
            isBig = true;
        }

        /**
         * Divides the row by the gcd of its entries (not unimodular: rank modes only). Returns
         * that gcd when it exceeds 1, else null. Stops looking at the first entry ±1.
         */
        BigInteger divideByContent() {
            if (length == 0) {
                return null;
            }
            if (isBig) {
                BigInteger g = BigInteger.ZERO;
                for (int k = 0; k < length && !g.equals(BigInteger.ONE); k++) {
                    g = g.gcd(big[k]);
                }
                if (g.equals(BigInteger.ONE)) {
                    return null;
                }
                for (int k = 0; k < length; k++) {
                    big[k] = big[k].divide(g);
                }
                return g;
            }
            long g = 0;
            for (int k = 0; k < length && g != 1; k++) {
                g = gcd(g, Math.abs(values[k]));
            }
            if (g <= 1) {
                return null;
            }
            for (int k = 0; k < length; k++) {
                values[k] /= g;
            }
            return BigInteger.valueOf(g);
        }

        private static long gcd(long a, long b) {
            while (b != 0) {
                long r = a % b;
                a = b;
                b = r;
            }
            return a;
        }
    }
}
