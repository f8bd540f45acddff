package dev.morse.input;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.morse.complex.ComplexKind;
import dev.morse.engine.Computation;
import dev.morse.engine.Engines;
import dev.morse.engine.Request;
import dev.morse.homology.HomologyGroup;
import dev.morse.io.InputException;
import dev.morse.poset.Poset;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Polygon meshes as regular CW complexes, against the homology of the surfaces they triangulate
 * (Hatcher, Algebraic Topology, 2002, Section 2.2 and Example 2.36-2.37, from memory for the numbers
 * of the examples: S^2 has H = Z, 0, Z; the torus Z, Z^2, Z; the Möbius band, which deformation
 * retracts onto its core circle, Z, Z, 0). The face poset is a CW poset, so the cellular complex
 * with one cell per vertex, edge and polygon is used.
 */
class MeshInputTest {
    /** The unit cube's eight corners and six square faces, with texture and normal indices as exporters write them. */
    static final String CUBE_OBJ = """
            # a cube
            v 0 0 0
            v 1 0 0
            v 1 1 0
            v 0 1 0
            v 0 0 1
            v 1 0 1
            v 1 1 1
            v 0 1 1
            vt 0 0
            vn 0 0 1
            g cube
            usemtl plain
            f 1/1/1 4/1/1 3/1/1 2/1/1
            f 5//1 6//1 7//1 8//1
            f 1 2 6 5
            f 2 3 7 6
            f 3 4 8 7
            f 4 1 5 8
            """;

    static final String CUBE_OFF = """
            OFF
            # the same cube, numbered from 0
            8 6 12
            0 0 0
            1 0 0
            1 1 0
            0 1 0
            0 0 1
            1 0 1
            1 1 1
            0 1 1
            4 0 3 2 1
            4 4 5 6 7
            4 0 1 5 4  255 0 0
            4 1 2 6 5
            4 2 3 7 6
            4 3 0 4 7
            """;

    @TempDir
    Path temp;

    private Computation run(String name, String text) throws IOException {
        return Engines.compute(InputReaders.read(Files.writeString(temp.resolve(name), text)), Request.defaults());
    }

    private static List<HomologyGroup> groups(int... betti) {
        return java.util.stream.IntStream.range(0, betti.length).mapToObj(d -> HomologyGroup.free(d, betti[d])).toList();
    }

    /** An m × n grid of squares on the torus, vertex (i, j) numbered i*n + j + 1, written with negative indices. */
    static String torus(int m, int n) {
        StringBuilder obj = new StringBuilder("# a " + m + "x" + n + " torus\n");
        for (int k = 0; k < m * n; k++) {
            obj.append("v ").append(k).append(" 0 0\n");
        }
        int count = m * n;
        for (int i = 0; i < m; i++) {
            for (int j = 0; j < n; j++) {
                int a = i * n + j + 1;
                int b = i * n + (j + 1) % n + 1;
                int c = ((i + 1) % m) * n + (j + 1) % n + 1;
                int d = ((i + 1) % m) * n + j + 1;
                // negative indices count back from the last vertex given: -1 is vertex count
                obj.append("f ").append(a - count - 1).append(' ').append(b - count - 1).append(' ')
                        .append(c - count - 1).append(' ').append(d - count - 1).append('\n');
            }
        }
        return obj.toString();
    }

    /**
     * A band of three squares whose ends are glued with a half twist: top vertices a0 a1 a2 (1-3),
     * bottom b0 b1 b2 (4-6), the last square closing a2 to b0 and b2 to a0.
     */
    static final String MOBIUS_OBJ = """
            v 0 0 0
            v 1 0 0
            v 2 0 0
            v 0 1 0
            v 1 1 0
            v 2 1 0
            f 1 2 5 4
            f 2 3 6 5
            f 3 4 1 6
            """;

    @Test
    void cubeSurfaceIsATwoSphere() throws IOException {
        Computation run = run("cube.obj", CUBE_OBJ);
        assertEquals(ComplexKind.CELLULAR, run.complexKind());
        assertEquals(List.of(8L, 12L, 6L), run.cells());
        assertEquals(groups(1, 0, 1), run.homology().groups());
    }

