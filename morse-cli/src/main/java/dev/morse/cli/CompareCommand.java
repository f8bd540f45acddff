package dev.morse.cli;

import dev.morse.engine.ComparisonReport;
import dev.morse.engine.HeuristicComparison;
import dev.morse.engine.Request;
import dev.morse.input.Input;
import dev.morse.matching.MatchingHeuristics;
import dev.morse.report.ComparisonChartSvg;
import dev.morse.report.ComparisonJsonWriter;
import dev.morse.report.ComparisonTextWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/** {@code morse compare FILE}: several matching heuristics side by side on one complex. */
@Command(name = "compare", mixinStandardHelpOptions = true,
        description = {
            "Runs several acyclic matchings on one complex and compares their critical cells, time and memory.",
            "The complex is chosen as for homology. The homology is computed by every matching, and all must agree."
                    + " When the order complex is generated on demand, its element orders are compared instead."
        })
final class CompareCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Mixin
    private InputOptions input;

    @Mixin
    private EngineOptions engine;

    @Option(names = "--matching", paramLabel = "NAME[,NAME...]", split = ",",
            completionCandidates = OptionConverters.MatchingValues.class,
            description = "Matchings to compare, in this order; available: ${COMPLETION-CANDIDATES}. Default: every"
                    + " built-in one except none. On an order complex generated on demand, implicit:ORDER names the"
                    + " implicit engine with an element order (implicit:down-sets, implicit:ids); default: the"
                    + " --element-order alone.")
    private List<String> matchings;

    @Mixin
    private MatchingRuns runs;

    @Mixin
    private ReportOptions shown;

    @Option(names = "--no-optimum", description = "Do not seek the exact optimum (sought by default on stored"
            + " complexes of at most 500 cells, within --time-limit).")
    private boolean noOptimum;

    @Option(names = "--plot", paramLabel = "FILE.svg",
            description = "Also draw a bar chart of critical cells per dimension and matching, bounds marked, as SVG.")
    private Path plot;

    @Override
    public Integer call() throws Exception {
        Request request = engine.request(spec, runs, MatchingHeuristics.DEFAULT);
        if (matchings != null) {
            try {
                HeuristicComparison.requireComparable(matchings);
            } catch (IllegalArgumentException e) {
                throw new ParameterException(spec.commandLine(), e.getMessage());
            }
        }
        List<Input> read = new ArrayList<>(1);
        ComparisonReport report = shown.around(spec, () -> {
            read.add(input.read(spec));
            return HeuristicComparison.run(read.get(0), request, Optional.ofNullable(matchings), !noOptimum);
        });
        Warnings.print(spec, input.warnings(read.get(0)));
        String text = shown.json() ? ComparisonJsonWriter.toJson(report) : ComparisonTextWriter.toText(report);
        if (plot != null) {
            OutputFiles.write(plot, ComparisonChartSvg.toSvg(report));
        }
        return ReportOptions.print(spec, text);
    }
}
