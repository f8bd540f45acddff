package dev.morse.morsecomplex;

import dev.morse.complex.Boundary;
import dev.morse.complex.ChainComplex;
import dev.morse.homology.SparseIntegerMatrix;
import dev.morse.matching.Matching;
import dev.morse.progress.Progress;
import it.unimi.dsi.fastutil.ints.Int2LongOpenHashMap;
import it.unimi.dsi.fastutil.ints.IntArrayList;
import it.unimi.dsi.fastutil.ints.IntHeapPriorityQueue;
import it.unimi.dsi.fastutil.longs.LongArrayList;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Builds the Morse complex of an acyclic matching with unit incidences (Forman 1998; in the
 * algebraic form of Sköldberg 2006 and Jöllenbeck–Welker 2009). For a critical cell σ of dimension
 * d, the chain {@code ∂σ} is swept down the gradient: each face τ matched upward with ν is replaced
 * using {@code ∂ν} so that τ vanishes, until only critical faces and faces matched downward remain;
 * the critical ones give {@code ∂σ} in the Morse complex. The faces are taken in one fixed
 * topological order of the gradient flow on dimension {@code d - 1}, so each is eliminated once and
 * the coefficients accumulate over all gradient paths at once, never path by path.
 *
 * <p>Coefficients are exact longs; an overflow raises {@link ArithmeticException}, never a wrong
 * value. Working memory: 8 bytes per cell for the flow order plus the accumulator of one sweep.
 */
public final class GradientSweep {
    private GradientSweep() {
    }

    /**
     * The Morse complex of {@code matching} on {@code complex}; the matching must have passed the
     * verifier.
     *
     * @throws ArithmeticException if a coefficient does not fit in a long
     */
    public static MorseComplex build(ChainComplex complex, Matching matching) {
        int top = complex.dimension();
        int[] counts = matching.criticalCounts(complex);
        List<SparseIntegerMatrix> boundaries = new ArrayList<>();
        if (counts.length > 0) {
            boundaries.add(MorseComplex.zeroBoundary(counts[0]));
        }
        int[] criticalIndex = new int[complex.cellCount()];
        Arrays.fill(criticalIndex, -1);
        for (int d = 0; d <= top; d++) {
            int k = 0;
            for (int c : matching.criticalCells(complex, d)) {
                criticalIndex[c] = k++;
            }
        }
        Boundary boundary = complex.boundary();
        long swept = 0;
        for (int d = 1; d <= top; d++) {
            swept += counts[d];
        }
        Progress progress = Progress.current();
        progress.begin("sweep", "critical cells", swept);
        for (int d = 1; d <= top; d++) {
            FlowOrder flow = flowOrder(complex, matching, boundary, d - 1);
            int[] critical = matching.criticalCells(complex, d);
            int[] offsets = new int[critical.length + 1];
            IntArrayList rows = new IntArrayList();
            LongArrayList values = new LongArrayList();
            Int2LongOpenHashMap chain = new Int2LongOpenHashMap();
            IntHeapPriorityQueue pending = new IntHeapPriorityQueue();
            for (int j = 0; j < critical.length; j++) {
                if ((j & 0x3F) == 0) {
                    progress.advance(Math.min(0x40, critical.length - j));
                }
                sweep(critical[j], boundary, matching, flow, chain, pending);
                int[] faces = chain.keySet().toIntArray();
                Arrays.sort(faces); // critical indices follow cell order, so the column comes out sorted
                for (int f : faces) {
                    long v = chain.get(f);
                    if (v != 0 && criticalIndex[f] >= 0) {
                        rows.add(criticalIndex[f]);
                        values.add(v);
                    }
                }
                offsets[j + 1] = rows.size();
            }
            boundaries.add(new SparseIntegerMatrix(counts[d - 1], offsets, rows.toIntArray(), values.toLongArray()));
        }
        return new MorseComplex(counts, boundaries);
    }

