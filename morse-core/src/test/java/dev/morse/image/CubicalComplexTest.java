package dev.morse.image;

import dev.morse.cw.CwPosetCheck;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import dev.morse.complex.Boundary;
import dev.morse.complex.ChainComplex;
import dev.morse.generate.CubicalFacePoset;
import dev.morse.generate.RandomVoxels;
import dev.morse.generate.VoxelBlock;
import dev.morse.homology.Coefficients;
import dev.morse.homology.Homology;
import dev.morse.homology.HomologyCalculator;
import dev.morse.homology.HomologyGroup;
import dev.morse.matching.MatchingHeuristics;
import dev.morse.matching.MatchingOptions;
import dev.morse.morsecomplex.MorseReduction;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

class CubicalComplexTest {
    private static Homology viaCoreduction(ChainComplex complex) {
        return MorseReduction.run(complex, new MorseReduction.Request(
                MatchingHeuristics.byName("coreduction").orElseThrow(), MatchingOptions.DEFAULT, Coefficients.INTEGERS,
                true)).homology();
    }

    private static VoxelSet of(int[] extents, int[]... positions) {
        VoxelSet.Builder b = VoxelSet.builder(extents);
        for (int[] p : positions) {
            b.add(p);
        }
        return b.build();
    }

    @Test
    void oneVoxelIsTheElementaryCube() {
        // the unit cube has 8 vertices, 12 edges, 6 squares, 1 cube (common practice)
        CubicalComplex cube = CubicalComplex.of(of(new int[] {1, 1, 1}, new int[] {0, 0, 0}));
        assertArrayEquals(new int[] {8, 12, 6, 1}, cube.cellCounts());
        assertEquals(List.of(HomologyGroup.free(0, 1), HomologyGroup.free(1, 0), HomologyGroup.free(2, 0),
                HomologyGroup.free(3, 0)), HomologyCalculator.compute(cube, Coefficients.INTEGERS).groups());
    }

    @Test
    void onePixelIsTheUnitSquare() {
        CubicalComplex square = CubicalComplex.of(of(new int[] {3, 2}, new int[] {1, 1}));
        assertArrayEquals(new int[] {4, 4, 1}, square.cellCounts());
        // ∂([1,2]x[1,2]) = ([2] - [1])x[1,2] - [1,2]x([2] - [1]), from ∂(P x Q) = ∂P x Q + (-1)^dim P P x ∂Q
        // (Kaczynski, Mischaikow and Mrozek, Computational Homology, 2004, §2.2)
        int face = square.firstCell(2);
        assertEquals("[1,2]x[1,2]", square.cellName(face));
        Map<String, Integer> boundary = new HashMap<>();
        Boundary b = square.boundary();
        for (int i = b.start(face); i < b.end(face); i++) {
            boundary.put(square.cellName(b.target(i)), b.coefficient(i));
        }
        assertEquals(Map.of("[2]x[1,2]", 1, "[1]x[1,2]", -1, "[1,2]x[2]", -1, "[1,2]x[1]", 1), boundary);
    }

    @Test
    void edgeBoundaryIsUpperEndMinusLowerEnd() {
        // ∂[c, c+1] = [c+1] - [c] (Kaczynski, Mischaikow and Mrozek, Computational Homology, 2004, §2.2)
        CubicalComplex segment = CubicalComplex.of(of(new int[] {4}, new int[] {2}));
        int edge = segment.firstCell(1);
        assertEquals("[2,3]", segment.cellName(edge));
        Boundary b = segment.boundary();
        Map<String, Integer> faces = new HashMap<>();
        for (int i = b.start(edge); i < b.end(edge); i++) {
            faces.put(segment.cellName(b.target(i)), b.coefficient(i));
        }
        assertEquals(Map.of("[3]", 1, "[2]", -1), faces);
    }

