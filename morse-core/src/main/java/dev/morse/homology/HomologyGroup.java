package dev.morse.homology;

import java.math.BigInteger;
import java.util.List;

/**
 * Homology in one dimension: free rank (the Betti number over the chosen coefficients) and the
 * torsion invariant factors, each greater than 1, ascending, each dividing the next.
 */
public record HomologyGroup(int dimension, int betti, List<BigInteger> torsion) {
    /** Validates and copies. */
    public HomologyGroup {
        if (betti < 0) {
            throw new IllegalArgumentException("negative Betti number");
        }
        torsion = List.copyOf(torsion);
        for (int i = 0; i < torsion.size(); i++) {
            BigInteger t = torsion.get(i);
            if (t.compareTo(BigInteger.ONE) <= 0) {
                throw new IllegalArgumentException("torsion factors must exceed 1");
            }
            if (i > 0 && !t.mod(torsion.get(i - 1)).equals(BigInteger.ZERO)) {
                throw new IllegalArgumentException("torsion factors must divide one another");
            }
        }
    }

    /** A group without torsion. */
    public static HomologyGroup free(int dimension, int betti) {
        return new HomologyGroup(dimension, betti, List.of());
    }

    /** Whether the group is zero. */
    public boolean isTrivial() {
        return betti == 0 && torsion.isEmpty();
    }

    /** Like {@code Z^2 + Z/2}, or {@code 0}. */
    @Override
    public String toString() {
        StringBuilder s = new StringBuilder();
        if (betti > 0) {
            s.append(betti == 1 ? "Z" : "Z^" + betti);
        }
        for (BigInteger t : torsion) {
            s.append(s.length() > 0 ? " + " : "").append("Z/").append(t);
        }
        return s.length() == 0 ? "0" : s.toString();
    }
}
