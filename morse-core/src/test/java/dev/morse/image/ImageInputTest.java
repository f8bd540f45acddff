package dev.morse.image;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.morse.homology.Coefficients;
import dev.morse.homology.HomologyGroup;
import dev.morse.io.InputException;
import dev.morse.matching.MatchingHeuristics;
import dev.morse.matching.MatchingOptions;
import dev.morse.morsecomplex.MorseReduction;
import dev.morse.testing.TestImages;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ImageInputTest {
    /** The annulus: H = Z, Z, 0 (common practice). */
    private static final List<HomologyGroup> ANNULUS = List.of(HomologyGroup.free(0, 1), HomologyGroup.free(1, 1),
            HomologyGroup.free(2, 0));
    private static final ImageOptions DEFAULTS = ImageOptions.defaults();

    @TempDir
    Path dir;

    private static List<HomologyGroup> homology(LoadedImage image) {
        return MorseReduction.run(CubicalComplex.of(image.voxels()), new MorseReduction.Request(
                MatchingHeuristics.byName("coreduction").orElseThrow(), MatchingOptions.DEFAULT, Coefficients.INTEGERS,
                true)).homology().groups();
    }

    private static List<HomologyGroup> groups(int... betti) {
        List<HomologyGroup> g = new ArrayList<>();
        for (int d = 0; d < betti.length; d++) {
            g.add(HomologyGroup.free(d, betti[d]));
        }
        return g;
    }

    private LoadedImage load(String name, byte[] bytes, ImageOptions options) throws IOException {
        return ImageInput.load(List.of(TestImages.write(dir.resolve(name), bytes)), options);
    }

    private static ImageOptions threshold(int t) {
        return new ImageOptions(OptionalInt.of(t), false, Optional.empty());
    }

    @Test
    void ringInEveryNetpbmVariantIsAnAnnulus() throws IOException {
        boolean[][] ring = TestImages.ring();
        assertEquals(ANNULUS, homology(load("ring1.pbm", TestImages.p1(ring), DEFAULTS)));
        assertEquals(ANNULUS, homology(load("ring4.pbm", TestImages.p4(ring), DEFAULTS)));
        assertEquals(ANNULUS, homology(load("ring2.pgm", TestImages.p2(ring, 255, 200, 30), DEFAULTS)));
        assertEquals(ANNULUS, homology(load("ring5.pgm", TestImages.p5(ring, 255, 200, 30), DEFAULTS)));
        assertEquals(ANNULUS, homology(load("ring5-16.pgm", TestImages.p5(ring, 1000, 900, 100), DEFAULTS)));
        assertEquals(ANNULUS, homology(load("ring3.ppm", TestImages.p3(ring, 200, 30), DEFAULTS)));
        // pure red has luminance 76 and pure blue 29 (BT.601): only a threshold between them separates them
        assertEquals(ANNULUS, homology(load("ring6.ppm", TestImages.p6(ring), threshold(50))));
    }

    @Test
    void ringAsPngIsAnAnnulus() throws IOException {
        Path file = dir.resolve("ring.png");
        TestImages.png(TestImages.ring(), file);
        LoadedImage image = ImageInput.load(List.of(file), DEFAULTS);
        assertEquals(16, image.voxels().count());
        assertEquals(128, image.threshold());
        assertEquals(ANNULUS, homology(image));
    }

    @Test
    void invertedRingIsTheDiscInsideAndTheFrameOutside() throws IOException {
        // the complement of the ring in the 7 x 7 square: a 3 x 3 block and a frame around the ring,
        // apart from each other: two components, and the frame's hole
        ImageOptions inverted = new ImageOptions(OptionalInt.empty(), true, Optional.empty());
        LoadedImage image = load("ring.pbm", TestImages.p1(TestImages.ring()), inverted);
        assertEquals(49 - 16, image.voxels().count());
        assertEquals(groups(2, 1, 0), homology(image));
    }

    @Test
    void cubeWithCavityAsRawBytes() throws IOException {
        // a solid cube without its centre voxel: H = Z, 0, Z, 0 (a sealed cavity is a 2-sphere)
        ImageOptions raw = new ImageOptions(OptionalInt.empty(), false, Optional.of(VolumeSize.parse("5,5,5")));
        LoadedImage image = load("cavity.raw", TestImages.raw(TestImages.cubeWithCavity(), 1), raw);
        assertTrue(image.isVolume());
        assertEquals(124, image.voxels().count());
        assertEquals(1, image.threshold());
        assertEquals(groups(1, 0, 1, 0), homology(image));
    }

    @Test
    void cubeWithCavityAsADirectoryOfSlices() throws IOException {
        boolean[][][] volume = TestImages.cubeWithCavity();
        Path slices = Files.createDirectory(dir.resolve("slices"));
        for (int z = 0; z < volume.length; z++) {
            // names whose natural order differs from their character order: s2 before s10
            TestImages.write(slices.resolve("s" + (z == 0 ? 10 : z) + ".pgm"), TestImages.p5(volume[z], 255, 255, 0));
        }
        Files.writeString(slices.resolve("notes.txt"), "not a slice");
        LoadedImage image = ImageInput.load(List.of(slices), DEFAULTS);
        assertEquals(5, image.slices());
        assertEquals(groups(1, 0, 1, 0), homology(image));
    }

    @Test
    void solidTorusFromSliceFiles() throws IOException {
        // a solid torus: H = Z, Z, 0, 0 (common practice)
        boolean[][][] volume = TestImages.solidTorus();
        List<Path> files = new ArrayList<>();
        for (int z = 0; z < volume.length; z++) {
            files.add(TestImages.write(dir.resolve("t" + z + ".pbm"), TestImages.p4(volume[z])));
        }
        assertEquals(groups(1, 1, 0, 0), homology(ImageInput.load(files, DEFAULTS)));
    }

    @Test
    void thickenedTorusSurfaceHasTwoTunnelsAndACavity() throws IOException {
        // T^2 x I has the homology of the torus: Z, Z^2, Z (Hatcher 2002, §2.1)
        ImageOptions raw = new ImageOptions(OptionalInt.empty(), false, Optional.of(VolumeSize.parse("9,9,5")));
        LoadedImage image = load("shell.raw", TestImages.raw(TestImages.torusShell(), 255), raw);
        assertEquals(groups(1, 2, 1, 0), homology(image));
    }

    @Test
    void sliceStackOrderIsNatural() {
        List<String> names = new ArrayList<>(List.of("s10.pgm", "s2.pgm", "s1.pgm", "s02.pgm", "a.pgm"));
        names.sort(ImageInput::compareNatural);
        assertEquals(List.of("a.pgm", "s1.pgm", "s02.pgm", "s2.pgm", "s10.pgm"), names);
    }

    @Test
    void formatsAreToldByTheirFirstBytes() throws IOException {
        Path pgm = TestImages.write(dir.resolve("looks.txt"), TestImages.p2(TestImages.ring(), 255, 200, 0));
        Path text = Files.writeString(dir.resolve("ring.pgm"), "morse-poset 1\na\n");
        assertTrue(ImageInput.isImageFile(pgm));
        assertFalse(ImageInput.isImageFile(text));
        assertFalse(ImageInput.isImageFile(dir.resolve("missing.png")));
    }

    @Test
    void truncatedImageNamesHowFarItGot() throws IOException {
        byte[] full = TestImages.p5(TestImages.ring(), 255, 200, 0);
        byte[] cut = java.util.Arrays.copyOf(full, full.length - 40);
        InputException e = assertThrows(InputException.class, () -> load("cut.pgm", cut, DEFAULTS));
        assertEquals(dir.resolve("cut.pgm") + ": the image ends after 9 of its 49 pixels", e.getMessage());
    }

    @Test
    void sampleAboveTheLargestValueIsAnErrorAtItsLine() throws IOException {
        byte[] bad = "P2\n2 2\n255\n0 300\n0 0\n".getBytes(java.nio.charset.StandardCharsets.US_ASCII);
        InputException e = assertThrows(InputException.class, () -> load("bad.pgm", bad, DEFAULTS));
        assertEquals(dir.resolve("bad.pgm") + ":4: the sample 300 of pixel 2 is more than the largest value 255",
                e.getMessage());
    }

    @Test
    void fileThatIsNoImageIsRefused() throws IOException {
        InputException e = assertThrows(InputException.class, () -> load("noise.png", new byte[] {1, 2, 3, 4}, DEFAULTS));
        assertEquals(dir.resolve("noise.png") + ": not an image: expected a Netpbm (P1 to P6), PNG, GIF, BMP or JPEG file",
                e.getMessage());
    }

    @Test
    void rawVolumeOfTheWrongSizeIsRefused() throws IOException {
        ImageOptions raw = new ImageOptions(OptionalInt.empty(), false, Optional.of(VolumeSize.parse("5,5,5")));
        InputException e = assertThrows(InputException.class, () -> load("short.raw", new byte[100], raw));
        assertEquals(dir.resolve("short.raw") + ": has 100 bytes, but a raw volume of 5 x 5 x 5 voxels needs 125",
                e.getMessage());
    }

    @Test
    void slicesOfDifferentSizesAreRefused() throws IOException {
        Path a = TestImages.write(dir.resolve("a.pbm"), TestImages.p1(TestImages.ring()));
        Path b = TestImages.write(dir.resolve("b.pbm"), TestImages.p1(new boolean[][] {{true, false}}));
        InputException e = assertThrows(InputException.class, () -> ImageInput.load(List.of(a, b), DEFAULTS));
        assertEquals(b + ": this slice is 2 x 1 pixels, but the first slice, " + a + ", is 7 x 7", e.getMessage());
    }

    @Test
    void thresholdAboveTheSampleRangeIsRefused() throws IOException {
        InputException e = assertThrows(InputException.class,
                () -> load("ring.pbm", TestImages.p1(TestImages.ring()), threshold(2)));
        assertEquals(dir.resolve("ring.pbm") + ": the threshold 2 is above the largest sample value 1 of this image",
                e.getMessage());
    }

    @Test
    void directoryWithoutImagesIsRefused() throws IOException {
        Path empty = Files.createDirectory(dir.resolve("empty"));
        InputException e = assertThrows(InputException.class, () -> ImageInput.load(List.of(empty), DEFAULTS));
        assertEquals(empty + ": is a directory with no image files to read as the slices of a volume", e.getMessage());
    }

    @Test
    void volumeSizesParse() {
        assertEquals(List.of(4, 5, 6), java.util.Arrays.stream(VolumeSize.parse("4,5,6").extents()).boxed().toList());
        assertEquals("4,5", VolumeSize.parse(" 4 , 5 ").toString());
        assertEquals("sizes must be whole numbers like 64,64,32, not 'a,b'",
                assertThrows(IllegalArgumentException.class, () -> VolumeSize.parse("a,b")).getMessage());
        assertThrows(IllegalArgumentException.class, () -> VolumeSize.parse("4"));
        assertThrows(IllegalArgumentException.class, () -> VolumeSize.parse("4,0,2"));
        // 2^21 * 2^21 * 2^22 = 2^64 voxels: a product in a long wraps round to 0, which must not pass
        assertTrue(assertThrows(IllegalArgumentException.class, () -> VolumeSize.parse("2097152,2097152,4194304"))
                .getMessage().contains("has more than " + VoxelSet.MAX_POSITIONS + " voxels"));
        assertEquals(46_340 * 46_340, VolumeSize.parse("46340,46340").voxels());
    }
}
