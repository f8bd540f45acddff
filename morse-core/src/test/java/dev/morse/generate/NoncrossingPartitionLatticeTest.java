package dev.morse.generate;

import dev.morse.poset.Mobius;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.morse.poset.Poset;
import org.junit.jupiter.api.Test;

class NoncrossingPartitionLatticeTest {
    private static long binomial(int n, int k) {
        long c = 1;
        for (int i = 0; i < k; i++) {
            c = c * (n - i) / (i + 1);
        }
        return c;
    }

    @Test
    void sizesAreCatalanNumbers() {
        // |NC_n| = Catalan(n): 1, 2, 5, 14, 42, 132, 429 (Kreweras 1972; OEIS A000108, from memory)
        long[] catalan = {1, 2, 5, 14, 42, 132, 429};
        for (int n = 1; n <= 7; n++) {
            assertEquals(catalan[n - 1], NoncrossingPartitionLattice.lattice(n).size(), "n = " + n);
            assertEquals(catalan[n - 1], FamiliesHomologyTest.catalan(n));
        }
    }

    @Test
    void ranksAreNarayanaNumbers() {
        // noncrossing partitions of [n] into k blocks: N(n,k) = C(n,k) C(n,k-1) / n (Kreweras 1972, from memory)
        int n = 7;
        Poset nc = NoncrossingPartitionLattice.lattice(n);
        long[] sizes = new long[n];
        for (int x = 0; x < nc.size(); x++) {
            sizes[nc.height(x)]++;
        }
        for (int h = 0; h < n; h++) {
            int k = n - h;
            assertEquals(binomial(n, k) * binomial(n, k - 1) / n, sizes[h], "blocks " + k);
        }
        assertTrue(nc.isGraded());
    }

    @Test
    void mobiusFunctionIsASignedCatalanNumber() {
        // μ(NC_n) = (-1)^(n-1) Catalan(n-1) (Kreweras 1972)
        for (int n = 1; n <= 7; n++) {
            long expected = (n % 2 == 1 ? 1 : -1) * FamiliesHomologyTest.catalan(n - 1);
            assertEquals(expected, Mobius.bottomToTop(NoncrossingPartitionLattice.lattice(n)), "n = " + n);
        }
    }

    @Test
    void crossingIsFourPointsReadingTwoBlocksAlternately() {
        // blocks by least element: 13|24 crosses, 14|23 and 12|34 do not (common practice)
        assertFalse(NoncrossingPartitionLattice.isNoncrossing(new int[] {0, 1, 0, 1}));
        assertTrue(NoncrossingPartitionLattice.isNoncrossing(new int[] {0, 1, 1, 0}));
        assertTrue(NoncrossingPartitionLattice.isNoncrossing(new int[] {0, 0, 1, 1}));
        assertFalse(NoncrossingPartitionLattice.isNoncrossing(new int[] {0, 1, 2, 0, 2, 1}));
        assertTrue(NoncrossingPartitionLattice.isNoncrossing(new int[] {0, 1, 2, 2, 1, 0}));
    }

    @Test
    void coversMergeTwoBlocksAndStayNoncrossing() {
        Poset nc = NoncrossingPartitionLattice.lattice(4);
        int crossing = nc.find("13|24").isPresent() ? 1 : 0;
        assertEquals(0, crossing, "13|24 is not in NC_4");
        int x = nc.find("14|2|3").orElseThrow();
        int y = nc.find("14|23").orElseThrow();
        assertTrue(nc.lowerCovers().contains(y, x));
        assertTrue(nc.lowerCovers().contains(nc.find("1234").orElseThrow(), y));
    }
}
