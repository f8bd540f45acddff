package dev.morse.homology;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

class InvariantFactorsTest {
    private static List<BigInteger> list(long... values) {
        List<BigInteger> l = new ArrayList<>();
        for (long v : values) {
            l.add(BigInteger.valueOf(v));
        }
        return l;
    }

    @Test
    void smallChains() {
        // By primes (common practice): 2,3 -> 6; 4,6 -> 2,12; 12,18 -> 6,36; 8,12,18 -> 2,12,72.
        assertEquals(list(6), InvariantFactors.chain(list(2, 3)));
        assertEquals(list(2, 12), InvariantFactors.chain(list(4, 6)));
        assertEquals(list(6, 36), InvariantFactors.chain(list(12, 18)));
        assertEquals(list(2, 12, 72), InvariantFactors.chain(list(8, 12, 18)));
        assertEquals(list(2, 2, 2), InvariantFactors.chain(list(2, 1, 2, 1, 2)));
        assertEquals(list(), InvariantFactors.chain(list(1, 1)));
    }

    @Test
    void coprimeBaseIsPairwiseCoprimeAndCoversEveryValue() {
        List<BigInteger> values = list(12, 18, 35, 49, 6, 1024, 3 * 1024);
        List<BigInteger> base = InvariantFactors.coprimeBase(values);
        for (int i = 0; i < base.size(); i++) {
            for (int j = i + 1; j < base.size(); j++) {
                assertEquals(BigInteger.ONE, base.get(i).gcd(base.get(j)));
            }
        }
        for (BigInteger v : values) {
            BigInteger rest = v;
            for (BigInteger q : base) {
                while (rest.mod(q).signum() == 0) {
                    rest = rest.divide(q);
                }
            }
            assertEquals(BigInteger.ONE, rest, "covers " + v);
        }
    }

    @Test
    void agreesWithPairwiseGcdLcmExchange() {
        // The textbook normalisation: replace (a, b) by (gcd, lcm) until each divides the next.
        Random random = new Random(11L);
        for (int n = 0; n < 500; n++) {
            List<BigInteger> d = new ArrayList<>();
            int k = 1 + random.nextInt(8);
            for (int i = 0; i < k; i++) {
                long v = 1;
                for (int f = random.nextInt(4); f > 0; f--) {
                    v *= new long[] {2, 3, 4, 5, 6, 9, 25, 1_000_003}[random.nextInt(8)];
                }
                d.add(BigInteger.valueOf(v));
            }
            BigInteger[] e = d.toArray(new BigInteger[0]);
            for (int i = 0; i < e.length; i++) {
                for (int j = i + 1; j < e.length; j++) {
                    BigInteger g = e[i].gcd(e[j]);
                    BigInteger l = e[i].multiply(e[j]).divide(g);
                    e[i] = g;
                    e[j] = l;
                }
            }
            List<BigInteger> expected = new ArrayList<>();
            for (BigInteger x : e) {
                if (x.compareTo(BigInteger.ONE) > 0) {
                    expected.add(x);
                }
            }
            List<BigInteger> chain = InvariantFactors.chain(d);
            assertEquals(expected, chain, d.toString());
            for (int i = 1; i < chain.size(); i++) {
                assertTrue(chain.get(i).mod(chain.get(i - 1)).signum() == 0);
            }
        }
    }
}
