package dev.morse.generate;

import dev.morse.poset.PosetOperations;

import static dev.morse.generate.CorpusEntry.poset;
import static dev.morse.generate.CorpusEntry.simplicial;

import java.util.ArrayList;
import java.util.List;

/**
 * Every case of the reference corpus with the homology the literature predicts for it. The
 * expected groups come from the cited theorems, never from running this library's homology code.
 */
final class CorpusCatalog {
    private static final String WACHS = "standard; e.g. Wachs, Poset topology: tools and applications, 2007";
    private static final String POLYTOPE = "standard: the boundary of a convex d-polytope is a (d-1)-sphere;"
            + " face lattices of polytopes are shellable (Bruggesser-Mani 1971)";
    private static final String BALL = "standard: a closed convex polytope is a ball, hence contractible";
    private static final String CW_QUOTIENT = "; CW poset: the antipodal quotient of the cube boundary is regular"
            + " (no proper face contains two antipodal faces)";
    private static final String BJORNER = "Bjorner 1980 (EL-shellability of the partition lattice);"
            + " mu(Pi_n) = (-1)^(n-1)(n-1)! in Stanley, Enumerative Combinatorics I";
    private static final String SOLOMON_TITS = "Solomon-Tits theorem (Solomon 1969)";
    private static final String DIVISORS = "standard: (1, N) is a sphere S^(k-2) when N is a product of k distinct"
            + " primes and contractible otherwise; its Moebius function is the number-theoretic one";
    private static final String WALKER = "derived: Walker 1988 (the order complex of P x Q is homeomorphic to the"
            + " product of the order complexes) and the Kunneth formula (Hatcher, Algebraic Topology, 2002, Thm 3B.6)";
    private static final String JOIN = "derived: the order complex of an ordinal sum is the join of the order"
            + " complexes (Wachs 2007); reduced homology of a join: H~_(k+1)(X*Y) = sum over i+j=k of"
            + " H~_i(X) (x) H~_j(Y) plus sum over i+j=k-1 of Tor(H~_i(X), H~_j(Y))";
    private static final String CONE = "standard: a poset with a least or a greatest element has a cone as order"
            + " complex, hence contractible";
    private static final String SURFACE = "standard homology of the surface (classification of surfaces; Hatcher,"
            + " Algebraic Topology, 2002, Ch. 2); GeneratorsTest checks the triangulation is a closed surface of"
            + " the right Euler characteristic and orientability";
    private static final String SKELETON = "standard: the k-skeleton of the (n-1)-simplex is a wedge of C(n-1,k+1)"
            + " k-spheres";

    private CorpusCatalog() {
    }

    /** All cases, in the order of the manifest. */
    static List<CorpusEntry> entries() {
        List<CorpusEntry> e = new ArrayList<>();
        addSpheresAndBalls(e);
        addProjectiveSpaces(e);
        addLattices(e);
        addProductsAndSums(e);
        addSmallPosets(e);
        addSimplicial(e);
        addGraphsAndMeshes(e);
        return List.copyOf(e);
    }

    private static void addSpheresAndBalls(List<CorpusEntry> e) {
        for (int n = 3; n <= 7; n++) {
            int m = n;
            e.add(poset("boolean-" + n + "-proper",
                    "proper part of the Boolean lattice B_" + n + " = face poset of the boundary of the "
                            + (n - 1) + "-simplex, a sphere S^" + (n - 2),
                    WACHS, true, Expected.sphere(n - 2), () -> BooleanLattice.properPart(m)));
        }
        e.add(poset("simplex-3-closed", "nonempty faces of the 3-simplex, the simplex included: a closed 3-ball",
                BALL, true, Expected.contractible(3), () -> SimplexFaces.closedFacePoset(3)));
        for (int d = 2; d <= 5; d++) {
            int m = d;
            e.add(poset("cube-" + d + "-boundary",
                    "nonempty proper faces of the " + d + "-cube (words over 0,1,*): the sphere S^" + (d - 1),
                    POLYTOPE, true, Expected.sphere(d - 1), () -> CubeFaces.boundaryFacePoset(m)));
        }
        for (int d = 2; d <= 5; d++) {
            int m = d;
            e.add(poset("cross-" + d + "-boundary",
                    "nonempty proper faces of the " + d + "-cross-polytope (nonzero sign vectors): the sphere S^"
                            + (d - 1),
                    POLYTOPE, true, Expected.sphere(d - 1), () -> CrossPolytopeFaces.of(FacePart.BOUNDARY, m)));
        }
        e.add(poset("cube-3-closed", "nonempty faces of the 3-cube, the cube included: a closed 3-ball",
                BALL, true, Expected.contractible(3), () -> CubeFaces.closedFacePoset(3)));
        e.add(poset("cross-3-closed", "nonempty faces of the octahedron, the octahedron included: a closed 3-ball",
                BALL, true, Expected.contractible(3), () -> CrossPolytopeFaces.of(FacePart.CLOSED, 3)));
    }

