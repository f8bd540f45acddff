package dev.morse.pipeline;

import dev.morse.complex.ComplexChoice;
import dev.morse.homology.Coefficients;
import dev.morse.implicit.ElementOrder;
import dev.morse.image.ImageOptions;
import dev.morse.matching.MatchingHeuristics;
import java.util.Objects;

/**
 * What a homology run should do.
 *
 * @param complex which complex to build from a poset; simplicial input takes only {@code AUTO}
 * @param coefficients the coefficient ring
 * @param reduced whether to report reduced homology
 * @param matching the name of the acyclic matching, one of {@link HomologyPipeline#matchingNames()}
 * @param seed the seed of the matching's random choices (and of the first trial)
 * @param trials how many seeded runs of the matching to tally; 1 runs it once
 * @param verify whether to verify the matching before trusting it
 * @param posetReduction whether to shrink a poset by homology-preserving reductions before its
 *     order complex is built (never done when the cellular complex is used)
 * @param image how to read an image or volume input
 * @param elementOrder the order of covers that fixes the matching of the implicit order complex
 * @param storedChainLimit the most chains {@link ComplexChoice#AUTO} stores; a poset with more gets the
 *     implicit order complex
 */
public record HomologyOptions(ComplexChoice complex, Coefficients coefficients, boolean reduced, String matching,
        long seed, int trials, boolean verify, boolean posetReduction, ImageOptions image, ElementOrder elementOrder,
        long storedChainLimit) {
    /**
     * Posets with more chains than this get the implicit order complex under {@link ComplexChoice#AUTO}.
     * Stored, with its matching and verification, the order complex of the proper part of B_8 (545,834
     * chains, up to dimension 6) needed about 500 MiB of heap and 4 s (benchmarks/RESULTS.md), so this
     * keeps the stored complex within about a GiB and ten seconds; beyond it the implicit engine is
     * far leaner, and on the posets it matches well (lattices with an EL-labelling) also faster.
     */
    public static final long DEFAULT_STORED_CHAIN_LIMIT = 1_000_000;

    /**
     * Validates.
     *
     * @throws IllegalArgumentException for an unknown matching name, listing the known ones
     */
    public HomologyOptions {
        Objects.requireNonNull(complex, "complex");
        Objects.requireNonNull(coefficients, "coefficients");
        Objects.requireNonNull(image, "image");
        matching = HomologyPipeline.requireKnownMatching(matching);
        if (trials < 1) {
            throw new IllegalArgumentException("trials must be at least 1");
        }
        Objects.requireNonNull(elementOrder, "elementOrder");
        if (storedChainLimit < 0 || storedChainLimit > 1L << 60) {
            throw new IllegalArgumentException("the stored chain limit must lie in 0..2^60");
        }
    }

    /** Options with the default element order and stored chain limit of the implicit order complex. */
    public HomologyOptions(ComplexChoice complex, Coefficients coefficients, boolean reduced, String matching,
            long seed, int trials, boolean verify, boolean posetReduction, ImageOptions image) {
        this(complex, coefficients, reduced, matching, seed, trials, verify, posetReduction, image,
                ElementOrder.DOWN_SETS, DEFAULT_STORED_CHAIN_LIMIT);
    }

    /** Options with poset reduction on and the default reading of images. */
    public HomologyOptions(ComplexChoice complex, Coefficients coefficients, boolean reduced, String matching,
            long seed, int trials, boolean verify) {
        this(complex, coefficients, reduced, matching, seed, trials, verify, true, ImageOptions.defaults());
    }

    /** Options with seed 1, one trial, verification and poset reduction on. */
    public HomologyOptions(ComplexChoice complex, Coefficients coefficients, boolean reduced, String matching) {
        this(complex, coefficients, reduced, matching, 1L, 1, true);
    }

    /** The defaults: automatic choice of complex, integer coefficients, unreduced, the default matching. */
    public static HomologyOptions defaults() {
        return new HomologyOptions(ComplexChoice.AUTO, Coefficients.INTEGERS, false, MatchingHeuristics.DEFAULT);
    }

    /** These options with another choice of complex. */
    public HomologyOptions withComplex(ComplexChoice choice) {
        return new HomologyOptions(choice, coefficients, reduced, matching, seed, trials, verify, posetReduction, image,
                elementOrder, storedChainLimit);
    }

    /** These options with poset reduction switched on or off. */
    public HomologyOptions withPosetReduction(boolean on) {
        return new HomologyOptions(complex, coefficients, reduced, matching, seed, trials, verify, on, image,
                elementOrder, storedChainLimit);
    }

    /** These options with another way of reading images. */
    public HomologyOptions withImage(ImageOptions imageOptions) {
        return new HomologyOptions(complex, coefficients, reduced, matching, seed, trials, verify, posetReduction,
                imageOptions, elementOrder, storedChainLimit);
    }

    /** These options with another element order and stored chain limit for the implicit order complex. */
    public HomologyOptions withImplicit(ElementOrder order, long limit) {
        return new HomologyOptions(complex, coefficients, reduced, matching, seed, trials, verify, posetReduction,
                image, order, limit);
    }
}
