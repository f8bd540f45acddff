package dev.morse.complex;

import dev.morse.poset.Poset;
import java.util.Optional;

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
     */
    public static ChainComplex select(Poset poset, ComplexChoice choice) {
        return switch (choice) {
            case ORDER -> OrderComplex.of(poset);
            case CELLULAR -> CellularComplex.of(poset);
            case AUTO -> {
                CwStructure structure = CwPosetCheck.analyse(poset);
                yield structure.verdict().isCwPoset()
                        ? CellularComplex.from(poset, structure.coverSigns())
                        : OrderComplex.of(poset);
            }
        };
    }

    /**
     * A chosen complex and the CW poset verdict it was chosen by.
     *
     * @param complex the chain complex built
     * @param verdict the verdict of {@link CwPosetCheck}, empty when no check was made
     *     ({@link ComplexChoice#ORDER})
     */
    public record Selection(ChainComplex complex, Optional<CwPosetVerdict> verdict) {
    }

    /**
     * Like {@link #select}, but keeps the verdict, and checks the poset only once. For
     * {@link ComplexChoice#CELLULAR} on a poset that is not a CW poset, the selection has no complex:
     * {@code complex} is {@code null} and the verdict says why.
     *
     * @throws IllegalStateException when the order complex is needed and has too many cells
     */
    public static Selection selectWithVerdict(Poset poset, ComplexChoice choice) {
        if (choice == ComplexChoice.ORDER) {
            return new Selection(OrderComplex.of(poset), Optional.empty());
        }
        CwStructure structure = CwPosetCheck.analyse(poset);
        Optional<CwPosetVerdict> verdict = Optional.of(structure.verdict());
        if (structure.verdict().isCwPoset()) {
            return new Selection(CellularComplex.from(poset, structure.coverSigns()), verdict);
        }
        return new Selection(choice == ComplexChoice.CELLULAR ? null : OrderComplex.of(poset), verdict);
    }
}
