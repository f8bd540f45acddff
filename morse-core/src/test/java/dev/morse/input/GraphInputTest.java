package dev.morse.input;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import dev.morse.engine.Engines;
import dev.morse.engine.Request;
import dev.morse.generate.Families;
import dev.morse.generate.Generated;
import dev.morse.graph.GraphComplex;
import dev.morse.homology.HomologyGroup;
import dev.morse.image.ImageOptions;
import dev.morse.io.InputException;
import dev.morse.poset.Poset;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Graphs read in each format and turned into their complexes, against published homotopy types.
 * Independence complexes of paths and cycles: Kozlov, "Complexes of directed trees", J. Combin.
 * Theory Ser. A 88 (1999): Ind(P_n) is contractible for n = 3k+1 and S^(k-1) for n = 3k-1 and
 * n = 3k; Ind(C_n) is S^(k-1) ∨ S^(k-1) for n = 3k and S^(k-1) for n = 3k±1 (the cases n ≤ 6 also
 * checked by hand).
 */
class GraphInputTest {
    @TempDir
    Path temp;

    private Input read(String name, String text, GraphComplex kind) throws IOException {
        return InputReaders.read(List.of(Files.writeString(temp.resolve(name), text)),
                new ReadOptions(ImageOptions.defaults(), kind));
    }

    private static List<Integer> reducedBetti(Input input) {
        return Engines.compute(input, Request.defaults().withHomology(dev.morse.homology.Coefficients.INTEGERS, true))
                .homology().groups().stream().map(HomologyGroup::betti).toList();
    }

    /** Reduced Betti numbers of a wedge of {@code count} spheres S^dim in a complex of top dimension {@code top}. */
    private static List<Integer> wedge(int count, int dim, int top) {
        List<Integer> betti = new ArrayList<>();
        for (int d = 0; d <= top; d++) {
            betti.add(d == dim ? count : 0);
        }
        return betti;
    }

    private static String path(int n) {
        StringBuilder s = new StringBuilder("# the path P_" + n + "\n");
        for (int i = 1; i < n; i++) {
            s.append(i).append(' ').append(i + 1).append('\n');
        }
        return n == 1 ? s.append("1\n").toString() : s.toString();
    }

    private static String cycle(int n) {
        return path(n) + n + " 1\n";
    }

    @ParameterizedTest
    @ValueSource(ints = {1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12})
    void independenceComplexOfAPath(int n) throws IOException {
        Input input = read("p" + n + ".edges", path(n), GraphComplex.INDEPENDENCE);
        int top = (n + 1) / 2 - 1; // the largest independent set of P_n has ceil(n/2) vertices
        int k = (n + 1) / 3;
        List<Integer> expected = n % 3 == 1 ? wedge(0, 0, top) : wedge(1, k - 1, top);
        assertEquals(expected, reducedBetti(input), "Ind(P_" + n + ")");
    }

    @ParameterizedTest
    @ValueSource(ints = {3, 4, 5, 6, 7, 8, 9, 10, 11, 12})
    void independenceComplexOfACycle(int n) throws IOException {
        Input input = read("c" + n + ".edges", cycle(n), GraphComplex.INDEPENDENCE);
        int top = n / 2 - 1; // the largest independent set of C_n has floor(n/2) vertices
        int k = (n + 1) / 3;
        List<Integer> expected = n % 3 == 0 ? wedge(2, n / 3 - 1, top) : wedge(1, k - 1, top);
        assertEquals(expected, reducedBetti(input), "Ind(C_" + n + ")");
    }

    @ParameterizedTest
    @ValueSource(ints = {3, 4, 5, 6, 7})
    void matchingComplexOfACompleteGraphAgreesWithTheFamily(int n) throws IOException {
        StringBuilder dot = new StringBuilder("graph K" + n + " {\n");
        for (int i = 1; i <= n; i++) {
            for (int j = i + 1; j <= n; j++) {
                dot.append("  ").append(i).append(" -- ").append(j).append(";\n");
            }
        }
        Input fromGraph = read("k" + n + ".dot", dot.append("}\n").toString(), GraphComplex.MATCHING);
        Generated family = Families.matchingComplex(n);
        Input fromFamily = new FacetInput("family", ((Generated.OfFacets) family).facets(), 0);
        assertEquals(((FacetInput) fromFamily).facets().faceCount(), ((FacetInput) fromGraph).facets().faceCount());
        assertEquals(Engines.compute(fromFamily, Request.defaults()).homology(),
                Engines.compute(fromGraph, Request.defaults()).homology(), "M_" + n);
    }

    @Test
    void cliqueComplexOfK4IsASolidTetrahedron() throws IOException {
        // the clique complex of K_n is the full (n-1)-simplex, contractible (common practice)
        Input input = read("k4.dot", "graph { a -- b -- c -- d; a -- c; b -- d; a -- d }\n", GraphComplex.CLIQUE);
        assertEquals(1, ((FacetInput) input).facets().faceCount());
        assertEquals(List.of(0, 0, 0, 0), reducedBetti(input));
    }

