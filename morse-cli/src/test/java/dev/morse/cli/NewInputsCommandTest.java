package dev.morse.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Chain complexes, graphs and meshes through the commands, against known homology: the real
 * projective plane (Hatcher, Algebraic Topology, 2002, Section 2.2: H_1 = Z/2), the independence
 * complex of the cycle C_6 (Kozlov 1999: S^1 ∨ S^1), the torus (Z, Z^2, Z) and the cube surface
 * (S^2); and bad input of each kind as one line naming file and line, exit code 2, nothing on
 * standard output.
 */
class NewInputsCommandTest {
    private static final String C6 = "# the cycle C_6\n1 2\n2 3\n3 4\n4 5\n5 6\n6 1\n";
    private static final String TORUS = torus();

    @TempDir
    Path dir;

    /** A 3 × 3 grid of squares on the torus (common practice). */
    private static String torus() {
        StringBuilder obj = new StringBuilder();
        for (int k = 0; k < 9; k++) {
            obj.append("v ").append(k).append(" 0 0\n");
        }
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                obj.append("f ").append(i * 3 + j + 1).append(' ').append(i * 3 + (j + 1) % 3 + 1).append(' ')
                        .append((i + 1) % 3 * 3 + (j + 1) % 3 + 1).append(' ').append((i + 1) % 3 * 3 + j + 1).append('\n');
            }
        }
        return obj.toString();
    }

    private Path exportedRp2() throws IOException {
        String rp2 = Inputs.write(dir, "rp2.simplicial", Inputs.RP2);
        Path out = dir.resolve("rp2-matrices");
        CliRun run = CliRun.morse("export", rp2, "-o", out.toString());
        assertEquals(0, run.code(), run.err());
        return out;
    }

    @Test
    void exportedMatricesAreAnInputToHomology() throws IOException {
        Map<String, Object> json = CliFiles.homologyJson(exportedRp2().toString());
        assertEquals("given", json.get("complex"));
        assertEquals("matrices", json.get("format"));
        assertEquals(List.of(1L, 0L, 0L), CliFiles.betti(json));
        assertEquals(List.of(2L), CliFiles.torsion(json, 1));
    }

    @Test
    void exportedMatricesOverZ2() throws IOException {
        Map<String, Object> json = CliFiles.homologyJson(exportedRp2().toString(), "--coefficients", "2");
        assertEquals(List.of(1L, 1L, 1L), CliFiles.betti(json));
    }

    @Test
    void exportedMatricesAreAnInputToCompareExportAndBatch() throws IOException {
        Path matrices = exportedRp2();
        CliRun compare = CliRun.morse("compare", matrices.toString());
        assertEquals(0, compare.code(), compare.err());
        Path again = dir.resolve("again");
        CliRun export = CliRun.morse("export", matrices.toString(), "-o", again.toString());
        assertEquals(0, export.code(), export.err());
        assertTrue(export.out().contains("H_1 = Z/2"), export.out());
        CliRun batch = CliRun.morse("batch", matrices.toString(), again.toString());
        assertEquals(0, batch.code(), batch.err());
        assertEquals(2, batch.out().lines().count(), batch.out());
        assertTrue(batch.out().lines().allMatch(line -> line.contains("\"torsion\":[2]")
                || line.replace(" ", "").contains("\"torsion\":[2]")), batch.out());
    }

    @Test
    void inspectingMatricesGivesTheEulerCharacteristic() throws IOException {
        Path matrices = exportedRp2();
        CliRun run = CliRun.morse("inspect", matrices.toString(), "--json");
        assertEquals(0, run.code(), run.err());
        @SuppressWarnings("unchecked")
        Map<String, Object> json = (Map<String, Object>) JsonValues.parse(run.out());
        assertEquals("matrices", json.get("format"));
        // chi(RP^2) = 1 - 0 + 0 = 1 from its homology (Hatcher 2002, Section 2.2); the Morse complex keeps it
        assertEquals(java.math.BigInteger.ONE, json.get("euler_characteristic"));
        // H_1 = Z/2 needs an entry other than 1 or -1
        assertEquals(false, json.get("unit_entries"));
    }

    @Test
    void independenceComplexOfTheSixCycleIsTwoCircles() throws IOException {
        String c6 = Inputs.write(dir, "c6.edges", C6);
        // Kozlov 1999: Ind(C_{3k}) is a wedge of two spheres S^(k-1); k = 2
        assertEquals(List.of(1L, 2L, 0L), CliFiles.betti(CliFiles.homologyJson(c6, "--graph-as", "independence")));
        // C_6 has no triangles, so its clique complex is the circle itself (common practice)
        assertEquals(List.of(1L, 1L), CliFiles.betti(CliFiles.homologyJson(c6)));
    }

    @Test
    void torusMeshAndCubeOffThroughHomology() throws IOException {
        String torus = Inputs.write(dir, "torus.obj", TORUS);
        Map<String, Object> json = CliFiles.homologyJson(torus);
        assertEquals("cellular", json.get("complex"));
        assertEquals(List.of(1L, 2L, 1L), CliFiles.betti(json));
    }

    @Test
    void generateWritesTheComplexesOfAGraphAndTheFacePosetOfAMesh() throws IOException {
        String c6 = Inputs.write(dir, "c6.edges", C6);
        Path ind = dir.resolve("ind.simplicial");
        CliRun run = CliRun.morse("generate", "graph", c6, "--graph-as", "independence", "-o", ind.toString());
        assertEquals(0, run.code(), run.err());
        assertEquals(List.of(1L, 2L, 0L), CliFiles.betti(CliFiles.homologyJson(ind.toString())));
        Path torus = dir.resolve("torus.poset");
        run = CliRun.morse("generate", "mesh", Inputs.write(dir, "torus.obj", TORUS), "-o", torus.toString());
        assertEquals(0, run.code(), run.err());
        assertTrue(Files.readString(torus).startsWith("morse-poset 1\n"));
        assertEquals(List.of(1L, 2L, 1L), CliFiles.betti(CliFiles.homologyJson(torus.toString())));
    }

    @Test
    void graphOptionOnAnotherInputIsAWarning() throws IOException {
        String rp2 = Inputs.write(dir, "rp2.simplicial", Inputs.RP2);
        CliRun run = CliRun.morse("homology", rp2, "--graph-as", "matching");
        assertEquals(0, run.code(), run.err());
        assertEquals(List.of("morse: warning: --graph-as applies only to graph files (.dot, .graphml, .edges); " + rp2
                + " is not one"), run.errLines());
    }

    /** Exit code 2, exactly {@code line} on standard error, nothing on standard output. */
    private static void assertBadInput(String line, String... args) {
        CliRun run = CliRun.morse(args);
        assertEquals(2, run.code(), run.err());
        assertEquals("", run.out());
        assertEquals(List.of(line), run.errLines());
    }

    @Test
    void generateRefusesALabelThatAFileCannotHold() throws IOException {
        String dot = Inputs.write(dir, "cities.dot", "graph { \"New York\" -- Boston; Boston -- Albany }\n");
        Path out = dir.resolve("cities.simplicial");
        assertBadInput(dot + ": cannot be written as a morse file: label 'New York' contains ' '; labels there have"
                + " no white space, ':' or '#'", "generate", "graph", dot, "-o", out.toString());
        assertTrue(Files.notExists(out));
    }

    @Test
    void aNonSimplePolygonIsOneLine() throws IOException {
        String bad = Inputs.write(dir, "bad.obj", "v 0 0 0\nv 1 0 0\nv 0 1 0\nf 1 2 3 2\n");
        assertBadInput(bad + ":4: vertex 2 appears twice in this polygon; a polygon must be simple (its vertices"
                + " distinct)", "homology", bad);
    }

    @Test
    void aLoopInAnEdgeListIsOneLine() throws IOException {
        String bad = Inputs.write(dir, "loop.edges", "a b\nc c\n");
        assertBadInput(bad + ":2: a loop at 'c': the complexes of a graph are made for simple graphs", "homology", bad,
                "--graph-as", "independence");
    }

    @Test
    void aGraphmlFileWithADocumentTypeIsRefusedBeforeItsEntitiesAreRead() throws IOException {
        // an external entity would make the XML parser read another file (the XXE attack, common
        // practice to refuse); GraphML has no document type, so any is refused, on its line
        String bad = Inputs.write(dir, "entity.graphml", "<?xml version=\"1.0\"?>\n"
                + "<!DOCTYPE graphml [<!ENTITY secret SYSTEM \"file:///etc/hostname\">]>\n"
                + "<graphml xmlns=\"http://graphml.graphdrawing.org/xmlns\"><graph edgedefault=\"undirected\">"
                + "<node id=\"a\"><data key=\"d0\">&secret;</data></node><node id=\"b\"/>"
                + "<edge source=\"a\" target=\"b\"/></graph></graphml>\n");
        assertBadInput(bad + ":2: a document type declaration (<!DOCTYPE ...>) is not read: GraphML needs none, and"
                + " its entities could reach other files", "homology", bad);
    }

    @Test
    void aDotSyntaxErrorIsOneLineWithItsLine() throws IOException {
        String bad = Inputs.write(dir, "bad.dot", "graph G {\n  a -- b;\n  b -- ;\n}\n");
        CliRun run = CliRun.morse("homology", bad);
        assertEquals(2, run.code(), run.err());
        assertEquals("", run.out());
        assertEquals(1, run.errLines().size(), run.err());
        assertTrue(run.err().startsWith(bad + ":3: "), run.err());
    }

    @Test
    void aFractionalMatrixEntryIsOneLine() throws IOException {
        Path matrices = Files.createDirectory(dir.resolve("m"));
        Files.writeString(matrices.resolve("boundary-1.mtx"),
                "%%MatrixMarket matrix coordinate real general\n2 1 2\n1 1 -1\n2 1 0.5\n");
        assertBadInput(matrices.resolve("boundary-1.mtx") + ":4: the entry '0.5' is not a whole number; boundary"
                + " matrices have integer entries", "homology", matrices.toString());
    }

    @Test
    void aBoundaryOfABoundaryThatIsNotZeroIsOneLineNamingBothMatrices() throws IOException {
        Path matrices = Files.createDirectory(dir.resolve("m"));
        Files.writeString(matrices.resolve("boundary-1.mtx"),
                "%%MatrixMarket matrix coordinate integer general\n2 1 2\n1 1 -1\n2 1 1\n");
        Files.writeString(matrices.resolve("boundary-2.mtx"),
                "%%MatrixMarket matrix coordinate integer general\n1 1 1\n1 1 1\n");
        assertBadInput(matrices.resolve("boundary-2.mtx") + ": boundary-1.mtx times boundary-2.mtx (∂_1 ∂_2) is not"
                + " zero: its entry at row 1, column 1 is -1; the boundary of a boundary must vanish", "homology",
                matrices.toString());
    }

    @Test
    void matricesThatDoNotFitAreOneLineNamingBothFiles() throws IOException {
        Path one = Files.writeString(dir.resolve("a.mtx"), "%%MatrixMarket matrix coordinate integer general\n2 3 0\n");
        Path two = Files.writeString(dir.resolve("b.mtx"), "%%MatrixMarket matrix coordinate integer general\n2 1 0\n");
        assertBadInput(two + ": ∂_2 has 2 rows, but a.mtx (∂_1) has 3 columns; the rows of ∂_2 are the columns of ∂_1",
                "homology", one.toString(), two.toString());
    }
}
