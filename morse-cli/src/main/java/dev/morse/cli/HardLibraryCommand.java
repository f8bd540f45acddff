package dev.morse.cli;

import dev.morse.engine.ComparisonReport;
import dev.morse.engine.HeuristicComparison;
import dev.morse.engine.Request;
import dev.morse.generate.HardLibraryComparison;
import dev.morse.matching.MatchingHeuristics;
import dev.morse.report.ComparisonSummaryWriter;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/** {@code morse hard-library}: every heuristic against the exact optimum on the built-in hard complexes. */
@Command(name = "hard-library", mixinStandardHelpOptions = true,
        description = {
            "Compares matchings on every complex of the built-in hard library (the dunce hat, Bing's house, sum"
                    + " complexes, small triangulations, non-shellable and collapsible balls) and against the exact"
                    + " optimum of each, sought within --time-limit per complex: one row per complex."
        })
final class HardLibraryCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Option(names = "--matching", paramLabel = "NAME[,NAME...]", split = ",",
            completionCandidates = OptionConverters.MatchingValues.class,
            description = "Matchings to compare, in this order; default: every one that comes with morse except none"
                    + " and optimal.")
    private List<String> matchings;

    @Mixin
    private MatchingRuns runs;

    @Mixin
    private ReportOptions shown;

    @Override
    public Integer call() throws Exception {
        Request request;
        try {
            request = Request.defaults().withMatching(MatchingHeuristics.DEFAULT, runs.seed(), runs.trials())
                    .withVerify(runs.verify()).withMatchingTimeLimit(runs.timeLimit());
            if (matchings != null) {
                HeuristicComparison.requireComparable(matchings);
            }
        } catch (IllegalArgumentException e) {
            throw new ParameterException(spec.commandLine(), e.getMessage());
        }
        List<ComparisonReport> reports = shown.around(spec,
                () -> HardLibraryComparison.run(request, Optional.ofNullable(matchings)));
        String text = shown.json() ? ComparisonSummaryWriter.toJson(reports) : ComparisonSummaryWriter.toText(reports);
        return ReportOptions.print(spec, text);
    }
}
