package dev.morse.matching;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import java.util.TreeSet;
import org.junit.jupiter.api.Test;

class PendingCellsTest {
    @Test
    void handsOutTheLeastCellFirstLikeASortedSet() {
        // reference: java.util.TreeSet, whose pollFirst is the least element (common practice)
        SplittableRandom random = new SplittableRandom(20261203L);
        for (int trial = 0; trial < 200; trial++) {
            int cells = 1 + random.nextInt(trial < 100 ? 300 : 300_000);
            PendingCells pending = new PendingCells(cells);
            TreeSet<Integer> reference = new TreeSet<>();
            int operations = 4 * Math.min(cells, 5_000);
            for (int op = 0; op < operations; op++) {
                if (reference.isEmpty() || random.nextInt(3) > 0) {
                    // two additions for each taking on average, anywhere in the range, so the set grows and empties by turns
                    int cell = random.nextInt(cells);
                    pending.add(cell);
                    reference.add(cell);
                } else {
                    assertEquals(reference.pollFirst(), pending.takeLeast());
                }
                assertEquals(reference.isEmpty(), pending.isEmpty());
            }
            while (!reference.isEmpty()) {
                assertEquals(reference.pollFirst(), pending.takeLeast());
            }
            assertTrue(pending.isEmpty());
        }
    }

    @Test
    void theLastCellOfAFullWordAndOfAFullSummaryWordComeBack() {
        // 64 cells fill one word and 64 * 64 one summary word: the edges of both levels
        int cells = 64 * 64 * 2 + 1;
        PendingCells pending = new PendingCells(cells);
        int[] edges = {cells - 1, 64 * 64, 64 * 64 - 1, 64, 63, 0};
        for (int c : edges) {
            pending.add(c);
        }
        pending.add(63);
        for (int i = edges.length - 1; i >= 0; i--) {
            assertEquals(edges[i], pending.takeLeast());
        }
        assertTrue(pending.isEmpty());
        pending.add(5);
        assertEquals(5, pending.takeLeast());
    }
}
