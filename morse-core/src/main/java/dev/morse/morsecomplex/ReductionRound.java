package dev.morse.morsecomplex;

/** Cells per dimension left after one round of algebraic reduction, and the pairs it removed. */
public record ReductionRound(int round, int[] cellCounts, int pairsRemoved) {
    /** Copies the counts. */
    public ReductionRound {
        cellCounts = cellCounts.clone();
    }

    /** A copy of the counts. */
    @Override
    public int[] cellCounts() {
        return cellCounts.clone();
    }
}
