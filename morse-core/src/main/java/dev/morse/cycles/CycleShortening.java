package dev.morse.cycles;

import dev.morse.complex.Boundary;
import dev.morse.complex.ChainComplex;
import it.unimi.dsi.fastutil.ints.Int2ObjectOpenHashMap;
import it.unimi.dsi.fastutil.ints.IntArrayFIFOQueue;
import it.unimi.dsi.fastutil.ints.IntOpenHashSet;
import java.math.BigInteger;

/**
 * Shortens a cycle within its homology class by a greedy local search: for a (d+1)-cell c with a
 * face on the cycle z, and a multiple λ that cancels the coefficient of one of those faces, the move
 * {@code z ← z + λ∂c} is made when it removes more terms than it adds; cells touching a changed face
 * are looked at again, until no move shortens z. Each move lowers the number of terms, so at most
 * that many moves are made, each costing the faces of one cell. The class of z is unchanged (z
 * changes by a boundary), and so is its pairing with every cocycle; for a torsion generator over Z
 * of order t the chain y with ∂y = t z becomes {@code y + tλc}. A shortest representative is hard to
 * find in general (Chen and Freedman, "Hardness results for homology localization", Discrete and
 * Computational Geometry 45, 2011; from memory); this greedy descent is the usual cheap substitute
 * (common practice) and gives no guarantee of optimality. Coefficients are integers, or residues
 * modulo p over Z/p; over Z and Q only moves with an integer λ are made.
 */
final class CycleShortening {
    private final ChainComplex complex;
    private final Boundary boundary;
    private final Boundary coboundary;
    private final BigInteger prime;

    /** Shortens over the integers ({@code prime} 0) or modulo {@code prime}. */
    CycleShortening(ChainComplex complex, int prime) {
        this.complex = complex;
        this.boundary = complex.boundary();
        this.coboundary = complex.coboundary();
        this.prime = BigInteger.valueOf(prime);
    }

    /** The certificate with its cycle shortened (and its preimage kept in step). */
    Certificate shorten(Certificate c) {
        int d = c.dimension();
        if (d >= complex.dimension() || c.chain().isEmpty()) {
            return c;
        }
        Int2ObjectOpenHashMap<BigInteger> z = normalised(c.chain());
        Int2ObjectOpenHashMap<BigInteger> y = c.preimage() == null ? null : new Int2ObjectOpenHashMap<>(c.preimage());
        IntArrayFIFOQueue pending = new IntArrayFIFOQueue();
        IntOpenHashSet queued = new IntOpenHashSet();
        for (int f : z.keySet()) {
            enqueueCofaces(f, pending, queued);
        }
        while (!pending.isEmpty()) {
            int cell = pending.dequeueInt();
            queued.remove(cell);
            BigInteger lambda = bestMultiple(z, cell);
            if (lambda == null) {
                continue;
            }
            for (int i = boundary.start(cell); i < boundary.end(cell); i++) {
                int f = boundary.target(i);
                BigInteger v = reduce(z.getOrDefault(f, BigInteger.ZERO)
                        .add(lambda.multiply(BigInteger.valueOf(boundary.coefficient(i)))));
                if (v.signum() == 0) {
                    z.remove(f);
                } else {
                    z.put(f, v);
                }
                enqueueCofaces(f, pending, queued);
            }
            if (y != null) {
                BigInteger v = y.getOrDefault(cell, BigInteger.ZERO).add(lambda.multiply(c.order()));
                if (v.signum() == 0) {
                    y.remove(cell);
                } else {
                    y.put(cell, v);
                }
            }
        }
        return new Certificate(d, c.order(), z, y, c.cocycle(), c.lifted());
    }

    /** The multiple of ∂cell that lowers the number of terms the most, or null when none lowers it. */
    private BigInteger bestMultiple(Int2ObjectOpenHashMap<BigInteger> z, int cell) {
        BigInteger best = null;
        int bestGain = 0;
        for (int i = boundary.start(cell); i < boundary.end(cell); i++) {
            BigInteger a = z.get(boundary.target(i));
            if (a == null) {
                continue;
            }
            BigInteger w = BigInteger.valueOf(boundary.coefficient(i));
            BigInteger lambda;
            if (prime.signum() > 0) {
                lambda = a.negate().multiply(w.modInverse(prime)).mod(prime);
            } else {
                BigInteger[] qr = a.negate().divideAndRemainder(w);
                if (qr[1].signum() != 0) {
                    continue;
                }
                lambda = qr[0];
            }
            int gain = gain(z, cell, lambda);
            if (gain > bestGain) {
                bestGain = gain;
                best = lambda;
            }
        }
        return best;
    }

    /** Terms removed minus terms added by {@code z + λ∂cell}. */
    private int gain(Int2ObjectOpenHashMap<BigInteger> z, int cell, BigInteger lambda) {
        int gain = 0;
        for (int i = boundary.start(cell); i < boundary.end(cell); i++) {
            BigInteger a = z.get(boundary.target(i));
            BigInteger after = reduce((a == null ? BigInteger.ZERO : a)
                    .add(lambda.multiply(BigInteger.valueOf(boundary.coefficient(i)))));
            if (a != null && after.signum() == 0) {
                gain++;
            } else if (a == null && after.signum() != 0) {
                gain--;
            }
        }
        return gain;
    }

    private void enqueueCofaces(int face, IntArrayFIFOQueue pending, IntOpenHashSet queued) {
        for (int i = coboundary.start(face); i < coboundary.end(face); i++) {
            int c = coboundary.target(i);
            if (queued.add(c)) {
                pending.enqueue(c);
            }
        }
    }

    private Int2ObjectOpenHashMap<BigInteger> normalised(Int2ObjectOpenHashMap<BigInteger> chain) {
        Int2ObjectOpenHashMap<BigInteger> z = new Int2ObjectOpenHashMap<>();
        chain.int2ObjectEntrySet().forEach(e -> {
            BigInteger v = reduce(e.getValue());
            if (v.signum() != 0) {
                z.put(e.getIntKey(), v);
            }
        });
        return z;
    }

    private BigInteger reduce(BigInteger a) {
        return prime.signum() > 0 ? a.mod(prime) : a;
    }
}
