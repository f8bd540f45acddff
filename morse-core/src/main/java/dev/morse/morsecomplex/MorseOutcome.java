package dev.morse.morsecomplex;

import dev.morse.homology.Homology;
import java.util.List;
import java.util.Optional;

/**
 * What a Morse reduction of a complex found, whichever engine ran it: the cells and the critical
 * cells of the acyclic matching, the Morse complex when it was built, the algebraic rounds, and the
 * unreduced homology. Both engines' results are read through this view, so reports and exports
 * need not know which ran.
 */
public interface MorseOutcome {
    /** The name of the matching, as reports show it. */
    String matchingName();

    /** Cells per dimension of the complex that was matched. */
    long[] cells();

    /** Critical cells per dimension of the matching. */
    int[] critical();

    /** Cells left after each round of algebraic reduction of the Morse complex (empty when none ran). */
    List<ReductionRound> rounds();

    /** The unreduced homology, over the coefficients asked for. */
    Homology homology();

    /** Milliseconds per phase, in the order the phases ran. */
    PhaseTimes times();

    /**
     * The Morse complex before any algebraic reduction: the boundaries between critical cells. Empty
     * when none was built: without a matching, or when a coefficient left the range of a long and the
     * answer was computed on every cell instead.
     */
    Optional<MorseComplex> morseComplex();

    /** The names of the critical cells of dimension {@code dimension}, in the order of the Morse complex's rows and columns. */
    List<String> criticalCellNames(int dimension);

    /** Total number of critical cells. */
    default long totalCritical() {
        long total = 0;
        for (int m : critical()) {
            total += m;
        }
        return total;
    }
}
