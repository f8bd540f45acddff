package dev.morse.morsecomplex;

import dev.morse.homology.SparseIntegerMatrix;
import dev.morse.progress.Progress;
import it.unimi.dsi.fastutil.ints.Int2LongMap;
import it.unimi.dsi.fastutil.ints.Int2LongOpenHashMap;
import it.unimi.dsi.fastutil.ints.IntArrayList;
import it.unimi.dsi.fastutil.ints.IntOpenHashSet;
import it.unimi.dsi.fastutil.longs.LongArrayList;
import java.util.ArrayList;
import java.util.List;

/**
 * Algebraic Morse reduction (Sköldberg 2006; Jöllenbeck–Welker 2009) of a complex given by its
 * boundary matrices: a unit entry {@code ⟨∂σ, τ⟩ = u = ±1} lets σ and τ be removed, with
 * {@code ∂σ' ← ∂σ' − (⟨∂σ', τ⟩ / u) ∂σ} for the other cells σ' of σ's dimension; the σ row of
 * {@code ∂_(d+1)} and the τ column of {@code ∂_(d−1)} simply drop out. The result is chain homotopy
 * equivalent over the integers, so homology over every coefficient ring is kept.
 *
 * <p>A round visits every column once and eliminates, where it can, the unit entry of least
 * Markowitz cost {@code (row length − 1)(column length − 1)} to limit fill-in; rounds repeat until
 * one removes nothing. An elimination whose arithmetic would overflow a long is skipped, never
 * rounded. Meant for Morse complexes, which are small: one hash map per remaining column and one
 * set per remaining row (tens of bytes per entry).
 */
public final class AlgebraicReduction {
    private final int top;
    private final Int2LongOpenHashMap[][] columns;
    private final IntOpenHashSet[][] rowsToColumns;
    private final boolean[][] alive;
    private final int[] counts;

    private AlgebraicReduction(MorseComplex complex) {
        top = complex.dimension();
        columns = new Int2LongOpenHashMap[top + 1][];
        rowsToColumns = new IntOpenHashSet[top + 1][];
        alive = new boolean[top + 1][];
        counts = complex.cellCounts();
        for (int d = 0; d <= top; d++) {
            alive[d] = new boolean[counts[d]];
            java.util.Arrays.fill(alive[d], true);
            columns[d] = new Int2LongOpenHashMap[counts[d]];
            rowsToColumns[d] = new IntOpenHashSet[d == top ? 0 : counts[d]];
        }
        for (int d = 0; d < top; d++) {
            for (int r = 0; r < counts[d]; r++) {
                rowsToColumns[d][r] = new IntOpenHashSet(4);
            }
        }
        for (int d = 0; d <= top; d++) {
            for (int j = 0; j < counts[d]; j++) {
                columns[d][j] = new Int2LongOpenHashMap(4);
            }
            if (d == 0) {
                continue;
            }
            SparseIntegerMatrix m = complex.boundary(d);
            for (int j = 0; j < m.columns(); j++) {
                for (int i = m.start(j); i < m.end(j); i++) {
                    columns[d][j].put(m.row(i), m.value(i));
                    rowsToColumns[d - 1][m.row(i)].add(j);
                }
            }
        }
    }

    /** The outcome: the reduced complex and the counts after each round. */
    public record Result(MorseComplex reduced, List<ReductionRound> rounds) {
        /** Copies the list. */
        public Result {
            rounds = List.copyOf(rounds);
        }
    }

    /** Reduces {@code complex} until no unit entry is left. */
    public static Result reduce(MorseComplex complex) {
        AlgebraicReduction state = new AlgebraicReduction(complex);
        List<ReductionRound> rounds = new ArrayList<>();
        Progress progress = Progress.current();
        progress.begin("reduce", "rounds", 0);
        for (int round = 1; ; round++) {
            progress.reached(round - 1);
            int removed = state.runRound();
            if (removed == 0) {
                break;
            }
            rounds.add(new ReductionRound(round, state.counts.clone(), removed));
        }
        return new Result(state.toComplex(), rounds);
    }

    private int runRound() {
        int removed = 0;
        for (int d = 1; d <= top; d++) {
            for (int j = 0; j < alive[d].length; j++) {
                if (!alive[d][j]) {
                    continue;
                }
                int pivotRow = cheapestUnit(d, j);
                if (pivotRow >= 0 && eliminate(d, pivotRow, j)) {
                    removed++;
                }
            }
        }
        return removed;
    }

