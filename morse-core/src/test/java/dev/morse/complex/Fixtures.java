package dev.morse.complex;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.morse.homology.Coefficients;
import dev.morse.homology.Homology;
import dev.morse.homology.HomologyCalculator;
import dev.morse.homology.HomologyGroup;
import dev.morse.io.PosetReader;
import dev.morse.poset.OrderCycleException;
import dev.morse.poset.Poset;
import dev.morse.poset.PosetBuilder;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Random;

/** Posets and assertions shared by the tests of this package. */
public final class Fixtures {
    private Fixtures() {
    }

    public static Poset poset(String body) {
        return PosetReader.parse("morse-poset 1\n" + body, "test");
    }

    public static Poset build(PosetBuilder builder) {
        try {
            return builder.build();
        } catch (OrderCycleException e) {
            throw new AssertionError("the fixture has a cycle", e);
        }
    }

    /** Integral homology, each group as text ("Z", "Z^2", "Z/2", "0"), dimensions 0 to the top. */
    public static List<String> homology(ChainComplex complex) {
        Homology h = HomologyCalculator.compute(complex, Coefficients.INTEGERS);
        List<String> groups = new ArrayList<>();
        for (HomologyGroup g : h.groups()) {
            groups.add(g.toString());
        }
        return groups;
    }

    /** Checks ∂∂ = 0, that faces lie one dimension down, and that the coboundary is the transpose. */
    public static void assertChainComplex(ChainComplex complex) {
        Boundary b = complex.boundary();
        assertEquals(complex.cellCount(), b.cellCount());
        long[] sum = new long[complex.cellCount()];
        int[] stamp = new int[complex.cellCount()];
        Arrays.fill(stamp, -1);
        List<Integer> touched = new ArrayList<>();
        for (int c = 0; c < complex.cellCount(); c++) {
            int d = complex.dimensionOf(c);
            touched.clear();
            for (int i = b.start(c); i < b.end(c); i++) {
                int f = b.target(i);
                assertEquals(d - 1, complex.dimensionOf(f), "face of " + complex.cellName(c));
                for (int j = b.start(f); j < b.end(f); j++) {
                    int g = b.target(j);
                    if (stamp[g] != c) {
                        stamp[g] = c;
                        sum[g] = 0;
                        touched.add(g);
                    }
                    sum[g] += (long) b.coefficient(i) * b.coefficient(j);
                }
            }
            for (int g : touched) {
                assertEquals(0, sum[g], "∂∂ of " + complex.cellName(c) + " at " + complex.cellName(g));
            }
        }
        Boundary co = complex.coboundary();
        assertEquals(b.entryCount(), co.entryCount());
        for (int c = 0; c < complex.cellCount(); c++) {
            for (int i = b.start(c); i < b.end(c); i++) {
                assertEquals(b.coefficient(i), co.coefficient(b.target(i), c));
            }
        }
    }

    /** Every incidence number is ±1 and every cell of positive dimension has a face. */
    public static void assertUnitIncidences(ChainComplex complex) {
        Boundary b = complex.boundary();
        for (int c = 0; c < complex.cellCount(); c++) {
            assertTrue(complex.dimensionOf(c) == 0 || b.size(c) > 0, complex.cellName(c));
            for (int i = b.start(c); i < b.end(c); i++) {
                assertEquals(1, Math.abs(b.coefficient(i)));
            }
        }
    }

    /** The nonempty proper subsets of {1..n} ordered by inclusion, labelled like "134". */
    public static Poset booleanProperPart(int n) {
        PosetBuilder b = new PosetBuilder();
        int full = (1 << n) - 1;
        for (int s = 1; s < full; s++) {
            int upper = b.element(subsetLabel(s, n));
            for (int i = 0; i < n; i++) {
                int smaller = s & ~(1 << i);
                if (smaller != s && smaller != 0) {
                    b.relate(b.element(subsetLabel(smaller, n)), upper, 0);
                }
            }
        }
        return build(b);
    }

    private static String subsetLabel(int s, int n) {
        StringBuilder label = new StringBuilder();
        for (int i = 0; i < n; i++) {
            if ((s & (1 << i)) != 0) {
                label.append(i + 1);
            }
        }
        return label.toString();
    }

    /** The product order on P × Q; its covers change one coordinate by a cover. */
    public static Poset product(Poset p, Poset q) {
        PosetBuilder b = new PosetBuilder();
        for (int x = 0; x < p.size(); x++) {
            for (int y = 0; y < q.size(); y++) {
                int upper = b.element(pair(p, x, q, y));
                for (int x2 : p.lowerCovers().neighbours(x)) {
                    b.relate(b.element(pair(p, x2, q, y)), upper, 0);
                }
                for (int y2 : q.lowerCovers().neighbours(y)) {
                    b.relate(b.element(pair(p, x, q, y2)), upper, 0);
                }
            }
        }
        return build(b);
    }

    private static String pair(Poset p, int x, Poset q, int y) {
        return "(" + p.label(x) + "," + q.label(y) + ")";
    }

