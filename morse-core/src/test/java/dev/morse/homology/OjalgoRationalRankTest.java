package dev.morse.homology;

import dev.morse.complex.ChainComplex;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.Random;
import org.junit.jupiter.api.Test;

/** ojalgo's certified rational rank against our rank over Q and the dense oracle. */
class OjalgoRationalRankTest {
    private static SparseIntegerMatrix dense(long[][] a) {
        return SparseIntegerMatrix.fromDense(a, a.length == 0 ? 0 : a[0].length);
    }

    @Test
    void rankDeficientShapesWhereThePlainLuCountFallsShort() {
        // Ranks by inspection: a single nonzero entry; two equal rows; a zero matrix; a wide matrix
        // with one dependent column; the 3×3 matrix 1..9 (rank 2, rows in arithmetic progression).
        assertEquals(1, OjalgoRationalRank.rank(dense(new long[][] {{0, 1}, {0, 0}})));
        assertEquals(1, OjalgoRationalRank.rank(dense(new long[][] {{0, 2, 3}, {0, 2, 3}})));
        assertEquals(0, OjalgoRationalRank.rank(dense(new long[2][3])));
        assertEquals(2, OjalgoRationalRank.rank(dense(new long[][] {{1, 0, 1, 0}, {0, 1, 1, 0}})));
        assertEquals(2, OjalgoRationalRank.rank(dense(new long[][] {{1, 2, 3}, {4, 5, 6}, {7, 8, 9}})));
        assertEquals(0, OjalgoRationalRank.rank(SparseIntegerMatrix.fromDense(new long[0][], 3)));
    }

    @Test
    void agreesWithRationalRankOnRandomMatrices() {
        Random random = new Random(56L);
        for (int n = 0; n < 300; n++) {
            long[][] a;
            int columns;
            if (n % 3 == 0) {
                int rows = 1 + random.nextInt(30);
                columns = 1 + random.nextInt(30);
                a = RandomMatrices.boundaryLike(random, rows, columns, 3);
            } else if (n % 3 == 1) {
                int rows = 1 + random.nextInt(10);
                columns = 1 + random.nextInt(10);
                a = RandomMatrices.lowRank(random, rows, columns, 1 + random.nextInt(5), 2);
            } else {
                int rows = 1 + random.nextInt(9);
                columns = 1 + random.nextInt(9);
                a = RandomMatrices.sparse(random, rows, columns, 0.2 + 0.5 * random.nextDouble(), 3);
            }
            SparseIntegerMatrix m = SparseIntegerMatrix.fromDense(a, columns);
            int ojalgo = OjalgoRationalRank.rank(m);
            assertEquals(DenseSmithOracle.compute(m).rank(), ojalgo, "oracle, matrix " + n);
            assertEquals(RationalRank.rank(m), ojalgo, "RationalRank, matrix " + n);
        }
    }

    @Test
    void boundaryOfTheSevenVertexTorus() {
        // Torus (REFERENCES.md): β = 1, 2, 1 over Q, so rank ∂_1 = 7 - 1 = 6 and rank ∂_2 = 14 - 1 = 13.
        ChainComplex torus = TestComplexes.simplicial(Triangulations.sevenVertexTorus());
        assertEquals(6, OjalgoRationalRank.rank(SparseIntegerMatrix.boundaryOf(torus, 1)));
        assertEquals(13, OjalgoRationalRank.rank(SparseIntegerMatrix.boundaryOf(torus, 2)));
    }

    @Test
    void refusesWhenOjalgoArithmeticIsNotExact() {
        // Determinants near 2^63 and beyond: ojalgo's long-backed rationals must approximate, and
        // the exact check of L·U = P·B then refuses to give a rank rather than give a wrong one.
        long n = 1L << 62;
        assertThrows(ArithmeticException.class, () -> OjalgoRationalRank.rank(dense(new long[][] {{n, n + 1}, {n + 2, n + 3}})));
        assertThrows(ArithmeticException.class,
                () -> OjalgoRationalRank.rank(dense(new long[][] {{3_000_000_007L, 5}, {7, 11_000_000_019L}})));
    }
}
