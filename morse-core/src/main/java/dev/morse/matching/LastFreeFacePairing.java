package dev.morse.matching;

import dev.morse.complex.ChainComplex;
import it.unimi.dsi.fastutil.ints.IntArrays;

/**
 * Collapses in reverse lexicographic order, the deterministic "rev-lex" strategy that Benedetti and
 * Lutz set beside random discrete Morse theory ("Random discrete Morse theory and a new library of
 * triangulations", Exp. Math. 23, 2014; the strategy's details from memory): among the free faces
 * left, always collapse the one whose vertex tuple ({@link ChainComplex#vertexTuple}) is
 * lexicographically last. When no free face is left, the lexicographically last cell of the highest
 * dimension left is declared critical and removed, and collapsing resumes.
 *
 * <p>Acyclic for the same reason as {@link CollapsePairing}: along a gradient path each step
 * reaches a pair removed strictly later. O(N log N) time; about 21 bytes per cell of working memory
 * besides the coboundary and the vertex tuples used once for the order.
 */
final class LastFreeFacePairing implements MatchingHeuristic.Pairing {
    @Override
    public Matching match(ChainComplex complex, MatchingOptions options) {
        int n = complex.cellCount();
        RevLexCollapse collapse = new RevLexCollapse(complex);
        // the highest dimension left is scanned from the top; within it, cells in descending rank
        int[] byDimensionThenRank = new int[n];
        for (int c = 0; c < n; c++) {
            byDimensionThenRank[c] = c;
        }
        for (int d = 0; d <= complex.dimension(); d++) {
            int first = complex.firstCell(d);
            IntArrays.mergeSort(byDimensionThenRank, first, first + complex.cellCount(d),
                    (a, b) -> Integer.compare(collapse.rank(a), collapse.rank(b)));
        }
        int next = n - 1;
        while (true) {
            collapse.collapseAll();
            while (next >= 0 && collapse.state().isRemoved(byDimensionThenRank[next])) {
                next--;
            }
            if (next < 0) {
                return collapse.state().matching();
            }
            collapse.makeCritical(byDimensionThenRank[next]);
        }
    }
}
