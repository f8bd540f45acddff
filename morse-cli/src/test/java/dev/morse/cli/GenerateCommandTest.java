package dev.morse.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.morse.generate.Families;
import dev.morse.generate.Generated;
import dev.morse.homology.Coefficients;
import dev.morse.image.CubicalComplex;
import dev.morse.matching.MatchingHeuristics;
import dev.morse.matching.MatchingOptions;
import dev.morse.morsecomplex.MorseReduction;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class GenerateCommandTest {
    @TempDir
    Path dir;

    /** Runs {@code morse generate ARGS -o FILE} and returns the file. */
    private String generate(String file, String... args) {
        String path = dir.resolve(file).toString();
        String[] all = new String[args.length + 3];
        all[0] = "generate";
        System.arraycopy(args, 0, all, 1, args.length);
        all[args.length + 1] = "-o";
        all[args.length + 2] = path;
        CliRun run = CliRun.morse(all);
        assertEquals(0, run.code(), run.err());
        assertEquals("", run.err());
        assertTrue(run.out().startsWith("wrote " + path + ": "), run.out());
        return path;
    }

    private static List<Long> betti(String file) {
        return CliFiles.betti(CliFiles.homologyJson(file));
    }

    @Test
    void latticesAndTheirProperParts() {
        // Björner 1980: Π_4 proper is a wedge of 3! = 6 circles
        assertEquals(List.of(1L, 6L), betti(generate("pi4.poset", "partition", "4", "--proper")));
        // Kreweras 1972: NC_5 proper is a wedge of Catalan(4) = 14 spheres S^2
        assertEquals(List.of(1L, 0L, 14L), betti(generate("nc5.poset", "noncrossing", "5", "--proper")));
        // Solomon-Tits: F_4^3 gives 4^3 = 64 circles
        assertEquals(List.of(1L, 64L), betti(generate("l43.poset", "subspace", "4", "3", "--proper")));
        // Wachs 2007: B_4 proper is S^2; the whole lattice is a cone
        assertEquals(List.of(1L, 0L, 1L), betti(generate("b4.poset", "boolean", "4", "--proper")));
        assertEquals(List.of(1L, 0L, 0L, 0L, 0L), betti(generate("b4full.poset", "boolean", "4")));
        // (1, 30) is S^1: 30 is a product of three primes (standard)
        assertEquals(List.of(1L, 1L), betti(generate("d30.poset", "divisor", "30", "--proper")));
    }

    @Test
    void polytopesAndProjectiveSpaces() {
        // the boundary of the 3-cube is S^2, the closed octahedron a ball (standard)
        assertEquals(List.of(1L, 0L, 1L), betti(generate("cube.poset", "cube", "3")));
        assertEquals(List.of(1L, 0L, 0L, 0L), betti(generate("octa.poset", "cross", "3", "--part", "closed")));
        assertEquals(List.of(1L, 0L, 1L), betti(generate("tet.poset", "simplex", "3")));
        // RP^3: Z, Z/2, 0, Z (Hatcher 2002, Example 2.42)
        Map<String, Object> rp3 = CliFiles.homologyJson(generate("rp3.poset", "projective", "3"));
        assertEquals(List.of(1L, 0L, 0L, 1L), CliFiles.betti(rp3));
        assertEquals(List.of(2L), CliFiles.torsion(rp3, 1));
    }

    @Test
    void simplicialFamilies() {
        // the Petersen graph: H_1 = Z^6 (standard); the 3 x 4 chessboard complex is a torus (from memory)
        assertEquals(List.of(1L, 6L), betti(generate("m5.simplicial", "matching", "5")));
        assertEquals(List.of(1L, 2L, 1L), betti(generate("c34.simplicial", "chessboard", "3", "4")));
    }

    @Test
    void voxelFamilies() {
        // Z, Z^2, Z, 0 by construction (VoxelBlock)
        assertEquals(List.of(1L, 2L, 1L, 0L),
                betti(generate("block.poset", "voxel-block", "9", "--tunnels", "2", "--cavities", "1")));
        // the written face poset has the homology of the cubical complex of the same random voxels
        Generated.OfVoxels voxels = (Generated.OfVoxels) Families.randomVoxels(new int[] {6, 6, 5}, 0.45, 3);
        List<Long> expected = MorseReduction.run(CubicalComplex.of(voxels.voxels()), new MorseReduction.Request(
                MatchingHeuristics.byName("coreduction").orElseThrow(), MatchingOptions.DEFAULT, Coefficients.INTEGERS,
                true)).homology().groups().stream().map(g -> (long) g.betti()).toList();
        assertEquals(expected, betti(generate("random.poset", "random-voxels", "6,6,5", "--density", "0.45",
                "--seed", "3")));
    }

    @Test
    void randomPosetHomologyIsTheSameWithAndWithoutReduction() {
        String file = generate("random.poset", "random-poset", "14", "--density", "0.25", "--seed", "9");
        Map<String, Object> reduced = CliFiles.homologyJson(file);
        Map<String, Object> plain = CliFiles.homologyJson(file, "--no-poset-reduction");
        assertEquals(CliFiles.betti(plain), CliFiles.betti(reduced));
        assertEquals(null, plain.get("poset_reduction"));
    }

    @Test
    void badArgumentsAreUsageErrorsAndWriteNothing() throws IOException {
        Path existing = Files.writeString(dir.resolve("keep.poset"), "morse-poset 1\nold\n");
        CliRun run = CliRun.morse("generate", "partition", "0", "-o", existing.toString());
        assertEquals(2, run.code());
        assertEquals(List.of("morse: n must be in 1..12, got 0 (see 'morse generate partition --help')"),
                run.errLines());
        assertEquals("", run.out());
        assertEquals("morse-poset 1\nold\n", Files.readString(existing));
        try (var files = Files.list(dir)) {
            assertEquals(1, files.count(), "no temporary file left behind");
        }
    }

    @Test
    void missingOutputDirectoryIsAnInputError() {
        Path target = dir.resolve("absent").resolve("b.poset");
        CliRun run = CliRun.morse("generate", "boolean", "3", "-o", target.toString());
        assertEquals(2, run.code());
        assertEquals(List.of(target + ": cannot be written: no such directory"), run.errLines());
    }

    @Test
    void familyIsRequired() {
        CliRun run = CliRun.morse("generate");
        assertEquals(2, run.code());
        assertTrue(run.errLines().get(0).startsWith("morse: a family is required: boolean, "), run.err());
    }

    @Test
    void helpListsEveryFamily() {
        CliRun run = CliRun.morse("generate", "--help");
        assertEquals(0, run.code());
        for (String family : List.of("boolean", "simplex", "cube", "cross", "partition", "noncrossing", "subspace",
                "divisor", "projective", "matching", "chessboard", "voxel-block", "random-voxels", "random-poset")) {
            assertTrue(run.out().contains("  " + family + " "), family + " in\n" + run.out());
        }
        assertFalse(run.out().isEmpty());
    }
}
