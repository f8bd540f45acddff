package dev.morse.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;

class DrawCommandTest {
    @TempDir
    Path dir;

    private static Document parse(byte[] svg) throws Exception {
        return DocumentBuilderFactory.newInstance().newDocumentBuilder().parse(new ByteArrayInputStream(svg));
    }

    /** Elements named {@code tag} whose class attribute has the word {@code word} ({@code null}: all). */
    private static int count(Document doc, String tag, String word) {
        NodeList nodes = doc.getElementsByTagName(tag);
        int count = 0;
        for (int i = 0; i < nodes.getLength(); i++) {
            if (word == null || List.of(((Element) nodes.item(i)).getAttribute("class").split(" ")).contains(word)) {
                count++;
            }
        }
        return count;
    }

    @Test
    void cwPosetIsDrawnWithItsMatchingMarked() throws Exception {
        String file = Inputs.write(dir, "square.poset", Inputs.SQUARE);
        Path svg = dir.resolve("square.svg");
        CliRun run = CliRun.morse("draw", file, "-o", svg.toString());
        assertEquals(0, run.code(), run.err());
        // a disk is collapsible and coreduction perfect on it: 1 critical cell, (9 - 1) / 2 pairs
        assertEquals("wrote " + svg + ": 9 nodes, 12 covers, 4 matched pairs, 1 critical", run.out().lines().findFirst()
                .orElseThrow());
        Document doc = parse(Files.readAllBytes(svg));
        assertEquals(9, count(doc, "circle", null));
        assertEquals(12, count(doc, "line", null));
        assertEquals(4, count(doc, "line", "matched"));
        assertEquals(1, count(doc, "circle", "critical"));
    }

    @Test
    void withoutAnOutputFileTheSvgGoesToStandardOutput() throws Exception {
        String file = Inputs.write(dir, "loop.poset", Inputs.LOOP);
        CliRun run = CliRun.morse("draw", file);
        assertEquals(0, run.code(), run.err());
        Document doc = parse(run.out().getBytes(StandardCharsets.UTF_8));
        // not a CW poset: its own Hasse diagram, two elements and one cover, nothing marked
        assertEquals(2, count(doc, "circle", null));
        assertEquals(1, count(doc, "line", null));
        assertEquals(0, count(doc, "line", "matched"));
        assertEquals(0, count(doc, "circle", "critical"));
    }

    @Test
    void theOrderComplexOfAPosetCanBeDrawnWithItsMatching() throws Exception {
        String file = Inputs.write(dir, "loop.poset", Inputs.LOOP);
        CliRun run = CliRun.morse("draw", file, "--complex", "order", "--matching", "collapse");
        assertEquals(0, run.code(), run.err());
        Document doc = parse(run.out().getBytes(StandardCharsets.UTF_8));
        // Δ = a segment: v, e and v<e; one collapse leaves one critical vertex
        assertEquals(3, count(doc, "circle", null));
        assertEquals(2, count(doc, "line", null));
        assertEquals(1, count(doc, "line", "matched"));
        assertEquals(1, count(doc, "circle", "critical"));
    }

    @Test
    void tooLargeToDrawIsRefusedWithTheLimitAndNoFile() throws IOException {
        StringBuilder text = new StringBuilder("morse-poset 1\n");
        for (int i = 0; i < 600; i++) {
            text.append('x').append(i).append('\n');
        }
        String file = Inputs.write(dir, "wide.poset", text.toString());
        Path svg = dir.resolve("wide.svg");
        CliRun run = CliRun.morse("draw", file, "-o", svg.toString());
        assertEquals(2, run.code());
        assertEquals("", run.out());
        assertEquals(List.of(file + ": too large to draw: a picture takes at most 500 nodes, and this has 600 elements"),
                run.errLines());
        assertFalse(Files.exists(svg));
    }

