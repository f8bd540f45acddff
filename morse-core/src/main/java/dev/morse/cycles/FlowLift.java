package dev.morse.cycles;

import dev.morse.complex.Boundary;
import dev.morse.complex.ChainComplex;
import dev.morse.matching.Matching;
import it.unimi.dsi.fastutil.ints.Int2ObjectOpenHashMap;
import it.unimi.dsi.fastutil.ints.IntHeapPriorityQueue;
import it.unimi.dsi.fastutil.ints.IntOpenHashSet;
import java.math.BigInteger;

/**
 * The way back from the Morse complex of an acyclic matching to the complex itself: the chain map
 * g with {@code g(c) = c + Σ b_ν ν} over the cells ν of dimension d matched downward, chosen so that
 * {@code ∂g(c)} has no face matched upward (Sköldberg, "Morse theory from an algebraic viewpoint",
 * Trans. AMS 2006; Forman 1998, the flow Φ^∞). A face τ matched upward with ν is cancelled by adding
 * {@code -a/[ν:τ] ν}, the faces taken in a topological order of the gradient flow so that each is
 * settled once. Since g is a chain map, a cycle of the Morse complex lifts to a cycle. Exact
 * BigInteger coefficients. Keeps the flow order of each dimension once computed; not thread-safe.
 */
final class FlowLift {
    private final ChainComplex complex;
    private final Matching matching;
    private final Boundary boundary;
    private final java.util.Map<Integer, FlowOrder> orders = new java.util.HashMap<>();

    FlowLift(ChainComplex complex, Matching matching) {
        this.complex = complex;
        this.matching = matching;
        this.boundary = complex.boundary();
    }

    /** {@code g(x)} for a chain x of dimension d given on its cells. */
    Int2ObjectOpenHashMap<BigInteger> lift(Int2ObjectOpenHashMap<BigInteger> chain, int d) {
        Int2ObjectOpenHashMap<BigInteger> lifted = new Int2ObjectOpenHashMap<>(chain);
        if (d == 0) {
            return lifted;
        }
        Int2ObjectOpenHashMap<BigInteger> faces = new Int2ObjectOpenHashMap<>();
        for (var e : chain.int2ObjectEntrySet()) {
            addBoundary(faces, e.getIntKey(), e.getValue());
        }
        FlowOrder order = orders.computeIfAbsent(d - 1, k -> FlowOrder.of(complex, matching, k, true));
        // only the faces reached are visited, in the order of the flow: a heap of their places in it
        IntHeapPriorityQueue pending = new IntHeapPriorityQueue();
        IntOpenHashSet queued = new IntOpenHashSet();
        for (int tau : faces.keySet()) {
            order.enqueue(tau, pending, queued);
        }
        while (!pending.isEmpty()) {
            int tau = order.cells()[pending.dequeueInt()];
            BigInteger a = faces.get(tau);
            if (a == null || a.signum() == 0) {
                continue;
            }
            int nu = matching.mate(tau);
            BigInteger w = BigInteger.valueOf(boundary.coefficient(nu, tau)); // ±1, checked by the verifier
            BigInteger b = a.multiply(w).negate();
            lifted.merge(nu, b, BigInteger::add);
            addBoundary(faces, nu, b);
            for (int i = boundary.start(nu); i < boundary.end(nu); i++) {
                order.enqueue(boundary.target(i), pending, queued);
            }
        }
        lifted.int2ObjectEntrySet().removeIf(e -> e.getValue().signum() == 0);
        return lifted;
    }

    private void addBoundary(Int2ObjectOpenHashMap<BigInteger> faces, int cell, BigInteger factor) {
        for (int i = boundary.start(cell); i < boundary.end(cell); i++) {
            faces.merge(boundary.target(i), factor.multiply(BigInteger.valueOf(boundary.coefficient(i))),
                    BigInteger::add);
        }
    }
}
