package dev.morse.posetreduction;

/**
 * Bounds on the work of the acyclic-link test. A link over either bound is left alone: the
 * element stays, which is always safe.
 *
 * @param maxLinkElements the most elements a link may have to be tested
 * @param maxLinkChains the most chains (cells of its order complex) a link may have to be tested
 * @param workPerElement the budget for all link tests together, in elements and chains visited,
 *     per element and cover of the poset (at least a million in all)
 * @param passes how many times to sweep the poset for acyclic links; each sweep after the first
 *     runs only if the one before removed something
 */
public record ReductionLimits(int maxLinkElements, long maxLinkChains, int workPerElement, int passes) {
    /** The bounds used by default: links of up to 4096 elements and chains, three sweeps. */
    public static final ReductionLimits DEFAULT = new ReductionLimits(4096, 4096, 16, 3);

    private static final long MINIMUM_BUDGET = 1_000_000;

    /** Validates. */
    public ReductionLimits {
        if (maxLinkElements < 0 || maxLinkChains < 0 || workPerElement < 0 || passes < 0) {
            throw new IllegalArgumentException("reduction limits must not be negative");
        }
    }

    /** The work budget for a poset of this many elements and covers. */
    long budget(long elements, long covers) {
        return Math.max(MINIMUM_BUDGET, workPerElement * (elements + covers));
    }
}
