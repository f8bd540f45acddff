package dev.morse.generate;

import dev.morse.complex.ChainComplex;
import dev.morse.complex.SimplicialComplex;
import dev.morse.cw.CwPosetCheck;
import java.util.Arrays;
import java.util.Objects;
import java.util.Optional;

/**
 * One complex of the hard library: the generated input, the chain complex it denotes (the
 * simplicial complex, or the cellular complex of a CW poset), and the optimal discrete Morse vector
 * where the literature gives it, with the source. Immutable.
 *
 * @param name short name, without spaces
 * @param input the generated input
 * @param knownOptimum critical cells per dimension of an optimal Morse matching, or null if unknown
 * @param source where the complex and its optimum come from
 */
public record HardComplex(String name, Generated input, int[] knownOptimum, String source) {
    /** Copies and validates. */
    public HardComplex {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(input, "input");
        Objects.requireNonNull(source, "source");
        knownOptimum = knownOptimum == null ? null : knownOptimum.clone();
        if (input instanceof Generated.OfVoxels) {
            throw new IllegalArgumentException("the hard library holds simplicial complexes and CW posets");
        }
    }

    /** The optimal vector from the literature, if known. */
    public Optional<int[]> optimum() {
        return Optional.ofNullable(knownOptimum).map(int[]::clone);
    }

    /** A copy, or null. */
    @Override
    public int[] knownOptimum() {
        return knownOptimum == null ? null : knownOptimum.clone();
    }

    /** The chain complex: simplicial for listed faces, cellular for a CW poset. */
    public ChainComplex complex() {
        if (input instanceof Generated.OfFacets facets) {
            return SimplicialComplex.of(facets.facets());
        }
        return CwPosetCheck.cellularComplex(((Generated.OfPoset) input).poset());
    }

    @Override
    public boolean equals(Object other) {
        return other instanceof HardComplex h && h.name.equals(name) && h.input.equals(input)
                && Arrays.equals(h.knownOptimum, knownOptimum) && h.source.equals(source);
    }

    @Override
    public int hashCode() {
        return Objects.hash(name, input, Arrays.hashCode(knownOptimum), source);
    }

    @Override
    public String toString() {
        return name + " (" + input.description() + ")";
    }
}
