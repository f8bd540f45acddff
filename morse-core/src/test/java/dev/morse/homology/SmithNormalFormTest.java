package dev.morse.homology;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.math.BigInteger;
import java.util.List;
import org.junit.jupiter.api.Test;

class SmithNormalFormTest {
    private static final long N62 = 1L << 62;

    private static SparseIntegerMatrix dense(long[][] a) {
        return SparseIntegerMatrix.fromDense(a, a.length == 0 ? 0 : a[0].length);
    }

    private static SmithInvariants form(int rank, long... factors) {
        return new SmithInvariants(rank, RandomMatrices.nonUnit(factors));
    }

    /** Checks the sparse path and the dense oracle against a value derived by hand. */
    private static void assertSmithForm(SmithInvariants expected, SparseIntegerMatrix m) {
        assertEquals(expected, SparseSmithNormalForm.compute(m), "sparse path");
        assertEquals(expected, DenseSmithOracle.compute(m), "dense oracle");
    }

    @Test
    void classicWorkedExample() {
        // A standard worked example (from memory; it is the example of the Wikipedia article
        // "Smith normal form"): diag(2, 6, 12). Check by determinantal divisors: the gcd of the
        // entries is 2; the 2×2 minors are 36, 48, 24, -48, -72, -48, -36, -24, -48, gcd 12 = 2·6;
        // the determinant is -144 = -(2·6·12).
        long[][] a = {{2, 4, 4}, {-6, 6, 12}, {10, -4, -16}};
        assertSmithForm(form(3, 2, 6, 12), dense(a));
    }

    @Test
    void diagonalMatricesFollowTheChineseRemainderTheorem() {
        // Z/2 + Z/3 = Z/6 and Z/4 + Z/6 = Z/2 + Z/12 (Chinese remainder theorem, common practice).
        assertSmithForm(form(2, 6), dense(new long[][] {{2, 0}, {0, 3}}));
        assertSmithForm(form(2, 2, 12), dense(new long[][] {{4, 0}, {0, 6}}));
        // 8, 12, 18: exponents of 2 are 3, 2, 1 and of 3 are 0, 1, 2, sorted per prime: 2, 12, 72.
        assertSmithForm(form(3, 2, 12, 72), dense(new long[][] {{8, 0, 0}, {0, 12, 0}, {0, 0, 18}}));
    }

    @Test
    void emptyAndZeroMatricesHaveRankZero() {
        assertSmithForm(form(0), SparseIntegerMatrix.fromDense(new long[0][], 5));
        assertSmithForm(form(0), SparseIntegerMatrix.fromDense(new long[4][0], 0));
        assertSmithForm(form(0), dense(new long[3][4]));
    }

    @Test
    void repeatedEntriesAreSummed() {
        // Column 0 lists row 0 twice (1 + 1 = 2); column 1 lists row 1 as 5 and -5, which cancel.
        SparseIntegerMatrix m = new SparseIntegerMatrix(2, new int[] {0, 2, 4}, new int[] {0, 0, 1, 1}, new long[] {1, 1, 5, -5});
        assertSmithForm(form(1, 2), m);
        // Long.MIN_VALUE twice in one place is -2^64.
        SparseIntegerMatrix big = new SparseIntegerMatrix(1, new int[] {0, 2}, new int[] {0, 0}, new long[] {Long.MIN_VALUE, Long.MIN_VALUE});
        assertSmithForm(new SmithInvariants(1, List.of(BigInteger.TWO.pow(64))), big);
    }

    @Test
    void eliminationThatOverflowsLongStaysExact() {
        // N = 2^62. The entries are consecutive integers, so their gcd d1 = 1; the determinant is
        // N(N+3) - (N+1)(N+2) = -2, so d1·d2 = 2: the Smith form is diag(1, 2). Clearing the
        // column needs gcd(N, N+2) = 2 = -N + (N+2) and the row combination ((N+2)/2)·row1 -
        // (N/2)·row2, whose products are near 2^123.
        long[][] a = {{N62, N62 + 1}, {N62 + 2, N62 + 3}};
        assertSmithForm(form(2, 2), dense(a));
    }

