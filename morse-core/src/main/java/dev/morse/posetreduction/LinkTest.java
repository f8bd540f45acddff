package dev.morse.posetreduction;

import dev.morse.complex.OrderComplex;
import dev.morse.homology.Coefficients;
import dev.morse.homology.Homology;
import dev.morse.homology.HomologyGroup;
import dev.morse.matching.MatchingHeuristics;
import dev.morse.matching.MatchingOptions;
import dev.morse.morsecomplex.MorseReduction;
import dev.morse.poset.OrderCycleException;
import dev.morse.poset.Poset;
import dev.morse.poset.PosetBuilder;
import dev.morse.progress.Progress;
import dev.morse.progress.ProgressScope;

/**
 * Decides whether the open lower set {@code P_<x} or the open upper set {@code P_>x} of an element
 * has an order complex with zero reduced integral homology. Cheap cases first: an empty set is not
 * acyclic (its reduced homology is Z in dimension -1); a set with a greatest or least element is a
 * cone; a nonzero reduced Euler characteristic (from the Möbius function, no chains listed) rules
 * acyclicity out. Otherwise the order complex
 * of the set is built and its homology computed by Morse reduction with coreduction. Not
 * thread-safe: it shares the workspace's search stamps.
 */
final class LinkTest {
    /** The outcome of one test. */
    enum Verdict { ACYCLIC, NOT_ACYCLIC, SKIPPED }

    /** Stands for a link with more comparable pairs than the chain limit. */
    private static final long TOO_MANY_PAIRS = Long.MIN_VALUE;

    private final HasseWorkspace hasse;
    private final ReductionLimits limits;
    private final int[] local;
    private long budget;

    LinkTest(HasseWorkspace hasse, ReductionLimits limits, long budget) {
        this.hasse = hasse;
        this.limits = limits;
        this.local = new int[hasse.size()];
        this.budget = budget;
    }

    /** Tests the lower ({@code down}) or upper link of {@code x}. */
    Verdict test(int x, boolean down) {
        if (budget <= 0) {
            return Verdict.SKIPPED;
        }
        int extremes = down ? hasse.lowerCount(x) : hasse.upperCount(x);
        if (extremes == 0) {
            return Verdict.NOT_ACYCLIC;
        }
        if (extremes == 1) {
            return Verdict.ACYCLIC; // the single cover is a greatest (least) element of the link
        }
        int[] set = hasse.collect(x, down, limits.maxLinkElements());
        if (set == null) {
            budget -= limits.maxLinkElements();
            return Verdict.SKIPPED;
        }
        budget -= set.length;
        int farthest = 0;
        for (int s : set) {
            if ((down ? hasse.lowerCount(s) : hasse.upperCount(s)) == 0) {
                farthest++;
            }
        }
        if (farthest == 1) {
            return Verdict.ACYCLIC; // a least (greatest) element: the link is a cone
        }
        long euler = reducedEulerCharacteristic(set);
        if (euler == TOO_MANY_PAIRS) {
            budget -= limits.maxLinkChains();
            return Verdict.SKIPPED;
        }
        if (euler != 0) {
            return Verdict.NOT_ACYCLIC;
        }
        Homology homology;
        // the homology of one link is part of the reduction, not a phase of its own
        try (ProgressScope quiet = Progress.use(Progress.SILENT)) {
            OrderComplex complex;
            try {
                complex = OrderComplex.of(subposet(set), limits.maxLinkChains());
            } catch (IllegalStateException tooMany) {
                budget -= limits.maxLinkChains();
                return Verdict.SKIPPED;
            }
            budget -= complex.cellCount();
            homology = MorseReduction.run(complex, new MorseReduction.Request(
                    MatchingHeuristics.byName(MatchingHeuristics.DEFAULT).orElseThrow(), MatchingOptions.DEFAULT,
                    Coefficients.INTEGERS, true)).homology().toReduced();
        }
        for (HomologyGroup group : homology.groups()) {
            if (!group.isTrivial()) {
                return Verdict.NOT_ACYCLIC;
            }
        }
        return Verdict.ACYCLIC;
    }

    /**
     * The reduced Euler characteristic of Δ(S), without listing chains: with a least element
     * adjoined, {@code χ̃(Δ(S)) = μ(0̂, 1̂) = -1 - Σ_(z ∈ S) μ(0̂, z)} and
     * {@code μ(0̂, z) = -1 - Σ_(w < z) μ(0̂, w)} (Philip Hall's theorem; Rota 1964). The sets below
     * each element are bit sets over S, so the work is bounded by the comparable pairs, which are
     * edges of Δ(S): {@link #TOO_MANY_PAIRS} when they alone exceed the chain limit.
     */
    private long reducedEulerCharacteristic(int[] set) {
        int size = set.length;
        for (int i = 0; i < size; i++) {
            local[set[i]] = i;
        }
        Integer[] order = new Integer[size];
        for (int i = 0; i < size; i++) {
            order[i] = i;
        }
        java.util.Arrays.sort(order, java.util.Comparator.comparingInt(i -> hasse.height(set[i])));
        int words = (size + 63) >>> 6;
        long[][] below = new long[size][];
        long[] mu = new long[size];
        long pairs = 0;
        long sum = 0;
        for (int k = 0; k < size; k++) {
            int i = order[k];
            int s = set[i];
            long[] down = new long[words];
            for (int c = 0; c < hasse.lowerCount(s); c++) {
                int t = hasse.lower(s, c);
                if (isMember(t, set)) {
                    int j = local[t];
                    long[] theirs = below[j];
                    for (int w = 0; w < words; w++) {
                        down[w] |= theirs[w];
                    }
                    down[j >>> 6] |= 1L << j;
                }
            }
            long total = -1;
            for (int w = 0; w < words; w++) {
                long bits = down[w];
                pairs += Long.bitCount(bits);
                while (bits != 0) {
                    total = Math.subtractExact(total, mu[(w << 6) + Long.numberOfTrailingZeros(bits)]);
                    bits &= bits - 1;
                }
            }
            if (pairs > limits.maxLinkChains()) {
                return TOO_MANY_PAIRS;
            }
            below[i] = down;
            mu[i] = total;
            sum = Math.addExact(sum, total);
        }
        budget -= pairs;
        return Math.subtractExact(-1, sum);
    }

    /**
     * The set as a poset. A lower or upper set is convex, so its covers are the covers of the
     * poset between its elements.
     */
    private Poset subposet(int[] set) {
        PosetBuilder builder = new PosetBuilder();
        for (int i = 0; i < set.length; i++) {
            local[set[i]] = builder.element(Integer.toString(i));
        }
        for (int s : set) {
            for (int i = 0; i < hasse.lowerCount(s); i++) {
                int t = hasse.lower(s, i);
                if (isMember(t, set)) {
                    builder.relate(local[t], local[s], 0);
                }
            }
        }
        try {
            return builder.build();
        } catch (OrderCycleException e) {
            throw new IllegalStateException("a subposet cannot have cyclic covers", e);
        }
    }

    /** Membership by the local ids just assigned: only members hold a valid id pointing back to them. */
    private boolean isMember(int t, int[] set) {
        int id = local[t];
        return id >= 0 && id < set.length && set[id] == t;
    }
}
