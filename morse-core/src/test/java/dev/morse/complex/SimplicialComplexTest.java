package dev.morse.complex;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.morse.io.SimplicialReader;
import dev.morse.poset.Poset;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.Set;
import java.util.TreeSet;
import org.junit.jupiter.api.Test;

class SimplicialComplexTest {

    private static SimplicialComplex complex(String body) {
        return SimplicialComplex.of(SimplicialReader.parse("morse-simplicial 1\n" + body, "test"));
    }

    /** Every edge of the listed triangles lies in exactly two of them: a closed pseudo-surface. */
    private static void assertEachEdgeInTwoTriangles(SimplicialComplex k) {
        Boundary co = k.coboundary();
        for (int e = k.firstCell(1); e < k.firstCell(2); e++) {
            assertEquals(2, co.size(e), k.cellName(e));
        }
    }

    @Test
    void facePosetOfTriangleCoversFacesByInclusion() {
        // the closed triangle {1 2 3}, worked by hand: 7 nonempty faces; each edge covers its two
        // vertices and the triangle its three edges, 9 covers
        SimplicialComplex k = complex("1 2 3\n");
        Poset faces = k.facePoset();
        assertEquals(7, faces.size());
        assertEquals(9, faces.coverCount());
        int triangle = faces.find("{1 2 3}").orElseThrow();
        int edge = faces.find("{1 2}").orElseThrow();
        int vertex = faces.find("{1}").orElseThrow();
        assertTrue(faces.isBelow(edge, triangle));
        assertTrue(faces.isBelow(vertex, edge));
        assertFalse(faces.isBelow(faces.find("{3}").orElseThrow(), edge));
    }

    @Test
    void boundaryOfTetrahedronIsTheTwoSphere() {
        // ∂Δ^3 is S^2 (standard): f = (4, 6, 4), H = Z, 0, Z
        SimplicialComplex k = complex("1 2 3\n1 2 4\n1 3 4\n2 3 4\n");
        assertArrayEquals(new int[] {4, 6, 4}, k.cellCounts());
        Fixtures.assertChainComplex(k);
        assertEquals(List.of("Z", "0", "Z"), Fixtures.homology(k));
    }

    @Test
    void sixVertexProjectivePlane() {
        // the 6-vertex RP^2 (from memory; the half-icosahedron), checked here: all 15 edges of K_6,
        // each in two triangles, Euler characteristic 6 - 15 + 10 = 1. H = Z, Z/2, 0 (Hatcher,
        // Algebraic Topology, 2002, Example 2.42)
        SimplicialComplex k = complex("""
                1 2 4
                1 2 6
                1 3 5
                1 3 6
                1 4 5
                2 3 4
                2 3 5
                2 5 6
                3 4 6
                4 5 6
                """);
        assertArrayEquals(new int[] {6, 15, 10}, k.cellCounts());
        assertEachEdgeInTwoTriangles(k);
        Fixtures.assertChainComplex(k);
        assertEquals(List.of("Z", "Z/2", "0"), Fixtures.homology(k));
    }

    @Test
    void sevenVertexTorus() {
        // Möbius' 7-vertex torus (from memory): triangles {i, i+1, i+3} and {i, i+2, i+3} mod 7, checked
        // here: all 21 edges of K_7, each in two triangles, Euler characteristic 7 - 21 + 14 = 0.
        // H = Z, Z^2, Z (standard)
        StringBuilder text = new StringBuilder();
        for (int i = 0; i < 7; i++) {
            text.append(i).append(' ').append((i + 1) % 7).append(' ').append((i + 3) % 7).append('\n');
            text.append(i).append(' ').append((i + 2) % 7).append(' ').append((i + 3) % 7).append('\n');
        }
        SimplicialComplex k = complex(text.toString());
        assertArrayEquals(new int[] {7, 21, 14}, k.cellCounts());
        assertEachEdgeInTwoTriangles(k);
        Fixtures.assertChainComplex(k);
        assertEquals(List.of("Z", "Z^2", "Z"), Fixtures.homology(k));
    }

    @Test
    void repeatedAndContainedFacesAreCountedOnce() {
        SimplicialComplex once = complex("a b c\n");
        SimplicialComplex repeated = complex("c b a\na b\nb a c\nc\na c b\n");
        assertArrayEquals(once.cellCounts(), repeated.cellCounts());
        assertArrayEquals(new int[] {3, 3, 1}, repeated.cellCounts());
    }

    @Test
    void simplicesAreAscendingAndNamedByLabels() {
        SimplicialComplex k = complex("z y x\n");
        int top = k.firstCell(2);
        assertArrayEquals(new int[] {0, 1, 2}, k.simplex(top));
        assertEquals("{z y x}", k.cellName(top));
        // ∂[0 1 2] = [1 2] - [0 2] + [0 1]
        Boundary b = k.boundary();
        List<String> faces = new ArrayList<>();
        for (int i = b.start(top); i < b.end(top); i++) {
            faces.add((b.coefficient(i) > 0 ? "+" : "-") + k.cellName(b.target(i)));
        }
        assertEquals(List.of("+{y x}", "-{z x}", "+{z y}"), faces);
    }

    @Test
    void randomFaceListsGiveAllSubsetsAndSquareToZero() {
        // faces compared with all subsets of the listed faces, enumerated by bit masks
        Random random = new Random(7L);
        for (int trial = 0; trial < 30; trial++) {
            int vertices = 5 + random.nextInt(6);
            int faces = 1 + random.nextInt(8);
            StringBuilder text = new StringBuilder();
            Set<Integer> expected = new TreeSet<>();
            for (int f = 0; f < faces; f++) {
                int mask = 0;
                while (mask == 0) {
                    mask = random.nextInt(1 << vertices) & random.nextInt(1 << vertices);
                }
                for (int v = 0; v < vertices; v++) {
                    if ((mask >> v & 1) == 1) {
                        text.append('v').append(v).append(' ');
                    }
                }
                text.append('\n');
                for (int sub = mask; sub > 0; sub = (sub - 1) & mask) {
                    expected.add(sub);
                }
            }
            SimplicialComplex k = complex(text.toString());
            Fixtures.assertChainComplex(k);
            Map<Integer, Integer> perDimension = new HashMap<>();
            for (int s : expected) {
                perDimension.merge(Integer.bitCount(s) - 1, 1, Integer::sum);
            }
            for (int d = 0; d <= k.dimension(); d++) {
                assertEquals(perDimension.getOrDefault(d, 0), k.cellCount(d), "trial " + trial + " dimension " + d);
            }
            assertEquals(expected.size(), k.cellCount());
        }
    }

    @Test
    void hugeFaceIsRefused() {
        // a face of 40 vertices has 2^40 - 1 nonempty subsets
        StringBuilder text = new StringBuilder();
        for (int v = 0; v < 40; v++) {
            text.append('v').append(v).append(' ');
        }
        assertThrows(IllegalStateException.class, () -> complex(text + "\n"));
        assertThrows(IllegalStateException.class, () -> SimplicialComplex.of(
                SimplicialReader.parse("morse-simplicial 1\na b c\n", "test"), 6));
    }
}
