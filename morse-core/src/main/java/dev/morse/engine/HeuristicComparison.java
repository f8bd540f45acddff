package dev.morse.engine;

import dev.morse.homology.Homology;
import dev.morse.implicit.ElementOrder;
import dev.morse.input.Input;
import dev.morse.io.InputException;
import dev.morse.matching.MatchingHeuristics;
import dev.morse.matching.OptimalMatching;
import dev.morse.matching.OptimalMatchingSolver;
import dev.morse.progress.HeapPeaks;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;

/**
 * Several matchings on one input: the complex is chosen and built once by {@link ComplexPolicy},
 * exactly as for a homology run, then each matching runs on it with every phase timed and the
 * approximate peak heap noted. On a stored complex the rows are the matching heuristics; on an
 * order complex generated on demand, whose matching is the implicit engine's own, they are its
 * element orders, named {@code implicit:ORDER} (by default only the request's order). The first row's homology is the reference; every other must give the same
 * groups, since any acyclic matching preserves homology (Forman 1998), so a difference is a bug and
 * raises {@link IllegalStateException}, as does a matching the verifier rejects. Stateless.
 */
public final class HeuristicComparison {
    /** How a row of the implicit engine is named: this prefix and the element order. */
    public static final String IMPLICIT_ROW = "implicit:";

    private HeuristicComparison() {
    }

    /** Every built-in heuristic except {@code none}, which is the baseline and is compared only when asked for. */
    public static List<String> defaultMatchings() {
        return MatchingHeuristics.builtInNames().stream().filter(n -> !n.equals(Request.NO_MATCHING)).toList();
    }

    /**
     * Compares on an input already read.
     *
     * @param request the complex, coefficients, seed, trials and the rest; its matching is ignored
     * @param matchings the matchings to compare in the order to show them, or empty for the defaults
     * @throws IllegalArgumentException for an unknown or repeated name or an empty list
     * @throws InputException when matchings are named for an order complex generated on demand,
     *     which has its own matching, or the input is beyond the chosen engine's limits
     * @throws IllegalStateException when a matching fails verification or disagrees with the reference
     */
    public static ComparisonReport run(Input input, Request request, Optional<List<String>> matchings) {
        return run(input, request, matchings, false);
    }

    /**
     * As {@link #run(Input, Request, Optional)}, and when {@code optimum} is asked for and the complex
     * is stored with at most {@link OptimalMatchingSolver#PROVEN_CELL_LIMIT} cells, also the exact
     * optimum of the matchings (Joswig–Pfetsch integer programming, within the request's time limit),
     * against which every row's gap is shown.
     */
    public static ComparisonReport run(Input input, Request request, Optional<List<String>> matchings,
            boolean optimum) {
        return run(input, request, matchings, optimum ? OptimalMatchingSolver.PROVEN_CELL_LIMIT : -1);
    }

