package dev.morse.homology;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

/** The engine's modes directly, to see that long overflow is met and recovered exactly. */
class IntegerEliminationTest {
    private static final long N = 1L << 62;
    private static final long[][] CONSECUTIVE = {{N, N + 1}, {N + 2, N + 3}};

    private static SparseIntegerMatrix consecutive() {
        return SparseIntegerMatrix.fromDense(CONSECUTIVE, 2);
    }

    @Test
    void rankModeRecoversFromOverflow() {
        // det = N(N+3) - (N+1)(N+2) = -2, so the rank is 2; clearing needs products near 2^123.
        IntegerElimination e = new IntegerElimination(consecutive(), IntegerElimination.Mode.RANK).run();
        assertEquals(2, e.pivotCount());
        assertTrue(e.overflowRecoveries() > 0, "the long path must have overflowed");
    }

    @Test
    void determinantModeFindsTheMinor() {
        IntegerElimination units = new IntegerElimination(consecutive(), IntegerElimination.Mode.UNITS).run();
        assertEquals(0, units.pivotCount(), "no entry is a unit");
        IntegerElimination d = units.copyForDeterminant().run();
        assertEquals(2, d.pivotCount());
        assertEquals(BigInteger.TWO, d.pivotDeterminant().abs());
        assertTrue(d.overflowRecoveries() > 0);
    }

    @Test
    void determinantOfAUnimodularDisguise() {
        // U·diag(3, 5, 7)·V with det U = det V = 1 has determinant ±105.
        long[][] a = RandomMatrices.disguisedDiagonal(new Random(3), 3, 3, new long[] {3, 5, 7}, 30);
        IntegerElimination d = new IntegerElimination(SparseIntegerMatrix.fromDense(a, 3), IntegerElimination.Mode.UNITS)
                .run().copyForDeterminant().run();
        assertEquals(BigInteger.valueOf(105), d.pivotDeterminant().abs());
    }

    @Test
    void smithModuloRecoversFromOverflow() {
        // Modulo 2^100 nothing reduces, and Euclidean steps on entries near 2^62 overflow long.
        // Over Z/2^100 the Smith form of diag(1, 2) is still diag(1, 2).
        BigInteger m = BigInteger.TWO.pow(100);
        IntegerElimination e = new IntegerElimination(consecutive(), IntegerElimination.Mode.UNITS).run()
                .continueModulo(m).run();
        assertEquals(2, e.pivotCount());
        assertTrue(e.overflowRecoveries() > 0);
        List<BigInteger> diagonal = new ArrayList<>();
        for (BigInteger p : e.nonUnitPivots()) {
            diagonal.add(p.gcd(m));
        }
        assertEquals(List.of(BigInteger.TWO), InvariantFactors.chain(diagonal));
    }

    @Test
    void unitModeLeavesTheCore() {
        // One unit pivot (the 1) is taken; what is left, 2·(the rest), has no unit.
        long[][] a = {{1, 2, 0}, {2, 0, 4}, {0, 4, 6}};
        IntegerElimination e = new IntegerElimination(SparseIntegerMatrix.fromDense(a, 3), IntegerElimination.Mode.UNITS).run();
        assertEquals(1, e.pivotCount());
        assertEquals(2, e.activeRows());
        assertEquals(2, e.activeColumns());
    }

    @Test
    void extendedGcdGivesBezoutCoefficients() {
        long[][] pairs = {{12, 18}, {-12, 18}, {7, -3}, {0, 5}, {5, 0}, {Long.MAX_VALUE, Long.MAX_VALUE - 1}};
        for (long[] pair : pairs) {
            BigInteger p = BigInteger.valueOf(pair[0]);
            BigInteger a = BigInteger.valueOf(pair[1]);
            BigInteger[] gst = IntegerElimination.extendedGcd(p, a);
            assertEquals(p.gcd(a), gst[0]);
            assertEquals(gst[0], gst[1].multiply(p).add(gst[2].multiply(a)));
        }
    }
}
