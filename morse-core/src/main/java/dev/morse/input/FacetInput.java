package dev.morse.input;

import dev.morse.complex.Facets;
import dev.morse.io.InputFormat;
import java.util.Objects;

/**
 * A simplicial file as read; it stands for the simplicial complex of all faces of its listed faces.
 *
 * @param source the name the file was given by
 * @param facets the listed faces
 * @param readMillis milliseconds spent reading
 */
public record FacetInput(String source, Facets facets, double readMillis) implements Input {
    /** Validates. */
    public FacetInput {
        Objects.requireNonNull(source, "source");
        Objects.requireNonNull(facets, "facets");
    }

    @Override
    public InputFormat format() {
        return InputFormat.SIMPLICIAL;
    }
}
