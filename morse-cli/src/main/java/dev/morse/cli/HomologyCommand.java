package dev.morse.cli;

import dev.morse.complex.ComplexChoice;
import dev.morse.homology.Coefficients;
import dev.morse.matching.MatchingHeuristics;
import dev.morse.pipeline.HomologyOptions;
import dev.morse.pipeline.HomologyPipeline;
import dev.morse.report.HomologyReport;
import dev.morse.report.JsonReportWriter;
import dev.morse.report.TextReportWriter;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
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

    @Option(names = "--complex", paramLabel = "auto|order|cellular", defaultValue = "auto",
            converter = OptionConverters.ComplexConverter.class, completionCandidates = OptionConverters.ComplexNames.class,
            description = "Complex to build from a poset: cellular when it is a CW poset (auto, the default),"
                    + " always the order complex, or insist on the cellular complex.")
    private ComplexChoice complex;

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

    @Mixin
    private ProgressOption progress;

    // read by Failures through the parse result, which is where it matters
    @Option(names = "--debug", description = "Show stack traces of failures.")
    private boolean debug;

    @Option(names = {"-h", "--help"}, usageHelp = true, description = "Show this help and exit.")
    private boolean help;

    @Override
    public Integer call() throws Exception {
        HomologyOptions options = new HomologyOptions(complex, coefficients, reduced, matching, seed, trials, !noVerify);
        HomologyReport report = progress.around(spec, () -> HomologyPipeline.run(file, options));
        String text = json ? JsonReportWriter.toJson(report) : TextReportWriter.toText(report);
        PrintWriter out = spec.commandLine().getOut();
        out.print(text);
        out.flush();
        return 0;
    }
}
