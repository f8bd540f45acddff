package dev.morse.homology;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.math.BigInteger;
import java.util.Arrays;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * The sparse paths against the dense oracle on seeded random matrices: the Smith form must agree
 * exactly, and the ranks over Z/p and Q must be those the oracle's invariant factors imply (the
 * rank over Z/p counts the invariant factors not divisible by p; the rank over Q counts them all).
 */
class EliminationPropertyTest {
    private static final int[] PRIMES = {2, 3, 5, 7, 2147483647};

    @Test
    void sparsePathsAgreeWithTheDenseOracleOnRandomMatrices() {
        Random random = new Random(20240611L);
        for (int n = 0; n < 1200; n++) {
            int kind = n % 7;
            // Entries near 10^12 or 2^62 make the dense oracle slow: smaller shapes for those.
            int side = kind == 6 ? 7 : kind == 3 ? 17 : 31;
            int rows = random.nextInt(side);
            int columns = random.nextInt(side);
            long[][] a = switch (kind) {
                case 0 -> RandomMatrices.sparse(random, rows, columns, 0.05 + 0.45 * random.nextDouble(), 1);
                case 1 -> RandomMatrices.sparse(random, rows, columns, 0.05 + 0.5 * random.nextDouble(), 3);
                case 2 -> RandomMatrices.sparse(random, rows, columns, 0.05 + 0.3 * random.nextDouble(), 100);
                case 3 -> RandomMatrices.sparse(random, rows, columns, 0.03 + 0.1 * random.nextDouble(), 1_000_000_000_000L);
                case 4 -> RandomMatrices.boundaryLike(random, rows, columns, 4);
                case 5 -> RandomMatrices.lowRank(random, rows, columns, 1 + random.nextInt(6), 4);
                default -> RandomMatrices.sparse(random, rows, columns, 0.3 + 0.7 * random.nextDouble(), Long.MAX_VALUE / 2);
            };
            checkAgainstOracle("matrix " + n + " (kind " + kind + ")", a, columns);
        }
    }

    @Test
    void disguisedDiagonalsKeepTheirInvariantFactors() {
        // Smith 1861: the invariant factors are unchanged by unimodular row and column operations,
        // so U·diag(d)·V has the chain d (chosen here to divide one another) as its Smith form.
        Random random = new Random(77L);
        long[][] chains = {{1, 2, 2, 6}, {3, 3, 9}, {1, 1, 1, 4, 8}, {2, 6, 30, 210}, {5}, {1, 7, 7, 7, 14}};
        for (int n = 0; n < 240; n++) {
            long[] chain = chains[n % chains.length];
            int rows = chain.length + random.nextInt(8);
            int columns = chain.length + random.nextInt(8);
            long[][] a = RandomMatrices.disguisedDiagonal(random, rows, columns, chain, 3 * (rows + columns));
            SparseIntegerMatrix m = RandomMatrices.matrix(a, columns);
            SmithInvariants expected = new SmithInvariants(chain.length, RandomMatrices.nonUnit(chain));
            assertEquals(expected, SparseSmithNormalForm.compute(m), "disguised diagonal " + n);
            assertEquals(expected, DenseSmithOracle.compute(m), "oracle on disguised diagonal " + n);
        }
    }

    private static void checkAgainstOracle(String what, long[][] a, int columns) {
        SparseIntegerMatrix m = RandomMatrices.matrix(a, columns);
        SmithInvariants oracle = DenseSmithOracle.compute(m);
        assertEquals(oracle, SparseSmithNormalForm.compute(m), what + " " + Arrays.deepToString(a));
        assertEquals(oracle.rank(), RationalRank.rank(m), what + ": rank over Q");
        for (int p : PRIMES) {
            BigInteger prime = BigInteger.valueOf(p);
            long divisible = oracle.nonUnitFactors().stream().filter(f -> f.mod(prime).signum() == 0).count();
            assertEquals(oracle.rank() - divisible, ModularRank.rank(m, p), what + ": rank over Z/" + p);
        }
    }
}
