package dev.morse.testing;

import dev.morse.complex.Facets;
import dev.morse.poset.OrderCycleException;
import dev.morse.poset.Poset;
import dev.morse.poset.PosetBuilder;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;

/** Seeded random posets, simplicial complexes and cubical complexes for property tests. */
public final class RandomInputs {
    private RandomInputs() {
    }

    /** A random poset on {@code n} elements: each pair i < j (in id order) related with probability p. */
    public static Poset poset(SplittableRandom random, int n, double p) {
        PosetBuilder b = new PosetBuilder();
        for (int i = 0; i < n; i++) {
            b.element("p" + i);
        }
        for (int i = 0; i < n; i++) {
            for (int j = i + 1; j < n; j++) {
                if (random.nextDouble() < p) {
                    b.relate(i, j, 0);
                }
            }
        }
        return build(b);
    }

    /** Random faces over {@code vertices} vertices, each of 1 to {@code maxSize} vertices. */
    public static Facets simplicial(SplittableRandom random, int vertices, int faces, int maxSize) {
        List<List<String>> list = new ArrayList<>();
        for (int f = 0; f < faces; f++) {
            int size = 1 + random.nextInt(maxSize);
            List<String> face = new ArrayList<>();
            while (face.size() < Math.min(size, vertices)) {
                String v = "v" + random.nextInt(vertices);
                if (!face.contains(v)) {
                    face.add(v);
                }
            }
            list.add(face);
        }
        return Facets.ofLabels(list);
    }

    /**
     * The face poset of the cubical complex made of a random set of unit cubes in an
     * {@code a × b × c} block (each cube kept with probability {@code density}); empty when none is kept.
     * Cells are named by doubled coordinates; odd coordinates are the directions a cell spans.
     */
    public static Poset cubical(SplittableRandom random, int a, int b, int c, double density) {
        boolean[][][] keep = new boolean[a][b][c];
        for (int x = 0; x < a; x++) {
            for (int y = 0; y < b; y++) {
                for (int z = 0; z < c; z++) {
                    keep[x][y][z] = random.nextDouble() < density;
                }
            }
        }
        return cubicalFacePoset(keep);
    }

    /** The face poset of the union of the closed unit cubes marked in {@code keep}. */
    public static Poset cubicalFacePoset(boolean[][][] keep) {
        int a = keep.length;
        int b = a == 0 ? 0 : keep[0].length;
        int c = b == 0 ? 0 : keep[0][0].length;
        boolean[][][] present = new boolean[2 * a + 1][2 * b + 1][2 * c + 1];
        for (int x = 0; x < a; x++) {
            for (int y = 0; y < b; y++) {
                for (int z = 0; z < c; z++) {
                    if (keep[x][y][z]) {
                        for (int i = 0; i <= 2; i++) {
                            for (int j = 0; j <= 2; j++) {
                                for (int k = 0; k <= 2; k++) {
                                    present[2 * x + i][2 * y + j][2 * z + k] = true;
                                }
                            }
                        }
                    }
                }
            }
        }
        PosetBuilder builder = new PosetBuilder();
        for (int x = 0; x <= 2 * a; x++) {
            for (int y = 0; y <= 2 * b; y++) {
                for (int z = 0; z <= 2 * c; z++) {
                    if (!present[x][y][z]) {
                        continue;
                    }
                    int cell = builder.element(name(x, y, z));
                    int[][] steps = {{1, 0, 0}, {0, 1, 0}, {0, 0, 1}};
                    int[] coordinate = {x, y, z};
                    for (int[] s : steps) {
                        int axis = s[0] == 1 ? 0 : s[1] == 1 ? 1 : 2;
                        if (coordinate[axis] % 2 == 1) {
                            builder.relate(builder.element(name(x - s[0], y - s[1], z - s[2])), cell, 0);
                            builder.relate(builder.element(name(x + s[0], y + s[1], z + s[2])), cell, 0);
                        }
                    }
                }
            }
        }
        return build(builder);
    }

    private static String name(int x, int y, int z) {
        return "c" + x + "." + y + "." + z;
    }

    private static Poset build(PosetBuilder b) {
        try {
            return b.build();
        } catch (OrderCycleException e) {
            throw new AssertionError("generated relations follow id order and cannot cycle", e);
        }
    }
}
