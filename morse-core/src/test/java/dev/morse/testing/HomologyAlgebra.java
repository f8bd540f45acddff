package dev.morse.testing;

import dev.morse.homology.HomologyGroup;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;
import java.util.TreeMap;

/**
 * The homology of products and joins from that of their factors, by the Künneth formula
 * {@code H_n(X × Y) = ⊕_(i+j=n) H_i(X) ⊗ H_j(Y) ⊕ ⊕_(i+j=n-1) Tor(H_i(X), H_j(Y))} (Hatcher,
 * Algebraic Topology, 2002, Thm 3B.6) and the join formula
 * {@code H̃_(n+1)(X * Y) = ⊕_(i+j=n) H̃_i(X) ⊗ H̃_j(Y) ⊕ ⊕_(i+j=n-1) Tor(H̃_i(X), H̃_j(Y))}
 * (Milnor 1956, from memory; Wachs 2007). For cyclic groups: {@code Z ⊗ A = A},
 * {@code Z/a ⊗ Z/b = Tor(Z/a, Z/b) = Z/gcd(a, b)}, {@code Tor(Z, A) = 0} (common practice). Written
 * here independently of the library's homology code.
 */
public final class HomologyAlgebra {
    private HomologyAlgebra() {
    }

    /** H(X × Y) from unreduced H(X) and H(Y), in dimensions 0..dim X + dim Y. */
    public static List<HomologyGroup> kunneth(List<HomologyGroup> x, List<HomologyGroup> y) {
        int top = x.size() - 1 + y.size() - 1;
        List<HomologyGroup> out = new ArrayList<>();
        for (int n = 0; n <= top; n++) {
            out.add(combine(n, x, y, n, n - 1));
        }
        return out;
    }

    /**
     * Unreduced H(X * Y) from the unreduced homology of two nonempty spaces, in dimensions
     * 0..dim X + dim Y + 1.
     */
    public static List<HomologyGroup> join(List<HomologyGroup> x, List<HomologyGroup> y) {
        List<HomologyGroup> rx = reduce(x);
        List<HomologyGroup> ry = reduce(y);
        int top = x.size() - 1 + y.size() - 1 + 1;
        List<HomologyGroup> out = new ArrayList<>();
        for (int n = 0; n <= top; n++) {
            HomologyGroup reduced = n == 0 ? HomologyGroup.free(0, 0) : combine(n, rx, ry, n - 1, n - 2);
            out.add(n == 0 ? HomologyGroup.free(0, reduced.betti() + 1) : reduced);
        }
        return out;
    }

    /** One less Z in dimension 0. */
    public static List<HomologyGroup> reduce(List<HomologyGroup> h) {
        List<HomologyGroup> r = new ArrayList<>(h);
        HomologyGroup h0 = h.get(0);
        r.set(0, new HomologyGroup(0, h0.betti() - 1, h0.torsion()));
        return r;
    }

    /** The tensor terms with i + j = tensorSum and the Tor terms with i + j = torSum, as dimension n. */
    private static HomologyGroup combine(int n, List<HomologyGroup> x, List<HomologyGroup> y, int tensorSum, int torSum) {
        int betti = 0;
        List<BigInteger> cyclic = new ArrayList<>();
        for (int i = 0; i < x.size(); i++) {
            for (int j = 0; j < y.size(); j++) {
                HomologyGroup a = x.get(i);
                HomologyGroup b = y.get(j);
                if (i + j == tensorSum) {
                    betti += a.betti() * b.betti();
                    for (int k = 0; k < a.betti(); k++) {
                        cyclic.addAll(b.torsion());
                    }
                    for (int k = 0; k < b.betti(); k++) {
                        cyclic.addAll(a.torsion());
                    }
                    addGcds(a, b, cyclic);
                }
                if (i + j == torSum) {
                    addGcds(a, b, cyclic);
                }
            }
        }
        return new HomologyGroup(n, betti, invariantFactors(cyclic));
    }

    private static void addGcds(HomologyGroup a, HomologyGroup b, List<BigInteger> into) {
        for (BigInteger s : a.torsion()) {
            for (BigInteger t : b.torsion()) {
                BigInteger g = s.gcd(t);
                if (!g.equals(BigInteger.ONE)) {
                    into.add(g);
                }
            }
        }
    }

    /**
     * The invariant factors of a direct sum of cyclic groups: split each into prime powers, then the
     * largest factor takes the largest power of every prime, the next the next largest, and so on
     * (structure theorem of finite abelian groups, common practice).
     */
    public static List<BigInteger> invariantFactors(List<BigInteger> cyclic) {
        TreeMap<BigInteger, List<BigInteger>> powersByPrime = new TreeMap<>();
        for (BigInteger c : cyclic) {
            BigInteger rest = c;
            for (BigInteger p = BigInteger.TWO; rest.compareTo(BigInteger.ONE) > 0; p = p.add(BigInteger.ONE)) {
                BigInteger power = BigInteger.ONE;
                while (rest.mod(p).signum() == 0) {
                    rest = rest.divide(p);
                    power = power.multiply(p);
                }
                if (!power.equals(BigInteger.ONE)) {
                    powersByPrime.computeIfAbsent(p, k -> new ArrayList<>()).add(power);
                }
            }
        }
        int count = 0;
        for (List<BigInteger> powers : powersByPrime.values()) {
            powers.sort(java.util.Comparator.reverseOrder());
            count = Math.max(count, powers.size());
        }
        List<BigInteger> factors = new ArrayList<>();
        for (int k = 0; k < count; k++) {
            BigInteger f = BigInteger.ONE;
            for (List<BigInteger> powers : powersByPrime.values()) {
                if (k < powers.size()) {
                    f = f.multiply(powers.get(k));
                }
            }
            factors.add(f);
        }
        java.util.Collections.reverse(factors);
        return factors;
    }
}
