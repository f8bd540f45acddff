package dev.morse.pipeline;

import dev.morse.complex.Facets;
import dev.morse.io.InputFormat;
import dev.morse.poset.Poset;
import java.util.Objects;

/**
 * One input file as read: a poset or a list of faces, with the name it was given by.
 *
 * @param source the file name as the user gave it
 * @param format the format read
 * @param poset the poset, for {@link InputFormat#POSET}; otherwise {@code null}
 * @param facets the listed faces, for {@link InputFormat#SIMPLICIAL}; otherwise {@code null}
 * @param readMillis how long reading took
 */
public record LoadedInput(String source, InputFormat format, Poset poset, Facets facets, double readMillis) {
    /** Validates that exactly the format's content is present. */
    public LoadedInput {
        Objects.requireNonNull(source, "source");
        Objects.requireNonNull(format, "format");
        if ((format == InputFormat.POSET) != (poset != null) || (format == InputFormat.SIMPLICIAL) != (facets != null)) {
            throw new IllegalArgumentException("a poset input holds a poset, a simplicial input its faces");
        }
    }

    /** A poset input. */
    public static LoadedInput ofPoset(String source, Poset poset, double readMillis) {
        return new LoadedInput(source, InputFormat.POSET, poset, null, readMillis);
    }

    /** A simplicial input. */
    public static LoadedInput ofFacets(String source, Facets facets, double readMillis) {
        return new LoadedInput(source, InputFormat.SIMPLICIAL, null, facets, readMillis);
    }
}
