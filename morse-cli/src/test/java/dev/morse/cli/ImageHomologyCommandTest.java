package dev.morse.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.math.BigInteger;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ImageHomologyCommandTest {
    /** A square ring of 16 pixels in a plain bitmap (Netpbm P1, 1 = black): an annulus, H = Z, Z. */
    private static final String RING = """
            P1
            7 7
            0000000
            0111110
            0100010
            0100010
            0100010
            0111110
            0000000
            """;

    @TempDir
    Path dir;

    private String file(String name, byte[] bytes) throws IOException {
        return Files.write(dir.resolve(name), bytes).toString();
    }

    private static byte[] ascii(String text) {
        return text.getBytes(StandardCharsets.US_ASCII);
    }

    /** A 5 x 5 x 5 cube without its centre, as raw bytes: H = Z, 0, Z, 0 (a sealed cavity). */
    private static byte[] cubeWithCavity() {
        byte[] v = new byte[125];
        java.util.Arrays.fill(v, (byte) 1);
        v[2 + 5 * (2 + 5 * 2)] = 0;
        return v;
    }

    @SuppressWarnings("unchecked")
    private static Map<String, Object> image(Map<String, Object> json) {
        return (Map<String, Object>) json.get("image");
    }

    @Test
    void ringHasOneComponentAndOneHole() throws IOException {
        String ring = file("ring.pbm", ascii(RING));
        CliRun run = CliRun.morse("homology", ring);
        assertEquals(0, run.code(), run.err());
        assertTrue(run.out().startsWith(ring + " (image file)\n  complex   cubical"), run.out());
        assertTrue(run.out().contains("  shape     1 component, 1 hole\n"), run.out());
        Map<String, Object> json = CliFiles.homologyJson(ring);
        assertEquals("image", json.get("format"));
        assertEquals(BigInteger.ONE, image(json).get("tunnels"));
    }

    @Test
    void invertedRingIsTwoPiecesAroundAHole() throws IOException {
        // inside the ring a 3 x 3 block, outside it a frame: two components and the frame's hole
        Map<String, Object> json = CliFiles.homologyJson(file("ring.pbm", ascii(RING)), "--invert");
        assertEquals(List.of(2L, 1L, 0L), CliFiles.betti(json));
        assertEquals(Boolean.TRUE, image(json).get("inverted"));
    }

    @Test
    void rawVolumeNeedsItsSizes() throws IOException {
        String raw = file("cube.raw", cubeWithCavity());
        Map<String, Object> json = CliFiles.homologyJson(raw, "--dims", "5,5,5");
        assertEquals("volume", json.get("format"));
        assertEquals(List.of(1L, 0L, 1L, 0L), CliFiles.betti(json));
        assertEquals(BigInteger.ONE, image(json).get("cavities"));
        CliRun text = CliRun.morse("homology", raw, "--dims", "5,5,5");
        assertTrue(text.out().contains("  shape     1 component, 0 tunnels, 1 cavity\n"), text.out());
    }

    @Test
    void slicesGivenOneByOneOrAsADirectory() throws IOException {
        // a square frame two slices high: a solid torus, H = Z, Z, 0, 0 (common practice)
        String frame = "P1\n5 5\n11111\n10001\n10001\n10001\n11111\n";
        Path slices = Files.createDirectory(dir.resolve("slices"));
        String a = Files.write(slices.resolve("z1.pbm"), ascii(frame)).toString();
        String b = Files.write(slices.resolve("z2.pbm"), ascii(frame)).toString();
        assertEquals(List.of(1L, 1L, 0L, 0L), CliFiles.betti(CliFiles.homologyJson(a, b)));
        Map<String, Object> json = CliFiles.homologyJson(slices.toString());
        assertEquals(List.of(1L, 1L, 0L, 0L), CliFiles.betti(json));
        assertEquals(BigInteger.TWO, image(json).get("slices"));
    }

    @Test
    void rawVolumeOfTheWrongSizeIsOneLine() throws IOException {
        String raw = file("cube.raw", cubeWithCavity());
        CliRun run = CliRun.morse("homology", raw, "--dims", "5,5,4");
        assertEquals(2, run.code());
        assertEquals(List.of(raw + ": has 125 bytes, but a raw volume of 5 x 5 x 4 voxels needs 100"), run.errLines());
        assertEquals("", run.out());
    }

    @Test
    void badSizesAndThresholdsAreUsageErrors() throws IOException {
        String ring = file("ring.pbm", ascii(RING));
        CliRun dims = CliRun.morse("homology", ring, "--dims", "5");
        assertEquals(2, dims.code());
        assertTrue(dims.errLines().get(0).contains("give two or three sizes"), dims.err());
        CliRun negative = CliRun.morse("homology", ring, "--threshold", "-1");
        assertEquals(2, negative.code());
        assertEquals(List.of("morse: the threshold must not be negative, not -1 (see 'morse homology --help')"),
                negative.errLines());
    }

    @Test
    void truncatedImageIsOneLine() throws IOException {
        String cut = file("cut.pbm", ascii("P1\n7 7\n0000000\n01111"));
        CliRun run = CliRun.morse("homology", cut);
        assertEquals(2, run.code());
        assertEquals(List.of(cut + ": the image ends after 12 of its 49 pixels"), run.errLines());
    }

    @Test
    void posetReductionCanBeSwitchedOff() throws IOException {
        // v < e: with the reduction the order complex is built on v alone; without it, on the segment
        String loop = Files.writeString(dir.resolve("loop.poset"), "morse-poset 1\nv\ne: v\n").toString();
        Map<String, Object> reduced = CliFiles.homologyJson(loop);
        Map<String, Object> plain = CliFiles.homologyJson(loop, "--no-poset-reduction");
        assertEquals(List.of(BigInteger.ONE), reduced.get("cells"));
        assertEquals(List.of(BigInteger.TWO, BigInteger.ONE), plain.get("cells"));
        assertEquals(CliFiles.betti(plain), CliFiles.betti(reduced));
        @SuppressWarnings("unchecked")
        Map<String, Object> stats = (Map<String, Object>) reduced.get("poset_reduction");
        assertEquals(BigInteger.ONE, stats.get("beat_points_removed"));
        assertEquals(BigInteger.TWO, stats.get("elements_before"));
        CliRun text = CliRun.morse("homology", loop);
        assertTrue(text.out().contains("  reduction 2 -> 1 elements before the order complex: 1 beat point, 0 acyclic"
                + " links removed, "), text.out());
    }
}
