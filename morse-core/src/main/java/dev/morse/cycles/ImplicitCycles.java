package dev.morse.cycles;

import dev.morse.engine.Computation;
import dev.morse.homology.Coefficients;
import dev.morse.homology.HomologyGroup;
import dev.morse.homology.SparseIntegerMatrix;
import dev.morse.implicit.ImplicitCycleLift;
import dev.morse.implicit.ImplicitHomology;
import dev.morse.io.InputException;
import dev.morse.morsecomplex.MorseComplex;
import dev.morse.poset.Poset;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * Representative cycles of a run of the implicit engine, whose chains are never stored: generators
 * of its Morse complex lifted along the gradient paths of its matching, each lift visiting at most
 * {@link #VISIT_LIMIT} chains, else a one-line refusal naming the limit. They are not shortened (the
 * cofaces of a chain are not at hand without the complex).
 *
 * <p>What is checked, by code that shares nothing with the engine: every term is a chain of P
 * (each element below the next in the poset itself), the boundary of every cycle is zero on Δ(P)
 * (faces formed here by omitting elements, modulo p over Z/p), and over Z the chain given for a
 * torsion generator of order t has boundary t·z. Independence and the exact orders are certified on
 * the Morse complex, whose cycles the lifts are images of under a chain homotopy equivalence
 * (Forman 1998, Theorem 8.2): each generator's cocycle is checked to be a cocycle of the Morse
 * complex (modulo its order) and to pair to the identity with the generators, as
 * {@link CycleVerifier} does on a stored complex. A failure is an {@link IllegalStateException}.
 */
final class ImplicitCycles {
    /** The most chains one lift may visit. */
    static final long VISIT_LIMIT = 2_000_000;

    private ImplicitCycles() {
    }

    static List<Cycle> of(Computation run, ImplicitHomology.Outcome outcome, Poset poset) {
        return of(run, outcome, poset, VISIT_LIMIT);
    }

    /** As {@link #of(Computation, ImplicitHomology.Outcome, Poset)} with another limit on the chains visited per lift. */
    static List<Cycle> of(Computation run, ImplicitHomology.Outcome outcome, Poset poset, long visitLimit) {
        MorseComplex morse = outcome.morseComplex().orElseThrow(() -> new InputException(run.source(),
                InputException.NO_LINE, "representative cycles need a Morse complex, and this run built none"
                        + " (a coefficient left the range of a long)"));
        Coefficients ring = run.coefficients();
        List<MorseGenerators.Generator> generators = new ArrayList<>(MorseGenerators.of(morse, ring));
        if (run.reduced()) {
            generators = reducedInDimensionZero(generators);
        }
        checkOnMorseComplex(morse, ring, run, generators);
        ImplicitCycleLift lift = new ImplicitCycleLift(poset, outcome, visitLimit);
        List<Cycle> cycles = new ArrayList<>();
        for (MorseGenerators.Generator g : generators) {
            Map<List<Integer>, BigInteger> z = lifted(run, lift, visitLimit, g.dimension(), g.coefficients(), ring);
            requireChains(poset, z);
            requireZero(boundary(z), ring, BigInteger.ZERO, "the boundary of a " + g.dimension() + "-cycle is not zero");
            if (ring.ring() == Coefficients.Ring.INTEGERS && g.order().signum() > 0) {
                Map<List<Integer>, BigInteger> difference = boundary(lifted(run, lift, visitLimit, g.dimension() + 1, g.preimage(),
                        ring));
                z.forEach((chain, a) -> difference.merge(chain, a.multiply(g.order()).negate(), BigInteger::add));
                requireZero(difference, ring, BigInteger.ZERO, "t·z is not the boundary of the chain given for a"
                        + " torsion cycle of order " + g.order());
            }
            cycles.add(toCycle(poset, g, z, ring));
        }
        return List.copyOf(cycles);
    }

    private static Map<List<Integer>, BigInteger> lifted(Computation run, ImplicitCycleLift lift, long limit, int d,
            BigInteger[] coefficients, Coefficients ring) {
        ImplicitCycleLift.Lifted chain;
        try {
            chain = lift.lift(d, coefficients);
        } catch (IllegalStateException e) {
            throw new InputException(run.source(), InputException.NO_LINE, String.format(Locale.ROOT,
                    "representative cycles on the implicit engine follow at most %,d chains of gradient paths per"
                            + " generator, and one of dimension %d needs more; --complex order stores the cells",
                    limit, d));
        }
        Map<List<Integer>, BigInteger> z = new HashMap<>();
        for (int i = 0; i < chain.chains().size(); i++) {
            z.merge(Arrays.stream(chain.chains().get(i)).boxed().toList(), chain.coefficients().get(i), BigInteger::add);
        }
        z.values().removeIf(a -> reduce(a, ring, BigInteger.ZERO).signum() == 0);
        return z;
    }

