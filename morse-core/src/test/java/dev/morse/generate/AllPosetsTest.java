package dev.morse.generate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import dev.morse.poset.Poset;
import java.util.List;
import org.junit.jupiter.api.Test;

class AllPosetsTest {
    @Test
    void countsAreTheNumbersOfUnlabelledPosets() {
        // unlabelled posets on n = 0..7 elements: OEIS A000112, from memory
        long[] expected = {1, 1, 2, 5, 16, 63, 318, 2045};
        for (int n = 0; n <= 7; n++) {
            assertEquals(expected[n], AllPosets.of(n).size(), "n = " + n);
        }
    }

    @Test
    void threeElementsAreTheFiveKnownPosets() {
        // on 3 elements: the antichain, a 2-chain beside a point, the chain, "V" and "Λ" (common practice)
        List<Poset> all = AllPosets.of(3);
        assertEquals(List.of(0, 1, 2, 2, 2), all.stream().map(Poset::coverCount).sorted().toList());
        assertEquals(List.of(0, 1, 1, 1, 2), all.stream().map(Poset::maxHeight).sorted().toList());
    }

    @Test
    void relabellingDoesNotChangeTheCanonicalForm() {
        // "V": 0 below 1 and 2 (bits i*n+j), and the same with the bottom labelled 2
        long v = (1L << 1) | (1L << 2);
        long relabelled = (1L << (2 * 3)) | (1L << (2 * 3 + 1));
        assertEquals(AllPosets.canonical(v, 3), AllPosets.canonical(relabelled, 3));
    }

    @Test
    void refusesEight() {
        assertThrows(IllegalArgumentException.class, () -> AllPosets.of(8));
    }
}
