package dev.morse.graph;

import dev.morse.io.InputException;
import dev.morse.io.TextFiles;
import it.unimi.dsi.fastutil.ints.IntArrayList;
import it.unimi.dsi.fastutil.objects.Object2IntLinkedOpenHashMap;
import java.io.BufferedReader;
import java.io.IOException;
import java.io.Reader;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.jgrapht.graph.DefaultEdge;
import org.jgrapht.graph.builder.GraphTypeBuilder;
import org.jgrapht.nio.GraphImporter;
import org.jgrapht.nio.ImportException;
import org.jgrapht.nio.dot.DOTImporter;
import org.jgrapht.nio.graphml.GraphMLImporter;

/**
 * Reads graphs: Graphviz DOT and GraphML through the importers of jgrapht-io, and a plain edge list
 * by hand. Direction, weights and attributes are ignored and an edge given twice counts once; a loop
 * is an error, since the complexes here are of simple graphs. Vertices keep their ids as labels and
 * are numbered in order of first appearance. Every error names the file, and the line when the
 * importer says which.
 */
public final class GraphReader {
    /** The line number in the messages of the ANTLR parser behind the DOT importer and of the XML parser. */
    private static final Pattern LINE = Pattern.compile("(?i)line[^0-9]{0,3}(\\d+)");

    private GraphReader() {
    }

    /** Reads a DOT file. */
    public static Graph readDot(Path file) throws IOException {
        DOTImporter<String, DefaultEdge> importer = new DOTImporter<>();
        importer.setVertexFactory(id -> id);
        return imported(file, isDirected(file), importer);
    }

    /** Reads a GraphML file; the XML is not checked against the GraphML schema, only parsed. */
    public static Graph readGraphml(Path file) throws IOException {
        refuseDocumentType(file);
        GraphMLImporter<String, DefaultEdge> importer = new GraphMLImporter<>();
        importer.setSchemaValidation(false);
        importer.setVertexFactory(id -> id);
        return imported(file, false, importer);
    }

    /**
     * Refuses a document type declaration before the root element: GraphML needs none, and the XML
     * parser inside the importer would resolve its external entities, reading other files or
     * addresses named there (common practice: such entities are the XXE attack, and the safe reader
     * of untrusted XML refuses them).
     */
    private static void refuseDocumentType(Path file) throws IOException {
        TextFiles.read(file, (reader, source) -> {
            StringBuilder prolog = new StringBuilder();
            char[] buffer = new char[8192];
            int read;
            while ((read = reader.read(buffer)) > 0) {
                prolog.append(buffer, 0, read);
                int root = prolog.indexOf("<graphml");
                int declaration = prolog.indexOf("<!DOCTYPE");
                if (declaration >= 0 && (root < 0 || declaration < root)) {
                    int line = 1 + (int) prolog.substring(0, declaration).chars().filter(c -> c == '\n').count();
                    throw new InputException(source, line, "a document type declaration (<!DOCTYPE ...>) is not read:"
                            + " GraphML needs none, and its entities could reach other files");
                }
                if (root >= 0) {
                    break;
                }
            }
            return null;
        });
    }

    /** Reads {@code file} into a graph of that kind with {@code importer}, every failure one line. */
    private static Graph imported(Path file, boolean directed, GraphImporter<String, DefaultEdge> importer)
            throws IOException {
        String source = file.toString();
        org.jgrapht.Graph<String, DefaultEdge> graph = emptyGraph(directed);
        try (Reader reader = TextFiles.utf8(file)) {
            importer.importGraph(graph, reader);
        } catch (ImportException | IllegalArgumentException e) {
            throw failure(source, e);
        }
        return fromJgrapht(graph, source);
    }

    /**
     * Reads an edge list: one edge {@code U V} per line, or a lone vertex {@code V}; labels are any
     * words without white space; {@code #} starts a comment.
     */
    public static Graph readEdges(Path file) throws IOException {
        return TextFiles.read(file, GraphReader::readEdges);
    }

