package dev.morse.generate;

import dev.morse.matching.MatchingHeuristics;
import dev.morse.cw.CwPosetCheck;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import dev.morse.complex.CellularComplex;
import dev.morse.homology.Coefficients;
import dev.morse.matching.MatchingOptions;
import dev.morse.morsecomplex.MorseReduction;
import dev.morse.io.PosetReader;
import dev.morse.io.PosetWriter;
import dev.morse.poset.Poset;
import java.io.IOException;
import java.io.StringWriter;
import java.util.Arrays;
import org.junit.jupiter.api.Test;

class VoxelBlockTest {

    @Test
    void blockWithTunnelsAndCavitiesHasTheHomologyOfItsConstruction() {
        // genus-2 handlebody with four sealed cavities: H = Z, Z^2, Z^4, 0 (Alexander duality; see VoxelBlock)
        VoxelBlock block = VoxelBlock.of(11, 2, 4);
        CellularComplex complex = CwPosetCheck.cellularComplex(block.toPoset());
        MorseReduction.Outcome outcome = MorseReduction.run(complex, new MorseReduction.Request(MatchingHeuristics.COREDUCTION,
                MatchingOptions.DEFAULT, Coefficients.INTEGERS, true));
        assertEquals(block.expectedHomology(), outcome.homology().groups());
    }

    @Test
    void cellCountsMatchTheBuiltPosetAndTheEulerCharacteristic() {
        VoxelBlock block = VoxelBlock.of(11, 1, 1);
        Poset poset = block.toPoset();
        long[] counts = block.cellCounts();
        assertEquals(Arrays.stream(counts).sum(), poset.size());
        // χ = 1 - 1 + 1 = 1 for one tunnel and one cavity (Euler–Poincaré formula)
        assertEquals(1, counts[0] - counts[1] + counts[2] - counts[3]);
    }

    @Test
    void solidBlockCellsAreTheDoubledGrid() {
        // an n^3 block has (n+1)^3 vertices, 3n(n+1)^2 edges, 3n^2(n+1) squares and n^3 cubes (common practice)
        long n = 5;
        assertArrayEquals(new long[] {(n + 1) * (n + 1) * (n + 1), 3 * n * (n + 1) * (n + 1), 3 * n * n * (n + 1), n * n * n},
                VoxelBlock.of(5, 0, 0).cellCounts());
    }

    @Test
    void writtenTextReadsBackToTheSamePoset() throws IOException {
        VoxelBlock block = VoxelBlock.of(6, 1, 0);
        StringWriter text = new StringWriter();
        block.write(text);
        Poset read = PosetReader.parse(text.toString(), "block");
        assertEquals(PosetWriter.toText(block.toPoset()), PosetWriter.toText(read));
    }

    @Test
    void tooManyHolesAreRefused() {
        assertThrows(IllegalArgumentException.class, () -> VoxelBlock.of(8, 5, 0));
    }
}