    @ParameterizedTest
    @ValueSource(ints = {4, 5, 6, 9})
    void cliqueComplexOfACycleIsACircle(int n) throws IOException {
        // C_n has no triangles for n ≥ 4, so its clique complex is the graph itself, a circle (common practice)
        assertEquals(List.of(0, 1), reducedBetti(read("c" + n + ".edges", cycle(n), GraphComplex.CLIQUE)));
    }

    @Test
    void cliqueComplexOfTheOctahedronGraphIsATwoSphere() throws IOException {
        // K_{2,2,2}'s triangles are the faces of the octahedron, whose boundary is S^2 (common practice)
        String graphml = """
                <?xml version="1.0" encoding="UTF-8"?>
                <graphml xmlns="http://graphml.graphdrawing.org/xmlns">
                  <graph id="octahedron" edgedefault="undirected">
                    <node id="x+"/><node id="x-"/><node id="y+"/><node id="y-"/><node id="z+"/><node id="z-"/>
                """;
        String[] nodes = {"x+", "x-", "y+", "y-", "z+", "z-"};
        StringBuilder edges = new StringBuilder();
        for (int i = 0; i < 6; i++) {
            for (int j = i + 1; j < 6; j++) {
                if (j != i + 1 || i % 2 == 1) {
                    edges.append("    <edge source=\"").append(nodes[i]).append("\" target=\"").append(nodes[j])
                            .append("\"/>\n");
                }
            }
        }
        Input input = read("octahedron.graphml", graphml + edges + "  </graph>\n</graphml>\n", GraphComplex.CLIQUE);
        assertEquals(8, ((FacetInput) input).facets().faceCount());
        assertEquals(List.of(0, 0, 1), reducedBetti(input));
    }

    @Test
    void connectedInducedSubgraphsOfAPathAreItsIntervals() throws IOException {
        // the connected vertex sets of P_n are its n(n+1)/2 intervals; the whole path is the greatest
        // element, so the order complex is a cone, contractible (common practice)
        Poset poset = ((PosetInput) read("p6.edges", path(6), GraphComplex.CONNECTED_SUBGRAPHS)).poset();
        assertEquals(21, poset.size());
        assertEquals(List.of(0, 0, 0, 0, 0, 0), reducedBetti(new PosetInput("p6", poset, 0)));
    }

    @Test
    void connectedInducedSubgraphsOfACycleAndOfACompleteGraph() throws IOException {
        // C_n has n(n-1) proper arcs plus itself; every nonempty subset of K_n is connected: 2^n - 1
        assertEquals(7 * 6 + 1, ((PosetInput) read("c7.edges", cycle(7), GraphComplex.CONNECTED_SUBGRAPHS)).poset().size());
        assertEquals(31, ((PosetInput) read("k5.dot", "graph{1--2;1--3;1--4;1--5;2--3;2--4;2--5;3--4;3--5;4--5}",
                GraphComplex.CONNECTED_SUBGRAPHS)).poset().size());
    }

    @Test
    void aDisconnectedGraphHasOneComponentPerConnectedPiece() throws IOException {
        // each component's connected sets have that component as greatest element: one cone each
        Input input = read("two.edges", "a b\nb c\nx y\nlone\n", GraphComplex.CONNECTED_SUBGRAPHS);
        assertEquals(List.of(2, 0, 0), reducedBetti(input));
    }

    @Test
    void aDirectedDotGraphIsReadWithoutItsDirections() throws IOException {
        Input input = read("d.dot", "// a directed 4-cycle\ndigraph { a -> b -> c -> d -> a }\n", GraphComplex.CLIQUE);
        assertEquals(List.of(0, 1), reducedBetti(input));
    }

    @Test
    void aLoopInAnEdgeListIsALineError() throws IOException {
        InputException e = assertThrows(InputException.class, () -> read("loop.edges", "a b\n# fine so far\nb b\n",
                GraphComplex.CLIQUE));
        assertEquals(temp.resolve("loop.edges") + ":3: a loop at 'b': the complexes of a graph are made for simple graphs",
                e.getMessage());
    }

    @Test
    void threeWordsOnAnEdgeListLineIsALineError() throws IOException {
        InputException e = assertThrows(InputException.class, () -> read("three.edges", "a b c\n", GraphComplex.CLIQUE));
        assertEquals(temp.resolve("three.edges") + ":1: expected one edge 'U V' (or one vertex 'V'), found 3 words",
                e.getMessage());
    }

    @Test
    void aDotSyntaxErrorNamesItsLine() throws IOException {
        InputException e = assertThrows(InputException.class, () -> read("bad.dot", "graph G {\n  a -- b;\n  b -- ;\n}\n",
                GraphComplex.CLIQUE));
        assertEquals(3, e.line());
        assertEquals(temp.resolve("bad.dot").toString(), e.source());
    }

    @Test
    void malformedGraphmlNamesItsLine() throws IOException {
        InputException e = assertThrows(InputException.class, () -> read("bad.graphml",
                "<?xml version=\"1.0\"?>\n<graphml>\n<graph edgedefault=\"undirected\">\n<node id=\"a\">\n</graph>\n</graphml>\n",
                GraphComplex.CLIQUE));
        assertEquals(5, e.line());
    }
}
