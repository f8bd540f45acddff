package dev.morse.implicit;

import dev.morse.poset.Poset;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;

/**
 * The way back from the implicit engine's Morse complex to chains of Δ(P): a vector over the
 * critical chains of one dimension lifted along the gradient flow of the same matching, with
 * partners computed on demand ({@link ChainMatching}) and the faces met kept only for the one lift
 * ({@link LocalGradientSweep#lift}). The bounded poset is rebuilt from the poset and the run's
 * element order, which numbers it as the run did. Not thread-safe.
 */
public final class ImplicitCycleLift {
    private final BoundedPoset bounded;
    private final CriticalChains critical;
    private final LocalGradientSweep sweep;

    /**
     * Prepares lifts for the run {@code outcome} of the implicit engine on {@code poset}, visiting at
     * most {@code visitLimit} chains per lift.
     */
    public ImplicitCycleLift(Poset poset, ImplicitHomology.Outcome outcome, long visitLimit) {
        this.bounded = BoundedPoset.of(poset, outcome.order()::ranks, Runtime.getRuntime().maxMemory() / 2);
        this.critical = outcome.chains().chains();
        this.sweep = new LocalGradientSweep(new ChainMatching(bounded), visitLimit);
    }

    /**
     * The chain of Δ(P) that the vector {@code coefficients} over the critical chains of dimension
     * {@code d} (in the order of the Morse complex) lifts to: each chain as element ids of the poset
     * from the bottom up, with its coefficient, in step.
     *
     * @throws IllegalStateException when the lift would visit more chains than the limit
     */
    public Lifted lift(int d, BigInteger[] coefficients) {
        List<int[]> chains = new ArrayList<>();
        List<BigInteger> values = new ArrayList<>();
        for (int k = 0; k < coefficients.length; k++) {
            if (coefficients[k].signum() != 0) {
                int[] chain = new int[d + 1];
                critical.copy(d, k, chain);
                chains.add(chain);
                values.add(coefficients[k]);
            }
        }
        LocalGradientSweep.LiftedChain lifted = sweep.lift(chains, values, d);
        List<int[]> original = new ArrayList<>();
        for (int[] chain : lifted.chains()) {
            int[] ids = new int[chain.length];
            for (int i = 0; i < chain.length; i++) {
                ids[i] = bounded.original(chain[i]);
            }
            original.add(ids);
        }
        return new Lifted(original, lifted.coefficients());
    }

    /**
     * A chain of Δ(P): its chains, each as poset element ids from the bottom up, and their nonzero
     * coefficients, in step.
     */
    public record Lifted(List<int[]> chains, List<BigInteger> coefficients) {
        /** Copies. */
        public Lifted {
            chains = List.copyOf(chains);
            coefficients = List.copyOf(coefficients);
        }
    }
}
