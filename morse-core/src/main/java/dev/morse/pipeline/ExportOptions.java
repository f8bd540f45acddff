package dev.morse.pipeline;

import dev.morse.complex.ComplexChoice;
import java.util.Objects;

/**
 * What a Morse complex export should build.
 *
 * @param complex which complex to build from a poset
 * @param matching the heuristic whose Morse complex is exported
 * @param seed the seed of the heuristic's random choices
 */
public record ExportOptions(ComplexChoice complex, String matching, long seed) {
    /** Validates. */
    public ExportOptions {
        Objects.requireNonNull(complex, "complex");
        matching = HomologyPipeline.requireKnownMatching(matching);
    }
}
