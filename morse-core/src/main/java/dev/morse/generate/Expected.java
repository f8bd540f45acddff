package dev.morse.generate;

import dev.morse.homology.HomologyGroup;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

/**
 * Unreduced integral homology written the way it is stated in theorems: {@code "Z, Z + Z/2, 0"}
 * lists H_0, H_1, H_2; a group is {@code 0} or summands {@code Z}, {@code Z^k}, {@code Z/t}
 * joined by {@code +}. Also the shapes that recur: spheres, wedges of spheres, contractible spaces.
 */
final class Expected {
    private Expected() {
    }

    /** Parses a comma-separated list of groups, H_0 first. */
    static List<HomologyGroup> parse(String text) {
        List<HomologyGroup> groups = new ArrayList<>();
        String[] parts = text.split(",");
        for (int d = 0; d < parts.length; d++) {
            groups.add(group(d, parts[d].strip()));
        }
        return List.copyOf(groups);
    }

    private static HomologyGroup group(int d, String text) {
        if (text.equals("0")) {
            return HomologyGroup.free(d, 0);
        }
        int betti = 0;
        List<BigInteger> torsion = new ArrayList<>();
        for (String summand : text.split("\\+")) {
            String s = summand.strip();
            if (s.equals("Z")) {
                betti++;
            } else if (s.startsWith("Z^")) {
                betti += Integer.parseInt(s.substring(2));
            } else if (s.startsWith("Z/")) {
                torsion.add(new BigInteger(s.substring(2)));
            } else {
                throw new IllegalArgumentException("not a group: '" + text + "'");
            }
        }
        Collections.sort(torsion);
        return new HomologyGroup(d, betti, torsion);
    }

    /** A wedge of {@code count} spheres of dimension {@code d}, listed in dimensions {@code 0..top}. */
    static List<HomologyGroup> wedgeOfSpheres(int count, int d, int top) {
        List<HomologyGroup> groups = new ArrayList<>();
        for (int i = 0; i <= top; i++) {
            int betti = (i == 0 ? 1 : 0) + (i == d ? count : 0);
            groups.add(HomologyGroup.free(i, betti));
        }
        return List.copyOf(groups);
    }

    /** The sphere {@code S^d} in dimensions {@code 0..d}. */
    static List<HomologyGroup> sphere(int d) {
        return wedgeOfSpheres(1, d, d);
    }

    /** A contractible space (a point's homology) in dimensions {@code 0..top}. */
    static List<HomologyGroup> contractible(int top) {
        return wedgeOfSpheres(0, 0, top);
    }

    /**
     * Real projective space {@code RP^n}: Z in dimension 0, Z/2 in odd dimensions below n, Z in
     * dimension n when n is odd, 0 otherwise (Hatcher, Algebraic Topology, 2002, Example 2.42).
     */
    static List<HomologyGroup> projectiveSpace(int n) {
        List<HomologyGroup> groups = new ArrayList<>();
        groups.add(HomologyGroup.free(0, 1));
        for (int k = 1; k <= n; k++) {
            if (k % 2 == 1 && k < n) {
                groups.add(new HomologyGroup(k, 0, List.of(BigInteger.TWO)));
            } else {
                groups.add(HomologyGroup.free(k, k == n && n % 2 == 1 ? 1 : 0));
            }
        }
        return List.copyOf(groups);
    }

    /** Like {@code H0 = Z, H1 = Z/2}. */
    static String summary(List<HomologyGroup> groups) {
        StringBuilder s = new StringBuilder();
        for (HomologyGroup g : groups) {
            if (s.length() > 0) {
                s.append(", ");
            }
            s.append('H').append(g.dimension()).append(" = ").append(g);
        }
        return s.toString();
    }
}
