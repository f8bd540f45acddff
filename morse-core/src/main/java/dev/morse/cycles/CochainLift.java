package dev.morse.cycles;

import dev.morse.complex.Boundary;
import dev.morse.complex.ChainComplex;
import dev.morse.matching.Matching;
import it.unimi.dsi.fastutil.ints.Int2ObjectOpenHashMap;
import it.unimi.dsi.fastutil.ints.IntArrayFIFOQueue;
import it.unimi.dsi.fastutil.ints.IntHeapPriorityQueue;
import it.unimi.dsi.fastutil.ints.IntOpenHashSet;
import java.math.BigInteger;

/**
 * The dual of {@link FlowLift}: a cochain of the Morse complex (values on the critical cells of
 * dimension d) lifted to a cochain φ of the complex whose coboundary vanishes on every cell of
 * dimension d + 1 matched downward. Cells of dimension d matched upward get the values that cancel
 * the coboundary on their partners, taken in a topological order of the reversed gradient flow, so
 * that each is settled once. This is the cochain map dual to the flow (Forman 1998, §8, the Morse
 * cochain complex; Sköldberg 2006): a cocycle of the Morse complex (over Z or modulo t) lifts to a
 * cocycle of the complex, with the same values on chains of critical and downward-matched cells, so
 * {@code φ(g(x)) = ψ(x)}. Used only to produce certificates; the verifier checks them on its own.
 * Not thread-safe; keeps the order of each dimension once computed.
 */
final class CochainLift {
    private final ChainComplex complex;
    private final Matching matching;
    private final Boundary coboundary;
    private final java.util.Map<Integer, Order> orders = new java.util.HashMap<>();

    CochainLift(ChainComplex complex, Matching matching) {
        this.complex = complex;
        this.matching = matching;
        this.coboundary = complex.coboundary();
    }

    /**
     * The lift of the cochain {@code psi} on the critical cells {@code critical} of dimension d,
     * reduced modulo {@code modulus} when it is positive (0: exact).
     */
    Int2ObjectOpenHashMap<BigInteger> lift(int[] critical, BigInteger[] psi, int d, BigInteger modulus) {
        Int2ObjectOpenHashMap<BigInteger> phi = new Int2ObjectOpenHashMap<>();
        Int2ObjectOpenHashMap<BigInteger> values = new Int2ObjectOpenHashMap<>();
        for (int i = 0; i < critical.length; i++) {
            BigInteger v = reduce(psi[i], modulus);
            if (v.signum() != 0) {
                phi.put(critical[i], v);
                addCoboundary(values, critical[i], v);
            }
        }
        if (d >= complex.dimension()) {
            return phi;
        }
        Order order = orders.computeIfAbsent(d + 1, this::coflowOrder);
        // only the cells reached are visited, in the order of the flow: a heap of their places in it
        IntHeapPriorityQueue pending = new IntHeapPriorityQueue();
        IntOpenHashSet queued = new IntOpenHashSet();
        for (int sigma : values.keySet()) {
            enqueue(order, sigma, pending, queued);
        }
        while (!pending.isEmpty()) {
            int sigma = order.cells[pending.dequeueInt()];
            BigInteger a = values.get(sigma);
            if (a == null || reduce(a, modulus).signum() == 0) {
                continue;
            }
            int tau = matching.mate(sigma);
            BigInteger w = BigInteger.valueOf(coboundary.coefficient(tau, sigma)); // ±1, checked by the verifier
            BigInteger b = reduce(a.multiply(w).negate(), modulus);
            phi.merge(tau, b, BigInteger::add);
            addCoboundary(values, tau, b);
            for (int i = coboundary.start(tau); i < coboundary.end(tau); i++) {
                enqueue(order, coboundary.target(i), pending, queued);
            }
        }
        phi.int2ObjectEntrySet().removeIf(e -> reduce(e.getValue(), modulus).signum() == 0);
        return phi;
    }

    private void enqueue(Order order, int cell, IntHeapPriorityQueue pending, IntOpenHashSet queued) {
        int at = order.place[cell - order.first];
        if (at >= 0 && queued.add(cell)) {
            pending.enqueue(at);
        }
    }

    /** The cells matched downward in flow order, and the place of each cell of the dimension in it (-1 if none). */
    private record Order(int first, int[] cells, int[] place) {
    }

    private static BigInteger reduce(BigInteger a, BigInteger modulus) {
        return modulus.signum() > 0 ? a.mod(modulus) : a;
    }

    private void addCoboundary(Int2ObjectOpenHashMap<BigInteger> values, int cell, BigInteger factor) {
        for (int i = coboundary.start(cell); i < coboundary.end(cell); i++) {
            values.merge(coboundary.target(i), factor.multiply(BigInteger.valueOf(coboundary.coefficient(i))),
                    BigInteger::add);
        }
    }

    /**
     * The cells of dimension {@code d} matched downward, each after every such cell whose partner is
     * one of its faces (Kahn's algorithm; a closed path here is a closed gradient path reversed).
     */
    private Order coflowOrder(int d) {
        int first = complex.firstCell(d);
        int count = complex.cellCount(d);
        int[] indegree = new int[count];
        int matched = 0;
        for (int s = first; s < first + count; s++) {
            if (isMatchedDown(s)) {
                matched++;
                int tau = matching.mate(s);
                for (int i = coboundary.start(tau); i < coboundary.end(tau); i++) {
                    int f = coboundary.target(i);
                    if (f != s && isMatchedDown(f)) {
                        indegree[f - first]++;
                    }
                }
            }
        }
        IntArrayFIFOQueue ready = new IntArrayFIFOQueue();
        for (int s = first; s < first + count; s++) {
            if (isMatchedDown(s) && indegree[s - first] == 0) {
                ready.enqueue(s);
            }
        }
        int[] order = new int[matched];
        int k = 0;
        while (!ready.isEmpty()) {
            int s = ready.dequeueInt();
            order[k++] = s;
            int tau = matching.mate(s);
            for (int i = coboundary.start(tau); i < coboundary.end(tau); i++) {
                int f = coboundary.target(i);
                if (f != s && isMatchedDown(f) && --indegree[f - first] == 0) {
                    ready.enqueue(f);
                }
            }
        }
        if (k != matched) {
            throw new IllegalStateException("the reversed gradient flow has a closed path: the matching is not acyclic");
        }
        int[] place = new int[count];
        java.util.Arrays.fill(place, -1);
        for (int i = 0; i < order.length; i++) {
            place[order[i] - first] = i;
        }
        return new Order(first, order, place);
    }

    private boolean isMatchedDown(int cell) {
        int mate = matching.mate(cell);
        return mate != Matching.CRITICAL && complex.dimensionOf(mate) == complex.dimensionOf(cell) - 1;
    }
}
