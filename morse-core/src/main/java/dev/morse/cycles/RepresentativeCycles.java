package dev.morse.cycles;

import dev.morse.complex.ChainComplex;
import dev.morse.engine.Computation;
import dev.morse.homology.Coefficients;
import dev.morse.io.InputException;
import dev.morse.matching.Matching;
import dev.morse.morsecomplex.MorseComplex;
import it.unimi.dsi.fastutil.ints.Int2ObjectOpenHashMap;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;

/**
 * One representative cycle per generator of each homology group of a computation: generators of
 * the Morse complex's homology ({@link MorseGenerators}) lifted along the gradient flow
 * ({@link FlowLift}) to cycles of the complex the homology was computed on, shortened by adding
 * boundaries ({@link CycleShortening}), and written in the input's labels. Beside each cycle the
 * reversed flow ({@link FlowLift#cochain}) lifts a cocycle that certifies it, and for torsion over
 * Z the flow lifts a chain it bounds t times; {@link CycleVerifier}, which shares nothing with the reduction,
 * checks these certificates on the complex after shortening: zero boundaries, exact orders,
 * independence, and a direct summand isomorphic to the printed group. A failure is an
 * {@link IllegalStateException}, never a wrong cycle. When a poset was shrunk before its order
 * complex was built, the cycles are chains of the smaller poset, which are chains of the input poset
 * too: the smaller poset is a subposet, so its order complex is a subcomplex of Δ(P).
 */
public final class RepresentativeCycles {
    /** The most critical cells whose Morse complex is decomposed with transforms (cubic time, quadratic memory). */
    public static final int MAX_CRITICAL = 3_000;

    private RepresentativeCycles() {
    }

    /**
     * The cycles of {@code run}, per dimension in the order of its homology groups: free generators
     * first, then one per torsion factor in the order of {@code torsion}; for reduced homology the
     * components of H̃_0 are differences of two vertices.
     *
     * @throws InputException when the run kept no Morse complex (a coefficient beyond a long), its
     *     Morse complex is beyond {@link #MAX_CRITICAL}, or on the implicit engine a lift would follow
     *     more than {@link ImplicitCycles#VISIT_LIMIT} chains
     * @throws IllegalStateException when a cycle fails its check or the count disagrees with the
     *     homology: an internal failure
     */
    public static List<Cycle> of(Computation run) {
        if (run.implicitRun().isPresent() && run.plan().implicitPoset().isPresent()) {
            requireFewCritical(run);
            return ImplicitCycles.of(run, run.implicitRun().get(), run.plan().implicitPoset().get());
        }
        if (run.complex().isEmpty() || run.matching().isEmpty()) {
            throw new InputException(run.source(), InputException.NO_LINE, "representative cycles need the cells"
                    + " stored, and the order complex here is generated on demand; --complex order stores them");
        }
        if (run.morseComplex().isEmpty() && run.matching().get().pairCount() > 0) {
            throw new InputException(run.source(), InputException.NO_LINE, "representative cycles need a Morse"
                    + " complex, and this run built none (a coefficient left the range of a long)");
        }
        requireFewCritical(run);
        List<Certificate> certificates = certificates(run);
        ChainComplex complex = run.complex().get();
        Coefficients ring = run.coefficients();
        CycleVerifier.verify(complex, ring, run.homology(), certificates);
        List<Cycle> cycles = new ArrayList<>();
        for (Certificate c : certificates) {
            cycles.add(toCycle(complex, c, ring));
        }
        return List.copyOf(cycles);
    }

    /** The certificates of a stored run, lifted and shortened, before the verifier has seen them. */
    static List<Certificate> certificates(Computation run) {
        ChainComplex complex = run.complex().get();
        Matching matching = run.matching().get();
        MorseComplex morse = run.morseComplex().orElseGet(() -> everyCellCritical(complex));
        Coefficients ring = run.coefficients();
        List<Certificate> certificates = certificates(complex, matching, morse, ring);
        if (run.reduced()) {
            certificates = reducedInDimensionZero(certificates, ring);
        }
        CycleShortening shortening = new CycleShortening(complex,
                ring.ring() == Coefficients.Ring.PRIME_FIELD ? ring.prime() : 0);
        return shortening.shortenAll(certificates);
    }

    private static void requireFewCritical(Computation run) {
        if (run.totalCritical() > MAX_CRITICAL) {
            throw new InputException(run.source(), InputException.NO_LINE, String.format(Locale.ROOT,
                    "representative cycles are found on at most %,d critical cells, and this matching leaves %,d;"
                            + " another --matching may leave fewer", MAX_CRITICAL, run.totalCritical()));
        }
    }

    /** Each generator of the Morse complex lifted to the complex, with its preimage and cocycle lifted too. */
    private static List<Certificate> certificates(ChainComplex complex, Matching matching, MorseComplex morse,
            Coefficients ring) {
        FlowLift flow = new FlowLift(complex, matching);
        List<Certificate> certificates = new ArrayList<>();
        java.util.Map<Integer, int[]> criticalByDimension = new java.util.HashMap<>();
        for (MorseGenerators.Generator g : MorseGenerators.of(morse, ring)) {
            int d = g.dimension();
            int[] critical = criticalByDimension.computeIfAbsent(d, k -> matching.criticalCells(complex, k));
            Int2ObjectOpenHashMap<BigInteger> chain = flow.chain(onCells(critical, g.coefficients()), d);
            Int2ObjectOpenHashMap<BigInteger> preimage = null;
            if (g.preimage() != null && ring.ring() == Coefficients.Ring.INTEGERS) {
                int[] above = criticalByDimension.computeIfAbsent(d + 1, k -> matching.criticalCells(complex, k));
                preimage = flow.chain(onCells(above, g.preimage()), d + 1);
            }
            BigInteger modulus = ring.ring() == Coefficients.Ring.PRIME_FIELD ? BigInteger.valueOf(ring.prime())
                    : g.order();
            Int2ObjectOpenHashMap<BigInteger> cocycle = d == 0 ? new Int2ObjectOpenHashMap<>() // components certify H_0
                    : flow.cochain(critical, g.cocycle(), d, modulus);
            certificates.add(new Certificate(d, g.order(), chain, preimage, cocycle, nonzero(chain, ring)));
        }
        return certificates;
    }

