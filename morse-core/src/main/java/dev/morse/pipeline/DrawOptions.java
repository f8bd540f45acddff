package dev.morse.pipeline;

import dev.morse.complex.ComplexChoice;
import java.util.Objects;

/**
 * What a Hasse diagram picture should show.
 *
 * @param complex for a poset: {@code auto} draws its own Hasse diagram, with the matching of its
 *     cellular complex marked when it is a CW poset; {@code cellular} insists on that;
 *     {@code order} draws the face poset of its order complex, one node per chain
 * @param matching the heuristic whose matching is marked
 * @param seed the seed of the heuristic's random choices
 */
public record DrawOptions(ComplexChoice complex, String matching, long seed) {
    /** Validates. */
    public DrawOptions {
        Objects.requireNonNull(complex, "complex");
        matching = HomologyPipeline.requireKnownMatching(matching);
    }
}
