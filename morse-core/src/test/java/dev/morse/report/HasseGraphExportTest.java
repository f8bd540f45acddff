package dev.morse.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import dev.morse.engine.Request;
import dev.morse.input.InputReaders;
import java.io.IOException;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.HashSet;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.concurrent.TimeUnit;
import org.jgrapht.Graph;
import org.jgrapht.graph.DefaultEdge;
import org.jgrapht.graph.SimpleDirectedGraph;
import org.jgrapht.nio.Attribute;
import org.jgrapht.nio.BaseEventDrivenImporter;
import org.jgrapht.nio.GraphImporter;
import org.jgrapht.nio.dot.DOTImporter;
import org.jgrapht.nio.graphml.GraphMLImporter;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * DOT and GraphML files read back with jgrapht-io's own importers give the drawing's nodes, covers
 * and attributes, and Graphviz's {@code dot} accepts the DOT file when it is installed.
 */
class HasseGraphExportTest {
    /** The boundary of a square, a circle, as a CW poset; its labels need escaping in both formats. */
    static final String CIRCLE = """
            morse-poset 1
            a"1
            b\\2
            c<3>
            d&4
            ab: a"1 b\\2
            bc: b\\2 c<3>
            cd: c<3> d&4
            da: d&4 a"1
            """;

    @TempDir
    Path dir;

    /** A drawing of the circle with the generator of H_1 marked. */
    static HasseDrawing circle() {
        return HasseDrawings.draw(InputReaders.parse("circle.poset", CIRCLE), Request.defaults(), CycleChoice.HIGHEST);
    }

    /** What an importer read: per node id its attributes, and the covers as pairs of labels. */
    record Read(Map<String, Map<String, String>> nodes, Set<String> covers, Map<String, Map<String, String>> coverAttributes) {
    }

    private static Read read(BaseEventDrivenImporter<String, DefaultEdge> importer, String text) {
        Graph<String, DefaultEdge> graph = new SimpleDirectedGraph<>(DefaultEdge.class);
        Map<String, Map<String, String>> nodes = new TreeMap<>();
        Map<DefaultEdge, Map<String, String>> edges = new HashMap<>();
        // the importers also hand on the node id under the key "ID", and null for an attribute without a value
        importer.addVertexAttributeConsumer((p, a) -> {
            Map<String, String> attributes = nodes.computeIfAbsent(p.getFirst(), k -> new TreeMap<>());
            if (a != null && !p.getSecond().equals("ID")) {
                attributes.put(p.getSecond(), a.getValue());
            }
        });
        importer.addEdgeAttributeConsumer((p, a) -> {
            if (a != null) {
                edges.computeIfAbsent(p.getFirst(), k -> new TreeMap<>()).put(p.getSecond(), a.getValue());
            }
        });
        ((GraphImporter<String, DefaultEdge>) importer).importGraph(graph, new StringReader(text));
        assertEquals(graph.vertexSet(), nodes.keySet());
        Set<String> covers = new HashSet<>();
        Map<String, Map<String, String>> coverAttributes = new HashMap<>();
        for (DefaultEdge e : graph.edgeSet()) {
            String pair = nodes.get(graph.getEdgeSource(e)).get("label") + " < " + nodes.get(graph.getEdgeTarget(e)).get("label");
            covers.add(pair);
            coverAttributes.put(pair, edges.getOrDefault(e, Map.of()));
        }
        return new Read(nodes, covers, coverAttributes);
    }

    private static void sameAsDrawing(HasseDrawing d, Read read) {
        assertEquals(d.nodeCount(), read.nodes().size());
        assertEquals(d.coverCount(), read.covers().size());
        for (int v = 0; v < d.nodeCount(); v++) {
            Map<String, String> a = read.nodes().get("n" + v);
            assertEquals(d.label(v), a.get("label"));
            assertEquals(Integer.toString(d.level(v)), a.get("level"));
            assertEquals(Boolean.toString(d.critical(v)), a.get("critical"));
            // a critical node has no partner and a node off the cycle no coefficient: those attributes are left out
            assertEquals(d.partner(v) < 0 ? null : d.label(d.partner(v)), a.get("partner"));
            assertEquals(Boolean.toString(d.inCycle(v)), a.get("cycle"));
            assertEquals(d.cycleCoefficient(v).isEmpty() ? null : d.cycleCoefficient(v), a.get("coefficient"));
        }
        for (int e = 0; e < d.coverCount(); e++) {
            String pair = d.label(d.lowerEnd(e)) + " < " + d.label(d.upperEnd(e));
            assertTrue(read.covers().contains(pair), pair);
            assertEquals(Boolean.toString(d.matched(e)), read.coverAttributes().get(pair).get("matched"));
        }
    }

