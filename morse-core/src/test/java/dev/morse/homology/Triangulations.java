package dev.morse.homology;

import java.util.ArrayList;
import java.util.List;

/** Facet lists of classical triangulations, for tests. */
final class Triangulations {
    private Triangulations() {
    }

    /** The 6-vertex real projective plane (half of the icosahedron; classical, from memory). */
    static int[][] projectivePlane() {
        return new int[][] {
            {1, 2, 4}, {1, 2, 6}, {1, 3, 5}, {1, 3, 6}, {1, 4, 5},
            {2, 3, 4}, {2, 3, 5}, {2, 5, 6}, {3, 4, 6}, {4, 5, 6},
        };
    }

    /** The 7-vertex torus of Möbius and Császár: triangles {i, i+1, i+3} and {i, i+2, i+3} mod 7. */
    static int[][] sevenVertexTorus() {
        int[][] f = new int[14][];
        for (int i = 0; i < 7; i++) {
            f[2 * i] = new int[] {i, (i + 1) % 7, (i + 3) % 7};
            f[2 * i + 1] = new int[] {i, (i + 2) % 7, (i + 3) % 7};
        }
        return f;
    }

    /** The boundary of the d-simplex on vertices 0..d: a (d-1)-sphere. */
    static int[][] simplexBoundary(int d) {
        int[][] f = new int[d + 1][];
        for (int skip = 0; skip <= d; skip++) {
            int[] face = new int[d];
            for (int v = 0, k = 0; v <= d; v++) {
                if (v != skip) {
                    face[k++] = v;
                }
            }
            f[skip] = face;
        }
        return f;
    }

    /**
     * An n×n grid of squares, each cut along a diagonal, glued left to right plainly and bottom to
     * top plainly (a torus) or with a reflection (a Klein bottle): the square model of both
     * surfaces (e.g. Hatcher, Algebraic Topology, 2002, §2.1).
     */
    static int[][] gridSurface(int n, boolean twisted) {
        List<int[]> f = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                int a = vertex(i, j, n, twisted);
                int b = vertex(i + 1, j, n, twisted);
                int c = vertex(i + 1, j + 1, n, twisted);
                int d = vertex(i, j + 1, n, twisted);
                f.add(new int[] {a, b, c});
                f.add(new int[] {a, d, c});
            }
        }
        return f.toArray(new int[0][]);
    }

    private static int vertex(int i, int j, int n, boolean twisted) {
        if (j == n) {
            j = 0;
            i = twisted ? n - i : i;
        }
        return Math.floorMod(i, n) * n + j;
    }

    /**
     * The 3-torus as an n×n×n periodic grid of cubes, each cut into 6 tetrahedra along its main
     * diagonal (the Freudenthal subdivision).
     */
    static int[][] threeTorus(int n) {
        int[][] orders = {{0, 1, 2}, {0, 2, 1}, {1, 0, 2}, {1, 2, 0}, {2, 0, 1}, {2, 1, 0}};
        List<int[]> f = new ArrayList<>();
        for (int x = 0; x < n; x++) {
            for (int y = 0; y < n; y++) {
                for (int z = 0; z < n; z++) {
                    for (int[] order : orders) {
                        int[] corner = {x, y, z};
                        int[] t = new int[4];
                        t[0] = cube(corner, n);
                        for (int k = 0; k < 3; k++) {
                            corner[order[k]]++;
                            t[k + 1] = cube(corner, n);
                        }
                        f.add(t);
                    }
                }
            }
        }
        return f.toArray(new int[0][]);
    }

    private static int cube(int[] c, int n) {
        return ((c[0] % n) * n + c[1] % n) * n + c[2] % n;
    }
}
