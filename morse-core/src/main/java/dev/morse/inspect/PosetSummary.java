package dev.morse.inspect;

import dev.morse.cw.CwPosetVerdict;
import dev.morse.complex.FaceCounts;
import java.math.BigInteger;
import java.util.List;
import java.util.Objects;

/**
 * What {@link PosetInspector} found about a poset P and its order complex Δ(P). Immutable.
 *
 * @param elements number of elements
 * @param covers number of cover relations (edges of the Hasse diagram)
 * @param minimal number of minimal elements
 * @param maximal number of maximal elements
 * @param rankSizes elements per height, from 0 (minimal elements) to the largest height; for a
 *     graded poset the height is the rank
 * @param graded whether every cover raises the height by one
 * @param thinFailure empty when P is graded and thin, else why not ({@link ThinCheck})
 * @param cwCheck whether P is a CW poset, and if not the first failure ({@code CwPosetCheck})
 * @param chains nonempty chains of P by dimension (entry d counts chains of d + 1 elements): the
 *     f-vector of Δ(P); empty when they were not counted
 * @param chainsSkipped empty when the chains were counted, else why not
 * @param mobius μ(0̂, 1̂) of P with a bottom and a top adjoined, computed by its own recursion;
 *     {@code null} when the chains were not counted
 */
public record PosetSummary(int elements, int covers, int minimal, int maximal, List<Integer> rankSizes,
        boolean graded, String thinFailure, CwPosetVerdict cwCheck, List<BigInteger> chains, String chainsSkipped,
        BigInteger mobius) {
    /** Validates and copies. */
    public PosetSummary {
        Objects.requireNonNull(thinFailure, "thinFailure");
        Objects.requireNonNull(cwCheck, "cwCheck");
        Objects.requireNonNull(chainsSkipped, "chainsSkipped");
        rankSizes = List.copyOf(rankSizes);
        chains = List.copyOf(chains);
        if (chainsSkipped.isEmpty() != (mobius != null)) {
            throw new IllegalArgumentException("the Möbius function is given exactly when the chains were counted");
        }
    }

    /** Whether P is graded and thin. */
    public boolean thin() {
        return thinFailure.isEmpty();
    }

    /** Whether the chains were counted. */
    public boolean chainsCounted() {
        return chainsSkipped.isEmpty();
    }

    /** The Euler characteristic χ(Δ(P)) = f0 − f1 + f2 − ...; only when the chains were counted. */
    public BigInteger eulerCharacteristic() {
        requireCounted();
        return FaceCounts.eulerCharacteristic(chains);
    }

    /** The reduced Euler characteristic χ(Δ(P)) − 1, which Philip Hall's theorem says is {@link #mobius()}. */
    public BigInteger reducedEulerCharacteristic() {
        requireCounted();
        return FaceCounts.eulerCharacteristic(chains).subtract(BigInteger.ONE);
    }

    /** The dimension of Δ(P): the largest height, -1 for the empty poset. */
    public int orderComplexDimension() {
        return rankSizes.size() - 1;
    }

    private void requireCounted() {
        if (!chainsCounted()) {
            throw new IllegalStateException("the chains were not counted: " + chainsSkipped);
        }
    }
}
