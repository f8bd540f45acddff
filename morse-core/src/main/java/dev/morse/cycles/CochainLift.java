package dev.morse.cycles;

import dev.morse.complex.Boundary;
import dev.morse.complex.ChainComplex;
import dev.morse.matching.Matching;
import it.unimi.dsi.fastutil.ints.Int2ObjectOpenHashMap;
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
    private final java.util.Map<Integer, FlowOrder> orders = new java.util.HashMap<>();

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
        FlowOrder order = orders.computeIfAbsent(d + 1, k -> FlowOrder.of(complex, matching, k, false));
        // only the cells reached are visited, in the order of the flow: a heap of their places in it
        IntHeapPriorityQueue pending = new IntHeapPriorityQueue();
        IntOpenHashSet queued = new IntOpenHashSet();
        for (int sigma : values.keySet()) {
            order.enqueue(sigma, pending, queued);
        }
        while (!pending.isEmpty()) {
            int sigma = order.cells()[pending.dequeueInt()];
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
                order.enqueue(coboundary.target(i), pending, queued);
            }
        }
        phi.int2ObjectEntrySet().removeIf(e -> reduce(e.getValue(), modulus).signum() == 0);
        return phi;
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
}
