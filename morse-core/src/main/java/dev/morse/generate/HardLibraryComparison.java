package dev.morse.generate;

import dev.morse.engine.ComparisonReport;
import dev.morse.engine.HeuristicComparison;
import dev.morse.engine.Request;
import dev.morse.input.FacetInput;
import dev.morse.input.Input;
import dev.morse.input.PosetInput;
import dev.morse.matching.MatchingHeuristics;
import dev.morse.matching.OptimalMatchingSolver;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * Every heuristic against the exact optimum on every complex of the {@link HardLibrary}: one
 * {@link HeuristicComparison} per complex, on the complex {@link HardComplex#complex()} names (a
 * simplicial complex, or the cellular complex of a CW poset, chosen as for any input), each input
 * named by the complex's short name. The optimum is sought on every complex the solver models (up to
 * {@link OptimalMatchingSolver#MODEL_CELL_LIMIT} cells), within the request's time limit each.
 */
public final class HardLibraryComparison {
    private HardLibraryComparison() {
    }

    /**
     * Every heuristic that comes with this library except {@code none} and {@code optimal}, which is
     * the yardstick: the default ones, then those on request.
     */
    public static List<String> defaultMatchings() {
        return MatchingHeuristics.everyKnown().keySet().stream()
                .filter(n -> !n.equals(Request.NO_MATCHING) && !n.equals("optimal")).toList();
    }

    /**
     * Compares on each complex of the library, in its order.
     *
     * @param request coefficients, seed, trials, time limit and the rest; its matching is ignored
     * @param matchings the matchings to compare, or empty for {@link #defaultMatchings()}
     * @return one report per complex, its {@code input} the complex's name
     */
    public static List<ComparisonReport> run(Request request, Optional<List<String>> matchings) {
        List<String> names = matchings.orElseGet(HardLibraryComparison::defaultMatchings);
        List<ComparisonReport> reports = new ArrayList<>();
        for (HardComplex hard : HardLibrary.all()) {
            reports.add(HeuristicComparison.run(input(hard), request, Optional.of(names),
                    OptimalMatchingSolver.MODEL_CELL_LIMIT));
        }
        return reports;
    }

    private static Input input(HardComplex hard) {
        if (hard.input() instanceof Generated.OfFacets facets) {
            return new FacetInput(hard.name(), facets.facets(), 0);
        }
        return new PosetInput(hard.name(), ((Generated.OfPoset) hard.input()).poset(), 0);
    }
}