    private static Int2ObjectOpenHashMap<BigInteger> onCells(int[] cells, BigInteger[] coefficients) {
        Int2ObjectOpenHashMap<BigInteger> chain = new Int2ObjectOpenHashMap<>();
        for (int i = 0; i < cells.length; i++) {
            if (coefficients[i].signum() != 0) {
                chain.put(cells[i], coefficients[i]);
            }
        }
        return chain;
    }

    private static int nonzero(Int2ObjectOpenHashMap<BigInteger> chain, Coefficients ring) {
        return (int) chain.values().stream().filter(a -> inRing(a, ring).signum() != 0).count();
    }

    /** The Morse complex of the matching with every cell critical: the complex itself. */
    private static MorseComplex everyCellCritical(ChainComplex complex) {
        List<dev.morse.homology.SparseIntegerMatrix> boundaries = new ArrayList<>();
        for (int d = 0; d <= complex.dimension(); d++) {
            boundaries.add(d == 0
                    ? new dev.morse.homology.SparseIntegerMatrix(0, new int[complex.cellCount(0) + 1], new int[0],
                            new long[0])
                    : dev.morse.homology.SparseIntegerMatrix.boundaryOf(complex, d));
        }
        return new MorseComplex(complex.cellCounts(), boundaries);
    }

    private static Cycle toCycle(ChainComplex complex, Certificate c, Coefficients ring) {
        int[] cells = c.chain().keySet().toIntArray();
        Arrays.sort(cells);
        List<Cycle.Term> terms = new ArrayList<>();
        for (int cell : cells) {
            BigInteger a = inRing(c.chain().get(cell), ring);
            if (a.signum() != 0) {
                terms.add(new Cycle.Term(cell, CellLabels.of(complex, cell), a));
            }
        }
        return new Cycle(c.dimension(), c.order(), terms, c.lifted());
    }

    private static BigInteger inRing(BigInteger a, Coefficients ring) {
        return ring.ring() == Coefficients.Ring.PRIME_FIELD ? a.mod(BigInteger.valueOf(ring.prime())) : a;
    }

    /**
     * H̃_0, the kernel of the augmentation ε (the sum of coefficients): the free 0-cycles are changed
     * by Euclid's steps on their values under ε, each step applied to the cocycles by the inverse
     * transpose so that the pairing stays the identity, until one cycle alone has ε ≠ 0 (then ±1, as
     * ε maps H_0 onto Z); that one and its cocycle are dropped, the rest are a basis of H̃_0.
     */
    private static List<Certificate> reducedInDimensionZero(List<Certificate> certificates, Coefficients ring) {
        List<Certificate> zero = new ArrayList<>(certificates.stream()
                .filter(c -> c.dimension() == 0 && c.order().signum() == 0).toList());
        if (zero.isEmpty()) {
            return certificates;
        }
        List<Int2ObjectOpenHashMap<BigInteger>> chains = new ArrayList<>();
        List<Int2ObjectOpenHashMap<BigInteger>> cocycles = new ArrayList<>();
        BigInteger[] e = new BigInteger[zero.size()];
        for (int i = 0; i < zero.size(); i++) {
            chains.add(new Int2ObjectOpenHashMap<>(zero.get(i).chain()));
            cocycles.add(new Int2ObjectOpenHashMap<>(zero.get(i).cocycle()));
            e[i] = zero.get(i).chain().values().stream().reduce(BigInteger.ZERO, BigInteger::add);
        }
        while (true) {
            int j = -1;
            for (int i = 0; i < e.length; i++) {
                if (e[i].signum() != 0 && (j < 0 || e[i].abs().compareTo(e[j].abs()) < 0)) {
                    j = i;
                }
            }
            boolean alone = true;
            for (int i = 0; i < e.length; i++) {
                if (i != j && e[i].signum() != 0) {
                    alone = false;
                    BigInteger q = e[i].divide(e[j]);
                    addMultiple(chains.get(i), chains.get(j), q.negate());
                    addMultiple(cocycles.get(j), cocycles.get(i), q);
                    e[i] = e[i].subtract(q.multiply(e[j]));
                }
            }
            if (alone) {
                List<Certificate> out = new ArrayList<>();
                for (Certificate c : certificates) {
                    int i = zero.indexOf(c);
                    if (i < 0) {
                        out.add(c);
                    } else if (i != j) {
                        chains.get(i).int2ObjectEntrySet().removeIf(x -> x.getValue().signum() == 0);
                        out.add(new Certificate(0, BigInteger.ZERO, chains.get(i), null, cocycles.get(i),
                                nonzero(chains.get(i), ring)));
                    }
                }
                return out;
            }
        }
    }

    private static void addMultiple(Int2ObjectOpenHashMap<BigInteger> target, Int2ObjectOpenHashMap<BigInteger> source,
            BigInteger factor) {
        source.int2ObjectEntrySet().forEach(x -> target.merge(x.getIntKey(), x.getValue().multiply(factor),
                BigInteger::add));
    }
}
