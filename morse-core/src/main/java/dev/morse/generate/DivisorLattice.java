package dev.morse.generate;

import dev.morse.poset.PosetOperations;

import dev.morse.poset.Poset;
import dev.morse.poset.PosetBuilder;
import it.unimi.dsi.fastutil.ints.IntArrayList;

/**
 * The divisors of a positive integer N ordered by divisibility, labelled by their decimal values;
 * {@code d} is covered by {@code d·p} for each prime {@code p} with {@code d·p | N}. The open
 * interval {@code (1, N)} is a sphere {@code S^(k-2)} when N is a product of k distinct primes and
 * contractible otherwise (standard; its Möbius function is the number-theoretic one).
 */
public final class DivisorLattice {
    /** Largest N accepted. */
    public static final int MAX_N = 1_000_000_000;

    private DivisorLattice() {
    }

    /** All divisors of {@code n}. */
    public static Poset lattice(int n) {
        Sizes.inRange("N", n, 1, MAX_N);
        IntArrayList divisors = new IntArrayList();
        for (int d = 1; (long) d * d <= n; d++) {
            if (n % d == 0) {
                divisors.add(d);
            }
        }
        for (int i = divisors.size() - 1; i >= 0; i--) {
            int d = divisors.getInt(i);
            if ((long) d * d != n) {
                divisors.add(n / d);
            }
        }
        IntArrayList primes = new IntArrayList();
        int rest = n;
        for (int p = 2; (long) p * p <= rest; p++) {
            if (rest % p == 0) {
                primes.add(p);
                while (rest % p == 0) {
                    rest /= p;
                }
            }
        }
        if (rest > 1) {
            primes.add(rest);
        }
        PosetBuilder b = new PosetBuilder();
        for (int d : divisors) {
            b.element(Integer.toString(d));
        }
        for (int i = 0; i < divisors.size(); i++) {
            int d = divisors.getInt(i);
            for (int p : primes) {
                if ((n / d) % p == 0) {
                    b.relate(i, b.element(Integer.toString(d * p)), 0);
                }
            }
        }
        return b.buildKnownAcyclic();
    }

    /** The open interval {@code (1, n)}: divisors other than 1 and n; for {@code n ≥ 2}. */
    public static Poset openInterval(int n) {
        if (n < 2) {
            throw new IllegalArgumentException("the open interval (1, N) needs N ≥ 2, got " + n);
        }
        return PosetOperations.properPart(lattice(n));
    }
}
