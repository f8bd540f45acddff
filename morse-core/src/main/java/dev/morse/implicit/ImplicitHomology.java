package dev.morse.implicit;

import dev.morse.poset.ChainCounts;

import dev.morse.homology.Coefficients;
import dev.morse.homology.DenseSmithOracle;
import dev.morse.homology.Homology;
import dev.morse.homology.HomologyCalculator;
import dev.morse.homology.HomologyGroup;
import dev.morse.homology.SmithInvariants;
import dev.morse.homology.SparseIntegerMatrix;
import dev.morse.morsecomplex.AlgebraicReduction;
import dev.morse.morsecomplex.MorseComplex;
import dev.morse.morsecomplex.PhaseTimes;
import dev.morse.morsecomplex.ReductionRound;
import dev.morse.poset.Poset;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import dev.morse.morsecomplex.MorseOutcome;

/**
 * Homology of the order complex Δ(P) of any finite poset without storing its chains. P gets a bottom
 * 0̂ and a top 1̂ (always; the chains of P are the chains of P̂ strictly between them), and the
 * maximal chains of P̂ are ordered lexicographically, covers compared by an {@link ElementOrder}.
 *
 * <p><b>The matching.</b> Send each nonempty chain G of P to φ(G), the first maximal chain containing
 * it: the greedy chain (first cover below the next element of G, step by step) in every gap of G.
 * If G ⊆ H then every maximal chain through H passes through G, so φ(G) ≤ φ(H): φ is order-preserving
 * from the face poset of Δ(P) to the maximal chains in their total order. Within each fibre φ⁻¹(F)
 * the elements of F are taken from the bottom up, and each pairs every two members still unmatched
 * that differ in it alone (an element matching; Jonsson, "Simplicial Complexes of Graphs", 2008).
 * That matching is acyclic: on a closed gradient path let s be the least step used; its element x_s
 * is added and never removed, for removing it from some ν would pair ν with ν \ x_s at step s already,
 * both being unmatched before step s, yet the path must return to a chain without x_s. By the cluster
 * lemma (Kozlov, "Combinatorial Algebraic Topology", 2008, Theorem 11.10, the patchwork theorem;
 * from memory) the union over all fibres is acyclic on Δ(P). Incidences are ±1, as in every simplicial
 * complex. {@link FacetReach} shows when one element matches a whole fibre, which is how partners are
 * computed by rule ({@link ChainMatching}); {@link CriticalChainSearch} finds the critical chains by
 * one pruned walk over the maximal chains.
 *
 * <p>On EL-shellable posets whose element order gives the EL-labelling (see
 * {@link ElementOrder#DOWN_SETS}: geometric lattices such as the partition lattices and the subspace
 * lattices), each fibre is the interval [R(F), F] of the shelling (Björner 1980; Chari 2000 for the
 * matching along a shelling), and the critical chains are one vertex and the falling maximal chains:
 * the Morse lower bound for a wedge of spheres.
 *
 * <p><b>The rest.</b> The Morse boundary between critical chains comes from {@link LocalGradientSweep}
 * (skipped only between dimensions of which one has no critical chain, where it is zero for want of
 * cells), the Morse complex is reduced by {@link AlgebraicReduction} and finished by the Smith normal
 * form. Should a Morse coefficient exceed a long, the Morse complex is finished by the dense
 * BigInteger Smith normal form instead. Memory: that of {@link BoundedPoset} (n²/8 bytes), the
 * critical chains, and one sweep at a time.
 */
public final class ImplicitHomology {
    /** Default bound on the critical chains kept. */
    public static final long DEFAULT_CRITICAL_LIMIT = 4_000_000;
    /** Default bound on the chains one sweep may visit. */
    public static final long DEFAULT_VISIT_LIMIT = 30_000_000;
    /** The largest Morse boundary matrix (rows times columns) finished densely after an overflow. */
    static final long DENSE_LIMIT = 25_000_000;

    private ImplicitHomology() {
    }