    /**
     * Leaves in {@code chain} the image of {@code ∂σ} after flowing out every face matched upward.
     * {@code pending} holds flow positions of faces still to eliminate, smallest first: a face only
     * brings in faces later in the flow order, so each position is settled once.
     */
    private static void sweep(int sigma, Boundary boundary, Matching matching, FlowOrder flow,
            Int2LongOpenHashMap chain, IntHeapPriorityQueue pending) {
        chain.clear();
        pending.clear();
        addScaled(chain, pending, boundary, sigma, 1L, flow);
        while (!pending.isEmpty()) {
            int tau = flow.cellAt(pending.dequeueInt());
            long a = chain.get(tau);
            if (a == 0) {
                continue;
            }
            int nu = matching.mate(tau);
            long w = boundary.coefficient(nu, tau); // ±1: the verifier checked it
            // chain -= (a / w) ∂ν, and 1/w = w for a unit; this cancels τ exactly
            addScaled(chain, pending, boundary, nu, Math.negateExact(Math.multiplyExact(a, w)), flow);
        }
    }

    private static void addScaled(Int2LongOpenHashMap chain, IntHeapPriorityQueue pending, Boundary boundary, int cell,
            long factor, FlowOrder flow) {
        for (int i = boundary.start(cell); i < boundary.end(cell); i++) {
            int f = boundary.target(i);
            long before = chain.get(f);
            long after = Math.addExact(before, Math.multiplyExact(factor, boundary.coefficient(i)));
            if (after == 0) {
                chain.remove(f);
            } else {
                chain.put(f, after);
                int position = flow.positionOf(f);
                if (before == 0 && position >= 0) {
                    pending.enqueue(position);
                }
            }
        }
    }

    /** The flow order of one dimension: positions of cells matched upward, and back. */
    record FlowOrder(int firstCell, int[] position, int[] cells) {
        int positionOf(int cell) {
            return position[cell - firstCell];
        }

        int cellAt(int p) {
            return cells[p];
        }
    }

    /**
     * A topological order of the gradient flow on the cells of dimension {@code e} matched upward:
     * τ comes before every τ' ≠ τ in the boundary of τ's partner. Entry {@code τ - firstCell(e)} is
     * τ's position, or -1 for cells not matched upward; the cells array lists them by position.
     */
    static FlowOrder flowOrder(ChainComplex complex, Matching matching, Boundary boundary, int e) {
        int first = complex.firstCell(e);
        int count = complex.cellCount(e);
        int[] inDegree = new int[count];
        boolean[] up = new boolean[count];
        for (int k = 0; k < count; k++) {
            int tau = first + k;
            int nu = matching.mate(tau);
            up[k] = nu != Matching.CRITICAL && complex.dimensionOf(nu) == e + 1;
        }
        for (int k = 0; k < count; k++) {
            if (!up[k]) {
                continue;
            }
            int tau = first + k;
            int nu = matching.mate(tau);
            for (int i = boundary.start(nu); i < boundary.end(nu); i++) {
                int t = boundary.target(i) - first;
                if (t != k && up[t]) {
                    inDegree[t]++;
                }
            }
        }
        int[] position = new int[count];
        Arrays.fill(position, -1);
        int[] queue = new int[count];
        int tail = 0;
        for (int k = 0; k < count; k++) {
            if (up[k] && inDegree[k] == 0) {
                queue[tail++] = k;
            }
        }
        for (int head = 0; head < tail; head++) {
            int k = queue[head];
            position[k] = head;
            queue[head] = first + k;
            int nu = matching.mate(first + k);
            for (int i = boundary.start(nu); i < boundary.end(nu); i++) {
                int t = boundary.target(i) - first;
                if (t != k && up[t] && --inDegree[t] == 0) {
                    queue[tail++] = t;
                }
            }
        }
        int upCount = 0;
        for (boolean u : up) {
            upCount += u ? 1 : 0;
        }
        if (tail < upCount) {
            throw new IllegalArgumentException("the matching has a closed gradient path in dimension " + e);
        }
        return new FlowOrder(first, position, Arrays.copyOf(queue, tail));
    }
}
