package dev.morse.homology;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class RankTest {
    private static final int MERSENNE = 2147483647;

    private static SparseIntegerMatrix dense(long[][] a) {
        return SparseIntegerMatrix.fromDense(a, a.length == 0 ? 0 : a[0].length);
    }

    @Test
    void ranksModuloSmallPrimes() {
        // [[2]] vanishes mod 2 only. [[1, 1], [1, -1]] has determinant -2: rank 1 mod 2, 2 mod 3.
        assertEquals(0, ModularRank.rank(dense(new long[][] {{2}}), 2));
        assertEquals(1, ModularRank.rank(dense(new long[][] {{2}}), 3));
        assertEquals(1, ModularRank.rank(dense(new long[][] {{1, 1}, {1, -1}}), 2));
        assertEquals(2, ModularRank.rank(dense(new long[][] {{1, 1}, {1, -1}}), 3));
    }

    @Test
    void ranksModuloTheLargestIntPrime() {
        // 2^31 - 1 is prime (Euler). p - 1 = -1 mod p: [[-1, -1], [-1, 1]] has determinant -2.
        long q = MERSENNE - 1;
        assertEquals(0, ModularRank.rank(dense(new long[][] {{MERSENNE}}), MERSENNE));
        assertEquals(2, ModularRank.rank(dense(new long[][] {{q, q}, {q, 1}}), MERSENNE));
        assertEquals(1, ModularRank.rank(dense(new long[][] {{q, q}, {q, 1}}), 2));
        // Long.MIN_VALUE = -2^63, and 2^31 = 1 mod p, so 2^63 = 2^(31·2+1) = 2 mod p: the rows
        // (-2^63, 2) and (1, -1) are dependent mod p (determinant 2 - 2), not over Q.
        assertEquals(1, ModularRank.rank(dense(new long[][] {{Long.MIN_VALUE}}), MERSENNE));
        assertEquals(1, ModularRank.rank(dense(new long[][] {{Long.MIN_VALUE, 2}, {1, -1}}), MERSENNE));
        assertEquals(2, RationalRank.rank(dense(new long[][] {{Long.MIN_VALUE, 2}, {1, -1}})));
    }

    @Test
    void modularRankRejectsComposites() {
        assertThrows(IllegalArgumentException.class, () -> ModularRank.rank(dense(new long[][] {{1}}), 4));
        assertThrows(IllegalArgumentException.class, () -> ModularRank.rank(dense(new long[][] {{1}}), 1));
        assertThrows(IllegalArgumentException.class, () -> ModularRank.rank(dense(new long[][] {{1}}), 2147483646));
    }

    @Test
    void repeatedEntriesAreSummedModuloP() {
        // Row 0 of column 0 is listed as 1 and 2: the entry 3 vanishes mod 3 but not mod 2.
        SparseIntegerMatrix m = new SparseIntegerMatrix(1, new int[] {0, 2}, new int[] {0, 0}, new long[] {1, 2});
        assertEquals(0, ModularRank.rank(m, 3));
        assertEquals(1, ModularRank.rank(m, 2));
        assertEquals(1, RationalRank.rank(m));
    }

    @Test
    void rationalRanks() {
        long n = 1L << 62;
        assertEquals(0, RationalRank.rank(dense(new long[3][3])));
        assertEquals(0, RationalRank.rank(SparseIntegerMatrix.fromDense(new long[0][], 4)));
        // Second row twice the first; then a row of consecutive large integers (det -2 with the first).
        assertEquals(1, RationalRank.rank(dense(new long[][] {{n / 2, n / 2 + 1}, {n, n + 2}})));
        assertEquals(2, RationalRank.rank(dense(new long[][] {{n, n + 1}, {n + 2, n + 3}})));
        assertEquals(1, RationalRank.rank(dense(new long[][] {{Long.MIN_VALUE, Long.MIN_VALUE}, {Long.MAX_VALUE, Long.MAX_VALUE}})));
        // The 3×3 matrix with entries 1..9 by rows has rank 2 (its rows are in arithmetic progression).
        assertEquals(2, RationalRank.rank(dense(new long[][] {{1, 2, 3}, {4, 5, 6}, {7, 8, 9}})));
    }
}