    /**
     * What to run.
     *
     * @param order the order of covers, which fixes the matching
     * @param coefficients the coefficient ring
     * @param criticalLimit the most critical chains to keep before giving up with a message
     * @param visitLimit the most chains one gradient sweep may visit before giving up with a message
     */
    public record Options(ElementOrder order, Coefficients coefficients, long criticalLimit, long visitLimit) {
        /** Validates. */
        public Options {
            Objects.requireNonNull(order, "order");
            Objects.requireNonNull(coefficients, "coefficients");
            if (criticalLimit < 1 || criticalLimit > Integer.MAX_VALUE - 8 || visitLimit < 1) {
                throw new IllegalArgumentException("limits must be positive, and critical chains fit in an int");
            }
        }

        /** The given order and coefficients with the default limits. */
        public Options(ElementOrder order, Coefficients coefficients) {
            this(order, coefficients, DEFAULT_CRITICAL_LIMIT, DEFAULT_VISIT_LIMIT);
        }
    }

    /**
     * Everything a run found.
     *
     * @param order the element order used
     * @param cells nonempty chains per dimension (the cells of Δ(P)), counted, never listed
     * @param critical critical chains per dimension
     * @param search what the walk over maximal chains did
     * @param rounds cells left after each round of algebraic reduction
     * @param homology the unreduced homology
     * @param times milliseconds per phase: {@code chains} (when not counted before), {@code order},
     *     {@code match}, {@code sweep}, {@code reduce}, {@code homology}
     * @param morse the Morse complex before algebraic reduction, or {@code null} when a coefficient
     *     left the range of a long
     * @param chains the critical chains, each named by its elements' labels from the bottom up
     */
    public record Outcome(ElementOrder order, long[] cells, int[] critical, SearchStatistics search,
            List<ReductionRound> rounds, Homology homology, PhaseTimes times, MorseComplex morse,
            CriticalChainNames chains) implements MorseOutcome {
        /** The name reports give the implicit engine's matching. */
        public static final String MATCHING = "implicit-lexicographic";

        /** Copies. */
        public Outcome {
            cells = cells.clone();
            critical = critical.clone();
            rounds = List.copyOf(rounds);
            Objects.requireNonNull(chains, "chains");
        }

        /** A copy. */
        @Override
        public long[] cells() {
            return cells.clone();
        }

        /** A copy. */
        @Override
        public int[] critical() {
            return critical.clone();
        }

        @Override
        public String matchingName() {
            return MATCHING;
        }

        @Override
        public Optional<MorseComplex> morseComplex() {
            return Optional.ofNullable(morse);
        }

        @Override
        public List<String> criticalCellNames(int dimension) {
            return chains.names(dimension);
        }
    }

    /**
     * The homology of Δ(poset).
     *
     * @throws IllegalStateException with a message fit for users when a limit is exceeded: more chains
     *     in a dimension than a long counts, down-sets beyond half the heap, too many critical chains,
     *     a sweep visiting too many chains, or an unresolved fibre too large to enumerate
     */
    public static Outcome run(Poset poset, Options options) {
        return run(poset, options, options.order()::ranks, null);
    }

    /**
     * As {@link #run(Poset, Options)} with the chains per dimension already counted (by
     * {@link ChainCounts#perDimension}), so that they are not counted twice.
     */
    public static Outcome run(Poset poset, Options options, long[] chainsPerDimension) {
        return run(poset, options, options.order()::ranks, chainsPerDimension.clone());
    }

    /** As {@link #run(Poset, Options)} with covers ordered by any ranking; the options' order is only reported. */
    static Outcome run(Poset poset, Options options, BoundedPoset.Ranking ranking) {
        return run(poset, options, ranking, null);
    }

