package dev.morse.cli;

import dev.morse.complex.ComplexChoice;
import dev.morse.homology.Coefficients;
import dev.morse.implicit.ElementOrder;
import dev.morse.matching.MatchingHeuristics;
import dev.morse.pipeline.HomologyOptions;
import dev.morse.pipeline.HomologyPipeline;
import dev.morse.report.HomologyReport;
import dev.morse.report.JsonReportWriter;
import dev.morse.report.TextReportWriter;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code morse homology FILE}: the homology of one poset or simplicial file. */
@Command(name = "homology",
        description = {
            "Computes the exact homology of a poset or simplicial file.",
            "A poset file (morse-poset 1) stands for its order complex, computed on the much smaller cellular"
                    + " complex when the poset is a CW poset; a simplicial file (morse-simplicial 1) stands for all"
                    + " faces of its listed faces."
        })
final class HomologyCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Parameters(index = "0", paramLabel = "FILE", description = "A morse-poset 1 or morse-simplicial 1 file.")
    private Path file;

    @Option(names = "--json", description = "Print one JSON object instead of a table.")
    private boolean json;

    @Option(names = "--complex", paramLabel = "auto|order|cellular|implicit", defaultValue = "auto",
            converter = OptionConverters.ComplexConverter.class, completionCandidates = OptionConverters.ComplexNames.class,
            description = "Complex to build from a poset: cellular when it is a CW poset, else the order complex,"
                    + " stored or with chains generated on demand when they are too many (auto, the default);"
                    + " always the stored order complex; insist on the cellular complex; or always generate the"
                    + " chains of the order complex on demand.")
    private ComplexChoice complex;

    @Option(names = "--element-order", paramLabel = "NAME", defaultValue = "down-sets",
            converter = OptionConverters.ElementOrderConverter.class,
            completionCandidates = OptionConverters.ElementOrderNames.class,
            description = "Order of covers that fixes the matching of the order complex generated on demand;"
                    + " available: ${COMPLETION-CANDIDATES} (default ${DEFAULT-VALUE}).")
    private ElementOrder elementOrder;

    @Option(names = "--max-stored-chains", paramLabel = "N", defaultValue = "1000000",
            description = "With --complex auto, a poset with more chains than this gets its order complex generated"
                    + " on demand instead of stored (default ${DEFAULT-VALUE}).")
    private long maxStoredChains;

    @Option(names = "--coefficients", paramLabel = "Z|Q|P", defaultValue = "Z",
            converter = OptionConverters.CoefficientsConverter.class,
            description = "Coefficients: the integers Z (default, with torsion), the rationals Q, or Z/P for a prime P.")
    private Coefficients coefficients;

    @Option(names = "--reduced", description = "Report reduced homology.")
    private boolean reduced;

    @Option(names = "--matching", paramLabel = "NAME", defaultValue = MatchingHeuristics.DEFAULT,
            converter = OptionConverters.MatchingConverter.class, completionCandidates = OptionConverters.MatchingNames.class,
            description = "Acyclic matching used to shrink the complex; available: ${COMPLETION-CANDIDATES}"
                    + " (default ${DEFAULT-VALUE}). 'none' computes on every cell.")
    private String matching;

    @Option(names = "--seed", paramLabel = "N", defaultValue = "1",
            description = "Seed of the random matching's choices, and of the first trial (default ${DEFAULT-VALUE}).")
    private long seed;

    @Option(names = "--trials", paramLabel = "N", defaultValue = "1",
            description = "Run the matching N times with seeds from --seed on and report how often each vector of"
                    + " critical cells occurred.")
    private int trials;

    @Option(names = "--no-verify", description = "Trust the matching without checking that it is acyclic.")
    private boolean noVerify;

    // read by Failures through the parse result, which is where it matters
    @Option(names = "--debug", description = "Show stack traces of failures.")
    private boolean debug;

    @Option(names = {"-h", "--help"}, usageHelp = true, description = "Show this help and exit.")
    private boolean help;

    @Override
    public Integer call() throws IOException {
        HomologyReport report = HomologyPipeline.run(file,
                new HomologyOptions(complex, coefficients, reduced, matching, seed, trials, !noVerify, elementOrder,
                        maxStoredChains));
        String text = json ? JsonReportWriter.toJson(report) : TextReportWriter.toText(report);
        PrintWriter out = spec.commandLine().getOut();
        out.print(text);
        out.flush();
        return 0;
    }
}
