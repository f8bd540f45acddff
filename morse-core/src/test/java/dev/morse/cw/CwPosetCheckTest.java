package dev.morse.cw;

import dev.morse.engine.ComplexPolicy;
import dev.morse.io.InputException;
import dev.morse.complex.CellularComplex;
import dev.morse.complex.ChainComplex;
import dev.morse.complex.ComplexChoice;
import dev.morse.complex.ComplexKind;
import dev.morse.complex.Fixtures;
import dev.morse.complex.OrderComplex;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.morse.poset.Poset;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;

public class CwPosetCheckTest {

    /** Two vertices and two edges joining them: a circle made of two cells of each dimension. */
    public static final String CIRCLE = "v1\nv2\ne1: v1 v2\ne2: v1 v2\n";

    /** The square as a closed 2-cell: 4 vertices, 4 edges, 1 face. */
    public static final String SQUARE = "ab: a b\nbc: b c\ncd: c d\nda: d a\nF: ab bc cd da\n";

    private static void assertFails(Poset p, String... mentioned) {
        CwPosetVerdict verdict = CwPosetCheck.check(p);
        assertFalse(verdict.isCwPoset());
        for (String m : mentioned) {
            assertTrue(verdict.reason().contains(m), verdict.reason());
        }
    }

    @Test
    void squareIsADisk() {
        // the closed square is a regular CW complex (standard), contractible
        Poset square = Fixtures.poset(SQUARE);
        CwPosetVerdict verdict = CwPosetCheck.check(square);
        assertTrue(verdict.isCwPoset(), verdict.reason());
        assertEquals("", verdict.reason());
        CellularComplex cells = CwPosetCheck.cellularComplex(square);
        assertEquals(List.of(4, 4, 1), List.of(cells.cellCount(0), cells.cellCount(1), cells.cellCount(2)));
        Fixtures.assertChainComplex(cells);
        Fixtures.assertUnitIncidences(cells);
        assertEquals(List.of("Z", "0", "0"), Fixtures.homology(cells));
    }

    @Test
    void loopIsNotACwPoset() {
        // one vertex and one edge above it: an edge must have two distinct end points in a regular
        // complex; the order complex is the single edge v<e, contractible
        Poset loop = Fixtures.poset("e: v\n");
        assertFails(loop, "'e'", "only 'v'");
        ChainComplex chosen = ComplexPolicy.storedComplex(loop, ComplexChoice.AUTO);
        assertEquals(ComplexKind.ORDER, chosen.kind());
        Fixtures.assertChainComplex(chosen);
        assertEquals(List.of("Z", "0"), Fixtures.homology(chosen));
        InputException e = assertThrows(InputException.class,
                () -> ComplexPolicy.storedComplex(loop, ComplexChoice.CELLULAR));
        assertEquals("poset: the cellular complex needs a CW poset, and this is not one: "
                + CwPosetCheck.check(loop).reason(), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> CwPosetCheck.cellularComplex(loop));
    }

    @Test
    void twoVertexCircle() {
        // S^1 with two vertices and two edges: H = Z, Z (standard)
        Poset circle = Fixtures.poset(CIRCLE);
        assertTrue(CwPosetCheck.check(circle).isCwPoset());
        ChainComplex chosen = ComplexPolicy.storedComplex(circle, ComplexChoice.AUTO);
        assertEquals(ComplexKind.CELLULAR, chosen.kind());
        assertEquals(4, chosen.cellCount());
        Fixtures.assertChainComplex(chosen);
        assertEquals(List.of("Z", "Z"), Fixtures.homology(chosen));
        CellularComplex cells = (CellularComplex) chosen;
        for (int x = 0; x < circle.size(); x++) {
            assertEquals(x, cells.element(cells.cell(x)));
            assertEquals(circle.label(x), cells.cellName(cells.cell(x)));
            assertEquals(circle.height(x), cells.dimensionOf(cells.cell(x)));
        }
    }

    @Test
    void edgeWithThreeEndsIsRefused() {
        assertFails(Fixtures.poset("e: a b c\n"), "'e'", "3 elements");
    }

    @Test
    void ungradedPosetIsRefused() {
        // F covers the edge e and the vertex w: the cover F > w skips a height
        assertFails(Fixtures.poset("e: u v\nF: e w\n"), "not graded", "'F'", "'w'");
    }

    @Test
    void intervalWithThreeMiddleElementsIsNotThin() {
        // three edges between two vertices under one face: [v1, F] has three middle elements
        assertFails(Fixtures.poset("e1: v1 v2\ne2: v1 v2\ne3: v1 v2\nF: e1 e2 e3\n"),
                "not thin", "'v1'", "'F'", "3 middle elements");
    }

    @Test
    void faceOnTwoCirclesIsRefused() {
        // F is bounded by two disjoint two-gons: thin, but its boundary is not one circle
        assertFails(Fixtures.poset("e1: a b\ne2: a b\ne3: c d\ne4: c d\nF: e1 e2 e3 e4\n"),
                "'F'", "2 separate cycles");
    }

