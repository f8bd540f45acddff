package dev.morse.matching;

import dev.morse.complex.Boundary;
import dev.morse.complex.ChainComplex;
import it.unimi.dsi.fastutil.ints.IntArrayList;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Cores of sets of cells of one dimension: what is left of a set after cells with a free face (a free
 * coface) relative to the set are taken out, repeatedly. A set whose core is not empty cannot be
 * matched downwards (upwards) in a Morse matching, which gives the exact solver its core cuts and its
 * bound on critical top cells. Working memory: a few arrays of one entry per cell.
 */
final class Cores {
    private final ChainComplex complex;
    private final int n;

    Cores(ChainComplex complex) {
        this.complex = complex;
        this.n = complex.cellCount();
    }

    /**
     * A lower bound on the critical cells of the top dimension: the fewest top cells whose removal
     * leaves a set without core, found by a depth-first search that always branches on the cells of
     * one small core. Why it bounds: the top cells a Morse matching pairs (all downwards) have an
     * empty core (see {@link OptimalMatchingSolver}), so its critical top cells meet every core. The
     * search starts at {@code known}, the bound already known for that dimension, and stops at
     * {@code cap} (no need to prove
     * more than a known matching leaves) or at the deadline, returning the size it was trying then,
     * every smaller one having failed or being excluded by the known bound.
     */
    int topCellBound(int known, int cap, long deadline) {
        int d = complex.dimension();
        int first = complex.firstCell(d);
        int end = complex.firstCell(d + 1);
        // below the bound already known the search could only find what proves nothing
        for (int k = known; k < cap; k++) {
            boolean[] kept = new boolean[n];
            Arrays.fill(kept, first, end, true);
            Boolean found = hits(first, end, kept, k, deadline);
            if (found == null || found) {
                return k;
            }
        }
        return Math.max(cap, known);
    }

    /** Whether taking out at most {@code k} more cells empties the core; null at the deadline. */
    private Boolean hits(int first, int end, boolean[] kept, int k, long deadline) {
        if (System.nanoTime() > deadline) {
            return null;
        }
        boolean[] core = kept.clone();
        prune(first, end, core, true);
        if (k == 0) {
            for (int c = first; c < end; c++) {
                if (core[c]) {
                    return false;
                }
            }
            return true;
        }
        IntArrayList members = smallCore(first, end, core);
        if (members.isEmpty()) {
            return true;
        }
        if (disjointCores(first, end, core, members, k) > k) {
            return false;
        }
        for (int v : members) {
            kept[v] = false;
            Boolean found = hits(first, end, kept, k - 1, deadline);
            kept[v] = true;
            if (found == null || found) {
                return found;
            }
        }
        return false;
    }

    /**
     * How many pairwise disjoint cores were found greedily, {@code members} being the first, counting
     * no further than {@code k + 1}: each needs a cell of its own taken out.
     */
    private int disjointCores(int first, int end, boolean[] core, IntArrayList members, int k) {
        boolean[] rest = core.clone();
        int count = 0;
        IntArrayList next = members;
        while (!next.isEmpty() && count <= k) {
            count++;
            for (int v : next) {
                rest[v] = false;
            }
            prune(first, end, rest, true);
            next = smallCore(first, end, rest);
        }
        return count;
    }

    /** A core inside {@code core} from which no single cell could be taken out, when it was tried, without emptying it. */
    private IntArrayList smallCore(int first, int end, boolean[] core) {
        // each connected part of a core is a core: a face two cells share keeps them in one part
        IntArrayList smallest = null;
        for (IntArrayList part : parts(first, end, core, true)) {
            if (smallest == null || part.size() < smallest.size()) {
                smallest = part;
            }
        }
        if (smallest == null) {
            return new IntArrayList();
        }
        boolean[] current = new boolean[n];
        for (int v : smallest) {
            current[v] = true;
        }
        for (int v : smallest) {
            if (!current[v]) {
                continue;
            }
            boolean[] smaller = current.clone();
            smaller[v] = false;
            prune(first, end, smaller, true);
            boolean empty = true;
            for (int c = first; c < end && empty; c++) {
                empty = !smaller[c];
            }
            if (!empty) {
                current = smaller;
            }
        }
        IntArrayList members = new IntArrayList();
        for (int c = first; c < end; c++) {
            if (current[c]) {
                members.add(c);
            }
        }
        return members;
    }

    /** Removes from {@code in} every cell with a free face (free coface) relative to {@code in}, repeatedly. */
    void prune(int first, int end, boolean[] in, boolean down) {
        Boundary toNeighbours = down ? complex.boundary() : complex.coboundary();
        Boundary fromNeighbours = down ? complex.coboundary() : complex.boundary();
        int[] members = new int[n];
        for (int c = first; c < end; c++) {
            if (in[c]) {
                for (int i = toNeighbours.start(c); i < toNeighbours.end(c); i++) {
                    members[toNeighbours.target(i)]++;
                }
            }
        }
        IntArrayList queue = new IntArrayList();
        for (int c = first; c < end; c++) {
            if (in[c] && hasLooseNeighbour(c, toNeighbours, members)) {
                queue.add(c);
            }
        }
        while (!queue.isEmpty()) {
            int c = queue.popInt();
            if (!in[c]) {
                continue;
            }
            in[c] = false;
            for (int i = toNeighbours.start(c); i < toNeighbours.end(c); i++) {
                int w = toNeighbours.target(i);
                if (--members[w] == 1) {
                    // the one cell left around w may now have a free face there
                    for (int j = fromNeighbours.start(w); j < fromNeighbours.end(w); j++) {
                        int u = fromNeighbours.target(j);
                        if (in[u] && hasLooseNeighbour(u, toNeighbours, members)) {
                            queue.add(u);
                        }
                    }
                }
            }
        }
    }

    /** The connected parts of {@code in}: cells sharing a face (a coface). */
    List<IntArrayList> parts(int first, int end, boolean[] in, boolean down) {
        Boundary toNeighbours = down ? complex.boundary() : complex.coboundary();
        Boundary fromNeighbours = down ? complex.coboundary() : complex.boundary();
        List<IntArrayList> parts = new ArrayList<>();
        boolean[] seen = new boolean[n];
        IntArrayList stack = new IntArrayList();
        for (int c = first; c < end; c++) {
            if (!in[c] || seen[c]) {
                continue;
            }
            IntArrayList cells = new IntArrayList();
            stack.add(c);
            seen[c] = true;
            while (!stack.isEmpty()) {
                int v = stack.popInt();
                cells.add(v);
                for (int i = toNeighbours.start(v); i < toNeighbours.end(v); i++) {
                    int w = toNeighbours.target(i);
                    for (int j = fromNeighbours.start(w); j < fromNeighbours.end(w); j++) {
                        int u = fromNeighbours.target(j);
                        if (in[u] && !seen[u]) {
                            seen[u] = true;
                            stack.add(u);
                        }
                    }
                }
            }
            parts.add(cells);
        }
        return parts;
    }

    /** Whether a neighbour of {@code c} joined by a unit incidence has {@code c} as its only member. */
    private static boolean hasLooseNeighbour(int c, Boundary toNeighbours, int[] members) {
        for (int i = toNeighbours.start(c); i < toNeighbours.end(c); i++) {
            int coefficient = toNeighbours.coefficient(i);
            if ((coefficient == 1 || coefficient == -1) && members[toNeighbours.target(i)] == 1) {
                return true;
            }
        }
        return false;
    }
}
