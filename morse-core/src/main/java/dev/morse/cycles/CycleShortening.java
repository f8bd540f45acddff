package dev.morse.cycles;

import dev.morse.complex.Boundary;
import dev.morse.complex.ChainComplex;
import it.unimi.dsi.fastutil.ints.Int2ObjectOpenHashMap;
import it.unimi.dsi.fastutil.ints.IntArrayFIFOQueue;
import it.unimi.dsi.fastutil.ints.IntOpenHashSet;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;

/**
 * Shortens a cycle within its homology class by a greedy local search: for a (d+1)-cell c with a
 * face on the cycle z, and a multiple λ that cancels the coefficient of one of those faces, the move
 * {@code z ← z + λ∂c} is made when it removes more terms than it adds, or as many, with a smaller
 * sum of absolute values of the coefficients (modulo p, of the residues nearest 0); a move that
 * raises that sum is never made, so that terms are not traded for large coefficients. Cells
 * touching a changed face are looked at again, until no move is left. Both measures only fall, so
 * at most their sum many moves are made, each costing the faces of one cell. The class of z is
 * unchanged (z changes by a boundary), and so is its pairing with every cocycle; for a torsion
 * generator over Z of order t the chain y with ∂y = t z becomes {@code y + tλc}. A shortest
 * representative is hard to find in general (Chen and Freedman, "Hardness results for homology
 * localization", Discrete and Computational Geometry 45, 2011; from memory); this greedy descent
 * is the usual cheap substitute (common practice) and promises no optimum. Coefficients are
 * integers, or residues modulo p over Z/p; over Z and Q only moves with an integer λ are made.
 *
 * <p>Then the free generators of each dimension (at most {@value #BASIS_LIMIT} of them) are
 * shortened as a basis: z_i is replaced by the shortened {@code z_i ± z_j} when that lowers one
 * measure and raises neither. It is an elementary change of basis, and its inverse transpose
 * {@code φ_j ∓ φ_i} keeps the cocycles dual. Repeated until no replacement is left. Where one
 * generator goes round two holes and another round one of them, this leaves one round each.
 */
final class CycleShortening {
    /** The most free generators of one dimension shortened as a basis (pairs are tried, so quadratic). */
    static final int BASIS_LIMIT = 64;

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

    /** Each certificate shortened, then the free generators of each dimension shortened as a basis. */
    List<Certificate> shortenAll(List<Certificate> certificates) {
        List<Certificate> out = new ArrayList<>(certificates.stream().map(this::shorten).toList());
        for (int d = 0; d <= complex.dimension(); d++) {
            List<Integer> free = new ArrayList<>();
            for (int i = 0; i < out.size(); i++) {
                if (out.get(i).dimension() == d && out.get(i).order().signum() == 0) {
                    free.add(i);
                }
            }
            if (free.size() > 1 && free.size() <= BASIS_LIMIT) {
                shortenBasis(out, free);
            }
        }
        return out;
    }

    private void shortenBasis(List<Certificate> out, List<Integer> free) {
        boolean improved = true;
        while (improved) {
            improved = false;
            for (int i : free) {
                for (int j : free) {
                    if (i == j) {
                        continue;
                    }
                    for (BigInteger sign : List.of(BigInteger.ONE, BigInteger.ONE.negate())) {
                        Certificate zi = out.get(i);
                        Certificate zj = out.get(j);
                        Int2ObjectOpenHashMap<BigInteger> sum = new Int2ObjectOpenHashMap<>(zi.chain());
                        zj.chain().int2ObjectEntrySet().forEach(e -> sum.merge(e.getIntKey(),
                                e.getValue().multiply(sign), BigInteger::add));
                        Certificate candidate = shorten(new Certificate(zi.dimension(), zi.order(), sum, null,
                                zi.cocycle(), zi.lifted()));
                        int terms = Integer.compare(zi.chain().size(), candidate.chain().size());
                        int weight = Long.compare(weight(zi.chain()), weight(candidate.chain()));
                        if (terms >= 0 && weight >= 0 && terms + weight > 0) {
                            Int2ObjectOpenHashMap<BigInteger> dual = new Int2ObjectOpenHashMap<>(zj.cocycle());
                            zi.cocycle().int2ObjectEntrySet().forEach(e -> dual.merge(e.getIntKey(),
                                    e.getValue().multiply(sign).negate(), BigInteger::add));
                            dual.int2ObjectEntrySet().removeIf(e -> reduce(e.getValue()).signum() == 0);
                            out.set(i, candidate);
                            out.set(j, new Certificate(zj.dimension(), zj.order(), zj.chain(), zj.preimage(), dual,
                                    zj.lifted()));
                            improved = true;
                        }
                    }
                }
            }
        }
    }

    /**
     * The multiple of ∂cell that lowers the number of terms the most without raising the sum of the
     * absolute values of the coefficients (or lowers that sum at an equal number of terms), or null
     * when none does.
     */
    private BigInteger bestMultiple(Int2ObjectOpenHashMap<BigInteger> z, int cell) {
        BigInteger best = null;
        long[] bestGain = {0, 0};
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
            long[] gain = gain(z, cell, lambda);
            if (gain[0] >= 0 && gain[1] >= 0 && (gain[0] > bestGain[0]
                    || gain[0] == bestGain[0] && gain[1] > bestGain[1])) {
                bestGain = gain;
                best = lambda;
            }
        }
        return best;
    }

    /** Terms removed minus terms added by {@code z + λ∂cell}, and the fall in the sum of absolute values. */
    private long[] gain(Int2ObjectOpenHashMap<BigInteger> z, int cell, BigInteger lambda) {
        long terms = 0;
        long weight = 0;
        for (int i = boundary.start(cell); i < boundary.end(cell); i++) {
            BigInteger a = z.get(boundary.target(i));
            BigInteger after = reduce((a == null ? BigInteger.ZERO : a)
                    .add(lambda.multiply(BigInteger.valueOf(boundary.coefficient(i)))));
            if (a != null && after.signum() == 0) {
                terms++;
            } else if (a == null && after.signum() != 0) {
                terms--;
            }
            weight += magnitude(a == null ? BigInteger.ZERO : a) - magnitude(after);
        }
        return new long[] {terms, weight};
    }

    /** |a|, or modulo p the distance of a to 0 (so that p - 1 weighs as -1). */
    private long magnitude(BigInteger a) {
        BigInteger m = prime.signum() > 0 ? a.mod(prime).min(prime.subtract(a.mod(prime))) : a.abs();
        return m.bitLength() < 62 ? m.longValue() : Long.MAX_VALUE / 4;
    }

    /** The sum of the magnitudes of the coefficients. */
    long weight(Int2ObjectOpenHashMap<BigInteger> z) {
        long sum = 0;
        for (BigInteger a : z.values()) {
            sum = Math.addExact(sum, magnitude(a));
        }
        return sum;
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
