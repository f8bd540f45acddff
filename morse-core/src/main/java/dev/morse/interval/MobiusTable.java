package dev.morse.interval;

import dev.morse.poset.StrictDownSets;
import java.math.BigInteger;
import java.util.Arrays;

/**
 * The Möbius function μ(x, y) of P̂ on every interval {@code x < y}, row by row from its defining
 * recursion {@code μ(x, x) = 1}, {@code μ(x, y) = -Σ_{x ≤ z < y} μ(x, z)} (Rota 1964; Stanley,
 * Enumerative Combinatorics I, §3.7, from memory). A row costs one pass over the down-sets of the elements above x.
 * Exact: longs while they suffice, BigInteger for the whole table after an overflow.
 *
 * <p>Memory: 8 bytes per interval (or a BigInteger each after an overflow), plus 4 bytes per element.
 */
public final class MobiusTable {
    private final PosetWithBounds hat;
    private final int[] rowOffsets;
    private final long[] small;
    private final BigInteger[] big;

    private MobiusTable(PosetWithBounds hat, int[] rowOffsets, long[] small, BigInteger[] big) {
        this.hat = hat;
        this.rowOffsets = rowOffsets;
        this.small = small;
        this.big = big;
    }

    /** μ on every interval of {@code hat}. */
    public static MobiusTable of(PosetWithBounds hat) {
        int n = hat.size();
        // rows of 0̂ (n + 1 entries), of each x in P (its up-set and 1̂), of 1̂ (none)
        int[] rowOffsets = new int[n + 3];
        long total = 0;
        for (int x = 0; x < n; x++) {
            rowOffsets[x] = (int) total;
            total += hat.upEnd(x) - hat.upStart(x) + 1;
        }
        rowOffsets[n] = (int) total;
        total += n + 1;
        if (total > Integer.MAX_VALUE - 8) {
            throw new IllegalStateException("more intervals than one array holds");
        }
        rowOffsets[n + 1] = (int) total;
        rowOffsets[n + 2] = (int) total;
        try {
            long[] values = new long[(int) total];
            new Rows<>(hat, rowOffsets, new LongArithmetic(values)).fill();
            return new MobiusTable(hat, rowOffsets, values, null);
        } catch (ArithmeticException overflow) {
            BigInteger[] values = new BigInteger[(int) total];
            new Rows<>(hat, rowOffsets, new BigArithmetic(values)).fill();
            return new MobiusTable(hat, rowOffsets, null, values);
        }
    }

    /** μ(x, y) for ids of P̂ with {@code x < y}. */
    public BigInteger value(int x, int y) {
        int i = index(x, y);
        return big != null ? big[i] : BigInteger.valueOf(small[i]);
    }

    private int index(int x, int y) {
        int n = hat.size();
        if (x == hat.bottom()) {
            return rowOffsets[n] + (y == hat.top() ? n : y);
        }
        if (x < n && y == hat.top()) {
            return rowOffsets[x + 1] - 1;
        }
        int i = x < n && y < n ? hat.upIndex(x, y) : -1;
        if (i < 0) {
            throw new IllegalArgumentException(x + " is not below " + y);
        }
        return rowOffsets[x] + i - hat.upStart(x);
    }

    /** Exact sums in some number type, written into the table's slots. */
    private interface Arithmetic {
        void clearRow(int n);

        void setRow(int element, int sign);

        void addToSum(int element);

        void resetSum();

        /** Stores minus the running sum in {@code slot} and as the row's value at {@code element}. */
        void storeNegatedSum(int slot, int element);
    }

    /** The recursion, row by row, over a dense row of values indexed by element id. */
    private static final class Rows<A extends Arithmetic> {
        private final PosetWithBounds hat;
        private final int[] rowOffsets;
        private final A arithmetic;

        Rows(PosetWithBounds hat, int[] rowOffsets, A arithmetic) {
            this.hat = hat;
            this.rowOffsets = rowOffsets;
            this.arithmetic = arithmetic;
        }

        void fill() {
            int n = hat.size();
            StrictDownSets down = hat.downSets();
            int[] above = new int[n];
            arithmetic.clearRow(n + 2);
            for (int x = 0; x <= n; x++) {
                boolean bottom = x == n;
                int count;
                if (bottom) {
                    count = n;
                    for (int p = 0; p < n; p++) {
                        above[p] = hat.atPosition(p);
                    }
                } else {
                    count = hat.upEnd(x) - hat.upStart(x);
                    for (int i = 0; i < count; i++) {
                        above[i] = hat.position(hat.upElement(hat.upStart(x) + i));
                    }
                    Arrays.sort(above, 0, count);
                    for (int i = 0; i < count; i++) {
                        above[i] = hat.atPosition(above[i]);
                    }
                }
                arithmetic.setRow(x, 1);
                for (int i = 0; i < count; i++) {
                    int y = above[i];
                    arithmetic.resetSum();
                    arithmetic.addToSum(n);
                    for (int k = down.start(y); k < down.end(y); k++) {
                        arithmetic.addToSum(down.element(k));
                    }
                    int slot = bottom ? rowOffsets[n] + y : rowOffsets[x] + hat.upIndex(x, y) - hat.upStart(x);
                    arithmetic.storeNegatedSum(slot, y);
                }
                // 1̂: everything of P̂ below it
                arithmetic.resetSum();
                for (int z = 0; z <= n; z++) {
                    arithmetic.addToSum(z);
                }
                arithmetic.storeNegatedSum(bottom ? rowOffsets[n] + n : rowOffsets[x + 1] - 1, n + 1);
                // clear the row for the next x
                arithmetic.setRow(x, 0);
                for (int i = 0; i < count; i++) {
                    arithmetic.setRow(above[i], 0);
                }
                arithmetic.setRow(n + 1, 0);
            }
        }
    }

    private static final class LongArithmetic implements Arithmetic {
        private final long[] table;
        private long[] row = new long[0];
        private long sum;

        LongArithmetic(long[] table) {
            this.table = table;
        }

        @Override
        public void clearRow(int n) {
            row = new long[n];
        }

        @Override
        public void setRow(int element, int value) {
            row[element] = value;
        }

        @Override
        public void addToSum(int element) {
            sum = Math.addExact(sum, row[element]);
        }

        @Override
        public void resetSum() {
            sum = 0;
        }

        @Override
        public void storeNegatedSum(int slot, int element) {
            long mu = Math.negateExact(sum);
            table[slot] = mu;
            row[element] = mu;
        }
    }

    private static final class BigArithmetic implements Arithmetic {
        private final BigInteger[] table;
        private BigInteger[] row = new BigInteger[0];
        private BigInteger sum = BigInteger.ZERO;

        BigArithmetic(BigInteger[] table) {
            this.table = table;
        }

        @Override
        public void clearRow(int n) {
            row = new BigInteger[n];
            Arrays.fill(row, BigInteger.ZERO);
        }

        @Override
        public void setRow(int element, int value) {
            row[element] = BigInteger.valueOf(value);
        }

        @Override
        public void addToSum(int element) {
            sum = sum.add(row[element]);
        }

        @Override
        public void resetSum() {
            sum = BigInteger.ZERO;
        }

        @Override
        public void storeNegatedSum(int slot, int element) {
            BigInteger mu = sum.negate();
            table[slot] = mu;
            row[element] = mu;
        }
    }
}
