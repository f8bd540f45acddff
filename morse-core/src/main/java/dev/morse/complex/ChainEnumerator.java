package dev.morse.complex;

import dev.morse.poset.Adjacency;
import dev.morse.poset.Poset;
import dev.morse.progress.Progress;
import it.unimi.dsi.fastutil.ints.IntArrayList;
import it.unimi.dsi.fastutil.ints.IntArrays;
import it.unimi.dsi.fastutil.longs.LongArrayList;
import java.util.Arrays;
import java.util.Locale;

/**
 * Lists every nonempty chain of a poset, dimension by dimension, and the simplicial boundary of
 * each. Used once per {@link OrderComplex}; not thread-safe.
 *
 * <p>A chain {@code x0 < ... < xd} extends the chain {@code x0 < ... < x(d-1)} by an element above
 * its top. Extending the chains of one dimension in their order, each by the elements above its top
 * in ascending id, lists the next dimension in lexicographic order of the id sequences, and the
 * extensions of one chain form a contiguous block. Those blocks make a prefix tree, so a face is
 * found by walking down from its bottom element, one binary search per step in a sorted up-set.
 *
 * <p>Before anything is listed the chains are counted (dynamic programming over the up-sets, with
 * saturating arithmetic), so an order complex too big to hold fails fast with a clear message.
 */
final class ChainEnumerator {
    private final Poset poset;
    private final long limit;
    private final int n;
    private final int[] upStart;
    private final int[] upEnd;
    private int[] upTargets;
    private long[] counts;
    private int[][] chains;
    private int[][] childStart;

    ChainEnumerator(Poset poset, long limit) {
        this.poset = poset;
        this.limit = limit;
        this.n = poset.size();
        this.upStart = new int[n];
        this.upEnd = new int[n];
    }

    /** The chains per dimension, each as a flat run of {@code d + 1} element ids. */
    int[][] chains() {
        return chains;
    }

    /** Cells per dimension. */
    int[] counts() {
        int[] c = new int[counts.length];
        for (int d = 0; d < c.length; d++) {
            c[d] = (int) counts[d];
        }
        return c;
    }

    /** Counts, lists and connects all chains; returns the boundary over the cells numbered by dimension. */
    Boundary run() {
        guardHeight();
        computeUpSets();
        countChains();
        listChains();
        return boundary();
    }

    /** A longest chain alone has {@code 2^(h+1) - 1} subchains; no need to look further if that is too many. */
    private void guardHeight() {
        int longest = poset.maxHeight() + 1;
        if (longest >= 62 || (1L << longest) - 1 > limit) {
            throw new IllegalStateException("the poset has a chain of " + longest
                    + " elements, so its order complex has at least 2^" + longest
                    + " - 1 cells, more than the limit of " + limit);
        }
    }

    /**
     * For each element the elements strictly above it, ascending, from the upper covers in reverse
     * linear extension order: the up-set of x is the union over its upper covers y of y and up(y).
     */
    private void computeUpSets() {
        int[] order = poset.linearExtension();
        Adjacency upper = poset.upperCovers();
        int[] stamp = new int[n];
        Arrays.fill(stamp, -1);
        IntArrayList all = new IntArrayList();
        if (n > limit) {
            throw tooMany(0, n);
        }
        for (int k = n - 1; k >= 0; k--) {
            int x = order[k];
            int begin = all.size();
            for (int i = upper.start(x); i < upper.end(x); i++) {
                int y = upper.target(i);
                if (stamp[y] != x) {
                    stamp[y] = x;
                    all.add(y);
                }
                for (int j = upStart[y]; j < upEnd[y]; j++) {
                    int w = all.getInt(j);
                    if (stamp[w] != x) {
                        stamp[w] = x;
                        all.add(w);
                    }
                }
            }
            IntArrays.quickSort(all.elements(), begin, all.size());
            upStart[x] = begin;
            upEnd[x] = all.size();
            // each comparable pair is an edge of the order complex
            if ((long) n + all.size() > limit) {
                throw tooMany(1, n + (long) all.size());
            }
        }
        upTargets = all.elements();
    }

