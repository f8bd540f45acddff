package dev.morse.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.morse.complex.ComplexKind;
import dev.morse.cw.CwPosetVerdict;
import dev.morse.engine.Computation;
import dev.morse.engine.ImageFacts;
import dev.morse.homology.Coefficients;
import dev.morse.image.LoadedImage;
import dev.morse.image.VoxelSet;
import dev.morse.input.PosetInput;
import dev.morse.input.VoxelInput;
import dev.morse.io.PosetReader;
import dev.morse.homology.Homology;
import dev.morse.homology.HomologyGroup;
import dev.morse.posetreduction.ReductionStats;
import java.math.BigDecimal;
import java.math.BigInteger;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.junit.jupiter.api.Test;

/** The report fields of poset reductions and of image input, in JSON and text. */
class ImageAndReductionReportTest {
    private static final Homology POINT = new Homology(Coefficients.INTEGERS, false,
            List.of(HomologyGroup.free(0, 1), HomologyGroup.free(1, 0)));
    /** The annulus of 16 pixels: 32 corners, 48 sides, 16 squares; H = Z, Z, 0 (common practice). */
    private static final Homology ANNULUS = new Homology(Coefficients.INTEGERS, false,
            List.of(HomologyGroup.free(0, 1), HomologyGroup.free(1, 1), HomologyGroup.free(2, 0)));

    /** A volume with one component, two tunnels and one cavity (a solid double torus with a bubble). */
    private static final Homology SHELL = new Homology(Coefficients.INTEGERS, false,
            List.of(HomologyGroup.free(0, 1), HomologyGroup.free(1, 2), HomologyGroup.free(2, 1)));

    private static Computation poset(Optional<ReductionStats> reduction) {
        PosetInput input = new PosetInput("chain.poset", PosetReader.parse("morse-poset 1\nv\n", "chain.poset"), 1);
        return ReportFixtures.computation(input, ComplexKind.ORDER, Optional.of(CwPosetVerdict.failed("not graded")),
                reduction, "none", new long[] {1}, new int[] {1}, POINT, false, 0, Map.of());
    }

    /** The image {@code facts} describe, its first {@code foreground} positions in the foreground. */
    private static Computation image(ImageFacts facts, Homology homology) {
        VoxelSet.Builder voxels = VoxelSet.builder(facts.size().stream().mapToInt(Integer::intValue).toArray());
        for (int i = 0; i < facts.foreground(); i++) {
            voxels.add(i);
        }
        LoadedImage loaded = new LoadedImage(voxels.build(), facts.slices(), facts.threshold(), facts.inverted());
        return ReportFixtures.computation(new VoxelInput("ring.pgm", loaded, 1), ComplexKind.CUBICAL, Optional.empty(),
                Optional.empty(), "none", new long[] {32, 48, 16}, new int[] {32, 48, 16}, homology, false, 0, Map.of());
    }

    @SuppressWarnings("unchecked")
    private static Map<String, Object> json(Computation report) {
        return (Map<String, Object>) JsonValues.parse(JsonReportWriter.toJson(report));
    }

    @Test
    void posetReductionIsAnObjectOfCounts() {
        Computation report = poset(Optional.of(new ReductionStats(5, 1, 3, 1, 2, 0.25)));
        assertEquals(Map.of("beat_points_removed", BigInteger.valueOf(3), "acyclic_links_removed", BigInteger.ONE,
                "links_skipped", BigInteger.TWO, "elements_before", BigInteger.valueOf(5), "elements_after",
                BigInteger.ONE, "ms", new BigDecimal("0.250")), json(report).get("poset_reduction"));
    }

    @Test
    void posetWithoutReductionHasNullAndOtherInputsHaveNoField() {
        Map<String, Object> json = json(poset(Optional.empty()));
        assertTrue(json.containsKey("poset_reduction"));
        assertNull(json.get("poset_reduction"));
        assertFalse(json.containsKey("image"));
        assertFalse(json(JsonReportWriterTest.kleinBottle()).containsKey("poset_reduction"));
    }

    @Test
    void reductionReadsAsOneLine() {
        String text = TextReportWriter.toText(poset(Optional.of(new ReductionStats(5, 1, 3, 1, 0, 0.25))));
        assertTrue(text.contains("  reduction 5 -> 1 elements before the order complex: 3 beat points, 1 acyclic link"
                + " removed, 0.25 ms\n"), text);
    }

    @Test
    void imageSpeaksOfComponentsAndHoles() {
        ImageFacts ring = new ImageFacts(List.of(7, 7), 1, 16, 128, false, 1, 1, 0);
        Map<String, Object> image = json(image(ring, ANNULUS));
        assertEquals("image", image.get("format"));
        assertEquals("cubical", image.get("complex"));
        assertEquals(Map.of("size", List.of(BigInteger.valueOf(7), BigInteger.valueOf(7)), "slices", BigInteger.ONE,
                "foreground", BigInteger.valueOf(16), "threshold", BigInteger.valueOf(128), "inverted", false,
                "components", BigInteger.ONE, "tunnels", BigInteger.ONE, "cavities", BigInteger.ZERO), image.get("image"));
        String text = TextReportWriter.toText(image(ring, ANNULUS));
        assertTrue(text.startsWith("ring.pgm (image file)\n  complex   cubical, one cell per elementary cube of the"
                + " foreground\n  image     7 x 7 pixels, foreground 16 (samples at or above 128)\n  shape     1"
                + " component, 1 hole\n"), text);
    }

    @Test
    void volumeSpeaksOfTunnelsAndCavities() {
        ImageFacts shell = new ImageFacts(List.of(9, 9, 5), 5, 300, 1, true, 1, 2, 1);
        String text = TextReportWriter.toText(image(shell, SHELL));
        assertTrue(text.contains("  image     9 x 9 x 5 voxels from 5 slices, foreground 300 (samples below 1)\n"
                + "  shape     1 component, 2 tunnels, 1 cavity\n"), text);
    }
}
