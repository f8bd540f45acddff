package dev.morse.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.morse.generate.Families;
import dev.morse.generate.Generated;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;

/**
 * The layered layout against the first one on the partition and Boolean lattices (proper parts, as
 * in the corpus): crossings counted here from the node coordinates alone, by the definition (two
 * covers between the same two ranks cross when their ends are in opposite left-to-right orders),
 * sharing nothing with the layout's own count.
 */
class HasseLayoutCrossingsTest {
    private static HasseDrawing properPart(boolean partition, int n) {
        Generated g = partition ? Families.partitionLattice(n, true) : Families.booleanLattice(n, true);
        return HasseDrawing.ofPoset(((Generated.OfPoset) g).poset(), g.description(), "");
    }

    private static long crossings(HasseDrawing d, HasseLayout layout) {
        long count = 0;
        for (int e = 0; e < d.coverCount(); e++) {
            for (int f = e + 1; f < d.coverCount(); f++) {
                int a = d.lowerEnd(e);
                int b = d.upperEnd(e);
                int c = d.lowerEnd(f);
                int g = d.upperEnd(f);
                if (d.level(a) != d.level(c) || d.level(b) != d.level(g) || a == c || b == g) {
                    continue;
                }
                count += Math.signum(layout.x(a) - layout.x(c)) * Math.signum(layout.x(b) - layout.x(g)) < 0 ? 1 : 0;
            }
        }
        return count;
    }

    private static void check(HasseDrawing d, long before, long after) {
        HasseLayout first = HasseLayout.evenRows(d);
        HasseLayout layered = HasseLayout.layered(d);
        assertEquals(before, crossings(d, first), "first layout");
        assertEquals(after, crossings(d, layered), "layered layout");
        assertEquals(before, first.crossings(), "the first layout's own count");
        assertEquals(after, layered.crossings(), "the layered layout's own count");
        assertTrue(after <= before);
    }

    // The expected counts are this layout's results, pinned so that a change to it shows; the
    // outside checks are the independent count above and the bound "never more than before".

    @Test
    void partitionLatticeFour() {
        check(properPart(true, 4), 37, 32);
    }

    @Test
    void partitionLatticeFive() {
        check(properPart(true, 5), 1171, 1052);
    }

    @Test
    void booleanLatticeFour() {
        check(properPart(false, 4), 22, 22);
    }

    @Test
    void booleanLatticeFive() {
        check(properPart(false, 5), 156, 152);
    }

    @Test
    void partitionLatticeSixFitsInAReadableWidthWithEveryRankNamed() {
        // 201 elements, a rank of 90 (the Stirling number S(6,3), from memory): the first layout was 7,020 px of diagram wide
        HasseDrawing d = properPart(true, 6);
        assertEquals(201, d.nodeCount());
        String svg = HasseDiagramSvg.toSvg(d);
        Matcher size = Pattern.compile("width=\"([0-9.]+)\" height=\"([0-9.]+)\"").matcher(svg);
        assertTrue(size.find());
        assertTrue(Double.parseDouble(size.group(1)) < 2000, size.group(1));
        for (int rank = 0; rank <= 3; rank++) {
            assertTrue(svg.contains(">rank " + rank + "</text>"), "rank " + rank);
        }
        assertTrue(svg.contains(">90 nodes</text>"));
    }

    @Test
    void coversSkippingLevelsAreBentThroughEachLevelBetween() {
        // heights: a 0, b and d 1, c 2, e 3 (it covers c and d), so the cover d < e passes level 2 once
        HasseDrawing d = HasseDrawing.ofPoset(dev.morse.io.PosetReader.parse(
                "morse-poset 1\nb: a\nc: b\nd: a\ne: c d\n", "skip.poset"), "skip", "");
        HasseLayout layout = HasseLayout.layered(d);
        int bent = 0;
        for (int e = 0; e < d.coverCount(); e++) {
            int span = d.level(d.upperEnd(e)) - d.level(d.lowerEnd(e));
            assertEquals(span - 1, layout.bendsX(e).length);
            bent += span > 1 ? 1 : 0;
        }
        assertEquals(1, bent);
        assertEquals("height", d.levelName());
    }
}
