package dev.morse.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import dev.morse.complex.ComplexChoice;
import dev.morse.complex.ComplexKind;
import dev.morse.image.ImageOptions;
import dev.morse.image.VolumeSize;
import dev.morse.io.InputException;
import dev.morse.io.InputFormat;
import dev.morse.testing.TestImages;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ImagePipelineTest {
    private static final Request DEFAULTS = Request.defaults();

    @TempDir
    Path dir;

    @Test
    void imageFileIsReadAsTheCubicalComplexOfItsForeground() throws IOException {
        Path ring = TestImages.write(dir.resolve("ring.pgm"), TestImages.p5(TestImages.ring(), 255, 255, 0));
        Computation report = Runs.run(ring, DEFAULTS);
        assertEquals(InputFormat.IMAGE, report.format());
        assertEquals(ComplexKind.CUBICAL, report.complexKind());
        // 16 pixels in a loop: 32 corners, 48 sides, 16 squares; an annulus has one component and one hole
        assertEquals(List.of(32L, 48L, 16L), report.cells());
        assertEquals(new ImageFacts(List.of(7, 7), 1, 16, 128, false, 1, 1, 0), report.image().orElseThrow());
        assertEquals(Optional.empty(), report.cwCheck());
    }

    @Test
    void sliceFilesMakeAVolume() throws IOException {
        boolean[][][] torus = TestImages.solidTorus();
        List<Path> files = new ArrayList<>();
        for (int z = 0; z < torus.length; z++) {
            files.add(TestImages.write(dir.resolve("t" + z + ".pbm"), TestImages.p1(torus[z])));
        }
        Computation report = Runs.run(files, ImageOptions.defaults(), DEFAULTS);
        assertEquals(InputFormat.VOLUME, report.format());
        assertEquals(files.get(0) + " " + files.get(1), report.source());
        // a solid torus: one component, one tunnel, no cavity (common practice)
        assertEquals(new ImageFacts(List.of(5, 5, 2), 2, 32, 1, false, 1, 1, 0), report.image().orElseThrow());
    }

    @Test
    void rawVolumeWithACavity() throws IOException {
        Path raw = TestImages.write(dir.resolve("cube.raw"), TestImages.raw(TestImages.cubeWithCavity(), 7));
        ImageOptions options = new ImageOptions(OptionalInt.of(5), false, Optional.of(VolumeSize.parse("5,5,5")));
        ImageFacts facts = Runs.run(List.of(raw), options, DEFAULTS).image().orElseThrow();
        assertEquals(1, facts.components());
        assertEquals(0, facts.tunnels());
        assertEquals(1, facts.cavities());
        assertEquals(5, facts.threshold());
    }

    @Test
    void imagesTakeNoChoiceOfComplex() throws IOException {
        Path ring = TestImages.write(dir.resolve("ring.pbm"), TestImages.p4(TestImages.ring()));
        InputException e = assertThrows(InputException.class,
                () -> Runs.run(ring, DEFAULTS.withComplex(ComplexChoice.ORDER)));
        assertEquals(ring + ": an image has only its cubical complex; the choice of complex applies to poset files",
                e.getMessage());
    }
}
