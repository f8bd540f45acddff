package dev.morse.homology;

import java.math.BigInteger;
import java.util.List;

/**
 * The Smith normal form of an integer matrix, summarised: its rank and the invariant factors
 * greater than 1 (ascending, each dividing the next); the other {@code rank - nonUnitFactors.size()}
 * invariant factors are 1.
 */
public record SmithInvariants(int rank, List<BigInteger> nonUnitFactors) {
    /** Validates and copies. */
    public SmithInvariants {
        nonUnitFactors = List.copyOf(nonUnitFactors);
        if (rank < nonUnitFactors.size()) {
            throw new IllegalArgumentException("more factors than the rank");
        }
        for (int i = 0; i < nonUnitFactors.size(); i++) {
            BigInteger t = nonUnitFactors.get(i);
            if (t.compareTo(BigInteger.ONE) <= 0 || (i > 0 && t.mod(nonUnitFactors.get(i - 1)).signum() != 0)) {
                throw new IllegalArgumentException("factors must exceed 1 and divide one another");
            }
        }
    }
}
