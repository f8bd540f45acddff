package dev.morse.matching;

import dev.morse.complex.ChainComplex;
import dev.morse.progress.Progress;
import it.unimi.dsi.fastutil.ints.IntArrayList;
import java.util.SplittableRandom;

/**
 * Random discrete Morse theory in the manner of Benedetti and Lutz ("Random discrete Morse theory
 * and a new library of triangulations", Exp. Math. 23, 2014): while free faces exist, collapse one
 * chosen uniformly at random; when none is left, remove a uniformly random cell of the top dimension
 * left and declare it critical. Seeded by {@link MatchingOptions#seed()}, so a seed repeats its run.
 *
 * <p>Acyclic for the same reason as {@link CollapsePairing}. Linear time in expectation;
 * about 17 bytes per cell of working memory besides the coboundary.
 */
final class RandomPairing implements MatchingHeuristic.Pairing {
    @Override
    public Matching match(ChainComplex complex, MatchingOptions options) {
        SplittableRandom random = new SplittableRandom(options.seed());
        int n = complex.cellCount();
        FreeFaceState state = new FreeFaceState(complex);
        IntArrayList freeFaces = new IntArrayList();
        state.offerFreeFaces(freeFaces::add);
        int[] shuffled = shuffledByDimension(complex, random);
        int next = n - 1;
        Progress progress = Progress.current();
        int pairs = 0;
        while (true) {
            if (!freeFaces.isEmpty()) {
                int pick = random.nextInt(freeFaces.size());
                int t = freeFaces.getInt(pick);
                freeFaces.set(pick, freeFaces.getInt(freeFaces.size() - 1));
                freeFaces.removeInt(freeFaces.size() - 1);
                if (state.isFree(t) && state.collapse(t, freeFaces::add) && (++pairs & 0x7FF) == 0) {
                    progress.reached(2L * pairs);
                }
                continue;
            }
            // shuffled lists each dimension's cells in random order, dimensions ascending
            while (next >= 0 && state.isRemoved(shuffled[next])) {
                next--;
            }
            if (next < 0) {
                return state.matching();
            }
            state.remove(shuffled[next], freeFaces::add);
        }
    }

    private static int[] shuffledByDimension(ChainComplex complex, SplittableRandom random) {
        int[] cells = new int[complex.cellCount()];
        for (int c = 0; c < cells.length; c++) {
            cells[c] = c;
        }
        for (int d = 0; d <= complex.dimension(); d++) {
            int first = complex.firstCell(d);
            int count = complex.cellCount(d);
            for (int i = count - 1; i > 0; i--) {
                int j = random.nextInt(i + 1);
                int tmp = cells[first + i];
                cells[first + i] = cells[first + j];
                cells[first + j] = tmp;
            }
        }
        return cells;
    }
}
