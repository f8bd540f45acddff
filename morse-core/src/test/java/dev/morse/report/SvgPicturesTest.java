package dev.morse.report;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.morse.engine.ComparisonReport;
import dev.morse.engine.MatchingRun;
import dev.morse.engine.Request;
import dev.morse.homology.Coefficients;
import dev.morse.input.InputReaders;
import dev.morse.homology.Homology;
import dev.morse.homology.HomologyGroup;
import dev.morse.io.InputFormat;
import dev.morse.complex.ComplexKind;
import dev.morse.io.PosetReader;
import dev.morse.poset.Poset;
import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.Optional;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.Test;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;

/** The SVG pictures are well-formed XML with exactly the expected elements. */
class SvgPicturesTest {
    static Document parse(String svg) throws Exception {
        DocumentBuilderFactory factory = DocumentBuilderFactory.newInstance();
        factory.setNamespaceAware(true);
        return factory.newDocumentBuilder().parse(new ByteArrayInputStream(svg.getBytes(StandardCharsets.UTF_8)));
    }

    static int count(Document doc, String tag, String classWord) {
        NodeList nodes = doc.getElementsByTagNameNS("http://www.w3.org/2000/svg", tag);
        int count = 0;
        for (int i = 0; i < nodes.getLength(); i++) {
            String classes = ((Element) nodes.item(i)).getAttribute("class");
            if (classWord == null || List.of(classes.split(" ")).contains(classWord)) {
                count++;
            }
        }
        return count;
    }

    @Test
    void labelsThatNeedEscapingStillMakeWellFormedXml() throws Exception {
        // labels may hold any character but white space, ':' and '#'
        Poset p = PosetReader.parse("morse-poset 1\na&b\n<c>: a&b\n\"d'\": a&b\n", "odd.poset");
        Document doc = parse(HasseDiagramSvg.toSvg(HasseDrawing.ofPoset(p, "odd & <labels>", "a note \"quoted\" & <escaped>")));
        assertEquals(3, count(doc, "circle", null));
        assertEquals(2, count(doc, "line", "cover"));
        NodeList texts = doc.getElementsByTagNameNS("http://www.w3.org/2000/svg", "text");
        boolean found = false;
        for (int i = 0; i < texts.getLength(); i++) {
            found |= texts.item(i).getTextContent().equals("<c>");
        }
        assertEquals(true, found, "the label <c> is shown as written");
    }

    @Test
    void chartHasOneBarPerMatchingAndDimensionAndOneBoundMarkPerDimension() throws Exception {
        Homology rp2 = new Homology(Coefficients.INTEGERS, false, List.of(HomologyGroup.free(0, 1),
                new HomologyGroup(1, 0, List.of(java.math.BigInteger.TWO)), HomologyGroup.free(2, 0)));
        ComparisonReport report = new ComparisonReport("rp2.simplicial", InputFormat.SIMPLICIAL, ComplexKind.SIMPLICIAL,
                List.of(6L, 15L, 10L), Optional.empty(), rp2, false, "coreduction", List.of(), List.of(
                        new MatchingRun("coreduction", List.of(1, 1, 1), List.of(), -1, List.of()),
                        new MatchingRun("none", List.of(6, 15, 10), List.of(), -1, List.of())), 1L, Optional.empty());
        Document doc = parse(ComparisonChartSvg.toSvg(report));
        assertEquals(6, count(doc, "rect", "bar"));
        assertEquals(3, count(doc, "line", "bound"));
        NodeList rects = doc.getElementsByTagNameNS("http://www.w3.org/2000/svg", "rect");
        int noneInDimensionOne = -1;
        for (int i = 0; i < rects.getLength(); i++) {
            Element r = (Element) rects.item(i);
            if (r.getAttribute("data-matching").equals("none") && r.getAttribute("data-dimension").equals("1")) {
                noneInDimensionOne = Integer.parseInt(r.getAttribute("data-value"));
            }
        }
        assertEquals(15, noneInDimensionOne);
    }

    @Test
    void tickStepsAreOneTwoOrFiveTimesAPowerOfTen() {
        assertEquals(1, ComparisonChartSvg.niceStep(3));
        assertEquals(2, ComparisonChartSvg.niceStep(7));
        assertEquals(5, ComparisonChartSvg.niceStep(21));
        assertEquals(2000, ComparisonChartSvg.niceStep(9999));
    }

    @Test
    void hasseDiagramHasACirclePerCellALinePerCoverAndThickLinesForMatchedPairs() throws Exception {
        // the square's face poset: 9 elements, 12 covers; coreduction leaves 1 critical cell and 4 pairs
        HasseDrawing drawing = HasseDrawings.draw(InputReaders.parse("square.poset", """
                morse-poset 1
                ab: a b
                bc: b c
                cd: c d
                da: d a
                face: ab bc cd da
                """), Request.defaults());
        Document doc = parse(HasseDiagramSvg.toSvg(drawing));
        assertEquals(9, count(doc, "circle", "node"));
        assertEquals(12, count(doc, "line", null));
        assertEquals(12, count(doc, "line", "cover"));
        assertEquals(4, count(doc, "line", "matched"));
        assertEquals(1, count(doc, "circle", "critical"));
    }
}