    /**
     * As {@link #run(Input, Request, Optional, boolean)}, seeking the exact optimum on stored complexes
     * of at most {@code optimumCellLimit} cells (none when negative): beyond
     * {@link OptimalMatchingSolver#PROVEN_CELL_LIMIT} the search may end at the time limit with only a
     * bound, which the report then shows.
     */
    public static ComparisonReport run(Input input, Request request, Optional<List<String>> matchings,
            long optimumCellLimit) {
        List<String> names = matchings.map(HeuristicComparison::requireComparable)
                .orElseGet(HeuristicComparison::defaultMatchings);
        List<String> heuristics = names.stream().filter(n -> !n.startsWith(IMPLICIT_ROW)).toList();
        String first = heuristics.contains(Request.NO_MATCHING) ? Request.NO_MATCHING
                : heuristics.isEmpty() ? request.matching() : heuristics.get(0);
        ComplexPlan plan = ComplexPolicy.plan(input, request.withMatching(first, request.seed(), request.trials()));
        List<Computation> runs = new ArrayList<>();
        List<Long> peaks = new ArrayList<>();
        if (plan.isImplicit()) {
            if (!heuristics.isEmpty() && matchings.isPresent()) {
                throw new InputException(input.source(), InputException.NO_LINE, "the order complex here is generated"
                        + " on demand (" + (plan.reason().isEmpty() ? "as asked" : plan.reason()) + "), and that engine"
                        + " has its own matching: compare its element orders (" + IMPLICIT_ROW + "down-sets,"
                        + IMPLICIT_ROW + "ids), or store the chains with --complex order to compare heuristics");
            }
            for (ElementOrder order : implicitOrders(names, matchings.isPresent(), request)) {
                HeapPeaks.reset();
                runs.add(plan.engine().run(input, plan, request.withImplicit(order, request.storedChainLimit())));
                peaks.add(HeapPeaks.peakBytes());
            }
        } else {
            if (heuristics.size() < names.size()) {
                throw new InputException(input.source(), InputException.NO_LINE, "the " + IMPLICIT_ROW
                        + " rows name the matching of the order complex generated on demand, and the complex here is"
                        + " stored; --complex implicit generates it");
            }
            for (String name : names) {
                HeapPeaks.reset();
                Request one = request.withMatching(name, request.seed(),
                        MatchingHeuristics.byName(name).orElseThrow().randomized() ? request.trials() : 1);
                runs.add(plan.engine().run(input, plan, one));
                peaks.add(HeapPeaks.peakBytes());
            }
        }
        Computation reference = runs.get(0);
        List<MatchingRun> rows = new ArrayList<>();
        for (int i = 0; i < runs.size(); i++) {
            Computation run = runs.get(i);
            String name = plan.isImplicit()
                    ? IMPLICIT_ROW + run.implicitRun().orElseThrow().order().optionName()
                    : run.matchingName();
            requireAgreement(rowName(reference, plan), reference.unreducedHomology(), name, run.unreducedHomology());
            rows.add(new MatchingRun(name, run.critical(), engineTimings(run), peaks.get(i), run.trials()));
        }
        List<PhaseTiming> setup = reference.timings().stream()
                .filter(t -> t.phase().equals("read") || t.phase().equals("poset reduction") || t.phase().equals("complex"))
                .toList();
        Optional<OptimalMatching> best = Optional.empty();
        if (plan.stored().isPresent() && plan.stored().get().cellCount() <= optimumCellLimit) {
            best = Optional.of(OptimalMatchingSolver.solve(plan.stored().get(), request.matchingOptions()));
        }
        return new ComparisonReport(input.source(), input.format(), plan.kind(), reference.cells(), plan.cwCheck(),
                reference.unreducedHomology(), request.reduced(), rows.get(0).matching(), setup, rows, request.seed(),
                best);
    }

    /**
     * The element orders to compare on an implicit plan: those named as {@code implicit:ORDER}, or
     * by default only the request's, the one homology would use (the others can be slow: an order
     * that is no EL-labelling leaves many critical chains and long gradient paths).
     */
    private static List<ElementOrder> implicitOrders(List<String> names, boolean named, Request request) {
        if (!named) {
            return List.of(request.elementOrder());
        }
        List<ElementOrder> orders = new ArrayList<>();
        for (String name : names) {
            orders.add(ElementOrder.parse(name.substring(IMPLICIT_ROW.length())));
        }
        return orders;
    }

    private static String rowName(Computation reference, ComplexPlan plan) {
        return plan.isImplicit()
                ? IMPLICIT_ROW + reference.implicitRun().orElseThrow().order().optionName()
                : reference.matchingName();
    }

    /** The phases a matching's run owns: what came after the complex was built. */
    private static List<PhaseTiming> engineTimings(Computation run) {
        List<PhaseTiming> all = run.timings();
        int complex = 0;
        while (complex < all.size() && !all.get(complex).phase().equals("complex")) {
            complex++;
        }
        return all.subList(Math.min(complex + 1, all.size()), all.size());
    }

    /**
     * Returns the names if they can be compared: at least one, none twice, each a known matching
     * heuristic or {@code implicit:ORDER} for the implicit engine with an element order.
     *
     * @throws IllegalArgumentException saying which rule a name breaks
     */
    public static List<String> requireComparable(List<String> names) {
        if (names.isEmpty()) {
            throw new IllegalArgumentException("name at least one matching to compare");
        }
        Set<String> seen = new HashSet<>();
        for (String name : names) {
            if (name.startsWith(IMPLICIT_ROW)) {
                ElementOrder.parse(name.substring(IMPLICIT_ROW.length()));
            } else {
                Request.requireKnownMatching(name);
            }
            if (!seen.add(name)) {
                throw new IllegalArgumentException("matching '" + name + "' is named twice");
            }
        }
        return List.copyOf(names);
    }

    /**
     * Fails unless two runs found the same homology groups.
     *
     * @throws IllegalStateException naming both runs and the first dimension where they differ
     */
    static void requireAgreement(String referenceName, Homology reference, String name, Homology found) {
        if (reference.groups().equals(found.groups())) {
            return;
        }
        int d = 0;
        while (d < reference.groups().size() && d < found.groups().size()
                && reference.group(d).equals(found.group(d))) {
            d++;
        }
        throw new IllegalStateException("matchings disagree on the homology: " + referenceName + " gives H" + d
                + " = " + reference.group(d) + " but " + name + " gives H" + d + " = " + found.group(d));
    }
}
