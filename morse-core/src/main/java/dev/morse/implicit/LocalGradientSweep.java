package dev.morse.implicit;

import it.unimi.dsi.fastutil.ints.IntArrayList;
import it.unimi.dsi.fastutil.longs.LongArrayList;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * The Morse boundary between critical chains (Forman 1998; in the algebraic form of Sköldberg 2006),
 * following gradient paths from one critical chain σ at a time with partners computed on demand. A
 * face τ of dimension {@code d - 1} matched upward with ν flows to the other faces of ν; first the
 * faces reachable from {@code ∂σ} are collected by a depth-first search, whose reverse postorder is
 * a topological order of the flow (the matching is acyclic); then {@code ∂σ} is swept in that order,
 * each τ matched upward cancelled by subtracting {@code (a / [ν:τ]) ∂ν}, so that coefficients add up
 * over all paths at once. What is left on critical faces is the column of σ.
 *
 * <p>Coefficients are exact: longs with overflow detection, and a column whose arithmetic overflows
 * is swept again in BigInteger. Memory: for one σ, about {@code 12d + 40} bytes per face visited
 * (the chain, its table slot, its flow edges and its coefficient); a sweep that would visit more than
 * the limit stops with a message instead.
 */
final class LocalGradientSweep {
    private static final int CRITICAL = -1;
    private static final int DOWN = -2;

    private final ChainMatching matching;
    private final long visitLimit;
    private boolean forceBigInteger;

    LocalGradientSweep(ChainMatching matching, long visitLimit) {
        this.matching = matching;
        this.visitLimit = visitLimit;
    }

    /** Sweeps every column in BigInteger arithmetic, so tests can compare the two paths. */
    LocalGradientSweep inBigInteger() {
        forceBigInteger = true;
        return this;
    }

    /** The matrix of the Morse boundary from critical chains of dimension d to those of d - 1. */
    MorseMatrix boundary(CriticalChains critical, int d) {
        int rows = critical.count(d - 1);
        int columns = critical.count(d);
        if (rows == 0 || columns == 0) {
            return MorseMatrix.zero(rows, columns); // no entries can exist: zero for want of cells
        }
        ChainTable rowIndex = new ChainTable(d);
        int[] scratch = new int[d + 1];
        for (int k = 0; k < rows; k++) {
            critical.copy(d - 1, k, scratch);
            rowIndex.add(scratch);
        }
        int[] offsets = new int[columns + 1];
        IntArrayList rowList = new IntArrayList();
        LongArrayList valueList = new LongArrayList();
        List<BigInteger> bigList = new ArrayList<>();
        boolean anyBig = false;
        int[] sigma = new int[d + 1];
        for (int j = 0; j < columns; j++) {
            critical.copy(d, j, sigma);
            Flow flow = collect(sigma, d);
            Column column = null;
            if (!forceBigInteger) {
                try {
                    column = flow.sweepInLong(sigma, rowIndex);
                } catch (ArithmeticException overflow) {
                    column = null;
                }
            }
            if (column == null) {
                column = flow.sweepInBigInteger(sigma, rowIndex);
            }
            for (int e = 0; e < column.rows.length; e++) {
                rowList.add(column.rows[e]);
                BigInteger v = column.values[e];
                if (v.bitLength() < Long.SIZE) {
                    valueList.add(v.longValueExact());
                    bigList.add(null);
                } else {
                    valueList.add(0L);
                    bigList.add(v);
                    anyBig = true;
                }
            }
            offsets[j + 1] = rowList.size();
        }
        return new MorseMatrix(rows, offsets, rowList.toIntArray(), valueList.toLongArray(),
                anyBig ? bigList.toArray(new BigInteger[0]) : null);
    }