    private static Outcome run(Poset poset, Options options, BoundedPoset.Ranking ranking, long[] counted) {
        Map<String, Double> times = new LinkedHashMap<>();
        long t0 = System.nanoTime();
        long[] cells = counted;
        long t1 = t0;
        if (cells == null) {
            try {
                cells = ChainCounts.perDimension(poset);
            } catch (ArithmeticException e) {
                throw new IllegalStateException("the order complex has more than 2^63 - 1 chains in one dimension");
            }
            t1 = lap(times, "chains", t0);
        }
        BoundedPoset bounded = BoundedPoset.of(poset, ranking, Runtime.getRuntime().maxMemory() / 2);
        long t2 = lap(times, "order", t1);
        CriticalChains critical = CriticalChainSearch.run(bounded, options.criticalLimit());
        long t3 = lap(times, "match", t2);
        int top = cells.length - 1;
        LocalGradientSweep sweep = new LocalGradientSweep(new ChainMatching(bounded), options.visitLimit());
        List<MorseMatrix> matrices = new ArrayList<>();
        for (int d = 1; d <= top; d++) {
            matrices.add(sweep.boundary(critical, d));
        }
        long t4 = lap(times, "sweep", t3);
        int[] counts = critical.counts(top);
        Homology homology;
        List<ReductionRound> rounds = List.of();
        MorseComplex morse = null;
        if (matrices.stream().allMatch(MorseMatrix::fitsInLong)) {
            List<SparseIntegerMatrix> boundaries = new ArrayList<>();
            if (top >= 0) {
                boundaries.add(new SparseIntegerMatrix(0, new int[counts[0] + 1], new int[0], new long[0]));
            }
            matrices.forEach(m -> boundaries.add(m.toSparse()));
            morse = new MorseComplex(counts, boundaries);
            AlgebraicReduction.Result reduced = AlgebraicReduction.reduce(morse);
            rounds = reduced.rounds();
            long t5 = lap(times, "reduce", t4);
            MorseComplex left = reduced.reduced();
            homology = HomologyCalculator.fromBoundaries(left.cellCounts(), left::boundary, options.coefficients());
            lap(times, "homology", t5);
        } else {
            homology = denseHomology(counts, matrices, options.coefficients());
            lap(times, "homology", t4);
        }
        return new Outcome(options.order(), cells, counts, critical.statistics(), rounds, homology, new PhaseTimes(times),
                morse, new CriticalChainNames(critical, bounded));
    }

    private static long lap(Map<String, Double> times, String phase, long since) {
        long now = System.nanoTime();
        times.put(phase, (now - since) / 1e6);
        return now;
    }

    /** Homology from dense BigInteger Smith forms, for a Morse complex with an entry beyond a long. */
    static Homology denseHomology(int[] counts, List<MorseMatrix> matrices, Coefficients coefficients) {
        int top = counts.length - 1;
        int[] rank = new int[top + 2];
        List<List<BigInteger>> torsion = new ArrayList<>();
        for (int d = 0; d <= top + 1; d++) {
            torsion.add(List.of());
        }
        for (int d = 1; d <= top; d++) {
            MorseMatrix m = matrices.get(d - 1);
            if ((long) m.rows() * m.columns() > DENSE_LIMIT) {
                throw new IllegalStateException("a Morse coefficient exceeds 2^63 in a boundary matrix of " + m.rows()
                        + " by " + m.columns() + " critical chains, too large for the dense BigInteger Smith normal form");
            }
            SmithInvariants form = DenseSmithOracle.compute(m.toDense());
            List<BigInteger> factors = form.nonUnitFactors();
            switch (coefficients.ring()) {
                case INTEGERS -> {
                    rank[d] = form.rank();
                    torsion.set(d - 1, factors);
                }
                case RATIONALS -> rank[d] = form.rank();
                case PRIME_FIELD -> {
                    BigInteger p = BigInteger.valueOf(coefficients.prime());
                    rank[d] = form.rank() - (int) factors.stream().filter(f -> f.mod(p).signum() == 0).count();
                }
            }
        }
        List<HomologyGroup> groups = new ArrayList<>();
        for (int d = 0; d <= top; d++) {
            groups.add(new HomologyGroup(d, counts[d] - rank[d] - rank[d + 1], torsion.get(d)));
        }
        return new Homology(coefficients, false, groups);
    }
}
