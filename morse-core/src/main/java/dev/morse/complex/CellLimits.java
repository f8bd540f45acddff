package dev.morse.complex;

/**
 * Size guards shared by the complexes that are enumerated explicitly: cells are ints and every
 * per-dimension table is one Java array, so counts must stay below the largest array length.
 */
final class CellLimits {
    /** The largest array length the JVM reliably allocates (common practice). */
    static final long MAX_ARRAY = Integer.MAX_VALUE - 8;

    private CellLimits() {
    }

    /** {@code a + b}, or {@code Long.MAX_VALUE} on overflow: counts only need to be compared with a limit. */
    static long saturatedAdd(long a, long b) {
        long sum = a + b;
        return ((a ^ sum) & (b ^ sum)) < 0 ? Long.MAX_VALUE : sum;
    }

    /** {@code a * b} for non-negative arguments, or {@code Long.MAX_VALUE} on overflow. */
    static long saturatedMultiply(long a, long b) {
        long hi = Math.multiplyHigh(a, b);
        long lo = a * b;
        return hi != 0 || lo < 0 ? Long.MAX_VALUE : lo;
    }

    /** Checks a requested cell limit. */
    static long validLimit(long maxCells) {
        if (maxCells < 0) {
            throw new IllegalArgumentException("the cell limit must not be negative");
        }
        return Math.min(maxCells, MAX_ARRAY);
    }
}
