package dev.morse.input;

import dev.morse.graph.Graph;
import dev.morse.graph.GraphComplexes;
import dev.morse.graph.GraphReader;
import dev.morse.io.InputException;
import dev.morse.io.InputFormat;
import java.io.IOException;
import java.nio.file.Path;
import java.util.List;

/**
 * Graph files (DOT, GraphML, edge lists), read as the complex {@link ReadOptions#graphAs()} names:
 * the clique, independence or matching complex as listed faces, or the poset of connected induced
 * subgraphs.
 */
final class GraphFileReader implements InputReader {
    @Override
    public boolean recognises(InputProbe probe) {
        return probe.header().filter(f -> f == InputFormat.DOT || f == InputFormat.GRAPHML || f == InputFormat.EDGES)
                .isPresent();
    }

    @Override
    public Input read(List<Path> files, ReadOptions options) throws IOException {
        long start = System.nanoTime();
        Path file = files.get(0);
        String source = file.toString();
        InputFormat format = InputFormat.sniff(file);
        Graph graph = switch (format) {
            case DOT -> GraphReader.readDot(file);
            case GRAPHML -> GraphReader.readGraphml(file);
            default -> GraphReader.readEdges(file);
        };
        return asComplex(source, graph, options, start);
    }

    /** The input a graph stands for under {@code options}. */
    static Input asComplex(String source, Graph graph, ReadOptions options, long start) {
        try {
            return switch (options.graphAs()) {
                case CLIQUE -> new FacetInput(source, GraphComplexes.cliqueComplex(graph), InputReaders.millisSince(start));
                case INDEPENDENCE -> new FacetInput(source, GraphComplexes.independenceComplex(graph),
                        InputReaders.millisSince(start));
                case MATCHING -> new FacetInput(source, GraphComplexes.matchingComplex(graph),
                        InputReaders.millisSince(start));
                case CONNECTED_SUBGRAPHS -> new PosetInput(source, GraphComplexes.connectedSubgraphs(graph),
                        InputReaders.millisSince(start));
            };
        } catch (IllegalArgumentException | IllegalStateException e) {
            throw new InputException(source, InputException.NO_LINE, "its " + options.graphAs().optionName()
                    + " complex cannot be made: " + e.getMessage());
        }
    }
}
