package dev.morse.input;

import dev.morse.complex.Facets;

/**
 * A simplicial file as read; it stands for the simplicial complex of all faces of its listed faces.
 *
 * @param source the name the file was given by
 * @param facets the listed faces
 * @param readMillis milliseconds spent reading
 */
public record FacetInput(String source, Facets facets, double readMillis) implements Input {
}
