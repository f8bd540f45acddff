package dev.morse.cycles;

import dev.morse.complex.Boundary;
import dev.morse.complex.ChainComplex;
import dev.morse.matching.Matching;
import it.unimi.dsi.fastutil.ints.Int2ObjectOpenHashMap;
import it.unimi.dsi.fastutil.ints.IntHeapPriorityQueue;
import it.unimi.dsi.fastutil.ints.IntOpenHashSet;
import java.math.BigInteger;
import java.util.HashMap;
import java.util.Map;

/**
 * The way back from the Morse complex of an acyclic matching to the complex itself, for chains
 * along the gradient flow and for cochains along the reversed flow.
 *
 * <p>{@link #chain}: the chain map g with {@code g(c) = c + Σ b_ν ν} over the cells ν of dimension d
 * matched downward, chosen so that {@code ∂g(c)} has no face matched upward (Sköldberg, "Morse
 * theory from an algebraic viewpoint", Trans. AMS 2006; Forman 1998, the flow Φ^∞). A face τ
 * matched upward with ν is cancelled by adding {@code -a/[ν:τ] ν}, the faces taken in a topological
 * order of the gradient flow so that each is settled once. Since g is a chain map, a cycle of the
 * Morse complex lifts to a cycle.
 *
 * <p>{@link #cochain}, the dual: a cochain of the Morse complex (values on the critical cells of
 * dimension d) lifted to a cochain φ of the complex whose coboundary vanishes on every cell of
 * dimension d + 1 matched downward. Cells of dimension d matched upward get the values that cancel
 * the coboundary on their partners, taken in a topological order of the reversed gradient flow, so
 * that each is settled once. This is the cochain map dual to the flow (Forman 1998, §8, the Morse
 * cochain complex; Sköldberg 2006): a cocycle of the Morse complex (over Z or modulo t) lifts to a
 * cocycle of the complex, with the same values on chains of critical and downward-matched cells, so
 * {@code φ(g(x)) = ψ(x)}. Used only to produce certificates; the verifier checks them on its own.
 *
 * <p>Exact BigInteger coefficients. Keeps the flow order of each dimension once computed; not
 * thread-safe.
 */
final class FlowLift {
    private final ChainComplex complex;
    private final Matching matching;
    private final Boundary boundary;
    private final Boundary coboundary;
    private final Map<Integer, FlowOrder> flow = new HashMap<>();
    private final Map<Integer, FlowOrder> reversedFlow = new HashMap<>();

    FlowLift(ChainComplex complex, Matching matching) {
        this.complex = complex;
        this.matching = matching;
        this.boundary = complex.boundary();
        this.coboundary = complex.coboundary();
    }

    /** {@code g(x)} for a chain x of dimension d given on its cells. */
    Int2ObjectOpenHashMap<BigInteger> chain(Int2ObjectOpenHashMap<BigInteger> chain, int d) {
        Int2ObjectOpenHashMap<BigInteger> lifted = new Int2ObjectOpenHashMap<>(chain);
        if (d == 0) {
            return lifted;
        }
        Int2ObjectOpenHashMap<BigInteger> faces = new Int2ObjectOpenHashMap<>();
        for (var e : chain.int2ObjectEntrySet()) {
            addStep(boundary, faces, e.getIntKey(), e.getValue());
        }
        FlowOrder order = flow.computeIfAbsent(d - 1, k -> FlowOrder.of(complex, matching, k, true));
        settle(order, boundary, faces, lifted, BigInteger.ZERO);
        return lifted;
    }

    /**
     * The lift of the cochain {@code psi} on the critical cells {@code critical} of dimension d,
     * reduced modulo {@code modulus} when it is positive (0: exact).
     */
    Int2ObjectOpenHashMap<BigInteger> cochain(int[] critical, BigInteger[] psi, int d, BigInteger modulus) {
        Int2ObjectOpenHashMap<BigInteger> phi = new Int2ObjectOpenHashMap<>();
        Int2ObjectOpenHashMap<BigInteger> values = new Int2ObjectOpenHashMap<>();
        for (int i = 0; i < critical.length; i++) {
            BigInteger v = reduce(psi[i], modulus);
            if (v.signum() != 0) {
                phi.put(critical[i], v);
                addStep(coboundary, values, critical[i], v);
            }
        }
        if (d >= complex.dimension()) {
            return phi;
        }
        FlowOrder order = reversedFlow.computeIfAbsent(d + 1, k -> FlowOrder.of(complex, matching, k, false));
        settle(order, coboundary, values, phi, modulus);
        return phi;
    }

    /**
     * Settles, in the flow order {@code order}, every cell that {@code pending} holds a value a for
     * (nonzero modulo {@code modulus}): adds {@code -a·[mate:cell] mate} to {@code lifted} and its
     * {@code step} to {@code pending}; then drops the terms of {@code lifted} that vanish.
     */
    private void settle(FlowOrder order, Boundary step, Int2ObjectOpenHashMap<BigInteger> pending,
            Int2ObjectOpenHashMap<BigInteger> lifted, BigInteger modulus) {
        // only the cells reached are visited, in the order of the flow: a heap of their places in it
        IntHeapPriorityQueue places = new IntHeapPriorityQueue();
        IntOpenHashSet queued = new IntOpenHashSet();
        for (int cell : pending.keySet()) {
            order.enqueue(cell, places, queued);
        }
        while (!places.isEmpty()) {
            int cell = order.cells()[places.dequeueInt()];
            BigInteger a = pending.get(cell);
            if (a == null || reduce(a, modulus).signum() == 0) {
                continue;
            }
            int mate = matching.mate(cell);
            BigInteger w = BigInteger.valueOf(step.coefficient(mate, cell)); // ±1, checked by the verifier
            BigInteger b = reduce(a.multiply(w).negate(), modulus);
            lifted.merge(mate, b, BigInteger::add);
            addStep(step, pending, mate, b);
            for (int i = step.start(mate); i < step.end(mate); i++) {
                order.enqueue(step.target(i), places, queued);
            }
        }
        lifted.int2ObjectEntrySet().removeIf(e -> reduce(e.getValue(), modulus).signum() == 0);
    }

    private static BigInteger reduce(BigInteger a, BigInteger modulus) {
        return modulus.signum() > 0 ? a.mod(modulus) : a;
    }

    private static void addStep(Boundary step, Int2ObjectOpenHashMap<BigInteger> values, int cell, BigInteger factor) {
        for (int i = step.start(cell); i < step.end(cell); i++) {
            values.merge(step.target(i), factor.multiply(BigInteger.valueOf(step.coefficient(i))), BigInteger::add);
        }
    }
}
