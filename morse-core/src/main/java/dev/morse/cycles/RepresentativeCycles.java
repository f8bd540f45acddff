package dev.morse.cycles;

import dev.morse.complex.Boundary;
import dev.morse.complex.ChainComplex;
import dev.morse.engine.Computation;
import dev.morse.homology.Coefficients;
import dev.morse.homology.HomologyGroup;
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
 * ({@link FlowLift}) to cycles of the complex the homology was computed on, written in the input's
 * labels. Every cycle is checked before it is returned: its boundary, computed from the complex's
 * own boundary and nothing of the reduction, is zero (modulo p over Z/p); a failure is an
 * {@link IllegalStateException}, never a wrong cycle. When a poset was shrunk before its order
 * complex was built, the cycles are chains of the smaller poset, which are chains of the input
 * poset too: the smaller poset is a subposet, so its order complex is a subcomplex of Δ(P).
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
     * @throws InputException when the run kept no stored complex and Morse complex (the implicit
     *     engine, or a coefficient beyond a long), or its Morse complex is beyond {@link #MAX_CRITICAL}
     * @throws IllegalStateException when a cycle fails its check or the count disagrees with the
     *     homology: an internal failure
     */
    public static List<Cycle> of(Computation run) {
        if (run.complex().isEmpty() || run.matching().isEmpty()) {
            throw new InputException(run.source(), InputException.NO_LINE, "representative cycles need the cells"
                    + " stored, and the order complex here is generated on demand; --complex order stores them");
        }
        if (run.morseComplex().isEmpty() && run.matching().get().pairCount() > 0) {
            throw new InputException(run.source(), InputException.NO_LINE, "representative cycles need a Morse"
                    + " complex, and this run built none (a coefficient left the range of a long)");
        }
        if (run.totalCritical() > MAX_CRITICAL) {
            throw new InputException(run.source(), InputException.NO_LINE, String.format(Locale.ROOT,
                    "representative cycles are found on at most %,d critical cells, and this matching leaves %,d;"
                            + " another --matching may leave fewer", MAX_CRITICAL, run.totalCritical()));
        }
        ChainComplex complex = run.complex().get();
        Matching matching = run.matching().get();
        MorseComplex morse = run.morseComplex().orElseGet(() -> everyCellCritical(complex));
        Coefficients ring = run.coefficients();
        FlowLift flow = new FlowLift(complex, matching);
        List<Cycle> cycles = new ArrayList<>();
        java.util.Map<Integer, int[]> criticalByDimension = new java.util.HashMap<>();
        for (MorseGenerators.Generator g : MorseGenerators.of(morse, ring)) {
            int[] critical = criticalByDimension.computeIfAbsent(g.dimension(), d -> matching.criticalCells(complex, d));
            Int2ObjectOpenHashMap<BigInteger> chain = new Int2ObjectOpenHashMap<>();
            for (int i = 0; i < critical.length; i++) {
                if (g.coefficients()[i].signum() != 0) {
                    chain.put(critical[i], g.coefficients()[i]);
                }
            }
            cycles.add(toCycle(complex, g.dimension(), g.order(), flow.lift(chain, g.dimension()), ring));
        }
        if (run.reduced()) {
            cycles = reducedInDimensionZero(complex, cycles, ring);
        }
        for (Cycle c : cycles) {
            requireCycle(complex, c, ring);
        }
        requireOneCyclePerGenerator(run, cycles);
        return List.copyOf(cycles);
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

    private static Cycle toCycle(ChainComplex complex, int d, BigInteger order,
            Int2ObjectOpenHashMap<BigInteger> chain, Coefficients ring) {
        int[] cells = chain.keySet().toIntArray();
        Arrays.sort(cells);
        List<Cycle.Term> terms = new ArrayList<>();
        for (int c : cells) {
            BigInteger a = inRing(chain.get(c), ring);
            if (a.signum() != 0) {
                terms.add(new Cycle.Term(c, CellLabels.of(complex, c), a));
            }
        }
        return new Cycle(d, order, terms);
    }

    private static BigInteger inRing(BigInteger a, Coefficients ring) {
        return ring.ring() == Coefficients.Ring.PRIME_FIELD ? a.mod(BigInteger.valueOf(ring.prime())) : a;
    }

    /** H̃_0: the components but the first, each as the difference of its vertex and the first component's. */
    private static List<Cycle> reducedInDimensionZero(ChainComplex complex, List<Cycle> cycles, Coefficients ring) {
        List<Cycle> out = new ArrayList<>();
        Cycle first = null;
        for (Cycle c : cycles) {
            if (c.dimension() != 0 || c.order().signum() != 0) {
                out.add(c);
            } else if (first == null) {
                first = c;
            } else {
                Int2ObjectOpenHashMap<BigInteger> chain = new Int2ObjectOpenHashMap<>();
                c.terms().forEach(t -> chain.merge(t.cell(), t.coefficient(), BigInteger::add));
                first.terms().forEach(t -> chain.merge(t.cell(), t.coefficient().negate(), BigInteger::add));
                out.add(toCycle(complex, 0, BigInteger.ZERO, chain, ring));
            }
        }
        return out;
    }

    /** The boundary of {@code c} from the complex's own boundary: zero, or zero modulo p over Z/p. */
    private static void requireCycle(ChainComplex complex, Cycle c, Coefficients ring) {
        Boundary boundary = complex.boundary();
        Int2ObjectOpenHashMap<BigInteger> faces = new Int2ObjectOpenHashMap<>();
        for (Cycle.Term t : c.terms()) {
            for (int i = boundary.start(t.cell()); i < boundary.end(t.cell()); i++) {
                faces.merge(boundary.target(i), t.coefficient().multiply(BigInteger.valueOf(boundary.coefficient(i))),
                        BigInteger::add);
            }
        }
        for (BigInteger a : faces.values()) {
            if (inRing(a, ring).signum() != 0) {
                throw new IllegalStateException("a representative cycle of dimension " + c.dimension()
                        + " has a nonzero boundary: the lift along the gradient flow failed");
            }
        }
    }

    private static void requireOneCyclePerGenerator(Computation run, List<Cycle> cycles) {
        for (HomologyGroup group : run.homology().groups()) {
            long expected = group.betti() + group.torsion().size();
            long found = cycles.stream().filter(c -> c.dimension() == group.dimension()).count();
            if (group.dimension() >= 0 && expected != found) {
                throw new IllegalStateException("H_" + group.dimension() + " has " + expected + " generators but "
                        + found + " representative cycles were found");
            }
        }
    }
}