    @Test
    void cubeSurfaceInOffIsATwoSphere() throws IOException {
        Computation run = run("cube.off", CUBE_OFF);
        assertEquals(List.of(8L, 12L, 6L), run.cells());
        assertEquals(groups(1, 0, 1), run.homology().groups());
    }

    @Test
    void torusMeshHasTwoLoops() throws IOException {
        Computation run = run("torus.obj", torus(3, 4));
        assertEquals(ComplexKind.CELLULAR, run.complexKind());
        assertEquals(List.of(12L, 24L, 12L), run.cells());
        assertEquals(groups(1, 2, 1), run.homology().groups());
    }

    @Test
    void mobiusBandIsACircleUpToHomotopy() throws IOException {
        Computation run = run("mobius.obj", MOBIUS_OBJ);
        assertEquals(ComplexKind.CELLULAR, run.complexKind());
        assertEquals(List.of(6L, 9L, 3L), run.cells());
        assertEquals(groups(1, 1, 0), run.homology().groups());
    }

    @Test
    void mobiusBandHasOneBoundaryCircleOfSixEdges() throws IOException {
        // what tells the band from an annulus (two boundary circles of three): its boundary, the edges
        // in one square only, is a single circle through all six vertices (common practice)
        Poset poset = ((PosetInput) InputReaders.read(Files.writeString(temp.resolve("m.obj"), MOBIUS_OBJ))).poset();
        StringBuilder facets = new StringBuilder("morse-simplicial 1\n");
        int boundaryEdges = 0;
        for (int x = 0; x < poset.size(); x++) {
            if (poset.height(x) == 1 && poset.upperCovers().degree(x) == 1) {
                boundaryEdges++;
                facets.append(poset.label(x).replace('-', ' ')).append('\n');
            }
        }
        assertEquals(6, boundaryEdges);
        Computation boundary = Engines.compute(InputReaders.parse("boundary", facets.toString()), Request.defaults());
        assertEquals(groups(1, 1), boundary.homology().groups());
    }

    @Test
    void cubeWithASquareHoleIsAnAnnulusUpToHomotopy() throws IOException {
        // the cube surface less the open top face is a disc; less also the bottom face, a cylinder: Z, Z, 0
        String open = CUBE_OBJ.replace("f 1/1/1 4/1/1 3/1/1 2/1/1\n", "").replace("f 5//1 6//1 7//1 8//1\n", "");
        assertEquals(groups(1, 1, 0), run("tube.obj", open).homology().groups());
    }

    @Test
    void aPolygonWithARepeatedVertexIsALineError() throws IOException {
        InputException e = assertThrows(InputException.class, () -> run("bad.obj", "v 0 0 0\nv 1 0 0\nv 0 1 0\n"
                + "f 1 2 3\nf 1/1 2/2 -3/3 3/3\n"));
        assertEquals(temp.resolve("bad.obj") + ":5: vertex 1 appears twice in this polygon; a polygon must be simple"
                + " (its vertices distinct)", e.getMessage());
    }

    @Test
    void aPolygonOfTwoVerticesIsALineError() throws IOException {
        InputException e = assertThrows(InputException.class, () -> run("bad.off", "OFF\n3 1 0\n0 0 0\n1 0 0\n0 1 0\n"
                + "2 0 1\n"));
        assertEquals(temp.resolve("bad.off") + ":6: a polygon needs at least 3 vertices, this one has 2", e.getMessage());
    }

    @Test
    void anIndexPastTheVerticesIsALineError() throws IOException {
        InputException e = assertThrows(InputException.class, () -> run("far.obj", "v 0 0 0\nv 1 0 0\nv 0 1 0\n"
                + "# the fourth vertex never comes\nf 1 2 4\n"));
        assertEquals(temp.resolve("far.obj") + ":5: vertex index 4 is out of range: the file has 3 vertices",
                e.getMessage());
    }

    @Test
    void theFacePosetNamesCellsAsTheFileNumbersThem() throws IOException {
        Poset poset = ((PosetInput) InputReaders.read(Files.writeString(temp.resolve("c.off"), CUBE_OFF))).poset();
        assertTrue(poset.find("v0").isPresent() && poset.find("v0-v3").isPresent() && poset.find("f6").isPresent());
        assertEquals(26, poset.size());
    }
}