    private int cheapestUnit(int d, int j) {
        int best = -1;
        long bestCost = Long.MAX_VALUE;
        long columnLength = columns[d][j].size();
        for (Int2LongMap.Entry e : columns[d][j].int2LongEntrySet()) {
            long v = e.getLongValue();
            if (v == 1 || v == -1) {
                long cost = (rowsToColumns[d - 1][e.getIntKey()].size() - 1L) * (columnLength - 1L);
                if (cost < bestCost) {
                    bestCost = cost;
                    best = e.getIntKey();
                }
            }
        }
        return best;
    }

    /** Removes the pair (τ = row {@code t} of dimension d-1, σ = column {@code s} of dimension d). */
    private boolean eliminate(int d, int t, int s) {
        Int2LongOpenHashMap sigma = columns[d][s];
        long u = sigma.get(t);
        int[] others = rowsToColumns[d - 1][t].toIntArray();
        List<Int2LongOpenHashMap> updated = new ArrayList<>(others.length);
        try {
            for (int other : others) {
                if (other == s) {
                    updated.add(null);
                    continue;
                }
                Int2LongOpenHashMap column = columns[d][other];
                long factor = Math.multiplyExact(column.get(t), u); // a / u = a·u for a unit u
                Int2LongOpenHashMap next = new Int2LongOpenHashMap(column);
                for (Int2LongMap.Entry e : sigma.int2LongEntrySet()) {
                    long v = Math.subtractExact(next.get(e.getIntKey()), Math.multiplyExact(factor, e.getLongValue()));
                    if (v == 0) {
                        next.remove(e.getIntKey());
                    } else {
                        next.put(e.getIntKey(), v);
                    }
                }
                updated.add(next);
            }
        } catch (ArithmeticException overflow) {
            return false;
        }
        for (int k = 0; k < others.length; k++) {
            int other = others[k];
            if (other == s) {
                continue;
            }
            Int2LongOpenHashMap before = columns[d][other];
            Int2LongOpenHashMap after = updated.get(k);
            for (int r : sigma.keySet()) {
                boolean had = before.containsKey(r);
                boolean has = after.containsKey(r);
                if (had && !has) {
                    rowsToColumns[d - 1][r].remove(other);
                } else if (!had && has) {
                    rowsToColumns[d - 1][r].add(other);
                }
            }
            columns[d][other] = after;
        }
        for (int r : sigma.keySet()) {
            rowsToColumns[d - 1][r].remove(s);
        }
        columns[d][s] = new Int2LongOpenHashMap(0);
        alive[d][s] = false;
        alive[d - 1][t] = false;
        counts[d]--;
        counts[d - 1]--;
        if (d < top) {
            for (int rho : rowsToColumns[d][s]) {
                columns[d + 1][rho].remove(s);
            }
            rowsToColumns[d][s].clear();
        }
        for (int r : columns[d - 1][t].keySet()) {
            rowsToColumns[d - 2][r].remove(t);
        }
        columns[d - 1][t] = new Int2LongOpenHashMap(0);
        return true;
    }

    private MorseComplex toComplex() {
        int[][] newIndex = new int[top + 1][];
        for (int d = 0; d <= top; d++) {
            newIndex[d] = new int[alive[d].length];
            int k = 0;
            for (int j = 0; j < alive[d].length; j++) {
                newIndex[d][j] = alive[d][j] ? k++ : -1;
            }
        }
        List<SparseIntegerMatrix> boundaries = new ArrayList<>();
        if (counts.length > 0) {
            boundaries.add(MorseComplex.zeroBoundary(counts[0]));
        }
        for (int d = 1; d <= top; d++) {
            int[] offsets = new int[counts[d] + 1];
            IntArrayList rows = new IntArrayList();
            LongArrayList values = new LongArrayList();
            int col = 0;
            for (int j = 0; j < alive[d].length; j++) {
                if (!alive[d][j]) {
                    continue;
                }
                int[] keys = columns[d][j].keySet().toIntArray();
                java.util.Arrays.sort(keys);
                for (int r : keys) {
                    rows.add(newIndex[d - 1][r]);
                    values.add(columns[d][j].get(r));
                }
                offsets[++col] = rows.size();
            }
            boundaries.add(new SparseIntegerMatrix(counts[d - 1], offsets, rows.toIntArray(), values.toLongArray()));
        }
        return new MorseComplex(counts.clone(), boundaries);
    }
}