    /**
     * The lift {@code g(x)} of a chain x of critical chains of dimension d (each {@code d + 1}
     * internal ids ascending, with its coefficient) along the gradient flow: x plus the chains of
     * dimension d matched downward whose boundaries cancel every face of {@code ∂x} matched upward,
     * the faces settled in the topological order of one flow reached from all of {@code ∂x} (the
     * sweep above, for a sum of chains at once). Exact BigInteger coefficients; the same limit on the
     * chains visited.
     *
     * @return the chains of the lift, each {@code d + 1} ids, and their nonzero coefficients, in step
     */
    LiftedChain lift(List<int[]> chains, List<BigInteger> coefficients, int d) {
        ChainTable lifted = new ChainTable(d + 1);
        List<BigInteger> values = new ArrayList<>();
        for (int k = 0; k < chains.size(); k++) {
            int at = lifted.add(chains.get(k));
            while (values.size() <= at) {
                values.add(BigInteger.ZERO);
            }
            values.set(at, values.get(at).add(coefficients.get(k)));
        }
        if (d > 0) {
            Flow flow = new Flow(d);
            int[] face = new int[d];
            for (int[] sigma : chains) {
                for (int k = 0; k <= d; k++) {
                    remove(sigma, d + 1, k, face);
                    flow.reach(face);
                }
            }
            flow.liftInto(chains, coefficients, lifted, values);
        }
        List<int[]> out = new ArrayList<>();
        List<BigInteger> outValues = new ArrayList<>();
        for (int i = 0; i < values.size(); i++) {
            if (values.get(i).signum() != 0) {
                int[] chain = new int[d + 1];
                lifted.copy(i, chain);
                out.add(chain);
                outValues.add(values.get(i));
            }
        }
        return new LiftedChain(out, outValues);
    }

    /** A chain of Δ(P) given by its chains (internal ids) and their coefficients, in step. */
    record LiftedChain(List<int[]> chains, List<BigInteger> coefficients) {
    }

    /** The faces reachable from {@code ∂σ} and the flow between them, in a topological order. */
    private Flow collect(int[] sigma, int d) {
        Flow flow = new Flow(d);
        int[] face = new int[d];
        for (int k = 0; k <= d; k++) {
            remove(sigma, d + 1, k, face);
            flow.reach(face);
        }
        return flow;
    }

    /** {@code chain[0..length)} without its k-th element, into {@code out}. */
    private static void remove(int[] chain, int length, int k, int[] out) {
        System.arraycopy(chain, 0, out, 0, k);
        System.arraycopy(chain, k + 1, out, k, length - k - 1);
    }

    /** The faces of one sweep: their partners, flow edges and a topological order. */
    private final class Flow {
        private final int width;
        private final ChainTable faces;
        private final IntArrayList partner = new IntArrayList();
        private final IntArrayList insertAt = new IntArrayList();
        private final IntArrayList edgeStart = new IntArrayList();
        private final IntArrayList edgeTarget = new IntArrayList();
        private final IntArrayList edgeSign = new IntArrayList();
        private final IntArrayList order = new IntArrayList();
        private final IntArrayList finished = new IntArrayList();
        private final int[] scratch;
        private final int[] nu;

        Flow(int width) {
            this.width = width;
            this.faces = new ChainTable(width);
            this.scratch = new int[width];
            this.nu = new int[width + 1];
        }

        /** Adds {@code face} and, depth first, everything it flows to; postorder into {@code order}. */
        void reach(int[] face) {
            if (faces.find(face) >= 0) {
                return;
            }
            IntArrayList stack = new IntArrayList();
            IntArrayList next = new IntArrayList();
            stack.add(add(face));
            next.add(0);
            while (!stack.isEmpty()) {
                int top = stack.size() - 1;
                int u = stack.getInt(top);
                int e = next.getInt(top);
                if (partner.getInt(u) < 0 || e == edgeCount(u)) {
                    order.add(u);
                    finished.set(u, 1);
                    stack.removeInt(top);
                    next.removeInt(top);
                    continue;
                }
                next.set(top, e + 1);
                int v = edgeTarget.getInt(edgeStart.getInt(u) + e);
                if (v < 0) {
                    v = discover(u, e);
                    if (v >= 0) {
                        stack.add(v);
                        next.add(0);
                    }
                }
            }
        }