    /** Reads an edge list from {@code reader}; {@code source} names it in error messages. */
    public static Graph readEdges(BufferedReader reader, String source) throws IOException {
        Object2IntLinkedOpenHashMap<String> ids = new Object2IntLinkedOpenHashMap<>();
        ids.defaultReturnValue(-1);
        IntArrayList us = new IntArrayList();
        IntArrayList vs = new IntArrayList();
        String line;
        int number = 0;
        while ((line = reader.readLine()) != null) {
            number++;
            int hash = line.indexOf('#');
            String content = (hash >= 0 ? line.substring(0, hash) : line).strip();
            if (content.isEmpty()) {
                continue;
            }
            String[] words = content.split("\\s+");
            if (words.length > 2) {
                throw new InputException(source, number, "expected one edge 'U V' (or one vertex 'V'), found "
                        + words.length + " words");
            }
            int u = id(ids, words[0]);
            if (words.length == 2) {
                int v = id(ids, words[1]);
                if (u == v) {
                    throw new InputException(source, number, "a loop at '" + words[0]
                            + "': the complexes of a graph are made for simple graphs");
                }
                us.add(u);
                vs.add(v);
            }
        }
        return Graph.of(ids.keySet().toArray(new String[0]), us.elements(), vs.elements(), us.size());
    }

    private static int id(Object2IntLinkedOpenHashMap<String> ids, String label) {
        int id = ids.getInt(label);
        if (id < 0) {
            id = ids.size();
            ids.put(label, id);
        }
        return id;
    }

    private static org.jgrapht.Graph<String, DefaultEdge> emptyGraph(boolean directed) {
        GraphTypeBuilder<String, DefaultEdge> builder = directed ? GraphTypeBuilder.directed() : GraphTypeBuilder.undirected();
        return builder.allowingMultipleEdges(true).allowingSelfLoops(true).vertexClass(String.class)
                .edgeClass(DefaultEdge.class).buildGraph();
    }

    private static Graph fromJgrapht(org.jgrapht.Graph<String, DefaultEdge> graph, String source) {
        List<String> labels = new ArrayList<>(graph.vertexSet());
        Object2IntLinkedOpenHashMap<String> ids = new Object2IntLinkedOpenHashMap<>();
        for (String label : labels) {
            ids.put(label, ids.size());
        }
        IntArrayList us = new IntArrayList();
        IntArrayList vs = new IntArrayList();
        for (DefaultEdge e : graph.edgeSet()) {
            String a = graph.getEdgeSource(e);
            String b = graph.getEdgeTarget(e);
            if (a.equals(b)) {
                throw new InputException(source, InputException.NO_LINE, "a loop at '" + a
                        + "': the complexes of a graph are made for simple graphs");
            }
            us.add(ids.getInt(a));
            vs.add(ids.getInt(b));
        }
        return Graph.of(labels.toArray(new String[0]), us.elements(), vs.elements(), us.size());
    }

    /** Whether a DOT file declares a digraph; the importer wants a graph of the same kind. */
    private static boolean isDirected(Path file) throws IOException {
        try (BufferedReader reader = TextFiles.utf8(file)) {
            char[] start = new char[4096];
            int length = Math.max(0, reader.read(start));
            String text = new String(start, 0, length).replaceAll("(?s)/\\*.*?\\*/", " ")
                    .replaceAll("(?m)^\\s*(#|//).*$", " ").strip().toLowerCase(java.util.Locale.ROOT);
            return text.startsWith("digraph") || text.matches("(?s)^strict\\s+digraph.*");
        }
    }

    private static InputException failure(String source, Exception e) {
        String message = e.getMessage() == null ? e.toString() : e.getMessage();
        Throwable cause = e.getCause();
        if (cause instanceof org.xml.sax.SAXParseException sax && sax.getLineNumber() > 0) {
            return new InputException(source, sax.getLineNumber(), oneLine(sax.getMessage()));
        }
        Matcher m = LINE.matcher(message);
        int line = m.find() ? Integer.parseInt(m.group(1)) : InputException.NO_LINE;
        return new InputException(source, line, oneLine(message));
    }

    private static String oneLine(String message) {
        String flat = message == null ? "cannot be read" : message.replaceAll("\\s+", " ").strip();
        return flat.length() > 300 ? flat.substring(0, 300) + "..." : flat;
    }

}