    private static Cycle toCycle(Poset poset, MorseGenerators.Generator g, Map<List<Integer>, BigInteger> z,
            Coefficients ring) {
        List<List<Integer>> chains = new ArrayList<>(z.keySet());
        chains.sort((a, b) -> Arrays.compare(a.stream().mapToInt(Integer::intValue).toArray(),
                b.stream().mapToInt(Integer::intValue).toArray()));
        List<Cycle.Term> terms = new ArrayList<>();
        for (List<Integer> chain : chains) {
            List<Object> label = new ArrayList<>();
            chain.forEach(x -> label.add(poset.label(x)));
            terms.add(new Cycle.Term(-1, label, reduce(z.get(chain), ring, BigInteger.ZERO)));
        }
        return new Cycle(g.dimension(), g.order(), terms, terms.size());
    }

    /** Each term a chain of the poset: every element strictly below the next. */
    private static void requireChains(Poset poset, Map<List<Integer>, BigInteger> z) {
        for (List<Integer> chain : z.keySet()) {
            for (int i = 0; i + 1 < chain.size(); i++) {
                if (!poset.isBelow(chain.get(i), chain.get(i + 1)) || chain.get(i).equals(chain.get(i + 1))) {
                    fail("a term of a representative cycle is not a chain of the poset");
                }
            }
        }
    }

    /** The boundary on Δ(P): the alternating sum of the faces omitting one element each. */
    private static Map<List<Integer>, BigInteger> boundary(Map<List<Integer>, BigInteger> chain) {
        Map<List<Integer>, BigInteger> faces = new HashMap<>();
        chain.forEach((cells, a) -> {
            if (cells.size() > 1) {
                for (int i = 0; i < cells.size(); i++) {
                    List<Integer> face = new ArrayList<>(cells);
                    face.remove(i);
                    faces.merge(face, (i & 1) == 0 ? a : a.negate(), BigInteger::add);
                }
            }
        });
        return faces;
    }

    /**
     * The generators of the Morse complex, certified there: each cocycle vanishes on the boundaries
     * of the Morse complex (modulo the generator's order, or p), pairs to 1 with its generator and to
     * 0 with the others of its dimension, and the counts match the printed groups.
     */
    private static void checkOnMorseComplex(MorseComplex morse, Coefficients ring, Computation run,
            List<MorseGenerators.Generator> generators) {
        BigInteger p = ring.ring() == Coefficients.Ring.PRIME_FIELD ? BigInteger.valueOf(ring.prime()) : BigInteger.ZERO;
        for (HomologyGroup group : run.homology().groups()) {
            int d = group.dimension();
            if (d < 0) {
                continue;
            }
            List<MorseGenerators.Generator> here = generators.stream().filter(g -> g.dimension() == d).toList();
            long free = here.stream().filter(g -> g.order().signum() == 0).count();
            List<BigInteger> orders = here.stream().filter(g -> g.order().signum() > 0)
                    .map(MorseGenerators.Generator::order).toList();
            if (free != group.betti() || !orders.equals(ring.hasTorsion() ? group.torsion() : List.of())) {
                fail("H_" + d + " is " + group + " but the generators found are " + free + " free and " + orders);
            }
            for (MorseGenerators.Generator psi : here) {
                BigInteger modulus = p.signum() > 0 ? p : psi.order();
                if (d < morse.dimension()) {
                    SparseIntegerMatrix above = morse.boundary(d + 1);
                    for (int c = 0; c < morse.cellCount(d + 1); c++) {
                        BigInteger v = BigInteger.ZERO;
                        for (int i = above.start(c); i < above.end(c); i++) {
                            v = v.add(psi.cocycle()[above.row(i)].multiply(BigInteger.valueOf(above.value(i))));
                        }
                        if (reduce(v, ring, modulus).signum() != 0) {
                            fail("the cochain certifying a " + d + "-cycle is not a cocycle of the Morse complex");
                        }
                    }
                }
            }
            requireIndependent(here, ring, p, d);
        }
    }

