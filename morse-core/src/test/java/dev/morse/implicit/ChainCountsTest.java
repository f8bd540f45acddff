package dev.morse.implicit;

import dev.morse.complex.OrderComplex;
import dev.morse.poset.ChainCounts;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.morse.generate.PartitionLattice;
import dev.morse.poset.Poset;
import dev.morse.testing.RandomInputs;
import java.util.Arrays;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/** Chain counts without listing chains, against the chains the stored order complex lists one by one. */
class ChainCountsTest {
    @Test
    void perDimensionCountsAgreeWithTheListedChains() {
        SplittableRandom random = new SplittableRandom(31);
        for (int i = 0; i < 300; i++) {
            // at most 2^16 - 1 chains, few enough to list
            Poset poset = RandomInputs.poset(random, random.nextInt(17), random.nextDouble());
            long[] listed = java.util.Arrays.stream(OrderComplex.of(poset).cellCounts()).asLongStream().toArray();
            assertArrayEquals(listed, ChainCounts.perDimension(poset), "case " + i);
            assertEquals(java.util.Arrays.stream(listed).mapToObj(java.math.BigInteger::valueOf).toList(),
                    ChainCounts.exact(poset), "case " + i);
        }
    }

    @Test
    void cappedTotalIsExactUpToTheCapAndAboveItBeyond() {
        SplittableRandom random = new SplittableRandom(32);
        for (int i = 0; i < 300; i++) {
            Poset poset = RandomInputs.poset(random, random.nextInt(30), random.nextDouble());
            long total = Arrays.stream(ChainCounts.perDimension(poset)).sum();
            long cap = random.nextInt(2000);
            long capped = ChainCounts.totalUpTo(poset, cap);
            if (total <= cap) {
                assertEquals(total, capped, "case " + i);
            } else {
                assertTrue(capped > cap, "case " + i);
            }
        }
    }

    @Test
    void properPartOfTheFifthPartitionLatticeHasTheKnownFVector() {
        // f-vector of Δ(Π_5 proper): 50 partitions, 205 comparable pairs, 180 maximal chains
        // (5!4!/2^4 = 180 maximal chains of Π_5: Stanley, Enumerative Combinatorics I, from memory)
        assertArrayEquals(new long[] {50, 205, 180}, ChainCounts.perDimension(PartitionLattice.properPart(5)));
    }
}
