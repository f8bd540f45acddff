package dev.morse.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class DemoCommandTest {
    @Test
    void demoRunsBothStoriesAndSucceeds() {
        CliRun run = CliRun.morse("demo");
        assertEquals(0, run.code(), run.err());
        assertEquals("", run.err());
        String out = run.out();
        // the 4 x 4 map: 16 corners, 32 sides, 16 tiles on the torus (counted from its construction)
        assertTrue(out.contains("64 = 16 + 32 + 16 in dimensions 0..2"), out);
        // torus homology Z, Z^2, Z (REFERENCES.md)
        assertTrue(out.contains("H_0 = Z\n") && out.contains("H_1 = Z^2\n") && out.contains("H_2 = Z\n"), out);
        // chains of the face poset: 64 elements; 2 * 32 + 4 * 16 + 4 * 16 = 192 comparable pairs;
        // 16 tiles * 4 sides * 2 ends = 128 flags
        assertTrue(out.contains("has 384 simplices, 64 + 192 + 128 by dimension"), out);
    }

    @Test
    void releasePlanHasOneLoop() {
        // by hand: Δ is the hexagon of designs and builds with two cones, one on each release's lower set;
        // the cones meet in two pieces (the path api-server-db and the vertex ui), so Δ is a circle: β = 1, 1, 0.
        // Beat points (Stong 1966), by hand: build-web and build-app are each awaited by one release only, then
        // design-api and design-db by build-server only; left is the four-point circle {build-server, design-ui}
        // below {release-web, release-app}, whose order complex has 4 vertices and 4 edges
        String out = CliRun.morse("demo").out();
        assertTrue(out.contains("reduction 8 -> 4 elements before the order complex: 4 beat points"), out);
        assertTrue(out.contains("cells     8 = 4 + 4 in dimensions 0..1"), out);
        assertTrue(out.contains("Betti numbers [1, 1, 0]"), out);
    }

    @Test
    void crewSplitIsAWedgeOfSixCircles() {
        // the proper part of the partition lattice Pi_4 is a wedge of (4-1)! = 6 spheres of dimension
        // 4 - 3 = 1 (Björner 1980), and mu(Pi_4) = (-1)^3 3! = -6 (Rota 1964); by hand: 13 arrangements,
        // 3 * 2 + 4 * 3 = 18 comparable pairs, reduced Euler characteristic -1 + 13 - 18 = -6
        String out = CliRun.morse("demo").out();
        assertTrue(out.contains("Reduced homology ~H_0 = 0, ~H_1 = Z^6: only one dimension is nonzero"), out);
        assertTrue(out.contains("a connected graph with 6\n"), out);
        assertTrue(out.contains("The Möbius value from bottom to\ntop is -6"), out);
    }
}
