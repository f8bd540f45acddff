package dev.morse.homology;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Smith normal form of sparse integer matrices: the production path used for homology.
 *
 * <p>Method ({@link IntegerElimination} does the work), in three phases:
 * <ol>
 *   <li>Unit pivots: entries ±1 are eliminated in long arithmetic, chosen to limit fill-in by the
 *       Markowitz rule (Markowitz 1957); sparse elimination with unit pivots first is common
 *       practice for homology. Entries grow only by addition, and each pivot contributes an
 *       invariant factor 1. Boundary matrices of simplicial and cellular complexes are almost
 *       entirely eliminated here, which is why this path is fast on them.</li>
 *   <li>If a core without unit entries is left, its rank r and a nonzero r×r minor D are found by
 *       fraction-free elimination on a copy, with every row kept primitive so that no entry
 *       exceeds the minors of the core.</li>
 *   <li>The core is diagonalised by Euclidean steps (Smith 1861) with entries reduced modulo
 *       {@code M = 2|D|}, which keeps them below M. Over Z/M the core's Smith form is
 *       {@code diag(gcd(d_i, M))} for its invariant factors d_i, zeros giving M. Since
 *       {@code d_1⋯d_r} divides D, every {@code d_i <= |D| < M}: after normalising the modular
 *       diagonal ({@link InvariantFactors}) the factors below M are exactly d_1, ..., d_r.</li>
 * </ol>
 *
 * <p>Exactness: all arithmetic is in {@code long} with every operation checked for overflow; a
 * row operation that would overflow is redone in {@link BigInteger}, so results are exact for
 * every input, including invariant factors beyond {@link Long#MAX_VALUE}.
 *
 * <p>Checked against the independent dense oracle {@link DenseSmithOracle}.
 */
public final class SparseSmithNormalForm {
    private SparseSmithNormalForm() {
    }

    /**
     * The Smith form of {@code matrix}: its rank and its invariant factors greater than 1. Entries
     * the matrix lists twice at one position are summed. A matrix with no rows or no columns has
     * rank 0.
     *
     * @throws IllegalStateException only on an internal inconsistency, never with a wrong answer
     */
    public static SmithInvariants compute(SparseIntegerMatrix matrix) {
        if (matrix.rows() == 0 || matrix.columns() == 0 || matrix.nonZeros() == 0) {
            return new SmithInvariants(0, List.of());
        }
        IntegerElimination elimination = new IntegerElimination(matrix, IntegerElimination.Mode.UNITS).run();
        int unitRank = elimination.pivotCount();
        int coreRows = elimination.activeRows();
        int coreColumns = elimination.activeColumns();
        if (coreRows == 0) {
            return new SmithInvariants(unitRank, List.of());
        }
        IntegerElimination determinant = elimination.copyForDeterminant().run();
        int coreRank = determinant.pivotCount();
        BigInteger modulus = determinant.pivotDeterminant().abs().shiftLeft(1);
        elimination.continueModulo(modulus).run();

        int diagonalLength = Math.min(coreRows, coreColumns);
        List<BigInteger> diagonal = new ArrayList<>();
        // Pivots repeat (often all 2): one gcd with the long modulus per distinct value.
        Map<BigInteger, BigInteger> gcdWithModulus = new HashMap<>();
        for (BigInteger pivot : elimination.nonUnitPivots()) {
            diagonal.add(gcdWithModulus.computeIfAbsent(pivot, modulus::gcd));
        }
        for (int k = elimination.pivotCount() - unitRank; k < diagonalLength; k++) {
            diagonal.add(modulus);
        }
        List<BigInteger> chain = InvariantFactors.chain(diagonal);
        int zeros = diagonalLength - coreRank;
        int kept = chain.size() - zeros;
        for (int i = 0; i < chain.size(); i++) {
            if ((i < kept) != (chain.get(i).compareTo(modulus) < 0)) {
                throw new IllegalStateException("modular diagonal disagrees with the rank of the core");
            }
        }
        return new SmithInvariants(unitRank + coreRank, chain.subList(0, Math.max(kept, 0)));
    }
}
