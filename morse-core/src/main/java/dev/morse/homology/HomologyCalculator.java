package dev.morse.homology;

import dev.morse.complex.ChainComplex;
import dev.morse.progress.Progress;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;

/**
 * Homology of a chain complex from the Smith forms (or ranks) of its boundary maps:
 * {@code β_d = f_d - rank ∂_d - rank ∂_(d+1)} and the torsion of {@code H_d} is the non-unit
 * invariant factors of {@code ∂_(d+1)} (common practice; e.g. Munkres, Elements of Algebraic
 * Topology, 1984, §11).
 */
public final class HomologyCalculator {
    private HomologyCalculator() {
    }

    /** Unreduced homology of {@code complex} over {@code coefficients}. */
    public static Homology compute(ChainComplex complex, Coefficients coefficients) {
        int top = complex.dimension();
        int[] rank = new int[top + 2];
        List<List<BigInteger>> torsionBelow = new ArrayList<>();
        for (int d = 0; d <= top + 1; d++) {
            torsionBelow.add(List.of());
        }
        Progress progress = Progress.current();
        progress.begin("homology", "columns", complex.cellCount() - complex.cellCount(0));
        long columnsDone = 0;
        for (int d = 1; d <= top; d++) {
            // the Smith normal form may report its own steps; the count is set right after each matrix
            progress.reached(columnsDone);
            columnsDone += complex.cellCount(d);
            SparseIntegerMatrix boundary = SparseIntegerMatrix.boundaryOf(complex, d);
            if (coefficients.hasTorsion() || coefficients.ring() == Coefficients.Ring.RATIONALS) {
                SmithForm form = SmithNormalForm.compute(boundary);
                rank[d] = form.rank();
                if (coefficients.hasTorsion()) {
                    torsionBelow.set(d - 1, form.nonUnitFactors());
                }
            } else {
                rank[d] = ModularRank.rank(boundary, coefficients.prime());
            }
        }
        List<HomologyGroup> groups = new ArrayList<>();
        for (int d = 0; d <= top; d++) {
            int betti = complex.cellCount(d) - rank[d] - rank[d + 1];
            groups.add(new HomologyGroup(d, betti, torsionBelow.get(d)));
        }
        return new Homology(coefficients, false, groups);
    }
}