    private static void addProjectiveSpaces(List<CorpusEntry> e) {
        for (int d = 2; d <= 5; d++) {
            int m = d;
            e.add(poset("rp-" + d,
                    "real projective space RP^" + d + ": boundary of the " + (d + 1)
                            + "-cube modulo the antipodal map, one cell per antipodal pair of faces",
                    "Hatcher, Algebraic Topology, 2002, Example 2.42" + CW_QUOTIENT, true,
                    Expected.projectiveSpace(d), () -> ProjectiveSpace.antipodalCubeQuotient(m)));
        }
    }

    private static void addLattices(List<CorpusEntry> e) {
        int factorial = 1;
        for (int n = 4; n <= 6; n++) {
            int m = n;
            factorial = n == 4 ? 6 : factorial * (n - 1);
            e.add(poset("partition-" + n + "-proper",
                    "proper part of the partition lattice Pi_" + n + ": a wedge of " + factorial + " spheres S^"
                            + (n - 3),
                    BJORNER, false, Expected.wedgeOfSpheres(factorial, n - 3, n - 3),
                    () -> PartitionLattice.properPart(m)));
        }
        int[][] subspaces = {{2, 3}, {2, 4}, {2, 5}, {3, 3}, {3, 4}};
        for (int[] qn : subspaces) {
            int q = qn[0];
            int n = qn[1];
            int spheres = 1;
            for (int i = 0; i < n * (n - 1) / 2; i++) {
                spheres *= q;
            }
            e.add(poset("subspace-" + q + "-" + n + "-proper",
                    "proper part of the lattice of subspaces of F_" + q + "^" + n + ": a wedge of " + spheres
                            + " = " + q + "^" + (n * (n - 1) / 2) + " spheres S^" + (n - 2),
                    SOLOMON_TITS, false, Expected.wedgeOfSpheres(spheres, n - 2, n - 2),
                    () -> SubspaceLattice.properPart(q, n)));
        }
        e.add(poset("divisor-30-open", "open interval (1, 30) of the divisor lattice; 30 = 2*3*5: the sphere S^1",
                DIVISORS, true, Expected.sphere(1), () -> DivisorLattice.openInterval(30)));
        e.add(poset("divisor-210-open",
                "open interval (1, 210) of the divisor lattice; 210 = 2*3*5*7: the sphere S^2",
                DIVISORS, true, Expected.sphere(2), () -> DivisorLattice.openInterval(210)));
        e.add(poset("divisor-12-open", "open interval (1, 12) of the divisor lattice; 12 = 2^2*3: contractible",
                DIVISORS, false, Expected.contractible(1), () -> DivisorLattice.openInterval(12)));
        e.add(poset("divisor-60-open", "open interval (1, 60) of the divisor lattice; 60 = 2^2*3*5: contractible",
                DIVISORS, false, Expected.contractible(2), () -> DivisorLattice.openInterval(60)));
        e.add(poset("divisor-72-open", "open interval (1, 72) of the divisor lattice; 72 = 2^3*3^2: contractible",
                DIVISORS, false, Expected.contractible(3), () -> DivisorLattice.openInterval(72)));
    }

