package dev.morse.homology;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * Smith's theorem (Smith 1861) independently of any elimination: the product of the first k
 * invariant factors is the gcd of all k×k minors (the k-th determinantal divisor), and the rank is
 * the largest k for which some k×k minor is nonzero. Computed by brute force over all minors.
 */
class DeterminantalDivisorsTest {
    @Test
    void smithFormsMatchDeterminantalDivisors() {
        Random random = new Random(1861L);
        for (int n = 0; n < 400; n++) {
            int rows = 1 + random.nextInt(5);
            int columns = 1 + random.nextInt(5);
            long bound = n % 3 == 0 ? 1 : n % 3 == 1 ? 4 : 30;
            long[][] a = RandomMatrices.sparse(random, rows, columns, 0.3 + 0.6 * random.nextDouble(), bound);
            SmithInvariants expected = byMinors(a, rows, columns);
            SparseIntegerMatrix m = SparseIntegerMatrix.fromDense(a, columns);
            assertEquals(expected, SparseSmithNormalForm.compute(m), "sparse path, matrix " + n);
            assertEquals(expected, DenseSmithOracle.compute(m), "dense oracle, matrix " + n);
        }
    }

    private static SmithInvariants byMinors(long[][] a, int rows, int columns) {
        List<BigInteger> factors = new ArrayList<>();
        BigInteger previous = BigInteger.ONE;
        int rank = 0;
        for (int k = 1; k <= Math.min(rows, columns); k++) {
            BigInteger divisor = BigInteger.ZERO;
            for (int[] r : subsets(rows, k)) {
                for (int[] c : subsets(columns, k)) {
                    divisor = divisor.gcd(determinant(a, r, c));
                }
            }
            if (divisor.signum() == 0) {
                break;
            }
            rank = k;
            BigInteger factor = divisor.divide(previous);
            if (factor.compareTo(BigInteger.ONE) > 0) {
                factors.add(factor);
            }
            previous = divisor;
        }
        return new SmithInvariants(rank, factors);
    }

    /** Laplace expansion along the first chosen row. */
    private static BigInteger determinant(long[][] a, int[] rows, int[] columns) {
        if (rows.length == 1) {
            return BigInteger.valueOf(a[rows[0]][columns[0]]);
        }
        int[] rest = Arrays.copyOfRange(rows, 1, rows.length);
        BigInteger sum = BigInteger.ZERO;
        for (int j = 0; j < columns.length; j++) {
            long entry = a[rows[0]][columns[j]];
            if (entry != 0) {
                int[] others = new int[columns.length - 1];
                for (int t = 0, k = 0; t < columns.length; t++) {
                    if (t != j) {
                        others[k++] = columns[t];
                    }
                }
                BigInteger term = BigInteger.valueOf(entry).multiply(determinant(a, rest, others));
                sum = j % 2 == 0 ? sum.add(term) : sum.subtract(term);
            }
        }
        return sum;
    }

    private static List<int[]> subsets(int n, int k) {
        List<int[]> all = new ArrayList<>();
        for (int mask = 0; mask < (1 << n); mask++) {
            if (Integer.bitCount(mask) == k) {
                int[] s = new int[k];
                for (int i = 0, t = 0; i < n; i++) {
                    if ((mask & (1 << i)) != 0) {
                        s[t++] = i;
                    }
                }
                all.add(s);
            }
        }
        return all;
    }
}
