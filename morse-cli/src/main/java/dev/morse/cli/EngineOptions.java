package dev.morse.cli;

import dev.morse.complex.ComplexChoice;
import dev.morse.engine.Request;
import dev.morse.homology.Coefficients;
import dev.morse.implicit.ElementOrder;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;

/** How homology is computed: the complex, the engine, the coefficients, and the reductions before matching. */
final class EngineOptions {
    @Option(names = "--complex", paramLabel = "auto|order|cellular|implicit", defaultValue = "auto",
            converter = OptionConverters.ComplexValues.class, completionCandidates = OptionConverters.ComplexValues.class,
            description = "Complex to build from a poset: cellular when it is a CW poset, else the order complex,"
                    + " stored or with chains generated on demand when they are too many (auto, the default);"
                    + " always the stored order complex; insist on the cellular complex; or always generate the"
                    + " chains of the order complex on demand.")
    private ComplexChoice complex;

    @Option(names = "--coefficients", paramLabel = "Z|Q|P", defaultValue = "Z",
            converter = OptionConverters.CoefficientsConverter.class,
            description = "Coefficients: the integers Z (default, with torsion), the rationals Q, or Z/P for a prime P.")
    private Coefficients coefficients;

    @Option(names = "--reduced", description = "Report reduced homology.")
    private boolean reduced;

    @Option(names = "--no-poset-reduction",
            description = "Build the order complex on the poset as given, without first removing beat points and"
                    + " elements with acyclic links (which keeps the homology and is on by default).")
    private boolean noPosetReduction;

    @Option(names = "--element-order", paramLabel = "NAME", defaultValue = "down-sets",
            converter = OptionConverters.ElementOrderValues.class,
            completionCandidates = OptionConverters.ElementOrderValues.class,
            description = "Order of covers that fixes the matching of the order complex generated on demand;"
                    + " available: ${COMPLETION-CANDIDATES} (default ${DEFAULT-VALUE}).")
    private ElementOrder elementOrder;

    @Option(names = "--max-stored-chains", paramLabel = "N", defaultValue = "1000000",
            description = "With --complex auto, a poset with more chains than this gets its order complex generated"
                    + " on demand instead of stored (default ${DEFAULT-VALUE}).")
    private long maxStoredChains;

    /**
     * The request these options and the matching options make.
     *
     * @throws ParameterException naming the option out of range
     */
    Request request(CommandSpec spec, MatchingRuns runs, String matching) {
        try {
            return new Request(complex, coefficients, reduced, matching, runs.seed(), runs.trials(), runs.verify(),
                    !noPosetReduction, elementOrder, maxStoredChains, Long.MAX_VALUE, runs.timeLimit());
        } catch (IllegalArgumentException e) {
            throw new ParameterException(spec.commandLine(), e.getMessage());
        }
    }
}
