package dev.morse.pipeline;

import dev.morse.complex.ComplexChoice;
import dev.morse.homology.Coefficients;
import java.util.Objects;

/**
 * What a homology run should do.
 *
 * @param complex which complex to build from a poset; simplicial input takes only {@code AUTO}
 * @param coefficients the coefficient ring
 * @param reduced whether to report reduced homology
 * @param matching the name of the acyclic matching, one of {@link HomologyPipeline#matchingNames()}
 */
public record HomologyOptions(ComplexChoice complex, Coefficients coefficients, boolean reduced, String matching) {
    /**
     * Validates.
     *
     * @throws IllegalArgumentException for an unknown matching name, listing the known ones
     */
    public HomologyOptions {
        Objects.requireNonNull(complex, "complex");
        Objects.requireNonNull(coefficients, "coefficients");
        matching = HomologyPipeline.requireKnownMatching(matching);
    }

    /** The defaults: automatic choice of complex, integer coefficients, unreduced, no matching. */
    public static HomologyOptions defaults() {
        return new HomologyOptions(ComplexChoice.AUTO, Coefficients.INTEGERS, false, HomologyPipeline.NO_MATCHING);
    }

    /** These options with another choice of complex. */
    public HomologyOptions withComplex(ComplexChoice choice) {
        return new HomologyOptions(choice, coefficients, reduced, matching);
    }
}
