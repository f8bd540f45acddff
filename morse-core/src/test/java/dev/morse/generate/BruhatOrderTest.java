package dev.morse.generate;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.morse.poset.Poset;
import org.junit.jupiter.api.Test;

class BruhatOrderTest {
    @Test
    void ranksCountPermutationsByInversions() {
        // rank sizes of S_n in the Bruhat order are the Mahonian numbers, permutations by number of
        // inversions: 1, 3, 5, 6, 5, 3, 1 for n = 4 (Stanley, EC I, Cor. 1.3.13, from memory)
        Poset p = BruhatOrder.of(4);
        assertEquals(24, p.size());
        assertTrue(p.isGraded());
        int[] perRank = new int[p.maxHeight() + 1];
        for (int x = 0; x < p.size(); x++) {
            perRank[p.height(x)]++;
        }
        assertArrayEquals(new int[] {1, 3, 5, 6, 5, 3, 1}, perRank);
    }

    @Test
    void smallCasesAreKnownPosets() {
        // S_3: identity below the two simple transpositions, each below both elements of length 2, below
        // the reversal: the "hexagon with crossings", 8 covers (Björner–Brenti 2005, Fig. 2.1, from memory)
        Poset p = BruhatOrder.of(3);
        assertEquals(6, p.size());
        assertEquals(8, p.coverCount());
        assertTrue(p.find("123").isPresent() && p.find("321").isPresent());
        assertEquals(0, p.height(p.find("123").get()));
        assertEquals(3, p.height(p.find("321").get()));
        assertEquals(718, BruhatOrder.properPart(6).size());
    }

    @Test
    void everyCoverRaisesTheLengthByOne() {
        // the Bruhat order is graded by length, the number of inversions (Björner–Brenti 2005, Thm 2.2.6,
        // from memory): along every cover the number of inversions grows by exactly one
        Poset p = BruhatOrder.of(4);
        for (int x = 0; x < p.size(); x++) {
            int[] w = p.label(x).chars().map(c -> c - '0').toArray();
            for (int i = p.upperCovers().start(x); i < p.upperCovers().end(x); i++) {
                int[] v = p.label(p.upperCovers().target(i)).chars().map(c -> c - '0').toArray();
                assertEquals(BruhatOrder.inversions(w) + 1, BruhatOrder.inversions(v));
            }
        }
    }

    @Test
    void refusesSizesOutOfRange() {
        assertThrows(IllegalArgumentException.class, () -> BruhatOrder.of(7));
        assertThrows(IllegalArgumentException.class, () -> BruhatOrder.properPart(1));
    }
}
