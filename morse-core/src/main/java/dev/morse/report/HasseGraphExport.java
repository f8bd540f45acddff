package dev.morse.report;

import java.io.StringWriter;
import java.util.LinkedHashMap;
import java.util.Map;
import org.jgrapht.Graph;
import org.jgrapht.graph.SimpleDirectedGraph;
import org.jgrapht.nio.Attribute;
import org.jgrapht.nio.AttributeType;
import org.jgrapht.nio.DefaultAttribute;
import org.jgrapht.nio.dot.DOTExporter;
import org.jgrapht.nio.graphml.GraphMLExporter;

/**
 * A {@link HasseDrawing} as a graph file for other graph tools, written by jgrapht-io: Graphviz DOT
 * or GraphML. One node per element or cell, with id {@code n0, n1, ...} and the attributes
 * {@code label}, {@code level} (rank, height or dimension, as the drawing's levels), and when a
 * matching is marked {@code critical} ({@code true}/{@code false}) and {@code partner} (the label
 * of the node it is matched with, left out when critical); when a cycle is marked, {@code cycle}
 * ({@code true}/{@code false}) and {@code coefficient} (its coefficient there, left out for none). One
 * edge per cover, from the lower node to the upper one, with {@code matched} and, with a cycle,
 * {@code cycle_cover} (whether the cycle runs along it). The DOT file also carries Graphviz's own styling (drawn bottom up, matched covers
 * thick and red, critical nodes filled, the cycle green) so that {@code dot -Tsvg} shows the same
 * marks as the SVG picture.
 */
public final class HasseGraphExport {
    private HasseGraphExport() {
    }

    /** The drawing as a Graphviz DOT digraph. */
    public static String toDot(HasseDrawing drawing) {
        DOTExporter<Integer, Integer> exporter = new DOTExporter<>(v -> "n" + v);
        exporter.setGraphIdProvider(() -> "hasse");
        exporter.setGraphAttributeProvider(() -> {
            Map<String, Attribute> graph = new LinkedHashMap<>();
            // graph attributes are written unquoted, so only a plain word goes here
            graph.put("rankdir", DefaultAttribute.createAttribute("BT"));
            return graph;
        });
        exporter.setVertexAttributeProvider(v -> {
            Map<String, Attribute> a = nodeAttributes(drawing, v);
            // the exporter escapes quotes only; a backslash starts an escape in DOT, so it is doubled
            a.replaceAll((key, value) -> value.getType() == AttributeType.STRING
                    ? DefaultAttribute.createAttribute(value.getValue().replace("\\", "\\\\")) : value);
            if (drawing.critical(v)) {
                a.put("style", DefaultAttribute.createAttribute("filled"));
                a.put("fillcolor", DefaultAttribute.createAttribute("#1f77b4"));
            }
            if (drawing.inCycle(v)) {
                a.put("color", DefaultAttribute.createAttribute("#2ca02c"));
                a.put("penwidth", DefaultAttribute.createAttribute("3"));
            }
            return a;
        });
        exporter.setEdgeAttributeProvider(e -> {
            Map<String, Attribute> a = edgeAttributes(drawing, e);
            if (drawing.matched(e) || drawing.coverInCycle(e)) {
                a.put("color", DefaultAttribute.createAttribute(drawing.matched(e) ? "#d62728" : "#2ca02c"));
                a.put("penwidth", DefaultAttribute.createAttribute("3"));
            }
            return a;
        });
        StringWriter out = new StringWriter();
        exporter.exportGraph(graphOf(drawing), out);
        return out.toString();
    }

    /** The drawing as a GraphML document with typed attribute keys. */
    public static String toGraphml(HasseDrawing drawing) {
        GraphMLExporter<Integer, Integer> exporter = new GraphMLExporter<>(v -> "n" + v);
        exporter.registerAttribute("label", GraphMLExporter.AttributeCategory.NODE, AttributeType.STRING);
        exporter.registerAttribute("level", GraphMLExporter.AttributeCategory.NODE, AttributeType.INT);
        if (drawing.marked()) {
            exporter.registerAttribute("critical", GraphMLExporter.AttributeCategory.NODE, AttributeType.BOOLEAN);
            exporter.registerAttribute("partner", GraphMLExporter.AttributeCategory.NODE, AttributeType.STRING);
            exporter.registerAttribute("matched", GraphMLExporter.AttributeCategory.EDGE, AttributeType.BOOLEAN);
        }
        if (drawing.hasCycle()) {
            exporter.registerAttribute("cycle", GraphMLExporter.AttributeCategory.NODE, AttributeType.BOOLEAN);
            exporter.registerAttribute("coefficient", GraphMLExporter.AttributeCategory.NODE, AttributeType.STRING);
            exporter.registerAttribute("cycle_cover", GraphMLExporter.AttributeCategory.EDGE, AttributeType.BOOLEAN);
        }
        exporter.setVertexAttributeProvider(v -> nodeAttributes(drawing, v));
        exporter.setEdgeAttributeProvider(e -> edgeAttributes(drawing, e));
        StringWriter out = new StringWriter();
        exporter.exportGraph(graphOf(drawing), out);
        return out.toString();
    }

    private static Graph<Integer, Integer> graphOf(HasseDrawing drawing) {
        Graph<Integer, Integer> graph = new SimpleDirectedGraph<>(null, null, false);
        for (int v = 0; v < drawing.nodeCount(); v++) {
            graph.addVertex(v);
        }
        for (int e = 0; e < drawing.coverCount(); e++) {
            graph.addEdge(drawing.lowerEnd(e), drawing.upperEnd(e), e);
        }
        return graph;
    }

    private static Map<String, Attribute> nodeAttributes(HasseDrawing drawing, int v) {
        Map<String, Attribute> a = new LinkedHashMap<>();
        a.put("label", DefaultAttribute.createAttribute(drawing.label(v)));
        a.put("level", DefaultAttribute.createAttribute(drawing.level(v)));
        if (drawing.marked()) {
            int partner = drawing.partner(v);
            a.put("critical", DefaultAttribute.createAttribute(drawing.critical(v)));
            if (partner >= 0) {
                a.put("partner", DefaultAttribute.createAttribute(drawing.label(partner)));
            }
        }
        if (drawing.hasCycle()) {
            a.put("cycle", DefaultAttribute.createAttribute(drawing.inCycle(v)));
            if (!drawing.cycleCoefficient(v).isEmpty()) {
                a.put("coefficient", DefaultAttribute.createAttribute(drawing.cycleCoefficient(v)));
            }
        }
        return a;
    }

    private static Map<String, Attribute> edgeAttributes(HasseDrawing drawing, int e) {
        Map<String, Attribute> a = new LinkedHashMap<>();
        if (drawing.marked()) {
            a.put("matched", DefaultAttribute.createAttribute(drawing.matched(e)));
        }
        if (drawing.hasCycle()) {
            a.put("cycle_cover", DefaultAttribute.createAttribute(drawing.coverInCycle(e)));
        }
        return a;
    }
}