    /** The poset with one more element above everything. */
    public static Poset withTop(Poset p, String topLabel) {
        PosetBuilder b = new PosetBuilder();
        int top = b.element(topLabel);
        for (int x = 0; x < p.size(); x++) {
            int ex = b.element(p.label(x));
            for (int y : p.lowerCovers().neighbours(x)) {
                b.relate(b.element(p.label(y)), ex, 0);
            }
            if (p.upperCovers().degree(x) == 0) {
                b.relate(ex, top, 0);
            }
        }
        return build(b);
    }

    /**
     * The faces of the boundary of the cube [-1,1]^k as sign vectors in {-,0,+}^k other than 0...0:
     * a 0 marks a free coordinate, so the dimension is the number of zeros, and g lies below f when
     * f agrees with g on the coordinates f fixes.
     */
    public static List<int[]> cubeBoundaryFaces(int k) {
        List<int[]> faces = new ArrayList<>();
        int[] v = new int[k];
        Arrays.fill(v, -1);
        while (true) {
            if (Arrays.stream(v).anyMatch(t -> t != 0)) {
                faces.add(v.clone());
            }
            int i = 0;
            while (i < k && v[i] == 1) {
                v[i] = -1;
                i++;
            }
            if (i == k) {
                return faces;
            }
            v[i]++;
        }
    }

    /** The faces obtained from {@code face} by fixing one free coordinate to -1 or +1. */
    public static List<int[]> lowerCoversOfCubeFace(int[] face) {
        List<int[]> covers = new ArrayList<>();
        for (int i = 0; i < face.length; i++) {
            if (face[i] == 0) {
                for (int s = -1; s <= 1; s += 2) {
                    int[] g = face.clone();
                    g[i] = s;
                    covers.add(g);
                }
            }
        }
        return covers;
    }

    public static String signLabel(int[] face) {
        StringBuilder s = new StringBuilder();
        for (int t : face) {
            s.append(t < 0 ? '-' : t > 0 ? '+' : '0');
        }
        return s.toString();
    }

    /** The face poset of the boundary of the k-cube. */
    public static Poset cubeBoundary(int k) {
        PosetBuilder b = new PosetBuilder();
        for (int[] f : cubeBoundaryFaces(k)) {
            int upper = b.element(signLabel(f));
            for (int[] g : lowerCoversOfCubeFace(f)) {
                b.relate(b.element(signLabel(g)), upper, 0);
            }
        }
        return build(b);
    }

    /** The antipodal class of a cube face, named by the representative whose first nonzero sign is +. */
    public static String antipodalLabel(int[] face) {
        int first = 0;
        while (face[first] == 0) {
            first++;
        }
        int[] rep = face.clone();
        if (rep[first] < 0) {
            for (int i = 0; i < rep.length; i++) {
                rep[i] = -rep[i];
            }
        }
        return "[" + signLabel(rep) + "]";
    }

    /** The face poset of the cube boundary modulo the antipodal map x -> -x. */
    public static Poset antipodalCubeQuotient(int k) {
        PosetBuilder b = new PosetBuilder();
        for (int[] f : cubeBoundaryFaces(k)) {
            int upper = b.element(antipodalLabel(f));
            for (int[] g : lowerCoversOfCubeFace(f)) {
                b.relate(b.element(antipodalLabel(g)), upper, 0);
            }
        }
        return build(b);
    }

    /**
     * The face poset of the cubical grid [0,m]^k: a cell is a point of {0..2m}^k whose odd
     * coordinates are its unit intervals; it covers the cells that fix one odd coordinate to an
     * even neighbour. Labelled by coordinates joined with dots.
     */
    public static Poset cubicalGrid(int m, int k) {
        PosetBuilder b = new PosetBuilder();
        int side = 2 * m + 1;
        int total = 1;
        for (int i = 0; i < k; i++) {
            total *= side;
        }
        int[] c = new int[k];
        for (int index = 0; index < total; index++) {
            int rest = index;
            for (int i = 0; i < k; i++) {
                c[i] = rest % side;
                rest /= side;
            }
            int upper = b.element(gridLabel(c));
            for (int i = 0; i < k; i++) {
                if (c[i] % 2 == 1) {
                    for (int s = -1; s <= 1; s += 2) {
                        c[i] += s;
                        b.relate(b.element(gridLabel(c)), upper, 0);
                        c[i] -= s;
                    }
                }
            }
        }
        return build(b);
    }

    private static String gridLabel(int[] c) {
        StringBuilder s = new StringBuilder();
        for (int i = 0; i < c.length; i++) {
            s.append(i > 0 ? "." : "").append(c[i]);
        }
        return s.toString();
    }

    /** A random poset: relations i < j for i < j with the given probability, elements 0..n-1 labelled "p0".. */
    public static Poset randomPoset(Random random, int n, double density) {
        PosetBuilder b = new PosetBuilder();
        for (int i = 0; i < n; i++) {
            b.element("p" + i);
        }
        for (int j = 0; j < n; j++) {
            for (int i = 0; i < j; i++) {
                if (random.nextDouble() < density) {
                    b.relate(i, j, 0);
                }
            }
        }
        return build(b);
    }
}
