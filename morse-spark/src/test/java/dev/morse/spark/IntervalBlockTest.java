package dev.morse.spark;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;

class IntervalBlockTest {
    @Test
    void aLowerEndWithMostIntervalsIsSplitAndSmallOnesArePacked() {
        // lower end 0 owns 25 intervals, as 0^ owns n + 1; ends 1..3 own 2 each; end 4 (1^) none
        List<IntervalBlock> blocks = IntervalBlock.plan(new int[] {25, 2, 2, 2, 0}, 10);
        assertEquals(4, blocks.size());
        assertArrayEquals(new int[] {0}, blocks.get(0).lowers());
        assertArrayEquals(new int[] {0}, blocks.get(0).from());
        assertArrayEquals(new int[] {10}, blocks.get(0).to());
        assertArrayEquals(new int[] {10}, blocks.get(1).from());
        assertArrayEquals(new int[] {20}, blocks.get(1).to());
        assertArrayEquals(new int[] {0, 1, 2, 3}, blocks.get(2).lowers());
        assertArrayEquals(new int[] {20, 0, 0, 0}, blocks.get(2).from());
        assertArrayEquals(new int[] {25, 2, 2, 1}, blocks.get(2).to());
        assertArrayEquals(new int[] {3}, blocks.get(3).lowers());
        assertArrayEquals(new int[] {1}, blocks.get(3).from());
        assertArrayEquals(new int[] {2}, blocks.get(3).to());
        assertEquals(31, blocks.stream().mapToLong(IntervalBlock::size).sum());
    }

    @Test
    void blocksGiveEachTaskSlotAboutFourTasks() {
        assertEquals(125, IntervalBlock.blockSize(1000, 2, 1));
        assertEquals(64, IntervalBlock.blockSize(100, 2, 64));
        assertEquals(1, IntervalBlock.blockSize(1, 8, 1));
    }
}
