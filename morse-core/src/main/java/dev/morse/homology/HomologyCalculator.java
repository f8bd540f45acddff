package dev.morse.homology;

import dev.morse.complex.ChainComplex;
import dev.morse.progress.Progress;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;
import java.util.function.IntFunction;

/**
 * Homology of a chain complex from its boundary maps: {@code β_d = f_d - rank ∂_d - rank ∂_(d+1)},
 * and over the integers the torsion of {@code H_d} is the invariant factors greater than 1 of
 * {@code ∂_(d+1)} (common practice; e.g. Munkres, Elements of Algebraic Topology, 1984, §11).
 *
 * <p>Each boundary map is reduced once, by the method that fits the coefficients: over Z its
 * Smith normal form ({@link SparseSmithNormalForm}), over Q its rational rank ({@link RationalRank}),
 * over Z/p its rank modulo p ({@link ModularRank}). Only one boundary matrix is held at a time.
 */
public final class HomologyCalculator {
    private HomologyCalculator() {
    }

    /** Unreduced homology of {@code complex} over {@code coefficients}. */
    public static Homology compute(ChainComplex complex, Coefficients coefficients) {
        return fromBoundaries(complex.cellCounts(), d -> SparseIntegerMatrix.boundaryOf(complex, d), coefficients);
    }

    /**
     * Unreduced homology of a chain complex given by its cells per dimension and its boundary
     * matrices, {@code boundary.apply(d)} being {@code ∂_d} for {@code 1 <= d < cellCounts.length}
     * (rows: cells of dimension {@code d - 1}); each matrix is asked for once.
     */
    public static Homology fromBoundaries(int[] cellCounts, IntFunction<SparseIntegerMatrix> boundary,
            Coefficients coefficients) {
        int top = cellCounts.length - 1;
        int[] rank = new int[top + 2];
        List<List<BigInteger>> torsion = new ArrayList<>();
        for (int d = 0; d <= top; d++) {
            torsion.add(List.of());
        }
        long columns = 0;
        for (int d = 1; d <= top; d++) {
            columns += cellCounts[d];
        }
        Progress progress = Progress.current();
        progress.begin("homology", "columns", columns);
        long columnsDone = 0;
        for (int d = 1; d <= top; d++) {
            // the Smith normal form may report its own steps; the count is set right after each matrix
            progress.reached(columnsDone);
            columnsDone += cellCounts[d];
            SparseIntegerMatrix matrix = boundary.apply(d);
            switch (coefficients.ring()) {
                case INTEGERS -> {
                    SmithInvariants form = SparseSmithNormalForm.compute(matrix);
                    rank[d] = form.rank();
                    torsion.set(d - 1, form.nonUnitFactors());
                }
                case RATIONALS -> rank[d] = RationalRank.rank(matrix);
                case PRIME_FIELD -> rank[d] = ModularRank.rank(matrix, coefficients.prime());
                default -> throw new IllegalArgumentException("unknown ring " + coefficients.ring());
            }
        }
        List<HomologyGroup> groups = new ArrayList<>();
        for (int d = 0; d <= top; d++) {
            int betti = cellCounts[d] - rank[d] - rank[d + 1];
            groups.add(new HomologyGroup(d, betti, torsion.get(d)));
        }
        return new Homology(coefficients, false, groups);
    }

    /**
     * Homology of {@code complex} over {@code coefficients}, reduced when {@code reduced} is set
     * (see {@link Homology#toReduced()}).
     */
    public static Homology compute(ChainComplex complex, Coefficients coefficients, boolean reduced) {
        Homology homology = compute(complex, coefficients);
        return reduced ? homology.toReduced() : homology;
    }
}
