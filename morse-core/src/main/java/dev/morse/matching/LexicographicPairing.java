package dev.morse.matching;

import dev.morse.complex.Boundary;
import dev.morse.complex.ChainComplex;
import dev.morse.progress.Progress;
import it.unimi.dsi.fastutil.ints.IntArrayList;
import it.unimi.dsi.fastutil.ints.IntArrays;
import java.util.Arrays;

/**
 * A greedy lexicographic matching: cells are taken in the lexicographic order of their vertex tuples
 * ({@link ChainComplex#vertexTuple}: chains for the order complex, vertex lists for simplices),
 * and each unmatched cell is paired with the first partner in that order, among its unmatched
 * cofaces and then its unmatched faces, that has a unit incidence and keeps the matching acyclic.
 * For order complexes, vertex ids follow the input order, so the chains are visited as the
 * lexicographic order of maximal chains in the spirit of Babson and Hersh ("Discrete Morse functions
 * from lexicographic orders", Trans. AMS 357, 2005) visits them.
 *
 * <p>Acyclicity is kept by a search, before each pairing, for a gradient path from the upper cell
 * back to the lower one; the search stays within the two dimensions involved. Quadratic in the worst
 * case, so meant for comparisons rather than the largest inputs. 12 bytes per cell of working memory.
 */
final class LexicographicPairing implements MatchingHeuristic.Pairing {
    @Override
    public Matching match(ChainComplex complex, MatchingOptions options) {
        int[] order = lexicographicOrder(complex);
        int n = order.length;
        int[] rank = positions(order);
        Boundary boundary = complex.boundary();
        Boundary coboundary = complex.coboundary();
        int[] mates = new int[n];
        Arrays.fill(mates, Matching.CRITICAL);
        int[] stamp = new int[n];
        Arrays.fill(stamp, -1);
        int[] search = {0};
        IntArrayList stack = new IntArrayList();
        IntArrayList candidates = new IntArrayList();
        Progress progress = Progress.current();
        int visited = 0;
        for (int c : order) {
            if ((++visited & 0x3FF) == 0) {
                progress.reached(visited);
            }
            if (mates[c] != Matching.CRITICAL) {
                continue;
            }
            candidates.clear();
            addUnitCandidates(c, coboundary, mates, candidates);
            sortByRank(candidates, rank);
            int cofaceCount = candidates.size();
            IntArrayList faces = new IntArrayList();
            addUnitCandidates(c, boundary, mates, faces);
            sortByRank(faces, rank);
            candidates.addAll(faces);
            for (int k = 0; k < candidates.size(); k++) {
                int partner = candidates.getInt(k);
                int lower = k < cofaceCount ? c : partner;
                int upper = k < cofaceCount ? partner : c;
                if (!closesPath(lower, upper, boundary, mates, stamp, ++search[0], stack)) {
                    mates[lower] = upper;
                    mates[upper] = lower;
                    break;
                }
            }
        }
        return Matching.adopt(mates);
    }

    /** The position of each cell in the lexicographic order of vertex tuples. */
    static int[] lexicographicRanks(ChainComplex complex) {
        return positions(lexicographicOrder(complex));
    }

    /** The inverse permutation: where each cell stands in {@code order}. */
    private static int[] positions(int[] order) {
        int[] position = new int[order.length];
        for (int i = 0; i < order.length; i++) {
            position[order[i]] = i;
        }
        return position;
    }

    /** The cells in the lexicographic order of their vertex tuples. */
    static int[] lexicographicOrder(ChainComplex complex) {
        int n = complex.cellCount();
        int[][] tuples = new int[n][];
        for (int c = 0; c < n; c++) {
            tuples[c] = complex.vertexTuple(c);
        }
        int[] order = new int[n];
        for (int c = 0; c < n; c++) {
            order[c] = c;
        }
        IntArrays.mergeSort(order, (a, b) -> Arrays.compare(tuples[a], tuples[b]));
        return order;
    }

    private static void addUnitCandidates(int c, Boundary relation, int[] mates, IntArrayList out) {
        for (int i = relation.start(c); i < relation.end(c); i++) {
            int coefficient = relation.coefficient(i);
            if ((coefficient == 1 || coefficient == -1) && mates[relation.target(i)] == Matching.CRITICAL) {
                out.add(relation.target(i));
            }
        }
    }

    private static void sortByRank(IntArrayList cells, int[] rank) {
        IntArrays.mergeSort(cells.elements(), 0, cells.size(), (a, b) -> Integer.compare(rank[a], rank[b]));
    }

    /**
     * Whether pairing {@code lower} with {@code upper} would close a gradient path: one that leaves
     * {@code upper} down to another face, alternates up along matched pairs and down along faces, and
     * comes back to {@code lower}.
     */
    private static boolean closesPath(int lower, int upper, Boundary boundary, int[] mates, int[] stamp, int searchId,
            IntArrayList stack) {
        stack.clear();
        stack.add(upper);
        stamp[upper] = searchId;
        while (!stack.isEmpty()) {
            int s = stack.popInt();
            for (int i = boundary.start(s); i < boundary.end(s); i++) {
                int t = boundary.target(i);
                if (s == upper && t == lower) {
                    continue;
                }
                if (t == lower) {
                    return true;
                }
                int next = mates[t];
                // a face matched upward leads on to its partner; matched downward or critical, the path ends
                if (next != Matching.CRITICAL && next != s && stamp[next] != searchId && boundary.coefficient(next, t) != 0) {
                    stamp[next] = searchId;
                    stack.add(next);
                }
            }
        }
        return false;
    }
}
