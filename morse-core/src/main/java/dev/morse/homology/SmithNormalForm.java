package dev.morse.homology;

/**
 * Smith normal form of sparse integer matrices: the production path used for homology.
 */
public final class SmithNormalForm {
    private SmithNormalForm() {
    }

    /** The Smith form of {@code matrix}. */
    public static SmithForm compute(SparseIntegerMatrix matrix) {
        return DenseSmithNormalForm.compute(matrix);
    }
}
