package dev.morse.matching;

import dev.morse.complex.Boundary;
import dev.morse.complex.ChainComplex;
import it.unimi.dsi.fastutil.ints.IntArrayList;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

/**
 * Closed gradient paths of a pairing that may not be acyclic: the shortest ones through each pair, for
 * the exact solver's cycle cuts, and a repair that unmatches pairs until none is left. A path goes
 * from an upper cell down to a face other than its partner (any nonzero incidence), and on from that
 * face up to its own partner. Working memory: three arrays of one entry per cell.
 */
final class ClosedPaths {
    private final ChainComplex complex;
    private final int n;

    ClosedPaths(ChainComplex complex) {
        this.complex = complex;
        this.n = complex.cellCount();
    }

    /**
     * For every upper cell of a pair, the shortest closed gradient path through it, if any, as the
     * list of upper cells it passes. A path goes from an upper cell down to a face other than its
     * partner (any nonzero incidence), and on from that face up to its own partner.
     */
    List<int[]> shortestCycles(int[] mates) {
        List<int[]> cycles = new ArrayList<>();
        Set<String> seen = new HashSet<>();
        int[] parent = new int[n];
        int[] stamp = new int[n];
        Arrays.fill(stamp, -1);
        int[] queue = new int[n];
        for (int root = 0; root < n; root++) {
            if (!isUpper(root, mates)) {
                continue;
            }
            int[] cycle = shortestCycleThrough(root, mates, parent, stamp, queue);
            if (cycle != null) {
                int[] key = cycle.clone();
                Arrays.sort(key);
                if (seen.add(Arrays.toString(key))) {
                    cycles.add(cycle);
                }
            }
        }
        return cycles;
    }

    private boolean isUpper(int c, int[] mates) {
        return mates[c] != Matching.CRITICAL && complex.dimensionOf(mates[c]) == complex.dimensionOf(c) - 1;
    }

    private int[] shortestCycleThrough(int root, int[] mates, int[] parent, int[] stamp, int[] queue) {
        Boundary boundary = complex.boundary();
        int tail = 0;
        queue[tail++] = root;
        stamp[root] = root;
        for (int head = 0; head < tail; head++) {
            int s = queue[head];
            for (int i = boundary.start(s); i < boundary.end(s); i++) {
                int t = boundary.target(i);
                if (t == mates[s]) {
                    continue;
                }
                int next = mates[t];
                if (next == Matching.CRITICAL || !isUpper(next, mates)) {
                    continue;
                }
                if (next == root) {
                    IntArrayList path = new IntArrayList();
                    for (int v = s; v != root; v = parent[v]) {
                        path.add(v);
                    }
                    path.add(root);
                    return path.toIntArray();
                }
                if (stamp[next] != root) {
                    stamp[next] = root;
                    parent[next] = s;
                    queue[tail++] = next;
                }
            }
        }
        return null;
    }

    /** Unmatches one pair of each closed path until none is left: a valid Morse matching. */
    int[] repair(int[] chosen) {
        int[] mates = chosen.clone();
        int[] parent = new int[n];
        int[] stamp = new int[n];
        int[] queue = new int[n];
        boolean changed = true;
        while (changed) {
            changed = false;
            Arrays.fill(stamp, -1);
            for (int root = 0; root < n; root++) {
                if (isUpper(root, mates) && shortestCycleThrough(root, mates, parent, stamp, queue) != null) {
                    mates[mates[root]] = Matching.CRITICAL;
                    mates[root] = Matching.CRITICAL;
                    changed = true;
                }
            }
        }
        return mates;
    }
}
