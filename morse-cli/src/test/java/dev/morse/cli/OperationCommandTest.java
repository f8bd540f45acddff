package dev.morse.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class OperationCommandTest {
    /** A circle: two vertices below two edges (DESIGN.md's example). */
    private static final String CIRCLE = "morse-poset 1\nv1\nv2\ne1: v1 v2\ne2: v1 v2\n";

    @TempDir
    Path dir;
    private String circle;
    private String b4;
    private String rp2;

    @BeforeEach
    void writeInputs() throws IOException {
        circle = Files.writeString(dir.resolve("circle.poset"), CIRCLE).toString();
        b4 = dir.resolve("b4.poset").toString();
        assertEquals(0, CliRun.morse("generate", "boolean", "4", "-o", b4).code());
        rp2 = dir.resolve("rp2.poset").toString();
        assertEquals(0, CliRun.morse("generate", "projective", "2", "-o", rp2).code());
    }

    private String op(String out, String... args) {
        String path = dir.resolve(out).toString();
        String[] all = new String[args.length + 3];
        all[0] = "op";
        System.arraycopy(args, 0, all, 1, args.length);
        all[args.length + 1] = "-o";
        all[args.length + 2] = path;
        CliRun run = CliRun.morse(all);
        assertEquals(0, run.code(), run.err());
        assertTrue(run.out().startsWith("wrote " + path + ": "), run.out());
        return path;
    }

    private static List<Long> betti(String file) {
        return CliFiles.betti(CliFiles.homologyJson(file));
    }

    @Test
    void productOfTwoCirclesIsATorus() {
        // Walker 1988 and Künneth: S^1 x S^1 has H = Z, Z^2, Z
        assertEquals(List.of(1L, 2L, 1L), betti(op("torus.poset", "product", circle, circle)));
    }

    @Test
    void ordinalSumOfTwoCirclesIsTheThreeSphere() {
        // the join S^1 * S^1 = S^3 (common practice); the shared labels are kept apart
        assertEquals(List.of(1L, 0L, 0L, 1L), betti(op("s3.poset", "sum", circle, circle)));
    }

    @Test
    void dualAndSubdivisionKeepTheHomology() {
        // RP^2: Z, Z/2, 0 (Hatcher 2002, Example 2.42), whichever way round and however subdivided
        for (String file : List.of(op("dual.poset", "dual", rp2), op("sd.poset", "subdivide", rp2))) {
            Map<String, Object> json = CliFiles.homologyJson(file);
            assertEquals(List.of(1L, 0L, 0L), CliFiles.betti(json));
            assertEquals(List.of(2L), CliFiles.torsion(json, 1));
        }
    }

    @Test
    void intervalsAndProperPartOfTheBooleanLattice() {
        // intervals of B_4 are Boolean (standard): ({1}, {1,2,3,4}) is the proper part of B_3, a circle
        assertEquals(List.of(1L, 1L), betti(op("open.poset", "open-interval", b4, "{1}", "{1,2,3,4}")));
        assertEquals(List.of(1L, 0L, 0L, 0L), betti(op("closed.poset", "closed-interval", b4, "{1}", "{1,2,3,4}")));
        assertEquals(List.of(1L, 0L, 1L), betti(op("proper.poset", "proper-part", b4)));
    }

    @Test
    void rankSelectionOfTheBooleanLattice() {
        // Stanley EC I, Thm 3.13.1 (from memory): ranks {1, 3} of B_4 give a wedge of β_4({1,3}) = 5
        // circles; the permutations of 1234 with descent set {1, 3} are 2143, 3142, 3241, 4132, 4231
        assertEquals(List.of(1L, 5L), betti(op("sel.poset", "rank-select", b4, "1,3")));
        assertEquals(List.of(1L, 0L, 1L), betti(op("mid.poset", "rank-select", b4, "1-3")));
    }

    @Test
    void unknownLabelIsAnInputError() {
        CliRun run = CliRun.morse("op", "open-interval", b4, "{9}", "{1}", "-o", dir.resolve("x.poset").toString());
        assertEquals(2, run.code());
        assertEquals(List.of(b4 + ": no element is labelled '{9}'"), run.errLines());
        assertTrue(Files.notExists(dir.resolve("x.poset")));
    }

    @Test
    void operationsNeedPosetFiles() throws IOException {
        String triangle = Files.writeString(dir.resolve("t.simplicial"), "morse-simplicial 1\na b c\n").toString();
        CliRun run = CliRun.morse("op", "dual", triangle, "-o", dir.resolve("x.poset").toString());
        assertEquals(2, run.code());
        assertEquals(List.of(triangle + ": a poset file (morse-poset 1) is needed here, not a morse-simplicial file"),
                run.errLines());
        CliRun missing = CliRun.morse("op", "dual", dir.resolve("none.poset").toString(), "-o", "x");
        assertEquals(List.of(dir.resolve("none.poset") + ": no such file"), missing.errLines());
    }

    @Test
    void properPartOfAnUnboundedPosetIsRefused() {
        CliRun run = CliRun.morse("op", "proper-part", circle, "-o", dir.resolve("x.poset").toString());
        assertEquals(2, run.code());
        assertEquals(List.of(circle + ": the poset has more than one minimal element"), run.errLines());
    }

    @Test
    void badRanksAreAUsageError() {
        CliRun run = CliRun.morse("op", "rank-select", b4, "1,x", "-o", dir.resolve("x.poset").toString());
        assertEquals(2, run.code());
        assertTrue(run.errLines().get(0).contains("ranks must be numbers or ranges like 1,3 or 0,2-4"), run.err());
    }
}