    @Test
    void cellOnATorusIsRefused() {
        // a 3-cell glued onto the torus S^1 × S^1 (Walker 1988: Δ(P × Q) ≅ Δ(P) × Δ(Q)): every
        // interval is thin, but the boundary has H1 = Z^2 (Künneth; Hatcher Thm 3B.6)
        Poset circle = Fixtures.poset(CIRCLE);
        Poset solid = Fixtures.withTop(Fixtures.product(circle, circle), "T");
        assertFails(solid, "'T'", "not a sphere of dimension 2", "H0 = Z, H1 = Z^2, H2 = Z");
    }

    @Test
    void cellOnTheProjectivePlaneIsRefusedByTorsion() {
        // the boundary RP^2 has H1 = Z/2 (Hatcher, Example 2.42): only the integral check sees it fail
        assertFails(Fixtures.withTop(Fixtures.antipodalCubeQuotient(3), "B"), "'B'", "H1 = Z/2");
    }

    @Test
    void projectivePlaneFromTheCube() {
        // RP^2 as the quotient of the cube boundary by x -> -x: 4 vertices, 6 edges, 3 squares.
        // Regular because no closed face of the cube meets its antipodal image (checked below:
        // the faces of each closed cube face fall into distinct antipodal classes), and then the
        // quotient poset must pass the CW check. H = Z, Z/2, 0 (Hatcher, Example 2.42).
        for (int[] face : Fixtures.cubeBoundaryFaces(3)) {
            Set<String> classes = new HashSet<>();
            int closedFaces = 0;
            for (int[] g : Fixtures.cubeBoundaryFaces(3)) {
                if (isFaceOf(g, face)) {
                    closedFaces++;
                    classes.add(Fixtures.antipodalLabel(g));
                }
            }
            assertEquals(closedFaces, classes.size(), Fixtures.signLabel(face));
        }
        Poset rp2 = Fixtures.antipodalCubeQuotient(3);
        CwPosetVerdict verdict = CwPosetCheck.check(rp2);
        assertTrue(verdict.isCwPoset(), verdict.reason());
        CellularComplex cells = CwPosetCheck.cellularComplex(rp2);
        assertEquals(List.of(4, 6, 3), List.of(cells.cellCount(0), cells.cellCount(1), cells.cellCount(2)));
        Fixtures.assertChainComplex(cells);
        Fixtures.assertUnitIncidences(cells);
        assertEquals(List.of("Z", "Z/2", "0"), Fixtures.homology(cells));
        assertEquals(List.of("Z", "Z/2", "0"), Fixtures.homology(OrderComplex.of(rp2)));
    }

    /** Whether g is a face of f (or f itself): g agrees with f where f is fixed. */
    private static boolean isFaceOf(int[] g, int[] f) {
        for (int i = 0; i < f.length; i++) {
            if (f[i] != 0 && g[i] != f[i]) {
                return false;
            }
        }
        return true;
    }

    @Test
    void emptyPosetIsTheEmptyCwComplex() {
        Poset empty = Fixtures.poset("");
        assertTrue(CwPosetCheck.check(empty).isCwPoset());
        assertEquals(0, CwPosetCheck.cellularComplex(empty).cellCount());
    }

    @Test
    void cubicalGridIsACwPoset() {
        // the cubical grid [0,12]^3 is a regular CW complex (standard): 25^3 cells, all lower
        // intervals boundaries of cubes
        Poset grid = Fixtures.cubicalGrid(12, 3);
        assertEquals(25 * 25 * 25, grid.size());
        assertTrue(CwPosetCheck.check(grid).isCwPoset(), CwPosetCheck.check(grid).reason());
        CellularComplex cells = CwPosetCheck.cellularComplex(grid);
        assertEquals(List.of(13 * 13 * 13, 3 * 12 * 13 * 13, 3 * 12 * 12 * 13, 12 * 12 * 12),
                List.of(cells.cellCount(0), cells.cellCount(1), cells.cellCount(2), cells.cellCount(3)));
        Fixtures.assertChainComplex(cells);
        Fixtures.assertUnitIncidences(cells);
    }

    @Test
    void choiceIsParsed() {
        assertEquals(ComplexChoice.AUTO, ComplexChoice.parse("auto"));
        assertEquals(ComplexChoice.ORDER, ComplexChoice.parse("order"));
        assertEquals(ComplexChoice.CELLULAR, ComplexChoice.parse("cellular"));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> ComplexChoice.parse("cubes"));
        assertTrue(e.getMessage().contains("cubes"));
        assertEquals("cellular", ComplexChoice.CELLULAR.optionName());
    }

    @Test
    void orderChoiceIsHonouredOnACwPoset() {
        // the barycentric subdivision of the square: 9 vertices, 16 edges, 8 triangles (standard)
        ChainComplex order = ComplexPolicy.storedComplex(Fixtures.poset(SQUARE), ComplexChoice.ORDER);
        assertEquals(ComplexKind.ORDER, order.kind());
        Fixtures.assertChainComplex(order);
        assertEquals(List.of(9, 16, 8), List.of(order.cellCount(0), order.cellCount(1), order.cellCount(2)));
    }
}
