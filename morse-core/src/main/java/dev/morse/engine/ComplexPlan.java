package dev.morse.engine;

import dev.morse.complex.ChainComplex;
import dev.morse.complex.ComplexKind;
import dev.morse.cw.CwPosetVerdict;
import dev.morse.poset.Poset;
import dev.morse.posetreduction.ReductionStats;
import java.util.Objects;
import java.util.Optional;

/**
 * The complex chosen for an input and why: either a stored complex, or a poset whose order complex
 * the implicit engine generates on demand, with the CW poset verdict, what the poset reduction did,
 * and the chains counted while choosing (so that nobody counts them again). Made only by
 * {@link ComplexPolicy}. Immutable.
 *
 * @param kind which complex it is
 * @param stored the stored complex, or empty for the implicit engine
 * @param implicitPoset the poset (after its reduction) whose order complex is generated on demand
 * @param chainsPerDimension for the implicit engine, the chains per dimension when they were counted
 *     while choosing (empty array otherwise)
 * @param reason why this complex and engine, when the choice was automatic; empty otherwise
 * @param cwCheck the CW poset verdict, when the check was made
 * @param posetReduction what the poset reduction did, when it ran
 * @param topDimension the dimension up to which homology groups are listed (that of the input's
 *     order complex, which a reduced poset may undercut)
 * @param buildMillis milliseconds spent choosing and building, less the poset reduction's
 */
public record ComplexPlan(ComplexKind kind, Optional<ChainComplex> stored, Optional<Poset> implicitPoset,
        long[] chainsPerDimension, String reason, Optional<CwPosetVerdict> cwCheck,
        Optional<ReductionStats> posetReduction, int topDimension, double buildMillis) {
    /** Validates: exactly one of a stored complex and an implicit poset. */
    public ComplexPlan {
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(reason, "reason");
        Objects.requireNonNull(cwCheck, "cwCheck");
        Objects.requireNonNull(posetReduction, "posetReduction");
        if (stored.isPresent() == implicitPoset.isPresent()) {
            throw new IllegalArgumentException("a plan has a stored complex or an implicit poset, not both");
        }
        chainsPerDimension = chainsPerDimension.clone();
    }

    /** Whether the order complex is generated on demand rather than stored. */
    public boolean isImplicit() {
        return implicitPoset.isPresent();
    }

    /** The engine that runs this plan. */
    public ComputationEngine engine() {
        return isImplicit() ? ImplicitEngine.INSTANCE : StoredEngine.INSTANCE;
    }

    /** A copy. */
    @Override
    public long[] chainsPerDimension() {
        return chainsPerDimension.clone();
    }
}