    @Test
    void largerEliminationThatOverflowsLongStaysExact() {
        // Rows N+0..2, N+3..5, N+6,N+7,N+9 with N = 2^62 - 16. Subtracting rows, det = det of
        // (N, N+1, N+2), (3, 3, 3), (0, 0, 1) = 3N - 3(N+1) = -3. The gcd of the entries is 1
        // (consecutive integers), so d1 = 1, d1·d2·d3 = 3 with d1 | d2 | d3 leaves only (1, 1, 3).
        long n = N62 - 16;
        long[][] a = {{n, n + 1, n + 2}, {n + 3, n + 4, n + 5}, {n + 6, n + 7, n + 9}};
        assertSmithForm(form(3, 3), dense(a));
    }

    @Test
    void invariantFactorBeyondLongMaxValue() {
        // N = 2^62 + 1. The entries have gcd 1 (an entry is 1), the determinant is -N - N = -2N,
        // so the Smith form is diag(1, 2N) with 2N = 2^63 + 2 > Long.MAX_VALUE.
        long n = N62 + 1;
        SmithInvariants expected = new SmithInvariants(2, List.of(BigInteger.TWO.pow(63).add(BigInteger.TWO)));
        assertSmithForm(expected, dense(new long[][] {{1, n}, {1, -n}}));
    }

    @Test
    void productOfLargeCoprimeFactors() {
        // 2^62 and 2^62 + 1 are coprime (consecutive), so diag(2^62, 2^62 + 1) ~ diag(1, 2^62(2^62 + 1)).
        BigInteger n = BigInteger.TWO.pow(62);
        SmithInvariants expected = new SmithInvariants(2, List.of(n.multiply(n.add(BigInteger.ONE))));
        assertSmithForm(expected, dense(new long[][] {{N62, 0}, {0, N62 + 1}}));
    }

    @Test
    void extremeLongEntries() {
        // |Long.MIN_VALUE| = 2^63 does not fit a long.
        assertSmithForm(new SmithInvariants(1, List.of(BigInteger.TWO.pow(63))), dense(new long[][] {{Long.MIN_VALUE}}));
        // Rows (MIN, MIN) and (MAX, MAX) are proportional over Q: rank 1; gcd(2^63, 2^63 - 1) = 1.
        long[][] a = {{Long.MIN_VALUE, Long.MIN_VALUE}, {Long.MAX_VALUE, Long.MAX_VALUE}};
        assertSmithForm(form(1), dense(a));
    }

    @Test
    void largeCycleGraphBoundary() {
        // The boundary of the cycle graph C_n (vertices × edges) has rank n - 1 and no torsion
        // (H_0 = H_1 = Z for a circle); a long unit-pivot elimination with wrap-around fill.
        int n = 20_000;
        int[] offsets = new int[n + 1];
        int[] rows = new int[2 * n];
        long[] values = new long[2 * n];
        for (int e = 0; e < n; e++) {
            rows[2 * e] = e;
            values[2 * e] = -1;
            rows[2 * e + 1] = (e + 1) % n;
            values[2 * e + 1] = 1;
            offsets[e + 1] = 2 * e + 2;
        }
        SparseIntegerMatrix m = new SparseIntegerMatrix(n, offsets, rows, values);
        assertEquals(form(n - 1), SparseSmithNormalForm.compute(m));
    }

    @Test
    void twistedCycleHasTwoTorsion() {
        // The same cycle with the last edge carrying +1 at both ends. The matrix is I - C for the
        // cyclic shift C with weights 1, ..., 1, -1, and det(I - C) = 1 - (product of weights) = 2
        // (the characteristic polynomial of a weighted n-cycle is x^n - product). Deleting row 0
        // and the last column leaves a unitriangular matrix, so the (n-1)-minors have gcd 1: the
        // Smith form is diag(1, ..., 1, 2).
        int n = 1000;
        long[][] a = new long[n][n];
        for (int e = 0; e < n; e++) {
            a[e][e] = 1;
            a[(e + 1) % n][e] = e == n - 1 ? 1 : -1;
        }
        assertEquals(form(n, 2), SparseSmithNormalForm.compute(dense(a)));
    }
}