        private int edgeCount(int u) {
            return partner.getInt(u) < 0 ? 0 : width;
        }

        /** Looks up the e-th other face of u's partner; returns it if it is new, else -1. */
        private int discover(int u, int e) {
            partnerOf(u, nu);
            int q = insertAt.getInt(u);
            int k = e < q ? e : e + 1; // the faces of ν other than τ = ν minus its q-th element
            remove(nu, width + 1, k, scratch);
            int slot = edgeStart.getInt(u) + e;
            edgeSign.set(slot, (k & 1) == 0 ? 1 : -1);
            int known = faces.find(scratch);
            if (known >= 0) {
                if (finished.getInt(known) == 0) {
                    // a face still on the search path: the flow would close a cycle
                    throw new IllegalStateException("the matching has a closed gradient path");
                }
                edgeTarget.set(slot, known);
                return -1;
            }
            int v = add(scratch);
            edgeTarget.set(slot, v);
            return v;
        }

        private int add(int[] face) {
            if (faces.size() >= visitLimit) {
                throw new IllegalStateException("following the gradient paths from one critical chain of dimension "
                        + width + " visits more than " + visitLimit + " chains");
            }
            int u = faces.add(face);
            int p = matching.partner(face, width);
            int q = 0;
            if (p == ChainMatching.CRITICAL) {
                partner.add(CRITICAL);
            } else if (Arrays.stream(face, 0, width).anyMatch(x -> x == p)) {
                partner.add(DOWN);
            } else {
                while (q < width && face[q] < p) {
                    q++;
                }
                partner.add(p);
            }
            insertAt.add(q);
            finished.add(0);
            edgeStart.add(edgeTarget.size());
            if (p >= 0 && partner.getInt(u) >= 0) {
                for (int e = 0; e < width; e++) {
                    edgeTarget.add(-1);
                    edgeSign.add(0);
                }
            }
            return u;
        }

        /** ν = τ_u with its partner element inserted. */
        private void partnerOf(int u, int[] out) {
            faces.copy(u, scratch);
            int q = insertAt.getInt(u);
            System.arraycopy(scratch, 0, out, 0, q);
            out[q] = partner.getInt(u);
            System.arraycopy(scratch, q, out, q + 1, width - q);
        }

        Column sweepInLong(int[] sigma, ChainTable rowIndex) {
            long[] a = new long[faces.size()];
            int[] face = new int[width];
            for (int k = 0; k <= width; k++) {
                remove(sigma, width + 1, k, face);
                int u = faces.find(face);
                a[u] = Math.addExact(a[u], (k & 1) == 0 ? 1 : -1);
            }
            for (int i = order.size() - 1; i >= 0; i--) {
                int u = order.getInt(i);
                if (partner.getInt(u) < 0 || a[u] == 0) {
                    continue;
                }
                long w = (insertAt.getInt(u) & 1) == 0 ? 1 : -1; // [ν : τ]
                long factor = Math.negateExact(Math.multiplyExact(a[u], w)); // a / w = a·w for a unit w
                int start = edgeStart.getInt(u);
                for (int e = 0; e < width; e++) {
                    int v = edgeTarget.getInt(start + e);
                    a[v] = Math.addExact(a[v], Math.multiplyExact(factor, edgeSign.getInt(start + e)));
                }
                a[u] = 0;
            }
            BigInteger[] values = new BigInteger[a.length];
            for (int u = 0; u < a.length; u++) {
                values[u] = BigInteger.valueOf(a[u]);
            }
            return column(values, rowIndex);
        }