    private static void addProductsAndSums(List<CorpusEntry> e) {
        String cwProduct = "; CW poset: a product of regular CW complexes is regular, with the product of the"
                + " face posets as face poset";
        e.add(poset("product-circle-circle",
                "product of two copies of the proper part of B_3 (hexagons): the torus S^1 x S^1",
                WALKER + cwProduct, true, Expected.parse("Z, Z^2, Z"),
                () -> PosetOperations.product(BooleanLattice.properPart(3), BooleanLattice.properPart(3))));
        e.add(poset("product-partition4-circle",
                "proper part of Pi_4 (6 circles wedged) times the proper part of B_3 (a circle)",
                WALKER + "; factors from Bjorner 1980 and Wachs 2007", false, Expected.parse("Z, Z^7, Z^6"),
                () -> PosetOperations.product(PartitionLattice.properPart(4), BooleanLattice.properPart(3))));
        e.add(poset("product-rp2-circle", "RP^2 (antipodal cube quotient) times a circle (proper part of B_3)",
                WALKER + cwProduct, true, Expected.parse("Z, Z + Z/2, Z/2, 0"),
                () -> PosetOperations.product(ProjectiveSpace.antipodalCubeQuotient(2), BooleanLattice.properPart(3))));
        e.add(poset("product-rp2-rp2", "RP^2 x RP^2 from two antipodal cube quotients; H_3 is a Tor term",
                WALKER + cwProduct, true, Expected.parse("Z, Z/2 + Z/2, Z/2, Z/2, 0"),
                () -> PosetOperations.product(ProjectiveSpace.antipodalCubeQuotient(2),
                        ProjectiveSpace.antipodalCubeQuotient(2))));
        e.add(poset("join-circle-circle",
                "ordinal sum of two copies of the proper part of B_3: the join S^1 * S^1 = S^3",
                JOIN + "; CW poset: every lower interval is a join of spheres, a sphere", true, Expected.sphere(3),
                () -> PosetOperations.ordinalSum(PosetOperations.relabel(BooleanLattice.properPart(3), "L"),
                        PosetOperations.relabel(BooleanLattice.properPart(3), "U"))));
        e.add(poset("suspension-rp2", "two points below RP^2 (ordinal sum S^0 + RP^2): the suspension of RP^2",
                JOIN + "; CW poset: every lower interval is S^0 joined with a sphere", true,
                Expected.parse("Z, 0, Z/2, 0"),
                () -> PosetOperations.ordinalSum(SmallPosets.antichain(2, "south"),
                        ProjectiveSpace.antipodalCubeQuotient(2))));
        e.add(poset("rp2-below-two-points",
                "RP^2 below two points (ordinal sum RP^2 + S^0): again the suspension of RP^2, not a CW poset",
                JOIN + "; not a CW poset: below each top point lies RP^2, not a sphere", false,
                Expected.parse("Z, 0, Z/2, 0"),
                () -> PosetOperations.ordinalSum(ProjectiveSpace.antipodalCubeQuotient(2),
                        SmallPosets.antichain(2, "north"))));
        e.add(poset("join-three-three", "ordinal sum of two 3-element antichains: the complete bipartite graph K_3,3",
                JOIN + ": H~_1 = Z^2 (x) Z^2", false, Expected.parse("Z, Z^4"),
                () -> PosetOperations.ordinalSum(SmallPosets.antichain(3, "a"), SmallPosets.antichain(3, "b"))));
        e.add(poset("cone-partition-4", "proper part of Pi_4 with a greatest element added: a cone",
                CONE, false, Expected.contractible(2),
                () -> PosetOperations.ordinalSum(PartitionLattice.properPart(4), SmallPosets.chain(1, "apex"))));
    }

    private static void addSmallPosets(List<CorpusEntry> e) {
        e.add(poset("chain-5", "a chain of 5 elements: its order complex is a 4-simplex", CONE, false,
                Expected.contractible(4), () -> SmallPosets.chain(5)));
        e.add(poset("boolean-4-full", "the whole Boolean lattice B_4, least and greatest elements included",
                CONE, false, Expected.contractible(4), () -> BooleanLattice.lattice(4)));
        e.add(poset("loop", "a circle as one vertex below one loop edge: not regular; the order complex is a segment",
                "common practice: the order complex of v < e is one edge", false, Expected.contractible(1),
                NonRegularCells::loop));
        e.add(poset("two-discs-on-a-loop",
                "a 2-sphere as a vertex, a loop and two discs: not regular; the order complex is two triangles"
                        + " sharing an edge",
                CONE, false, Expected.contractible(2), NonRegularCells::twoDiscsOnALoop));
    }

