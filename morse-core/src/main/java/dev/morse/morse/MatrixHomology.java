package dev.morse.morse;

import dev.morse.homology.Coefficients;
import dev.morse.homology.Homology;
import dev.morse.homology.HomologyGroup;
import dev.morse.homology.ModularRank;
import dev.morse.homology.SmithForm;
import dev.morse.homology.SmithNormalForm;
import dev.morse.homology.SparseIntegerMatrix;
import dev.morse.progress.Progress;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;

/** Homology of a {@link MorseComplex} from the Smith forms or ranks of its boundary matrices. */
final class MatrixHomology {
    private MatrixHomology() {
    }

    static Homology compute(MorseComplex complex, Coefficients coefficients) {
        int top = complex.dimension();
        int[] rank = new int[top + 2];
        List<List<BigInteger>> torsion = new ArrayList<>();
        for (int d = 0; d <= top + 1; d++) {
            torsion.add(List.of());
        }
        Progress progress = Progress.current();
        progress.begin("homology", "columns", complex.totalCells() - complex.cellCount(0));
        long columnsDone = 0;
        for (int d = 1; d <= top; d++) {
            // the Smith normal form may report its own steps; the count is set right after each matrix
            progress.reached(columnsDone);
            columnsDone += complex.cellCount(d);
            SparseIntegerMatrix m = complex.boundary(d);
            if (coefficients.ring() == Coefficients.Ring.PRIME_FIELD) {
                rank[d] = ModularRank.rank(m, coefficients.prime());
            } else {
                SmithForm form = SmithNormalForm.compute(m);
                rank[d] = form.rank();
                if (coefficients.hasTorsion()) {
                    torsion.set(d - 1, form.nonUnitFactors());
                }
            }
        }
        List<HomologyGroup> groups = new ArrayList<>();
        for (int d = 0; d <= top; d++) {
            groups.add(new HomologyGroup(d, complex.cellCount(d) - rank[d] - rank[d + 1], torsion.get(d)));
        }
        return new Homology(coefficients, false, groups);
    }
}
