package dev.morse.interval;

import dev.morse.complex.SimplicialComplex;
import dev.morse.input.FacetInput;
import dev.morse.input.Input;
import dev.morse.input.PosetInput;
import dev.morse.input.VoxelInput;
import dev.morse.io.InputException;
import dev.morse.poset.Poset;

/**
 * The poset whose intervals a sweep visits, for each kind of input: a poset file's own poset; for a
 * simplicial file, its face poset (nonempty faces by inclusion, each labelled like {@code {a b}}),
 * whose order complex is the barycentric subdivision of the complex, so that the verdicts (all of
 * them topological or combinatorial invariants of the complex; Munkres 1984 for Cohen–Macaulayness)
 * are the complex's own. Images have no sweep.
 */
public final class SweepInputs {
    private SweepInputs() {
    }

    /**
     * The poset to sweep for {@code input}.
     *
     * @throws InputException for an image or volume
     */
    public static Poset posetOf(Input input) {
        if (input instanceof PosetInput poset) {
            return poset.poset();
        }
        if (input instanceof FacetInput facets) {
            return SimplicialComplex.of(facets.facets()).facePoset();
        }
        throw new InputException(input.source(), InputException.NO_LINE, "an interval sweep needs a poset or a"
                + " simplicial file, not " + (input instanceof VoxelInput ? "an image" : "a chain complex given by matrices"));
    }
}
