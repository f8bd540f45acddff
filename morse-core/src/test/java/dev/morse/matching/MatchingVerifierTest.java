package dev.morse.matching;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.morse.complex.Boundary;
import dev.morse.complex.ChainComplex;
import dev.morse.complex.ComplexKind;
import dev.morse.complex.GradedCells;
import dev.morse.complex.ListedComplex;
import dev.morse.complex.SimplicialComplex;
import dev.morse.io.SimplicialReader;
import org.junit.jupiter.api.Test;

class MatchingVerifierTest {
    /** The boundary of a triangle: vertices a b c (cells 0..2), edges ab ac bc (cells 3..5). */
    private static ChainComplex triangleBoundary() {
        return SimplicialComplex.of(SimplicialReader.parse("morse-simplicial 1\na b\na c\nb c\n", "triangle"));
    }

    @Test
    void pairingEveryVertexWithAnEdgeAroundACircleIsRejectedAsCyclic() {
        // a->ab, b->bc, c->ac: the gradient runs round the circle (Forman 1998: V-paths must not close)
        ChainComplex circle = triangleBoundary();
        int[] mates = {3, 5, 4, 0, 2, 1};
        MatchingVerdict verdict = MatchingVerifier.verify(circle, Matching.of(mates));
        assertFalse(verdict.valid());
        assertTrue(verdict.defect().contains("closed path"), verdict.defect());
    }

    @Test
    void aClosedPathAmongEdgesAndTrianglesIsNamedByACellOnIt() {
        // the boundary of a tetrahedron, its edges round vertex a paired with triangles so that the
        // V-path ab, abc, ac, acd, ad, abd, ab closes (Forman 1998); vertices and bcd stay critical
        ChainComplex sphere = SimplicialComplex.of(
                SimplicialReader.parse("morse-simplicial 1\na b c\na b d\na c d\nb c d\n", "tetrahedron"));
        assertEquals("{a b}", sphere.cellName(4));
        assertEquals("{a b c}", sphere.cellName(10));
        int[] mates = {-1, -1, -1, -1, 10, 12, 11, -1, -1, -1, 4, 6, 5, -1}; // ab-abc, ac-acd, ad-abd
        MatchingVerdict verdict = MatchingVerifier.verify(sphere, Matching.of(mates));
        assertFalse(verdict.valid());
        // a cell on the closed path: not vertex a, which lies below it and is left unsorted too
        assertEquals("the gradient has a closed path through cell {a b}", verdict.defect());
        // unpairing ad and abd opens the path: acyclic
        int[] open = mates.clone();
        open[6] = -1;
        open[11] = -1;
        assertTrue(MatchingVerifier.verify(sphere, Matching.of(open)).valid());
    }

    @Test
    void aTreeOfPairsOnTheCircleIsAccepted() {
        // a critical; b->ab, c->ac; bc critical: acyclic, leaving one vertex and one edge critical
        int[] mates = {-1, 3, 4, 1, 2, -1};
        assertTrue(MatchingVerifier.verify(triangleBoundary(), Matching.of(mates)).valid());
    }

    @Test
    void pairingAVertexWithAnEdgeNotContainingItIsRejected() {
        int[] mates = {5, -1, -1, -1, -1, 0}; // a with bc: incidence 0
        MatchingVerdict verdict = MatchingVerifier.verify(triangleBoundary(), Matching.of(mates));
        assertFalse(verdict.valid());
        assertTrue(verdict.defect().contains("not a unit"), verdict.defect());
    }

    @Test
    void pairingAcrossAnIncidenceOfTwoIsRejected() {
        // The minimal CW structure of RP^2: one cell per dimension, ∂e = 0, ∂f = 2e (Hatcher 2002, Example 2.42).
        ChainComplex rp2 = new ListedComplex(ComplexKind.CELLULAR, new GradedCells(new int[] {1, 1, 1}),
                new Boundary(new int[] {0, 0, 0, 1}, new int[] {1}, new int[] {2}), c -> "c" + c);
        MatchingVerdict verdict = MatchingVerifier.verify(rp2, Matching.of(new int[] {-1, 2, 1}));
        assertFalse(verdict.valid());
        assertTrue(verdict.defect().contains("incidence 2"), verdict.defect());
    }

    @Test
    void asymmetricPartnersAreRejected() {
        int[] mates = {3, -1, -1, 1, -1, -1};
        assertFalse(MatchingVerifier.verify(triangleBoundary(), Matching.of(mates)).valid());
    }

    @Test
    void partnersTwoDimensionsApartAreRejected() {
        ChainComplex triangle = SimplicialComplex.of(SimplicialReader.parse("morse-simplicial 1\na b c\n", "t"));
        int last = triangle.cellCount() - 1; // the triangle itself
        int[] mates = new int[triangle.cellCount()];
        java.util.Arrays.fill(mates, -1);
        mates[0] = last;
        mates[last] = 0;
        assertFalse(MatchingVerifier.verify(triangle, Matching.of(mates)).valid());
    }

    @Test
    void everyHeuristicPassesOnTheCircle() {
        for (MatchingHeuristic h : MatchingHeuristics.all().values()) {
            assertTrue(MatchingVerifier.verify(triangleBoundary(), h.match(triangleBoundary(), MatchingOptions.DEFAULT)).valid(),
                    h.name());
        }
    }
}
