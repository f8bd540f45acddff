package dev.morse.cli;

import dev.morse.complex.ComplexChoice;
import dev.morse.pipeline.ComparisonOptions;
import dev.morse.pipeline.HeuristicComparison;
import dev.morse.report.ComparisonChartSvg;
import dev.morse.report.ComparisonJsonWriter;
import dev.morse.report.ComparisonReport;
import dev.morse.report.ComparisonTextWriter;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code morse compare FILE}: several matching heuristics side by side on one complex. */
@Command(name = "compare",
        description = {
            "Runs several acyclic matchings on one complex and compares their critical cells, time and memory.",
            "The homology is computed once, by the first matching, and every other must agree with it."
        })
final class CompareCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Parameters(index = "0", paramLabel = "FILE", description = "A morse-poset 1 or morse-simplicial 1 file.")
    private Path file;

    @Option(names = "--matching", paramLabel = "NAME[,NAME...]", split = ",",
            converter = OptionConverters.MatchingConverter.class, completionCandidates = OptionConverters.MatchingNames.class,
            description = "Matchings to compare, in this order; available: ${COMPLETION-CANDIDATES}."
                    + " Default: every built-in one except none.")
    private List<String> matchings;

    @Option(names = "--complex", paramLabel = "auto|order|cellular", defaultValue = "auto",
            converter = OptionConverters.ComplexConverter.class, completionCandidates = OptionConverters.ComplexNames.class,
            description = "Complex to build from a poset, as for homology (default ${DEFAULT-VALUE}).")
    private ComplexChoice complex;

    @Option(names = "--seed", paramLabel = "N", defaultValue = "1",
            description = "Seed of the random choices, and of the first trial (default ${DEFAULT-VALUE}).")
    private long seed;

    @Option(names = "--trials", paramLabel = "N", defaultValue = "1",
            description = "Run each randomized matching N times with seeds from --seed on and show how often each"
                    + " vector of critical cells occurred.")
    private int trials;

    @Option(names = "--json", description = "Print one JSON object instead of a table.")
    private boolean json;

    @Option(names = "--plot", paramLabel = "FILE.svg",
            description = "Also draw a bar chart of critical cells per dimension and matching, bounds marked, as SVG.")
    private Path plot;

    @Mixin
    private ProgressOption progress;

    // read by Failures through the parse result, which is where it matters
    @Option(names = "--debug", description = "Show stack traces of failures.")
    private boolean debug;

    @Option(names = {"-h", "--help"}, usageHelp = true, description = "Show this help and exit.")
    private boolean help;

    @Override
    public Integer call() throws Exception {
        ComparisonOptions options = new ComparisonOptions(complex,
                matchings == null ? ComparisonOptions.defaultMatchings() : matchings, seed, trials);
        ComparisonReport report = progress.around(spec, () -> HeuristicComparison.run(file, options));
        String text = json ? ComparisonJsonWriter.toJson(report) : ComparisonTextWriter.toText(report);
        if (plot != null) {
            OutputFiles.write(plot, ComparisonChartSvg.toSvg(report));
        }
        PrintWriter out = spec.commandLine().getOut();
        out.print(text);
        out.flush();
        return 0;
    }
}
