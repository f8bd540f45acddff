package dev.morse.matching;

import dev.morse.complex.Boundary;
import dev.morse.complex.ChainComplex;
import dev.morse.progress.Progress;
import it.unimi.dsi.fastutil.ints.IntArrayList;
import java.util.Arrays;
import java.util.SplittableRandom;

/**
 * Random discrete Morse theory in the manner of Benedetti and Lutz ("Random discrete Morse theory
 * and a new library of triangulations", Exp. Math. 23, 2014): while free faces exist, collapse one
 * chosen uniformly at random; when none is left, remove a uniformly random cell of the top dimension
 * left and declare it critical. Seeded by {@link MatchingOptions#seed()}, so a seed repeats its run.
 *
 * <p>Acyclic for the same reason as {@link CollapseHeuristic}. Linear time in expectation;
 * about 17 bytes per cell of working memory besides the coboundary.
 */
public final class RandomHeuristic implements MatchingHeuristic {
    @Override
    public String name() {
        return "random";
    }

    /** Each seed gives its own run. */
    @Override
    public boolean randomized() {
        return true;
    }

    @Override
    public Matching match(ChainComplex complex, MatchingOptions options) {
        SplittableRandom random = new SplittableRandom(options.seed());
        int n = complex.cellCount();
        Boundary boundary = complex.boundary();
        Boundary coboundary = complex.coboundary();
        int[] mates = new int[n];
        Arrays.fill(mates, Matching.CRITICAL);
        boolean[] removed = new boolean[n];
        int[] cofacesLeft = new int[n];
        IntArrayList freeFaces = new IntArrayList();
        for (int c = 0; c < n; c++) {
            cofacesLeft[c] = coboundary.size(c);
            if (cofacesLeft[c] == 1) {
                freeFaces.add(c);
            }
        }
        int[] shuffled = shuffledByDimension(complex, random);
        int next = n - 1;
        int left = n;
        Progress progress = Progress.current();
        int steps = 0;
        while (left > 0) {
            if ((++steps & 0xFFF) == 0) {
                progress.reached(n - left);
            }
            if (!freeFaces.isEmpty()) {
                int pick = random.nextInt(freeFaces.size());
                int t = freeFaces.getInt(pick);
                freeFaces.set(pick, freeFaces.getInt(freeFaces.size() - 1));
                freeFaces.removeInt(freeFaces.size() - 1);
                if (removed[t] || cofacesLeft[t] != 1) {
                    continue;
                }
                int entry = remainingEntry(t, removed, coboundary);
                int coefficient = coboundary.coefficient(entry);
                if (coefficient == 1 || coefficient == -1) {
                    int s = coboundary.target(entry);
                    mates[s] = t;
                    mates[t] = s;
                    remove(s, removed, cofacesLeft, boundary, freeFaces);
                    remove(t, removed, cofacesLeft, boundary, freeFaces);
                    left -= 2;
                }
                continue;
            }
            // shuffled lists each dimension's cells in random order, dimensions ascending
            while (removed[shuffled[next]]) {
                next--;
            }
            remove(shuffled[next], removed, cofacesLeft, boundary, freeFaces);
            left--;
        }
        return Matching.adopt(mates);
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

    private static void remove(int c, boolean[] removed, int[] cofacesLeft, Boundary boundary, IntArrayList freeFaces) {
        removed[c] = true;
        for (int i = boundary.start(c); i < boundary.end(c); i++) {
            int f = boundary.target(i);
            if (!removed[f] && --cofacesLeft[f] == 1) {
                freeFaces.add(f);
            }
        }
    }

    private static int remainingEntry(int t, boolean[] removed, Boundary coboundary) {
        for (int i = coboundary.start(t); i < coboundary.end(t); i++) {
            if (!removed[coboundary.target(i)]) {
                return i;
            }
        }
        throw new IllegalStateException("coface count out of step with the coboundary");
    }
}
