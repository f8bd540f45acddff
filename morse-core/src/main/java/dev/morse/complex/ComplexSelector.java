package dev.morse.complex;

import dev.morse.poset.Poset;

/**
 * Builds the chain complex of a poset that a {@link ComplexChoice} asks for. Either complex has
 * the homology of the order complex, so the choice affects only the number of cells.
 */
public final class ComplexSelector {
    private ComplexSelector() {
    }

    /**
     * The chain complex of {@code poset}: for {@link ComplexChoice#AUTO} the cellular complex exactly
     * when {@link CwPosetCheck} passes, else the order complex.
     *
     * @throws IllegalArgumentException for {@link ComplexChoice#CELLULAR} on a poset that is not a
     *     CW poset, with the verdict's reason
     * @throws IllegalStateException when the order complex is asked for and has too many cells
     * @throws IllegalArgumentException for {@link ComplexChoice#IMPLICIT}, which stores no complex
     */
    public static ChainComplex select(Poset poset, ComplexChoice choice) {
        return switch (choice) {
            case ORDER -> OrderComplex.of(poset);
            case CELLULAR -> CellularComplex.of(poset);
            case IMPLICIT -> throw new IllegalArgumentException(
                    "the implicit order complex stores no cells; dev.morse.implicit.ImplicitHomology computes its homology");
            case AUTO -> {
                CwStructure structure = CwPosetCheck.analyse(poset);
                yield structure.verdict().isCwPoset()
                        ? CellularComplex.from(poset, structure.coverSigns())
                        : OrderComplex.of(poset);
            }
        };
    }
}
