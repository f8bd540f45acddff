package dev.morse.inspect;

import dev.morse.cw.CwPosetCheck;
import dev.morse.cw.CwPosetVerdict;
import dev.morse.complex.FaceCounts;
import dev.morse.poset.ChainCounts;
import dev.morse.poset.Mobius;
import dev.morse.poset.Poset;
import dev.morse.poset.StrictDownSets;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;

/**
 * Gathers a {@link PosetSummary}: sizes and ranks from the Hasse diagram, gradedness, thinness
 * ({@link ThinCheck}), the CW poset verdict ({@link CwPosetCheck}), the chains of Δ(P) per dimension
 * ({@link FaceCounts#chainCounts}) and μ(0̂, 1̂) of P with bounds adjoined
 * ({@link Mobius#withBoundsAdjoined}). The last two need the comparable pairs of P, 4 bytes each,
 * and are skipped, with the reason, when there are more than a limit.
 *
 * <p>The two are computed independently and must agree by Philip Hall's theorem: μ(0̂, 1̂) of P̂ is
 * the reduced Euler characteristic of Δ(P) (Stanley, Enumerative Combinatorics I, Prop. 3.8.5); a
 * disagreement is a bug here and raises {@link IllegalStateException}.
 */
public final class PosetInspector {
    /** The default bound on comparable pairs held for counting chains: 2^28, one GiB of ints. */
    public static final long DEFAULT_MAX_PAIRS = 1L << 28;

    private PosetInspector() {
    }

    /** Inspects {@code poset} with the default bound on comparable pairs. */
    public static PosetSummary inspect(Poset poset) {
        return inspect(poset, DEFAULT_MAX_PAIRS);
    }

    /**
     * Inspects {@code poset}.
     *
     * @param maxPairs the most comparable pairs to hold for counting chains
     * @throws IllegalStateException if Philip Hall's theorem fails on the numbers found
     */
    public static PosetSummary inspect(Poset poset, long maxPairs) {
        int n = poset.size();
        int minimal = 0;
        int maximal = 0;
        int[] perHeight = new int[poset.maxHeight() + 1];
        for (int x = 0; x < n; x++) {
            minimal += poset.lowerCovers().degree(x) == 0 ? 1 : 0;
            maximal += poset.upperCovers().degree(x) == 0 ? 1 : 0;
            perHeight[poset.height(x)]++;
        }
        List<Integer> rankSizes = new ArrayList<>();
        for (int c : perHeight) {
            rankSizes.add(c);
        }
        CwPosetVerdict verdict = CwPosetCheck.check(poset);
        String thin = ThinCheck.failure(poset);
        StrictDownSets downSets;
        try {
            // each element lies above at least its height many others (a longest chain below it), so
            // their sum bounds the comparable pairs from below at no cost: a long chain is refused at
            // once instead of after filling a GiB of down-sets
            long atLeast = 0;
            for (int x = 0; x < n; x++) {
                atLeast += poset.height(x);
            }
            if (atLeast > maxPairs) {
                throw new IllegalStateException("the poset has at least " + atLeast
                        + " comparable pairs (each element lies above at least its height many)");
            }
            downSets = StrictDownSets.of(poset, maxPairs);
        } catch (IllegalStateException tooMany) {
            return new PosetSummary(n, poset.coverCount(), minimal, maximal, rankSizes, poset.isGraded(), thin, verdict,
                    List.of(), "not counted: " + tooMany.getMessage() + ", more than this inspection holds", null);
        }
        List<BigInteger> chains = ChainCounts.exact(poset);
        BigInteger mobius = Mobius.withBoundsAdjoined(poset, downSets);
        PosetSummary summary = new PosetSummary(n, poset.coverCount(), minimal, maximal, rankSizes, poset.isGraded(),
                thin, verdict, chains, "", mobius);
        if (!mobius.equals(summary.reducedEulerCharacteristic())) {
            throw new IllegalStateException("Philip Hall's theorem fails: μ(0̂, 1̂) = " + mobius
                    + " but the chains give a reduced Euler characteristic of " + summary.reducedEulerCharacteristic());
        }
        return summary;
    }
}
