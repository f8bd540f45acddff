package dev.morse.cw;

import dev.morse.complex.CellularComplex;
import dev.morse.complex.ChainComplex;
import dev.morse.complex.ComplexChoice;
import dev.morse.complex.OrderComplex;

import dev.morse.poset.Poset;
import java.util.Optional;
import java.util.function.UnaryOperator;

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
        return selectWithVerdict(poset, choice).complex();
    }

    /**
     * Like {@link #select}, also returning the CW poset verdict; the poset is analysed once, whatever
     * the choice.
     */
    public static ComplexSelection selectWithVerdict(Poset poset, ComplexChoice choice) {
        return selectWithVerdict(poset, choice, UnaryOperator.identity());
    }

    /**
     * Like {@link #selectWithVerdict(Poset, ComplexChoice)}, with {@code beforeOrderComplex} applied
     * to the poset just before its order complex is built, and never when the cellular complex is
     * chosen: the place for reductions that keep the homology of the order complex but would spoil
     * the CW structure.
     */
    public static ComplexSelection selectWithVerdict(Poset poset, ComplexChoice choice,
            UnaryOperator<Poset> beforeOrderComplex) {
        if (choice == ComplexChoice.ORDER) {
            return new ComplexSelection(OrderComplex.of(beforeOrderComplex.apply(poset)), Optional.empty());
        }
        if (choice == ComplexChoice.IMPLICIT) {
            throw new IllegalArgumentException(
                    "the implicit order complex stores no cells; dev.morse.implicit.ImplicitHomology computes its homology");
        }
        CellularAttempt attempt = tryCellular(poset);
        CwPosetVerdict verdict = attempt.verdict();
        if (attempt.cellular().isPresent()) {
            return new ComplexSelection(attempt.cellular().get(), Optional.of(verdict));
        }
        if (choice == ComplexChoice.CELLULAR) {
            throw new IllegalArgumentException(verdict.reason());
        }
        return new ComplexSelection(OrderComplex.of(beforeOrderComplex.apply(poset)), Optional.of(verdict));
    }

    /**
     * Analyses the poset once and builds the cellular complex if it is a CW poset; builds no order
     * complex, so a caller can decide whether to store one.
     */
    public static CellularAttempt tryCellular(Poset poset) {
        CwStructure structure = CwPosetCheck.analyse(poset);
        CwPosetVerdict verdict = structure.verdict();
        return new CellularAttempt(verdict, verdict.isCwPoset()
                ? Optional.of(CellularComplex.withIncidences(poset, structure.coverSigns()))
                : Optional.empty());
    }
}
