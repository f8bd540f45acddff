package dev.morse.homology;

import java.math.BigInteger;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Deque;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * Invariant factors of a diagonal integer matrix, without factoring into primes.
 *
 * <p>The invariant factors of {@code diag(d_1, ..., d_k)} are found prime by prime: for each prime
 * the exponents it has in the d_i, sorted, are its exponents in the invariant factors
 * (common practice; it is the same fact as the gcd/lcm exchange {@code (a, b) -> (gcd, lcm)}).
 * Pairwise coprime "base" numbers stand in for the primes: refine the distinct d_i into numbers
 * that are pairwise coprime and of which every d_i is a product of powers (a coprime base, or
 * factor refinement: Bach, Driscoll and Shallit, "Factor refinement", J. Algorithms 1993). Every
 * prime divides at most one base number q, and its exponent in d_i is its exponent in q times
 * the exponent of q in d_i, so sorting exponents of q sorts those of each of its primes.
 *
 * <p>Cost: grouping equal entries first, a number of gcds quadratic in the number of distinct
 * entries (few in practice), plus one pass per base number over the k entries.
 */
final class InvariantFactors {
    private InvariantFactors() {
    }

    /**
     * The invariant factors greater than 1, ascending, of a diagonal matrix whose nonzero entries
     * have the absolute values {@code diagonal} (each at least 1, in any order).
     */
    static List<BigInteger> chain(List<BigInteger> diagonal) {
        List<BigInteger> nonUnit = new ArrayList<>();
        for (BigInteger d : diagonal) {
            if (d.signum() <= 0) {
                throw new IllegalArgumentException("diagonal entries must be positive");
            }
            if (d.compareTo(BigInteger.ONE) > 0) {
                nonUnit.add(d);
            }
        }
        if (nonUnit.isEmpty()) {
            return List.of();
        }
        TreeMap<BigInteger, Integer> multiplicity = new TreeMap<>();
        for (BigInteger d : nonUnit) {
            multiplicity.merge(d, 1, Integer::sum);
        }
        List<BigInteger> base = coprimeBase(multiplicity.keySet());
        int k = nonUnit.size();
        int[][] exponents = new int[base.size()][k];
        int at = 0;
        for (Map.Entry<BigInteger, Integer> entry : multiplicity.entrySet()) {
            BigInteger rest = entry.getKey();
            for (int b = 0; b < base.size(); b++) {
                int e = 0;
                BigInteger[] qr = rest.divideAndRemainder(base.get(b));
                while (qr[1].signum() == 0) {
                    rest = qr[0];
                    e++;
                    qr = rest.divideAndRemainder(base.get(b));
                }
                Arrays.fill(exponents[b], at, at + entry.getValue(), e);
            }
            if (!rest.equals(BigInteger.ONE)) {
                throw new IllegalStateException("coprime base does not cover " + entry.getKey());
            }
            at += entry.getValue();
        }
        for (int[] e : exponents) {
            Arrays.sort(e);
        }
        List<BigInteger> factors = new ArrayList<>();
        BigInteger previous = null;
        for (int i = 0; i < k; i++) {
            boolean same = i > 0;
            for (int b = 0; b < base.size() && same; b++) {
                same = exponents[b][i] == exponents[b][i - 1];
            }
            if (!same) {
                previous = BigInteger.ONE;
                for (int b = 0; b < base.size(); b++) {
                    if (exponents[b][i] > 0) {
                        previous = previous.multiply(base.get(b).pow(exponents[b][i]));
                    }
                }
            }
            if (previous.compareTo(BigInteger.ONE) > 0) {
                factors.add(previous);
            }
        }
        return factors;
    }

    /**
     * Pairwise coprime numbers greater than 1 such that each of {@code values} is a product of
     * powers of them. Splitting a pair sharing a factor g into (a/g, g, b/g) lowers the product
     * of everything held, so the refinement ends; leftovers that are not yet power products are
     * refined in again until none remain.
     */
    static List<BigInteger> coprimeBase(Iterable<BigInteger> values) {
        List<BigInteger> base = new ArrayList<>();
        Deque<BigInteger> pending = new ArrayDeque<>();
        for (BigInteger v : values) {
            pending.push(v);
        }
        while (true) {
            refine(base, pending);
            for (BigInteger v : values) {
                BigInteger rest = v;
                for (BigInteger q : base) {
                    BigInteger[] qr = rest.divideAndRemainder(q);
                    while (qr[1].signum() == 0) {
                        rest = qr[0];
                        qr = rest.divideAndRemainder(q);
                    }
                }
                if (!rest.equals(BigInteger.ONE)) {
                    pending.push(rest);
                }
            }
            if (pending.isEmpty()) {
                return base;
            }
        }
    }

    private static void refine(List<BigInteger> base, Deque<BigInteger> pending) {
        outer:
        while (!pending.isEmpty()) {
            BigInteger y = pending.pop();
            if (y.equals(BigInteger.ONE)) {
                continue;
            }
            for (int i = 0; i < base.size(); i++) {
                BigInteger b = base.get(i);
                BigInteger g = y.gcd(b);
                if (!g.equals(BigInteger.ONE)) {
                    base.remove(i);
                    pending.push(b.divide(g));
                    pending.push(g);
                    pending.push(y.divide(g));
                    continue outer;
                }
            }
            base.add(y);
        }
    }
}