    private static void addSimplicial(List<CorpusEntry> e) {
        e.add(simplicial("torus-7", "the 7-vertex torus (Moebius, Csaszar): 14 triangles",
                SURFACE, Expected.parse("Z, Z^2, Z"), Triangulations::torus7));
        e.add(simplicial("klein-bottle-8",
                "an 8-vertex Klein bottle, vertex-minimal (Franklin 1934, from memory): 16 triangles",
                SURFACE, Expected.parse("Z, Z + Z/2, 0"), Triangulations::kleinBottle8));
        e.add(simplicial("projective-plane-6", "the 6-vertex real projective plane (half icosahedron): 10 triangles",
                SURFACE + "; Hatcher 2002, Example 2.42", Expected.parse("Z, Z/2, 0"),
                Triangulations::projectivePlane6));
        e.add(simplicial("dunce-hat-8",
                "an 8-vertex dunce hat: contractible, every edge in two or three triangles, so not collapsible",
                "Zeeman 1964 (the dunce hat is contractible); GeneratorsTest checks the edge multiplicities and"
                        + " the Euler characteristic 1",
                Expected.contractible(2), Triangulations::dunceHat8));
        e.add(simplicial("matching-4", "matching complex of K_4: three disjoint edges (the perfect matchings)",
                "common practice: K_4 has three perfect matchings, pairwise sharing no edge", Expected.parse("Z^3, 0"),
                () -> MatchingComplex.facets(4)));
        e.add(simplicial("matching-5", "matching complex of K_5: the Petersen graph",
                "standard: the Petersen graph is connected with 10 vertices and 15 edges, so H_1 = Z^6",
                Expected.parse("Z, Z^6"), () -> MatchingComplex.facets(5)));
        e.add(simplicial("matching-7", "matching complex of K_7: 21 vertices, 105 edges, 105 triangles; 3-torsion",
                "Bouc 1992 (H~_1 = Z/3; rational homology only in dimension 2, from memory); Shareshian-Wachs, Torsion in the"
                        + " matching complex and chessboard complex, 2007; rank 20 derived from the Euler"
                        + " characteristic 21 - 105 + 105 = 21",
                Expected.parse("Z, Z/3, Z^20"), () -> MatchingComplex.facets(7)));
        e.add(simplicial("chessboard-3x3",
                "chessboard complex of the 3x3 board: each edge lies in one triangle, so it collapses to a graph",
                "derived: collapsing each triangle through a free edge leaves a connected graph with 9 vertices"
                        + " and 12 edges (f-vector 9, 18, 6)",
                Expected.parse("Z, Z^4, 0"), () -> ChessboardComplex.facets(3, 3)));
        e.add(simplicial("chessboard-3x4", "chessboard complex of the 3x4 board: a torus with 12 vertices",
                "from memory; GeneratorsTest checks it is a closed orientable surface with Euler characteristic"
                        + " 12 - 36 + 24 = 0, hence a torus",
                Expected.parse("Z, Z^2, Z"), () -> ChessboardComplex.facets(3, 4)));
        int[][] skeleta = {{1, 5}, {2, 6}, {3, 5}, {2, 7}};
        for (int[] kn : skeleta) {
            int k = kn[0];
            int n = kn[1];
            int rank = binomial(n - 1, k + 1);
            e.add(simplicial("skeleton-" + k + "-of-" + n,
                    "the " + k + "-skeleton of the " + (n - 1) + "-simplex: a wedge of " + rank + " spheres S^" + k
                            + (k == n - 2 ? " (the boundary of the simplex)" : ""),
                    SKELETON, Expected.wedgeOfSpheres(rank, k, k), () -> Skeleton.ofSimplex(k, n)));
        }
    }

    private static final String KOZLOV = "Kozlov, Complexes of directed trees, J. Combin. Theory Ser. A 88 (1999):"
            + " Ind(P_n) is S^(k-1) for n = 3k-1 and 3k and contractible for n = 3k+1; Ind(C_n) is"
            + " S^(k-1) v S^(k-1) for n = 3k and S^(k-1) for n = 3k+-1";
    private static final String MESH = "standard homology of the surface (Hatcher, Algebraic Topology, 2002, Ch. 2);"
            + " CW poset: every polygon is simple, so its closure is a disc (common practice)";