        /** Sweeps {@code ∂x} and adds each partner used, with its coefficient, to {@code lifted}. */
        void liftInto(List<int[]> chains, List<BigInteger> coefficients, ChainTable lifted, List<BigInteger> values) {
            BigInteger[] a = new BigInteger[faces.size()];
            Arrays.fill(a, BigInteger.ZERO);
            int[] face = new int[width];
            for (int c = 0; c < chains.size(); c++) {
                for (int k = 0; k <= width; k++) {
                    remove(chains.get(c), width + 1, k, face);
                    int u = faces.find(face);
                    a[u] = (k & 1) == 0 ? a[u].add(coefficients.get(c)) : a[u].subtract(coefficients.get(c));
                }
            }
            for (int i = order.size() - 1; i >= 0; i--) {
                int u = order.getInt(i);
                if (partner.getInt(u) < 0 || a[u].signum() == 0) {
                    continue;
                }
                BigInteger factor = (insertAt.getInt(u) & 1) == 0 ? a[u].negate() : a[u];
                partnerOf(u, nu);
                int at = lifted.add(nu);
                while (values.size() <= at) {
                    values.add(BigInteger.ZERO);
                }
                values.set(at, values.get(at).add(factor));
                int start = edgeStart.getInt(u);
                for (int e = 0; e < width; e++) {
                    int v = edgeTarget.getInt(start + e);
                    a[v] = edgeSign.getInt(start + e) > 0 ? a[v].add(factor) : a[v].subtract(factor);
                }
                a[u] = BigInteger.ZERO;
            }
        }

        Column sweepInBigInteger(int[] sigma, ChainTable rowIndex) {
            BigInteger[] a = new BigInteger[faces.size()];
            Arrays.fill(a, BigInteger.ZERO);
            int[] face = new int[width];
            for (int k = 0; k <= width; k++) {
                remove(sigma, width + 1, k, face);
                int u = faces.find(face);
                a[u] = a[u].add(BigInteger.valueOf((k & 1) == 0 ? 1 : -1));
            }
            for (int i = order.size() - 1; i >= 0; i--) {
                int u = order.getInt(i);
                if (partner.getInt(u) < 0 || a[u].signum() == 0) {
                    continue;
                }
                BigInteger factor = (insertAt.getInt(u) & 1) == 0 ? a[u].negate() : a[u];
                int start = edgeStart.getInt(u);
                for (int e = 0; e < width; e++) {
                    int v = edgeTarget.getInt(start + e);
                    a[v] = edgeSign.getInt(start + e) > 0 ? a[v].add(factor) : a[v].subtract(factor);
                }
                a[u] = BigInteger.ZERO;
            }
            return column(a, rowIndex);
        }

        /** The entries on critical faces, by ascending row. */
        private Column column(BigInteger[] a, ChainTable rowIndex) {
            IntArrayList rows = new IntArrayList();
            List<BigInteger> values = new ArrayList<>();
            int[] face = new int[width];
            for (int u = 0; u < a.length; u++) {
                if (partner.getInt(u) == CRITICAL && a[u].signum() != 0) {
                    faces.copy(u, face);
                    int row = rowIndex.find(face);
                    if (row < 0) {
                        throw new IllegalStateException("a critical face is missing from the critical chains");
                    }
                    rows.add(row);
                    values.add(a[u]);
                }
            }
            Integer[] byRow = new Integer[rows.size()];
            for (int i = 0; i < byRow.length; i++) {
                byRow[i] = i;
            }
            Arrays.sort(byRow, (x, y) -> Integer.compare(rows.getInt(x), rows.getInt(y)));
            int[] sortedRows = new int[byRow.length];
            BigInteger[] sortedValues = new BigInteger[byRow.length];
            for (int i = 0; i < byRow.length; i++) {
                sortedRows[i] = rows.getInt(byRow[i]);
                sortedValues[i] = values.get(byRow[i]);
            }
            return new Column(sortedRows, sortedValues);
        }
    }

    /** One column of the Morse boundary. */
    private record Column(int[] rows, BigInteger[] values) {
    }
}
