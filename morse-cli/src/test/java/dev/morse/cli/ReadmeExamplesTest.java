package dev.morse.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;

/** The example files the README names exist, and give the homology it shows. */
class ReadmeExamplesTest {
    /** Tests run in morse-cli/; the README is one level up. */
    private static final Path ROOT = Path.of("..");

    @Test
    void everyExampleFileTheReadmeNamesExists() throws IOException {
        String readme = Files.readString(ROOT.resolve("README.md"));
        Matcher m = Pattern.compile("docs/examples/[A-Za-z0-9_.-]+").matcher(readme);
        int found = 0;
        while (m.find()) {
            assertTrue(Files.isRegularFile(ROOT.resolve(m.group())), m.group());
            found++;
        }
        assertTrue(found >= 3, "the README names its example files");
    }

    @Test
    void theExamplesHaveTheirKnownHomology() {
        // a circle: Z, Z (common practice)
        assertEquals(List.of(1L, 1L), CliFiles.betti(json("circle.poset")));
        // RP^2: Z, Z/2, 0 (Hatcher 2002, Example 2.42, from memory)
        Map<String, Object> rp2 = json("rp2.simplicial");
        assertEquals(List.of(1L, 0L, 0L), CliFiles.betti(rp2));
        assertEquals(List.of(2L), CliFiles.torsion(rp2, 1));
        // a ring of pixels is an annulus: Z, Z, 0
        assertEquals(List.of(1L, 1L, 0L), CliFiles.betti(json("ring.pbm")));
        // a block with two holes retracts onto a wedge of two circles: Z, Z^2, 0 (common practice)
        assertEquals(List.of(1L, 2L, 0L), CliFiles.betti(json("two-holes.pbm")));
    }

    @Test
    void theGraphAndMeshExamplesHaveTheirKnownHomology() {
        // the clique complex of the octahedron graph is the octahedron's boundary, S^2 (common practice)
        assertEquals(List.of(1L, 0L, 1L), CliFiles.betti(json("octahedron.dot")));
        // Kozlov 1999: Ind(C_6) is S^1 v S^1
        assertEquals(List.of(1L, 2L, 0L), CliFiles.betti(CliFiles.homologyJson(
                ROOT.resolve("docs/examples/c6.edges").toString(), "--graph-as", "independence")));
        // the cube's surface is S^2; a 3 x 3 torus has Z, Z^2, Z (Hatcher 2002, Section 2.2)
        assertEquals(List.of(1L, 0L, 1L), CliFiles.betti(json("cube.off")));
        assertEquals(List.of(1L, 2L, 1L), CliFiles.betti(json("torus.obj")));
    }

    private static Map<String, Object> json(String name) {
        return CliFiles.homologyJson(ROOT.resolve("docs/examples").resolve(name).toString());
    }
}
