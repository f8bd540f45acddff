package dev.morse.inspect;

import dev.morse.input.ChainComplexInput;
import dev.morse.input.FacetInput;
import dev.morse.input.Input;
import dev.morse.input.PosetInput;
import dev.morse.input.VoxelInput;
import java.util.function.BiFunction;

/** The summary of any input, handed to the view that fits its kind. */
public final class Inspections {
    private Inspections() {
    }

    /**
     * Inspects {@code input} and shows its summary, with the input's name, by the view for its kind.
     */
    public static <T> T show(Input input, BiFunction<String, PosetSummary, T> poset,
            BiFunction<String, SimplicialSummary, T> simplicial, BiFunction<String, ChainComplexSummary, T> matrices,
            BiFunction<String, ImageSummary, T> image) {
        String source = input.source();
        if (input instanceof PosetInput p) {
            return poset.apply(source, PosetInspector.inspect(p.poset()));
        }
        if (input instanceof FacetInput f) {
            return simplicial.apply(source, SimplicialInspector.inspect(f.facets()));
        }
        if (input instanceof ChainComplexInput given) {
            return matrices.apply(source, ChainComplexSummary.of(given.complex()));
        }
        return image.apply(source, ImageInspector.inspect(((VoxelInput) input).image()));
    }
}
