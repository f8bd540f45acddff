package dev.morse.matching;

import dev.morse.complex.Boundary;
import dev.morse.complex.ChainComplex;

/**
 * Collapses with a greedy choice of critical cells. Free faces are collapsed in reverse lexicographic
 * order, as in {@link LastFreeFacePairing} (Benedetti and Lutz, Exp. Math. 23, 2014). When none is
 * left, the cell declared critical is, among the cells of the highest dimension left, one whose
 * removal frees the most faces (faces with exactly two cofaces left), ties going to the
 * lexicographically last. This choice rule is ours, not from the literature: a critical cell that
 * frees no face lets collapsing stop again at once; benchmarks/RESULTS.md measures its effect on the
 * hard library.
 *
 * <p>Acyclic for the same reason as {@link CollapsePairing}. Each critical choice scans the cells
 * of the current top dimension, so the time is O(N · c) for c critical cells of that kind; about 21
 * bytes per cell of working memory besides the coboundary.
 */
final class FreeingCollapsePairing implements MatchingHeuristic.Pairing {
    @Override
    public Matching match(ChainComplex complex, MatchingOptions options) {
        RevLexCollapse collapse = new RevLexCollapse(complex);
        FreeFaceState state = collapse.state();
        Boundary boundary = complex.boundary();
        int top = complex.dimension();
        while (true) {
            collapse.collapseAll();
            int chosen = -1;
            int chosenScore = -1;
            while (top >= 0 && chosen < 0) {
                int first = complex.firstCell(top);
                for (int c = first; c < first + complex.cellCount(top); c++) {
                    if (state.isRemoved(c)) {
                        continue;
                    }
                    int score = 0;
                    for (int i = boundary.start(c); i < boundary.end(c); i++) {
                        int f = boundary.target(i);
                        if (!state.isRemoved(f) && state.cofacesLeft(f) == 2) {
                            score++;
                        }
                    }
                    if (score > chosenScore || (score == chosenScore && collapse.rank(c) > collapse.rank(chosen))) {
                        chosen = c;
                        chosenScore = score;
                    }
                }
                if (chosen < 0) {
                    top--;
                }
            }
            if (chosen < 0) {
                return state.matching();
            }
            // every cell of the highest dimension left has no coface left, so it may be removed
            collapse.makeCritical(chosen);
        }
    }
}