    @Test
    void dotAndGraphmlGoToStandardOutputAndReadBackWithTheLibrary() throws Exception {
        String file = Inputs.write(dir, "square.poset", Inputs.SQUARE);
        for (String format : List.of("dot", "graphml")) {
            CliRun run = CliRun.morse("draw", file, "--format", format);
            assertEquals(0, run.code(), run.err());
            org.jgrapht.Graph<String, org.jgrapht.graph.DefaultEdge> graph =
                    new org.jgrapht.graph.SimpleDirectedGraph<>(org.jgrapht.graph.DefaultEdge.class);
            java.util.Map<String, String> critical = new java.util.HashMap<>();
            org.jgrapht.nio.BaseEventDrivenImporter<String, org.jgrapht.graph.DefaultEdge> importer;
            if (format.equals("dot")) {
                org.jgrapht.nio.dot.DOTImporter<String, org.jgrapht.graph.DefaultEdge> dot =
                        new org.jgrapht.nio.dot.DOTImporter<>();
                dot.setVertexFactory(id -> id);
                importer = dot;
            } else {
                org.jgrapht.nio.graphml.GraphMLImporter<String, org.jgrapht.graph.DefaultEdge> graphml =
                        new org.jgrapht.nio.graphml.GraphMLImporter<>();
                graphml.setVertexFactory(id -> id);
                importer = graphml;
            }
            importer.addVertexAttributeConsumer((p, a) -> {
                if (p.getSecond().equals("critical")) {
                    critical.put(p.getFirst(), a.getValue());
                }
            });
            ((org.jgrapht.nio.GraphImporter<String, org.jgrapht.graph.DefaultEdge>) importer).importGraph(graph,
                    new java.io.StringReader(run.out()));
            // the square's face poset: 9 cells, 12 covers; coreduction on a disk leaves 1 critical cell
            assertEquals(9, graph.vertexSet().size(), format);
            assertEquals(12, graph.edgeSet().size(), format);
            assertEquals(1, critical.values().stream().filter("true"::equals).count(), format);
        }
    }

    @Test
    void anUnknownFormatIsOneLineAndExitCodeTwo() throws IOException {
        String file = Inputs.write(dir, "square.poset", Inputs.SQUARE);
        CliRun run = CliRun.morse("draw", file, "--format", "png");
        assertEquals(2, run.code());
        assertEquals("", run.out());
        assertEquals(1, run.errLines().size(), run.err());
        assertTrue(run.err().contains("'png' is not a format: svg, dot or graphml"), run.err());
    }

    @Test
    void cyclesMarkTheChosenGeneratorAndAMissingOneIsRefused() throws Exception {
        // the boundary of the square is a circle: H_1 = Z, generated by its four sides
        String file = Inputs.write(dir, "circle.poset", "morse-poset 1\nab: a b\nbc: b c\ncd: c d\nda: d a\n");
        Path svg = dir.resolve("circle.svg");
        CliRun run = CliRun.morse("draw", file, "--cycles", "-o", svg.toString());
        assertEquals(0, run.code(), run.err());
        assertTrue(run.out().contains("cycle: generator 1 of 1 of H_1, free, 4 terms"), run.out());
        Document doc = parse(Files.readAllBytes(svg));
        assertEquals(4, count(doc, "circle", "cycle"));
        CliRun missing = CliRun.morse("draw", file, "--generator", "1:2", "-o", dir.resolve("none.svg").toString());
        assertEquals(2, missing.code());
        assertEquals(List.of(file + ": there is no generator 2 of H_1: the homology in dimension 1 has 1 generator"),
                missing.errLines());
        assertFalse(Files.exists(dir.resolve("none.svg")));
    }

    @Test
    void cyclesOfTheImplicitEngineAreMarkedOnItsChains() throws Exception {
        // the implicit engine's chains have no stored ids: the marked nodes are found by the chains'
        // names. The circle's one generator is a sum of chains whose elements go once round it, and
        // its nodes are the 1-chains of the order complex (common practice: H_1 of a circle is Z)
        String file = Inputs.write(dir, "circle.poset", "morse-poset 1\nab: a b\nbc: b c\ncd: c d\nda: d a\n");
        Path svg = dir.resolve("implicit.svg");
        CliRun run = CliRun.morse("draw", file, "--complex", "implicit", "--cycles", "-o", svg.toString());
        assertEquals(0, run.code(), run.err());
        assertTrue(run.out().contains("cycle: generator 1 of 1 of H_1, free, 8 terms"), run.out());
        assertEquals(8, count(parse(Files.readAllBytes(svg)), "circle", "cycle"));
    }

    @Test
    void anImageWithCyclesIsDrawnWithEachHoleGoneRound() throws Exception {
        // a 5 x 3 bitmap with two single-pixel holes: H_1 = Z^2
        String image = Inputs.write(dir, "holes.pbm", "P1\n5 3\n1 1 1 1 1\n1 0 1 0 1\n1 1 1 1 1\n");
        Path svg = dir.resolve("holes.svg");
        CliRun run = CliRun.morse("draw", image, "--cycles", "-o", svg.toString());
        assertEquals(0, run.code(), run.err());
        Document doc = parse(Files.readAllBytes(svg));
        assertEquals(2, count(doc, "path", "cycle"));
        CliRun dot = CliRun.morse("draw", image, "--cycles", "--format", "dot", "-o", dir.resolve("holes.dot").toString());
        assertEquals(2, dot.code());
        assertEquals(List.of(image + ": an image with its cycles is drawn as SVG only; leave out --format dot"),
                dot.errLines());
        assertFalse(Files.exists(dir.resolve("holes.dot")));
    }
}