    /** {@code c_d(x)}, the chains of d + 1 elements with bottom x, is the sum of {@code c_(d-1)(y)} over y above x. */
    private void countChains() {
        LongArrayList perDimension = new LongArrayList();
        long[] previous = new long[n];
        Arrays.fill(previous, 1);
        perDimension.add(n);
        long total = n;
        long entries = 0;
        String refusal = null;
        for (int d = 1; n > 0; d++) {
            long[] current = new long[n];
            long sum = 0;
            for (int x = 0; x < n; x++) {
                long s = 0;
                for (int j = upStart[x]; j < upEnd[x]; j++) {
                    s = CellLimits.saturatedAdd(s, previous[upTargets[j]]);
                }
                current[x] = s;
                sum = CellLimits.saturatedAdd(sum, s);
            }
            if (sum == 0) {
                break;
            }
            total = CellLimits.saturatedAdd(total, sum);
            // past the limit, the remaining dimensions are still counted (one pass each over the
            // comparable pairs) so that the refusal states the whole size, not a partial sum
            if (refusal == null) {
                entries = CellLimits.saturatedAdd(entries, CellLimits.saturatedMultiply(sum, d + 1));
                if (total > limit) {
                    refusal = String.format(Locale.ROOT, "more than the limit of %,d", limit);
                } else if (entries > CellLimits.MAX_ARRAY) {
                    refusal = "and more boundary entries than one array holds";
                }
                perDimension.add(sum);
            }
            previous = current;
        }
        if (refusal != null) {
            throw new IllegalStateException(String.format(Locale.ROOT, "the order complex would have %s cells in all"
                    + " dimensions, %s", total == Long.MAX_VALUE ? "more than 2^63"
                    : String.format(Locale.ROOT, "%,d", total), refusal));
        }
        counts = perDimension.toLongArray();
    }

    private IllegalStateException tooMany(int dimension, long atLeast) {
        return new IllegalStateException("the order complex would have more than the limit of " + limit
                + " cells (at least " + (atLeast == Long.MAX_VALUE ? "2^63" : Long.toString(atLeast))
                + " counting up to dimension " + dimension + ")");
    }

    private void listChains() {
        int top = counts.length - 1;
        chains = new int[top + 1][];
        childStart = new int[Math.max(top, 0)][];
        if (top < 0) {
            return;
        }
        chains[0] = new int[n];
        for (int x = 0; x < n; x++) {
            chains[0][x] = x;
        }
        long total = 0;
        for (long c : counts) {
            total += c;
        }
        Progress progress = Progress.current();
        progress.begin("order complex", "chains", total);
        long listed = n;
        for (int d = 1; d <= top; d++) {
            progress.reached(listed);
            listed += counts[d];
            int parents = (int) counts[d - 1];
            int[] below = chains[d - 1];
            int[] next = new int[(int) counts[d] * (d + 1)];
            int[] starts = new int[parents + 1];
            int pos = 0;
            for (int p = 0; p < parents; p++) {
                starts[p] = pos;
                int last = below[p * d + d - 1];
                for (int j = upStart[last]; j < upEnd[last]; j++) {
                    int at = pos * (d + 1);
                    System.arraycopy(below, p * d, next, at, d);
                    next[at + d] = upTargets[j];
                    pos++;
                }
            }
            starts[parents] = pos;
            chains[d] = next;
            childStart[d - 1] = starts;
        }
    }

    private Boundary boundary() {
        int top = counts.length - 1;
        long cellTotal = 0;
        long entryTotal = 0;
        for (int d = 0; d <= top; d++) {
            cellTotal += counts[d];
            if (d > 0) {
                entryTotal += counts[d] * (d + 1);
            }
        }
        int[] offsets = new int[(int) cellTotal + 1];
        int[] targets = new int[(int) entryTotal];
        int[] coefficients = new int[(int) entryTotal];
        int cell = (int) counts[0]; // vertices have empty boundaries
        int entry = 0;
        int firstBelow = 0;
        int[] face = new int[top + 1];
        Progress progress = Progress.current();
        progress.begin("order complex boundary", "chains", cellTotal);
        for (int d = 1; d <= top; d++) {
            int[] list = chains[d];
            int count = (int) counts[d];
            for (int c = 0; c < count; c++) {
                if ((c & 0xFFF) == 0) {
                    progress.reached(cell);
                }
                int at = c * (d + 1);
                for (int i = 0; i <= d; i++) {
                    int k = 0;
                    for (int t = 0; t <= d; t++) {
                        if (t != i) {
                            face[k++] = list[at + t];
                        }
                    }
                    targets[entry] = firstBelow + find(face, d);
                    coefficients[entry] = (i & 1) == 0 ? 1 : -1;
                    entry++;
                }
                offsets[++cell] = entry;
            }
            firstBelow += (int) counts[d - 1];
        }
        return new Boundary(offsets, targets, coefficients);
    }

    /** Index within its dimension of the chain {@code face[0..length)}, by walking the prefix tree. */
    private int find(int[] face, int length) {
        int index = face[0];
        for (int t = 1; t < length; t++) {
            int last = face[t - 1];
            int rank = Arrays.binarySearch(upTargets, upStart[last], upEnd[last], face[t]) - upStart[last];
            index = childStart[t - 1][index] + rank;
        }
        return index;
    }
}
