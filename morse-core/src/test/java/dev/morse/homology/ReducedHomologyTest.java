package dev.morse.homology;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

class ReducedHomologyTest {
    @Test
    void theEmptyComplexHasTheRingInDimensionMinusOne() {
        // augmented chain complex of the empty complex: the ring in degree -1 alone (common practice)
        Homology reduced = new Homology(Coefficients.INTEGERS, false, List.of()).toReduced();
        assertEquals(List.of(HomologyGroup.free(-1, 1)), reduced.groups());
        assertTrue(reduced.ofEmptyComplex());
        assertEquals(HomologyGroup.free(-1, 1), reduced.group(-1));
        assertEquals(HomologyGroup.free(0, 0), reduced.group(0));
        // reduced Euler characteristic of the empty complex: -1 (the Möbius function of a two-element chain)
        assertEquals(-1, reduced.eulerCharacteristic());
    }

    @Test
    void anEmptyComplexListedUpToADimensionIsStillEmpty() {
        // H_0 = 0 only for the empty complex, whatever dimensions were listed
        Homology unreduced = new Homology(Coefficients.RATIONALS, false,
                List.of(HomologyGroup.free(0, 0), HomologyGroup.free(1, 0)));
        assertEquals(List.of(HomologyGroup.free(-1, 1)), unreduced.toReduced().groups());
    }

    @Test
    void aNonemptyComplexLosesOneFreeSummandInDimensionZero() {
        Homology circle = new Homology(Coefficients.INTEGERS, false, List.of(HomologyGroup.free(0, 1),
                HomologyGroup.free(1, 1)));
        assertEquals(List.of(HomologyGroup.free(0, 0), HomologyGroup.free(1, 1)), circle.toReduced().groups());
    }

    @Test
    void dimensionMinusOneIsOnlyForTheReducedEmptyComplex() {
        assertThrows(IllegalArgumentException.class, () -> new Homology(Coefficients.INTEGERS, false,
                List.of(HomologyGroup.free(-1, 1))));
        assertThrows(IllegalArgumentException.class, () -> new Homology(Coefficients.INTEGERS, true,
                List.of(HomologyGroup.free(-1, 1), HomologyGroup.free(0, 0))));
    }
}
