package dev.morse.complex;

import dev.morse.cw.CwPosetCheck;
import dev.morse.cw.CwPosetCheckTest;
import dev.morse.cw.CwPosetVerdict;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.morse.poset.Poset;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * On a CW poset the order complex is the barycentric subdivision of the regular CW complex
 * (Björner 1984), so both chain complexes must have the same homology; each case also has a
 * textbook value.
 */
class CellularAgreesWithOrderTest {

    private static void assertSameHomology(Poset p, List<String> expected) {
        CwPosetVerdict verdict = CwPosetCheck.check(p);
        assertTrue(verdict.isCwPoset(), verdict.reason());
        CellularComplex cells = CwPosetCheck.cellularComplex(p);
        OrderComplex chains = OrderComplex.of(p);
        Fixtures.assertChainComplex(cells);
        Fixtures.assertUnitIncidences(cells);
        Fixtures.assertChainComplex(chains);
        assertEquals(p.size(), cells.cellCount());
        assertTrue(cells.cellCount() < chains.cellCount());
        assertEquals(expected, Fixtures.homology(cells));
        assertEquals(expected, Fixtures.homology(chains));
    }

    @Test
    void simplexBoundaryIsASphere() {
        // the face poset of ∂Δ^d is the proper part of B_(d+1); ∂Δ^d ≅ S^(d-1) (Wachs 2007)
        assertSameHomology(Fixtures.booleanProperPart(3), List.of("Z", "Z"));
        assertSameHomology(Fixtures.booleanProperPart(4), List.of("Z", "0", "Z"));
        assertSameHomology(Fixtures.booleanProperPart(5), List.of("Z", "0", "0", "Z"));
    }

    @Test
    void cubeBoundaryIsASphere() {
        // the boundary of a polytope is a sphere (standard; Bruggesser–Mani 1971 for shellability)
        assertSameHomology(Fixtures.cubeBoundary(3), List.of("Z", "0", "Z"));
    }

    @Test
    void torusIsTheProductOfTwoCircles() {
        // Walker 1988: Δ(P × Q) ≅ Δ(P) × Δ(Q); Künneth (Hatcher Thm 3B.6): T^2 has Z, Z^2, Z
        Poset circle = Fixtures.poset(CwPosetCheckTest.CIRCLE);
        assertSameHomology(Fixtures.product(circle, circle), List.of("Z", "Z^2", "Z"));
    }

    @Test
    void cylinderAndSolidTorus() {
        // S^1 × [0,1] and S^1 × D^2 both have the homology of S^1 (homotopy invariance; Künneth)
        Poset circle = Fixtures.poset(CwPosetCheckTest.CIRCLE);
        Poset interval = Fixtures.poset("e: a b\n");
        assertSameHomology(Fixtures.product(circle, interval), List.of("Z", "Z", "0"));
        Poset square = Fixtures.poset(CwPosetCheckTest.SQUARE);
        assertSameHomology(Fixtures.product(circle, square), List.of("Z", "Z", "0", "0"));
    }

    @Test
    void projectivePlaneTimesCircle() {
        // Künneth (Hatcher Thm 3B.6) for RP^2 × S^1: H0 = Z, H1 = Z + Z/2, H2 = Z/2, H3 = 0
        Poset circle = Fixtures.poset(CwPosetCheckTest.CIRCLE);
        Poset rp2 = Fixtures.antipodalCubeQuotient(3);
        Poset product = Fixtures.product(rp2, circle);
        assertTrue(CwPosetCheck.check(product).isCwPoset());
        CellularComplex cells = CwPosetCheck.cellularComplex(product);
        Fixtures.assertChainComplex(cells);
        assertEquals(List.of("Z", "Z + Z/2", "Z/2", "0"), Fixtures.homology(cells));
    }

    @Test
    void smallCubicalGridIsContractible() {
        // a cube subdivided into 2^3 cubes is contractible
        assertSameHomology(Fixtures.cubicalGrid(2, 3), List.of("Z", "0", "0", "0"));
    }
}
