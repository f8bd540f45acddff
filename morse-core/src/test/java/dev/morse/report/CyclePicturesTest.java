package dev.morse.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.morse.cycles.Cycle;
import dev.morse.cycles.RepresentativeCycles;
import dev.morse.engine.Computation;
import dev.morse.engine.Engines;
import dev.morse.engine.Request;
import dev.morse.image.ImageOptions;
import dev.morse.input.Input;
import dev.morse.input.InputReaders;
import dev.morse.io.InputException;
import java.io.IOException;
import java.math.BigInteger;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;

class CyclePicturesTest {
    /** A 7 x 3 bitmap, all foreground but the pixels (1, 1) and (5, 1): two holes. */
    static final String TWO_HOLES = """
            P1
            7 3
            1 1 1 1 1 1 1
            1 0 1 1 1 0 1
            1 1 1 1 1 1 1
            """;
    static final int[][] HOLES = {{1, 1}, {5, 1}};

    @TempDir
    Path dir;

    /**
     * The winding number of a 1-cycle of the plane's cubical complex around the centre of pixel
     * (hx, hy): the signed count of its edges that the ray from that centre toward y = 0 crosses,
     * the horizontal edges [hx, hx+1] x [y] with y at most hy, each oriented by increasing x. For a
     * cycle every ray gives the same count (the degree of a closed curve around a point).
     */
    static BigInteger winding(Cycle loop, int hx, int hy) {
        BigInteger w = BigInteger.ZERO;
        for (Cycle.Term t : loop.terms()) {
            List<?> xs = (List<?>) t.label().get(0);
            List<?> ys = (List<?>) t.label().get(1);
            int x0 = ((Number) xs.get(0)).intValue();
            int x1 = ((Number) xs.get(1)).intValue();
            int y0 = ((Number) ys.get(0)).intValue();
            int y1 = ((Number) ys.get(1)).intValue();
            if (x0 == hx && x1 == hx + 1 && y0 == y1 && y0 <= hy) {
                w = w.add(t.coefficient());
            }
        }
        return w;
    }

    @Test
    void anImageWithTwoHolesHasTwoCyclesEachGoingRoundOneHoleEachDrawnInItsOwnColour() throws Exception {
        Path image = dir.resolve("two-holes.pbm");
        Files.writeString(image, TWO_HOLES);
        Input input = InputReaders.read(List.of(image), ImageOptions.defaults());
        Computation run = Engines.compute(input, Request.defaults());
        List<Cycle> loops = RepresentativeCycles.of(run).stream().filter(c -> c.dimension() == 1).toList();
        // a plane region's H_1 is free of rank its number of holes (Alexander duality; common practice)
        assertEquals(2, loops.size());
        Set<Integer> holesGoneRound = new HashSet<>();
        for (Cycle loop : loops) {
            int roundOne = -1;
            for (int h = 0; h < HOLES.length; h++) {
                BigInteger w = winding(loop, HOLES[h][0], HOLES[h][1]);
                if (w.signum() != 0) {
                    assertEquals(BigInteger.ONE, w.abs(), "a generator goes round its hole once");
                    assertEquals(-1, roundOne, "a generator goes round one hole only");
                    roundOne = h;
                }
            }
            assertTrue(roundOne >= 0, "every generator goes round a hole");
            holesGoneRound.add(roundOne);
        }
        assertEquals(Set.of(0, 1), holesGoneRound);

        Document doc = SvgPicturesTest.parse(ImageCycleOverlay.of(run).svg());
        NodeList paths = doc.getElementsByTagNameNS("http://www.w3.org/2000/svg", "path");
        Set<String> colours = new HashSet<>();
        int drawn = 0;
        for (int i = 0; i < paths.getLength(); i++) {
            Element p = (Element) paths.item(i);
            if (p.getAttribute("class").equals("cycle")) {
                int k = Integer.parseInt(p.getAttribute("data-generator"));
                int terms = loops.get(k - 1).terms().size();
                assertEquals(Integer.toString(terms), p.getAttribute("data-terms"));
                // one move and one line per edge
                assertEquals(terms, p.getAttribute("d").chars().filter(c -> c == 'L').count());
                colours.add(p.getAttribute("stroke"));
                drawn++;
            }
        }
        assertEquals(2, drawn);
        assertEquals(2, colours.size(), "each cycle in its own colour");
    }

    @Test
    void onAPosetThatIsNotACwPosetTheChainsOfTheCycleAreMarked() throws IOException {
        Input input = InputReaders.read(Path.of(System.getProperty("morse.corpus", "../corpus"),
                "partition-4-proper.poset"));
        // the proper part of Π_4 is a wedge of (4-1)! = 6 circles (Björner 1980): generators 1..6 of H_1
        HasseDrawing d = HasseDrawings.draw(input, Request.defaults(), new CycleChoice(1, 6));
        assertTrue(d.hasCycle());
        assertTrue(d.cycleDescription().startsWith("cycle: generator 6 of 6 of H_1, free, "), d.cycleDescription());
        int terms = Integer.parseInt(d.cycleDescription().replaceAll(".*free, (\\d+) terms.*", "$1"));
        // its chains are edges a < b of the order complex; in a poset of two ranks every such pair is a cover
        int covers = 0;
        for (int e = 0; e < d.coverCount(); e++) {
            if (d.coverInCycle(e)) {
                covers++;
                assertTrue(d.inCycle(d.lowerEnd(e)) && d.inCycle(d.upperEnd(e)));
            }
        }
        assertEquals(terms, covers);
        // in a 1-cycle every vertex lies on two of its edges at least, so there are no more vertices than edges
        int elements = 0;
        for (int v = 0; v < d.nodeCount(); v++) {
            elements += d.inCycle(v) ? 1 : 0;
        }
        assertTrue(elements >= 3 && elements <= covers, elements + " elements, " + covers + " covers");
        InputException none = assertThrows(InputException.class,
                () -> HasseDrawings.draw(input, Request.defaults(), new CycleChoice(1, 7)));
        assertEquals("there is no generator 7 of H_1: the homology in dimension 1 has 6 generators", none.problem());
    }

    @Test
    void theDefaultIsTheFirstGeneratorOfTheHighestDimension() {
        HasseDrawing d = HasseGraphExportTest.circle();
        // the circle's homology is Z in dimensions 0 and 1; the default passes H_0 by
        assertEquals("cycle: generator 1 of 1 of H_1, free, 4 terms", d.cycleDescription());
    }
}