    @Test
    void boundaryOfBoundaryVanishesOnRandomSets() {
        // ∂∂ = 0 is what makes the incidence signs a chain complex (KMM 2004, Prop. 2.37, numbering from memory)
        for (int seed = 0; seed < 20; seed++) {
            int[] extents = seed % 2 == 0 ? new int[] {7, 6, 5} : new int[] {9, 8};
            CubicalComplex complex = CubicalComplex.of(RandomVoxels.of(extents, 0.45, seed));
            Boundary b = complex.boundary();
            for (int c = 0; c < complex.cellCount(); c++) {
                Map<Integer, Integer> twice = new HashMap<>();
                for (int i = b.start(c); i < b.end(c); i++) {
                    int face = b.target(i);
                    assertEquals(complex.dimensionOf(c) - 1, complex.dimensionOf(face));
                    for (int j = b.start(face); j < b.end(face); j++) {
                        twice.merge(b.target(j), b.coefficient(i) * b.coefficient(j), Integer::sum);
                    }
                }
                twice.values().forEach(v -> assertEquals(0, v));
            }
        }
    }

    @Test
    void agreesWithTheFacePosetOnRandomSets() {
        // two independent constructions of the same CW complex: the cellular complex of the face
        // poset (signs found by CwPosetCheck) and the cubical complex (signs by formula)
        for (int seed = 0; seed < 12; seed++) {
            int[] extents = seed % 3 == 0 ? new int[] {10, 9} : new int[] {5, 5, 4};
            VoxelSet voxels = RandomVoxels.of(extents, 0.3 + 0.04 * seed, 100 + seed);
            CubicalComplex cubical = CubicalComplex.of(voxels);
            ChainComplex cellular = CwPosetCheck.cellularComplex(CubicalFacePoset.toPoset(voxels));
            assertArrayEquals(cellular.cellCounts(), cubical.cellCounts(), "seed " + seed);
            assertEquals(HomologyCalculator.compute(cellular, Coefficients.INTEGERS).groups(),
                    viaCoreduction(cubical).groups(), "seed " + seed);
        }
    }

    @Test
    void voxelBlockHasTheHomologyKnownByConstruction() {
        // a block with t tunnels and c sealed cavities: Z, Z^t, Z^c, 0 (VoxelBlock; Alexander duality)
        VoxelBlock block = VoxelBlock.of(12, 3, 2);
        assertEquals(block.expectedHomology(), viaCoreduction(CubicalComplex.of(block.voxels())).groups());
    }

    @Test
    void emptySetHasNoCells() {
        CubicalComplex empty = CubicalComplex.of(VoxelSet.builder(4, 4).build());
        assertEquals(0, empty.cellCount());
        assertEquals(-1, empty.dimension());
    }

    @Test
    void tooManyCellsFailBeforeTheBoundaryIsBuilt() {
        VoxelSet block = RandomVoxels.of(new int[] {20, 20, 20}, 1.0, 1);
        IllegalStateException e = assertThrows(IllegalStateException.class, () -> CubicalComplex.of(block, 1000));
        assertEquals("the cubical complex of 8000 foreground positions has more than the limit of 1000 cells",
                e.getMessage());
    }

    @Test
    void cubesAreNamedAndLocatedFromTheirCellNumber() {
        // the cells of [0,2]x[0,1] are listed by dimension, then by type, then by position
        CubicalComplex strip = CubicalComplex.of(of(new int[] {2, 1}, new int[] {0, 0}, new int[] {1, 0}));
        assertArrayEquals(new int[] {6, 7, 2}, strip.cellCounts());
        assertEquals("[0]x[0]", strip.cellName(0));
        assertEquals("[2]x[1]", strip.cellName(5));
        assertEquals("[0,1]x[0]", strip.cellName(6));
        assertEquals("[1,2]x[1]", strip.cellName(9));
        assertEquals("[0]x[0,1]", strip.cellName(10));
        assertEquals("[1,2]x[0,1]", strip.cellName(14));
        assertArrayEquals(new int[] {1, 1, 0, 1}, strip.cube(14));
    }
}