    /**
     * The pairing of cocycles with generators: over Z the identity (free block exactly, each torsion
     * row modulo its order), over Q and Z/p a nonsingular matrix.
     */
    private static void requireIndependent(List<MorseGenerators.Generator> here, Coefficients ring, BigInteger p,
            int d) {
        int k = here.size();
        BigInteger[][] m = new BigInteger[k][k];
        for (int i = 0; i < k; i++) {
            for (int j = 0; j < k; j++) {
                BigInteger modulus = p.signum() > 0 ? p : here.get(i).order();
                m[i][j] = reduce(dot(here.get(i).cocycle(), here.get(j).coefficients()), ring, modulus);
            }
        }
        boolean independent;
        if (ring.ring() == Coefficients.Ring.INTEGERS) {
            independent = true;
            for (int i = 0; i < k; i++) {
                for (int j = 0; j < k; j++) {
                    BigInteger order = here.get(i).order();
                    boolean compared = order.signum() > 0 ? here.get(j).order().signum() > 0
                            : here.get(j).order().signum() == 0;
                    BigInteger one = order.signum() > 0 ? BigInteger.ONE.mod(order) : BigInteger.ONE;
                    if (compared && !m[i][j].equals(i == j ? one : BigInteger.ZERO)) {
                        independent = false;
                    }
                }
            }
        } else {
            independent = CycleVerifier.determinant(m, p).signum() != 0;
        }
        if (!independent) {
            fail("the generators of dimension " + d + " are not independent");
        }
    }

    private static BigInteger dot(BigInteger[] a, BigInteger[] b) {
        BigInteger sum = BigInteger.ZERO;
        for (int i = 0; i < a.length; i++) {
            sum = sum.add(a[i].multiply(b[i]));
        }
        return sum;
    }

    /** H̃_0 as in {@link RepresentativeCycles}: Euclid's steps on the augmentation, the cocycles in step. */
    private static List<MorseGenerators.Generator> reducedInDimensionZero(List<MorseGenerators.Generator> all) {
        List<Integer> zero = new ArrayList<>();
        for (int i = 0; i < all.size(); i++) {
            if (all.get(i).dimension() == 0 && all.get(i).order().signum() == 0) {
                zero.add(i);
            }
        }
        if (zero.isEmpty()) {
            return all;
        }
        BigInteger[][] chains = new BigInteger[zero.size()][];
        BigInteger[][] cocycles = new BigInteger[zero.size()][];
        BigInteger[] e = new BigInteger[zero.size()];
        for (int i = 0; i < zero.size(); i++) {
            chains[i] = all.get(zero.get(i)).coefficients().clone();
            cocycles[i] = all.get(zero.get(i)).cocycle().clone();
            e[i] = Arrays.stream(chains[i]).reduce(BigInteger.ZERO, BigInteger::add);
        }
        int j;
        boolean alone;
        do {
            j = -1;
            for (int i = 0; i < e.length; i++) {
                if (e[i].signum() != 0 && (j < 0 || e[i].abs().compareTo(e[j].abs()) < 0)) {
                    j = i;
                }
            }
            alone = true;
            for (int i = 0; i < e.length; i++) {
                if (i != j && e[i].signum() != 0) {
                    alone = false;
                    BigInteger q = e[i].divide(e[j]);
                    for (int c = 0; c < chains[i].length; c++) {
                        chains[i][c] = chains[i][c].subtract(q.multiply(chains[j][c]));
                        cocycles[j][c] = cocycles[j][c].add(q.multiply(cocycles[i][c]));
                    }
                    e[i] = e[i].subtract(q.multiply(e[j]));
                }
            }
        } while (!alone);
        List<MorseGenerators.Generator> out = new ArrayList<>();
        for (int i = 0; i < all.size(); i++) {
            int k = zero.indexOf(i);
            if (k < 0) {
                out.add(all.get(i));
            } else if (k != j) {
                out.add(new MorseGenerators.Generator(0, BigInteger.ZERO, chains[k], cocycles[k], null));
            }
        }
        return out;
    }

    private static void requireZero(Map<List<Integer>, BigInteger> values, Coefficients ring, BigInteger modulus,
            String failure) {
        for (BigInteger v : values.values()) {
            if (reduce(v, ring, modulus).signum() != 0) {
                fail(failure);
            }
        }
    }

    private static BigInteger reduce(BigInteger a, Coefficients ring, BigInteger modulus) {
        if (ring.ring() == Coefficients.Ring.PRIME_FIELD) {
            return a.mod(BigInteger.valueOf(ring.prime()));
        }
        return modulus.signum() > 0 ? a.mod(modulus) : a;
    }

    private static void fail(String what) {
        throw new IllegalStateException("representative cycles failed their check: " + what);
    }
}
