package dev.morse.generate;

import dev.morse.complex.Facets;
import java.util.ArrayList;
import java.util.List;

/**
 * Small classical triangulations, as their triangles on vertices labelled {@code 1, 2, ...}.
 * GeneratorsTest checks each combinatorially: for the surfaces, every edge in exactly two
 * triangles, every vertex link a circle, the Euler characteristic and orientability, which by the
 * classification of surfaces determine the surface.
 */
public final class Triangulations {
    private Triangulations() {
    }

    /**
     * The 7-vertex torus of Möbius and Császár: triangles {@code {i, i+1, i+3}} and
     * {@code {i, i+2, i+3}} modulo 7; 7 vertices, 21 edges (the complete graph), 14 triangles.
     */
    public static Facets torus7() {
        List<List<String>> out = new ArrayList<>();
        for (int i = 0; i < 7; i++) {
            out.add(modular(7, i, i + 1, i + 3));
            out.add(modular(7, i, i + 2, i + 3));
        }
        return Facets.ofLabels(out);
    }

    /**
     * The 6-vertex real projective plane, the antipodal quotient of the icosahedron: 6 vertices,
     * 15 edges (the complete graph), 10 triangles.
     */
    public static Facets projectivePlane6() {
        return listed(new int[][] {
            {1, 2, 3}, {1, 3, 4}, {1, 4, 5}, {1, 5, 6}, {1, 6, 2},
            {2, 3, 5}, {3, 4, 6}, {4, 5, 2}, {5, 6, 3}, {6, 2, 4},
        });
    }

    /**
     * An 8-vertex Klein bottle, the fewest vertices possible (Franklin 1934): 8 vertices, 24 edges,
     * 16 triangles. Found by an exhaustive search for closed non-orientable surfaces with 8
     * vertices and Euler characteristic 0.
     */
    public static Facets kleinBottle8() {
        return listed(new int[][] {
            {1, 2, 3}, {1, 2, 4}, {1, 3, 5}, {1, 4, 5}, {2, 3, 6}, {2, 4, 7}, {2, 5, 6}, {2, 5, 7},
            {3, 4, 6}, {3, 4, 8}, {3, 5, 7}, {3, 7, 8}, {4, 5, 8}, {4, 6, 7}, {5, 6, 8}, {6, 7, 8},
        });
    }

    /**
     * An 8-vertex dunce hat (Zeeman 1964): a triangle whose sides are glued by the word
     * {@code a a a⁻¹}. Each side is cut into three segments {@code v p q v} (vertices 1, 2, 3), so
     * the boundary of the triangle is a 9-gon reading {@code v p q v p q v q p}; five interior
     * vertices (4..8) each see at most three consecutive boundary points, all of distinct labels,
     * so that no two triangles or edges of the disc become equal after gluing. 8 vertices,
     * 24 edges, 17 triangles; the three glued edges lie in three triangles each, all others in two.
     */
    public static Facets dunceHat8() {
        int v = 1;
        int p = 2;
        int q = 3;
        return listed(new int[][] {
            // boundary segments with their interior vertex
            {4, v, p}, {4, p, q}, {5, q, v}, {5, v, p}, {6, p, q}, {6, q, v}, {7, v, q}, {7, q, p}, {8, p, v},
            // between consecutive interior vertices
            {4, 5, q}, {5, 6, p}, {6, 7, v}, {7, 8, p}, {8, 4, v},
            // the inner pentagon 4 5 6 7 8
            {4, 5, 6}, {4, 6, 7}, {4, 7, 8},
        });
    }

    /**
     * Rudin's non-shellable triangulation of a tetrahedron (M. E. Rudin, "An unshellable triangulation
     * of a tetrahedron", Bull. Amer. Math. Soc. 64, 1958, 90–91): 14 vertices, all on the boundary,
     * and 41 tetrahedra, each written as four letters {@code a..n}. The facet list and its vertex
     * names are those of M. Hachimori's library of simplicial complexes (example "rudin"), as
     * reproduced in published documentation; the counts (14 vertices, 41 tetrahedra, all vertices on
     * the boundary) are Rudin's, and that no tetrahedron can be removed leaving a ball ("strongly
     * non-shellable") is stated by Lutz ("A vertex-minimal non-shellable simplicial 3-ball", Electronic
     * Geometry Models 2003.05.004). HardLibraryTest checks what can be checked: pure of dimension 3,
     * f-vector (14, 66, 94, 41), every triangle in one or two tetrahedra, the homology of a point, a
     * boundary with the homology of a 2-sphere containing every vertex, and no tetrahedron whose removal
     * leaves a homology ball.
     */
    public static Facets rudinBall() {
        List<List<String>> out = new ArrayList<>();
        for (String tetrahedron : new String[] {
            "klmn", "hlmn", "ikmn", "fjmn", "djmn", "fimn", "dhmn", "jkln", "bjln", "bhln", "cjkn", "eikn",
            "egkn", "cgkn", "cfjn", "bdjn", "efin", "bdhn", "gklm", "eilm", "cilm", "ehlm", "cglm", "aikm",
            "agkm", "efim", "acim", "dehm", "acgm", "fjkl", "fhkl", "dhkl", "dgkl", "bfjl", "bfhl", "dehl",
            "cdgl", "cfjk", "aeik", "aegk", "cdgk"
        }) {
            out.add(tetrahedron.chars().mapToObj(c -> String.valueOf((char) c)).toList());
        }
        return Facets.ofLabels(out);
    }

    private static List<String> modular(int n, int... vertices) {
        List<String> face = new ArrayList<>();
        for (int x : vertices) {
            face.add(Integer.toString(x % n + 1));
        }
        return face;
    }

    private static Facets listed(int[][] triangles) {
        List<List<String>> out = new ArrayList<>();
        for (int[] t : triangles) {
            List<String> face = new ArrayList<>();
            for (int x : t) {
                face.add(Integer.toString(x));
            }
            out.add(face);
        }
        return Facets.ofLabels(out);
    }
}
