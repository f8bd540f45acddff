package dev.morse.engine;

import dev.morse.complex.ComplexChoice;
import dev.morse.homology.Coefficients;
import dev.morse.implicit.ElementOrder;
import dev.morse.matching.MatchingHeuristics;
import dev.morse.matching.MatchingOptions;
import java.io.Serializable;
import java.time.Duration;
import java.util.Objects;

/**
 * What a computation should do with an input, whatever the command that asks. A plain serialisable
 * value, so that work sent to other machines is computed as asked.
 *
 * @param complex which complex to build from a poset; other inputs take only {@code AUTO}
 * @param coefficients the coefficient ring
 * @param reduced whether to report reduced homology
 * @param matching the name of the acyclic matching, one of {@link MatchingHeuristics#names()}
 * @param seed the seed of the matching's random choices (and of the first trial)
 * @param trials how many seeded runs of the matching to tally; 1 runs it once
 * @param verify whether to verify the matching before trusting it
 * @param posetReduction whether to shrink a poset by homology-preserving reductions before its
 *     order complex is built (never done when the cellular complex is used)
 * @param elementOrder the order of covers that fixes the matching of the implicit order complex
 * @param storedChainLimit the most chains {@link ComplexChoice#AUTO} stores; a poset with more gets
 *     the implicit order complex
 * @param maxStoredCells the most cells a stored complex may have before building it is refused
 *     (pictures ask for few)
 * @param matchingTimeLimit how long a matching that searches (the exact optimum) may take
 */
public record Request(ComplexChoice complex, Coefficients coefficients, boolean reduced, String matching, long seed,
        int trials, boolean verify, boolean posetReduction, ElementOrder elementOrder, long storedChainLimit,
        long maxStoredCells, Duration matchingTimeLimit) implements Serializable {
    private static final long serialVersionUID = 1L;

    /** The matching name that means no Morse reduction: every cell is critical. */
    public static final String NO_MATCHING = "none";

    /**
     * Posets with more chains than this get the implicit order complex under {@link ComplexChoice#AUTO}.
     * Stored, with its matching and verification, the order complex of the proper part of B_8 (545,834
     * chains, up to dimension 6) needed about 500 MiB of heap and 4 s (benchmarks/RESULTS.md), so this
     * keeps the stored complex within about a GiB and ten seconds; beyond it the implicit engine is
     * far leaner, and on the posets it matches well (lattices with an EL-labelling) also faster.
     */
    public static final long DEFAULT_STORED_CHAIN_LIMIT = 1_000_000;

    /** The largest stored chain limit, 2^60: "store the order complex whatever its number of chains". */
    public static final long MAX_STORED_CHAIN_LIMIT = 1L << 60;

    /**
     * The most seeded trials one request may ask for. Each trial is a whole matching of the complex,
     * so a million already means hours on anything but a toy; more is a typing slip, refused rather
     * than left running.
     */
    public static final int MAX_TRIALS = 1_000_000;

    /**
     * Validates.
     *
     * @throws IllegalArgumentException for an unknown matching name (listing the known ones), trials
     *     outside 1..{@link #MAX_TRIALS}, or a limit out of range
     */
    public Request {
        Objects.requireNonNull(complex, "complex");
        Objects.requireNonNull(coefficients, "coefficients");
        Objects.requireNonNull(elementOrder, "elementOrder");
        matching = requireKnownMatching(matching);
        if (trials < 1 || trials > MAX_TRIALS) {
            throw new IllegalArgumentException("trials must be in 1.." + MAX_TRIALS + ", got " + trials);
        }
        if (storedChainLimit < 0 || storedChainLimit > MAX_STORED_CHAIN_LIMIT) {
            throw new IllegalArgumentException("the stored chain limit must lie in 0..2^60");
        }
        if (maxStoredCells < 1) {
            throw new IllegalArgumentException("the cell limit must be positive");
        }
        if (matchingTimeLimit == null || matchingTimeLimit.isNegative() || matchingTimeLimit.isZero()) {
            throw new IllegalArgumentException("the time limit must be positive");
        }
    }

    /** The defaults: automatic choice of complex, integer coefficients, unreduced, the default matching. */
    public static Request defaults() {
        return new Request(ComplexChoice.AUTO, Coefficients.INTEGERS, false, MatchingHeuristics.DEFAULT, 1L, 1, true,
                true, ElementOrder.DOWN_SETS, DEFAULT_STORED_CHAIN_LIMIT, Long.MAX_VALUE, MatchingOptions.DEFAULT_TIME_LIMIT);
    }

    /**
     * Returns {@code name} if it names a matching.
     *
     * @throws IllegalArgumentException naming the available matchings otherwise
     */
    public static String requireKnownMatching(String name) {
        if (name == null || MatchingHeuristics.byName(name).isEmpty()) {
            throw new IllegalArgumentException("unknown matching '" + name + "'; available: "
                    + String.join(", ", MatchingHeuristics.everyKnown().keySet()));
        }
        return name;
    }

    /** This request with another choice of complex. */
    public Request withComplex(ComplexChoice choice) {
        return new Request(choice, coefficients, reduced, matching, seed, trials, verify, posetReduction, elementOrder,
                storedChainLimit, maxStoredCells, matchingTimeLimit);
    }

    /** This request with other coefficients and reduced or unreduced homology. */
    public Request withHomology(Coefficients ring, boolean reducedHomology) {
        return new Request(complex, ring, reducedHomology, matching, seed, trials, verify, posetReduction,
                elementOrder, storedChainLimit, maxStoredCells, matchingTimeLimit);
    }

    /** This request with another matching, seed and number of trials. */
    public Request withMatching(String name, long seedValue, int trialCount) {
        return new Request(complex, coefficients, reduced, name, seedValue, trialCount, verify, posetReduction,
                elementOrder, storedChainLimit, maxStoredCells, matchingTimeLimit);
    }

    /** This request with verification of the matching switched on or off. */
    public Request withVerify(boolean on) {
        return new Request(complex, coefficients, reduced, matching, seed, trials, on, posetReduction, elementOrder,
                storedChainLimit, maxStoredCells, matchingTimeLimit);
    }

    /** This request with poset reduction switched on or off. */
    public Request withPosetReduction(boolean on) {
        return new Request(complex, coefficients, reduced, matching, seed, trials, verify, on, elementOrder,
                storedChainLimit, maxStoredCells, matchingTimeLimit);
    }

    /** This request with another element order and stored chain limit for the implicit order complex. */
    public Request withImplicit(ElementOrder order, long limit) {
        return new Request(complex, coefficients, reduced, matching, seed, trials, verify, posetReduction, order, limit,
                maxStoredCells, matchingTimeLimit);
    }

    /** This request with another time limit for matchings that search. */
    public Request withMatchingTimeLimit(Duration limit) {
        return new Request(complex, coefficients, reduced, matching, seed, trials, verify, posetReduction, elementOrder,
                storedChainLimit, maxStoredCells, limit);
    }

    /** The options the matching heuristic is given: the seed and the time limit. */
    public MatchingOptions matchingOptions() {
        return new MatchingOptions(seed, matchingTimeLimit);
    }

    /** This request refusing stored complexes of more than {@code cells} cells. */
    public Request withMaxStoredCells(long cells) {
        return new Request(complex, coefficients, reduced, matching, seed, trials, verify, posetReduction, elementOrder,
                storedChainLimit, cells, matchingTimeLimit);
    }
}
