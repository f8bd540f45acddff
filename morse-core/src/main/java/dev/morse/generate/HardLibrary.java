package dev.morse.generate;

import java.util.List;

/**
 * Complexes on which matching heuristics are known to struggle, or whose optimal Morse matching is
 * known, for comparing heuristics with the optimum ({@code dev.morse.matching.OptimalMatchingSolver}).
 * Each entry names its source; optimal vectors are given only where the literature gives them.
 */
public final class HardLibrary {
    private HardLibrary() {
    }

    /** Every complex of the library, smallest first within each family. */
    public static List<HardComplex> all() {
        return List.of(
                new HardComplex("dunce-hat", new Generated.OfFacets(Triangulations.dunceHat8(), "an 8-vertex dunce hat"),
                        new int[] {1, 1, 1},
                        "Zeeman 1964: contractible, not collapsible; no free edge, so every Morse matching leaves a"
                                + " critical cell in dimensions 0, 1 and 2 (Forman 1998), and (1, 1, 1) is reached"),
                new HardComplex("bings-house", Families.bingsHouse(), null,
                        "Bing 1964 (from memory); contractible without free faces, so at least (1, 1, 1) by the same argument"),
                new HardComplex("rp2-6", new Generated.OfFacets(Triangulations.projectivePlane6(),
                        "the 6-vertex real projective plane"), new int[] {1, 1, 1},
                        "H = Z, Z/2, 0 (Hatcher 2002, Ex. 2.42): the Morse bound β_k + t_k + t_(k−1) is (1, 1, 1)"),
                new HardComplex("torus-7", new Generated.OfFacets(Triangulations.torus7(), "the 7-vertex torus"),
                        new int[] {1, 2, 1}, "H = Z, Z^2, Z (Möbius, Császár): the Morse bound is (1, 2, 1)"),
                sum(7, new int[] {0, 1, 2}, new int[] {1, 0, 0},
                        "an arithmetic progression, so 2-collapsible (Linial–Meshulam–Rosenthal 2010);"
                                + " what is left is a tree, so collapsible"),
                sum(7, new int[] {0, 1, 3}, null, "not an arithmetic progression, so not 2-collapsible (LMR 2010)"),
                sum(7, new int[] {0, 1, 2, 4}, null, "7 prime: a 3-hypertree, not 3-collapsible (LMR 2010)"),
                sum(11, new int[] {0, 1, 3}, null, "11 prime: a 2-hypertree, not 2-collapsible (LMR 2010)"),
                sum(13, new int[] {0, 1, 4}, null, "13 prime: a 2-hypertree, not 2-collapsible (LMR 2010)"),
                sum(17, new int[] {0, 1, 3}, null, "17 prime: a 2-hypertree, not 2-collapsible (LMR 2010)"),
                sum(19, new int[] {0, 2, 7}, null, "19 prime: a 2-hypertree, not 2-collapsible (LMR 2010)"),
                sum(11, new int[] {0, 1, 2, 4}, null, "11 prime: a 3-hypertree, not 3-collapsible (LMR 2010)"),
                sum(13, new int[] {0, 2, 5, 6}, null, "13 prime: a 3-hypertree, not 3-collapsible (LMR 2010)"),
                new HardComplex("matching-k7", new Generated.OfFacets(MatchingComplex.facets(7),
                        "the matching complex of K_7"), null, "H_1 = Z/3 (Bouc 1992)"),
                new HardComplex("chessboard-4x5", new Generated.OfFacets(ChessboardComplex.facets(4, 5),
                        "the chessboard complex of the 4x5 board"), null,
                        "chessboard complexes: Björner, Lovász, Vrećica and Živaljević 1994 (from memory)"),
                new HardComplex("rudin-ball", new Generated.OfFacets(Triangulations.rudinBall(),
                        "Rudin's non-shellable ball"), new int[] {1, 0, 0, 0},
                        "Rudin 1958: a triangulated tetrahedron with 14 vertices, all on the boundary, and 41"
                                + " tetrahedra that is not shellable; strongly so, no tetrahedron meets the boundary in a"
                                + " disc (Lutz 2003). Collapsible (Benedetti and Lutz 2014, from memory); the exact"
                                + " solver proves (1, 0, 0, 0), which by Forman 1998 shows the collapse"),
                new HardComplex("simplex-4-ball", new Generated.OfPoset(SimplexFaces.closedFacePoset(4),
                        "the closed 4-simplex"), new int[] {1, 0, 0, 0, 0},
                        "a simplex is collapsible (Whitehead 1939), so (1, 0, ...) is optimal"),
                new HardComplex("cube-3-ball", new Generated.OfPoset(CubeFaces.closedFacePoset(3), "the closed 3-cube"),
                        new int[] {1, 0, 0, 0}, "a cube is collapsible (Whitehead 1939), so (1, 0, ...) is optimal"));
    }

    /** The sum complex {@code X_A} on Z/n ({@link SumComplex}). */
    public static HardComplex sum(int n, int[] a, int[] optimum, String source) {
        StringBuilder name = new StringBuilder("sum-" + n + "-");
        for (int i = 0; i < a.length; i++) {
            name.append(i > 0 ? "." : "").append(a[i]);
        }
        return new HardComplex(name.toString(), Families.sumComplex(n, a), optimum,
                "Linial, Meshulam and Rosenthal 2010; " + source);
    }
}
