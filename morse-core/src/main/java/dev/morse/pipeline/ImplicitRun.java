package dev.morse.pipeline;

import dev.morse.complex.ComplexKind;
import dev.morse.cw.CwPosetVerdict;
import dev.morse.homology.Homology;
import dev.morse.poset.ChainCounts;
import dev.morse.implicit.ImplicitHomology;
import dev.morse.io.InputException;
import dev.morse.io.InputFormat;
import dev.morse.morsecomplex.MorseReduction;
import dev.morse.poset.Poset;
import dev.morse.posetreduction.ReductionStats;
import dev.morse.report.ComplexEngine;
import dev.morse.report.HomologyReport;
import dev.morse.report.PhaseTiming;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

/**
 * The pipeline's part for order complexes too large to store: the automatic choice between the
 * stored and the implicit order complex, and a run of {@link ImplicitHomology} turned into a report.
 */
final class ImplicitRun {
    /** The name the report gives the implicit engine's matching. */
    static final String MATCHING = "implicit-lexicographic";
    private static final String POSET_REDUCTION = "poset reduction";

    private ImplicitRun() {
    }

    /**
     * Why the stored order complex does, or the reason to generate chains on demand: empty when the
     * chains are few enough to store.
     */
    static Optional<String> reasonForImplicit(Poset poset, HomologyOptions options) {
        long limit = options.storedChainLimit();
        long chains = ChainCounts.totalUpTo(poset, limit);
        if (chains <= limit) {
            return Optional.empty();
        }
        return Optional.of(String.format(Locale.ROOT, "more than %,d chains, too many to store, so the chains"
                + " are generated on demand", limit));
    }

    /** Why the stored order complex was chosen, for a poset with few enough chains. */
    static String reasonForStored(Poset poset, HomologyOptions options) {
        long chains = ChainCounts.totalUpTo(poset, options.storedChainLimit());
        return String.format(Locale.ROOT, "%,d %s, at most the %,d stored", chains, chains == 1 ? "chain" : "chains",
                options.storedChainLimit());
    }

    /**
     * Runs the implicit engine on {@code poset} (the input poset, or what its reduction left) and reports.
     *
     * @param top the dimension of the input's order complex, up to which homology groups are listed
     * @param reduction what the poset reduction did, when it ran
     * @throws InputException when the poset is beyond the engine's limits, with the engine's reason
     */
    static HomologyReport run(String source, Poset poset, int top, Optional<CwPosetVerdict> verdict,
            HomologyOptions options, String reason, PhaseTiming read, PhaseTiming build,
            Optional<ReductionStats> reduction) {
        if (options.matching().equals(HomologyPipeline.NO_MATCHING)) {
            throw new InputException(source, InputException.NO_LINE, "the implicit order complex always uses its own"
                    + " matching; the full Smith normal form on every chain (--matching none) needs --complex order");
        }
        ImplicitHomology.Outcome outcome;
        try {
            outcome = ImplicitHomology.run(poset,
                    new ImplicitHomology.Options(options.elementOrder(), options.coefficients()));
        } catch (IllegalStateException e) {
            throw new InputException(source, InputException.NO_LINE, "too large to compute: " + e.getMessage());
        } catch (OutOfMemoryError e) {
            throw new InputException(source, InputException.NO_LINE, String.format(Locale.ROOT,
                    "too large to compute: the implicit engine ran out of its %,d MiB of heap (raise it with"
                            + " JAVA_OPTS=-Xmx...)", Runtime.getRuntime().maxMemory() >> 20));
        }
        List<PhaseTiming> timings = new ArrayList<>(List.of(read));
        reduction.ifPresent(stats -> timings.add(new PhaseTiming(POSET_REDUCTION, stats.milliseconds())));
        timings.add(build);
        outcome.times().millis().forEach((phase, ms) -> timings.add(new PhaseTiming(phase, ms)));
        Homology unreduced = HomologyPipeline.padded(outcome.homology(), top);
        Homology homology = options.reduced() ? unreduced.toReduced() : unreduced;
        ComplexEngine engine = ComplexEngine.implicit(reason,
                new ComplexEngine.ImplicitRun(outcome.order().optionName(), outcome.search()));
        return new HomologyReport(source, InputFormat.POSET, ComplexKind.ORDER,
                Arrays.stream(outcome.cells()).boxed().toList(), MATCHING,
                Arrays.stream(outcome.critical()).boxed().toList(), homology, verdict, timings, outcome.rounds(),
                MorseReduction.lowerBound(outcome.homology()), List.of(), reduction, Optional.empty(), engine);
    }
}