    @Test
    void theCircleIsMarkedAsItsHomologySays() {
        HasseDrawing d = circle();
        assertEquals(8, d.nodeCount());
        assertEquals(8, d.coverCount());
        // H_1 of a circle is Z, generated by the sum of its edges with alternating orientation signs: the four
        // edges each with coefficient ±1, and no vertex (an outside fact; every cycle is checked by the library too)
        int onCycle = 0;
        for (int v = 0; v < d.nodeCount(); v++) {
            if (d.inCycle(v)) {
                onCycle++;
                assertEquals(1, d.level(v));
                assertTrue(Set.of("1", "-1").contains(d.cycleCoefficient(v)), d.cycleCoefficient(v));
            }
        }
        assertEquals(4, onCycle);
        // a circle's 8 cells under a perfect matching: 2 critical, 3 pairs
        assertEquals(2, d.criticalCount());
        assertEquals(3, d.matchedCount());
    }

    @Test
    void dotReadsBackWithTheSameNodesCoversAndAttributes() {
        HasseDrawing d = circle();
        DOTImporter<String, DefaultEdge> importer = new DOTImporter<>();
        importer.setVertexFactory(id -> id);
        sameAsDrawing(d, read(importer, HasseGraphExport.toDot(d)));
    }

    @Test
    void graphmlReadsBackWithTheSameNodesCoversAndAttributes() {
        HasseDrawing d = circle();
        GraphMLImporter<String, DefaultEdge> importer = new GraphMLImporter<>();
        importer.setVertexFactory(id -> id);
        importer.setSchemaValidation(true);
        sameAsDrawing(d, read(importer, HasseGraphExport.toGraphml(d)));
    }

    @Test
    void aPosetWithNothingMarkedHasOnlyLabelsAndLevels() {
        HasseDrawing d = HasseDrawings.draw(InputReaders.parse("loop.poset", "morse-poset 1\nv\ne: v\n"),
                Request.defaults());
        GraphMLImporter<String, DefaultEdge> importer = new GraphMLImporter<>();
        importer.setVertexFactory(id -> id);
        Read read = read(importer, HasseGraphExport.toGraphml(d));
        assertEquals(Map.of("n0", Map.of("label", "v", "level", "0"), "n1", Map.of("label", "e", "level", "1")),
                read.nodes());
        assertEquals(Set.of("v < e"), read.covers());
    }

    @Test
    void graphvizDotAcceptsTheDotFile() throws IOException, InterruptedException {
        assumeTrue(onPath("dot"), "Graphviz's dot is not installed");
        Path file = dir.resolve("circle.dot");
        Files.writeString(file, HasseGraphExport.toDot(circle()), StandardCharsets.UTF_8);
        Process dot = new ProcessBuilder("dot", "-Tsvg", file.toString()).redirectErrorStream(true).start();
        String out = new String(dot.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        assertTrue(dot.waitFor(60, TimeUnit.SECONDS));
        assertEquals(0, dot.exitValue(), out);
        // dot writes one <g class="node"> per node and one <g class="edge"> per edge
        assertEquals(8, out.split("class=\"node\"", -1).length - 1, out);
        assertEquals(8, out.split("class=\"edge\"", -1).length - 1, out);
        assertTrue(!out.contains("Warning") && !out.contains("Error"), out);
    }

    private static boolean onPath(String program) {
        String path = System.getenv("PATH");
        if (path == null) {
            return false;
        }
        for (String entry : path.split(java.io.File.pathSeparator)) {
            if (Files.isExecutable(Path.of(entry, program))) {
                return true;
            }
        }
        return false;
    }
}