    /** Complexes made from graphs and meshes, as the graph and mesh inputs make them. */
    private static void addGraphsAndMeshes(List<CorpusEntry> e) {
        e.add(simplicial("independence-cycle-9", "independence complex of the cycle C_9: a wedge of two 2-spheres",
                KOZLOV, Expected.parse("Z, 0, Z^2, 0"),
                () -> dev.morse.graph.GraphComplexes.independenceComplex(cycleGraph(9))));
        e.add(simplicial("independence-path-11", "independence complex of the path P_11: a 3-sphere up to homotopy",
                KOZLOV, Expected.parse("Z, 0, 0, Z, 0, 0"),
                () -> dev.morse.graph.GraphComplexes.independenceComplex(pathGraph(11))));
        e.add(simplicial("clique-octahedron-graph", "clique complex of the octahedron graph K_{2,2,2}: the boundary"
                + " of the octahedron, S^2", "common practice: the triangles of K_{2,2,2} are the eight faces of the"
                + " octahedron, and it has no 4-cliques", Expected.parse("Z, 0, Z"),
                () -> dev.morse.graph.GraphComplexes.cliqueComplex(octahedronGraph())));
        e.add(poset("mesh-torus-3x4", "face poset of a 3x4 grid of squares on the torus (12 vertices, 24 edges,"
                + " 12 squares)", MESH, true, Expected.parse("Z, Z^2, Z"),
                () -> dev.morse.mesh.MeshReader.parseObj(torusMesh(3, 4), "mesh-torus-3x4").facePoset()));
        e.add(poset("mesh-mobius-3", "face poset of a Moebius band of three squares glued with a half twist",
                "standard: the Moebius band deformation retracts onto its core circle (Hatcher 2002, Ch. 0); CW"
                        + " poset: every polygon is simple (common practice)", true, Expected.parse("Z, Z, 0"),
                () -> dev.morse.mesh.MeshReader.parseObj("v 0 0 0\nv 1 0 0\nv 2 0 0\nv 0 1 0\nv 1 1 0\nv 2 1 0\n"
                        + "f 1 2 5 4\nf 2 3 6 5\nf 3 4 1 6\n", "mesh-mobius-3").facePoset()));
    }

    private static dev.morse.graph.Graph pathGraph(int n) {
        return graph(n, n - 1, i -> i, i -> i + 1);
    }

    private static dev.morse.graph.Graph cycleGraph(int n) {
        return graph(n, n, i -> i, i -> (i + 1) % n);
    }

    /** Vertices 1..6 with 2k-1 and 2k opposite: every pair joined except the three opposite ones. */
    private static dev.morse.graph.Graph octahedronGraph() {
        List<int[]> edges = new ArrayList<>();
        for (int i = 0; i < 6; i++) {
            for (int j = i + 1; j < 6; j++) {
                if (!(i % 2 == 0 && j == i + 1)) {
                    edges.add(new int[] {i, j});
                }
            }
        }
        return graph(6, edges.size(), k -> edges.get(k)[0], k -> edges.get(k)[1]);
    }

    private static dev.morse.graph.Graph graph(int n, int m, java.util.function.IntUnaryOperator u,
            java.util.function.IntUnaryOperator v) {
        String[] labels = new String[n];
        for (int i = 0; i < n; i++) {
            labels[i] = Integer.toString(i + 1);
        }
        int[] us = new int[m];
        int[] vs = new int[m];
        for (int k = 0; k < m; k++) {
            us[k] = u.applyAsInt(k);
            vs[k] = v.applyAsInt(k);
        }
        return dev.morse.graph.Graph.of(labels, us, vs, m);
    }

    /** An m x n grid of squares with opposite sides glued, in OBJ. */
    private static String torusMesh(int m, int n) {
        StringBuilder obj = new StringBuilder();
        for (int k = 0; k < m * n; k++) {
            obj.append("v ").append(k / n).append(' ').append(k % n).append(" 0\n");
        }
        for (int i = 0; i < m; i++) {
            for (int j = 0; j < n; j++) {
                obj.append("f ").append(i * n + j + 1).append(' ').append(i * n + (j + 1) % n + 1).append(' ')
                        .append((i + 1) % m * n + (j + 1) % n + 1).append(' ').append((i + 1) % m * n + j + 1)
                        .append('\n');
            }
        }
        return obj.toString();
    }

    private static int binomial(int n, int k) {
        long c = 1;
        for (int i = 0; i < k; i++) {
            c = c * (n - i) / (i + 1);
        }
        return Math.toIntExact(c);
    }
}
