package dev.morse.matching;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.ServiceLoader;

/**
 * The heuristics known by name: the built-in ones, then any registered through
 * {@link ServiceLoader} as implementations of {@link MatchingHeuristic} on the class path.
 */
public final class MatchingHeuristics {
    /** The heuristic used when none is named. */
    public static final String DEFAULT = "coreduction";

    /** Coreduction (Mrozek and Batko 2009): see {@link CoreductionPairing}. The default. */
    public static final MatchingHeuristic COREDUCTION = MatchingHeuristic.named(DEFAULT, false, new CoreductionPairing());
    /** Elementary collapses, top-down (Whitehead; Forman): see {@link CollapsePairing}. */
    public static final MatchingHeuristic COLLAPSE = MatchingHeuristic.named("collapse", false, new CollapsePairing());
    /** Greedy pairing in the lexicographic order of vertex tuples: see {@link LexicographicPairing}. */
    public static final MatchingHeuristic LEXICOGRAPHIC = MatchingHeuristic.named("lexicographic", false,
            new LexicographicPairing());
    /** Random discrete Morse theory (Benedetti and Lutz 2014), seeded: see {@link RandomPairing}. */
    public static final MatchingHeuristic RANDOM = MatchingHeuristic.named("random", true, new RandomPairing());
    /** Every cell critical: the full Smith normal form baseline and oracle. */
    public static final MatchingHeuristic NONE = MatchingHeuristic.named("none", false,
            (complex, options) -> Matching.empty(complex.cellCount()));
    /** Reverse lexicographic collapses: see {@link LastFreeFacePairing}. */
    public static final MatchingHeuristic LAST_FREE_FACE = MatchingHeuristic.named("last-free-face", false,
            new LastFreeFacePairing());
    /** Reverse lexicographic collapses with a greedy critical cell: see {@link FreeingCollapsePairing}. */
    public static final MatchingHeuristic FREEING_COLLAPSE = MatchingHeuristic.named("freeing-collapse", false,
            new FreeingCollapsePairing());
    /**
     * Collapse, then cancellation, both from the literature: the matching of {@link CollapsePairing}
     * (elementary collapses, Whitehead 1939, the last remaining cell made critical when none is free),
     * improved by cancelling pairs of critical cells joined by exactly one gradient path, Forman's
     * cancellation theorem ("Morse theory for cell complexes", Adv. Math. 134, 1998; see
     * {@link GradientPathCancellation}). Improving a greedy matching by such cancellations is the
     * published idea of Hersh ("On optimizing discrete Morse functions", Adv. in Appl. Math. 35, 2005;
     * from memory), who starts from a lexicographic matching; starting from collapse and the order of
     * the passes are ours. Each cancellation removes two critical cells and keeps
     * the matching acyclic, so the result is never worse than collapse alone. On the hard library it
     * leaves 20 critical cells beyond the Morse bounds, against 32 for collapse (benchmarks/RESULTS.md).
     *
     * <p>Time: collapse's, plus O(c · N) per pass of cancellations for c critical cells (a search of the
     * gradient paths from each critical cell), repeated while a pass cancels; meant for complexes of up
     * to some hundred thousand cells with few critical cells. Memory: 16 bytes per cell besides
     * collapse's.
     */
    public static final MatchingHeuristic CANCELLING_COLLAPSE = MatchingHeuristic.named("cancelling-collapse", false,
            (complex, options) -> GradientPathCancellation.improve(complex, COLLAPSE.match(complex, options)));

    /**
     * {@link FreeingCollapsePairing}, then Forman's cancellations ({@link GradientPathCancellation}).
     * The cancellation is published (Forman 1998); the choice of critical cells of freeing-collapse is
     * ours, so this combination as a whole is ours too. On the hard library it reaches the fewest
     * critical cells of any heuristic here, the proven optimum on every complex
     * (benchmarks/RESULTS.md).
     *
     * <p>Time and memory: those of freeing-collapse plus those of the cancellations, as for
     * {@link #CANCELLING_COLLAPSE}.
     */
    public static final MatchingHeuristic CANCELLING_FREEING_COLLAPSE = MatchingHeuristic.named(
            "cancelling-freeing-collapse", false,
            (complex, options) -> GradientPathCancellation.improve(complex, FREEING_COLLAPSE.match(complex, options)));

    /**
     * The optimal Morse matching of {@link OptimalMatchingSolver} (Joswig and Pfetsch 2006): proven
     * optimal when the solver finishes within {@link MatchingOptions#timeLimit()}, otherwise the best
     * matching found by then. Callers that need the proof status or the bound call
     * {@link OptimalMatchingSolver#solve} directly. The seed only steers the random starting
     * heuristic, so repeated trials would at most trade one optimal matching for another: not randomised.
     */
    public static final MatchingHeuristic OPTIMAL = MatchingHeuristic.named("optimal", false,
            (complex, options) -> OptimalMatchingSolver.solve(complex, options).matching());

    private MatchingHeuristics() {
    }

    /**
     * The plug-ins on the class path, looked up once: scanning the class path costs tens of
     * microseconds, and interval sweeps and batches ask for a heuristic by name per run.
     */
    private static final class PlugIns {
        static final List<MatchingHeuristic> LOADED = load();

        private static List<MatchingHeuristic> load() {
            List<MatchingHeuristic> found = new ArrayList<>();
            ServiceLoader.load(MatchingHeuristic.class).forEach(found::add);
            return List.copyOf(found);
        }
    }

    /** All heuristics by name, built-ins first. A fresh unmodifiable map each call. */
    public static Map<String, MatchingHeuristic> all() {
        Map<String, MatchingHeuristic> byName = new LinkedHashMap<>();
        for (MatchingHeuristic h : builtIn()) {
            byName.put(h.name(), h);
        }
        for (MatchingHeuristic h : PlugIns.LOADED) {
            byName.putIfAbsent(h.name(), h);
        }
        return Collections.unmodifiableMap(byName);
    }

    /** The heuristic with this name, if any: one of {@link #all()} or of {@link #onRequest()}. */
    public static Optional<MatchingHeuristic> byName(String name) {
        MatchingHeuristic found = all().get(name);
        if (found == null) {
            found = onRequest().stream().filter(h -> h.name().equals(name)).findFirst().orElse(null);
        }
        return Optional.ofNullable(found);
    }

    /**
     * Heuristics of this library found by {@link #byName} but left out of {@link #all()} and
     * {@link #names()}, so that whatever runs every heuristic by default does not run them: the exact
     * solver {@code optimal}, which may take up to its time limit, the collapse orders
     * {@code last-free-face} and {@code freeing-collapse}, and the same collapses followed by Forman's
     * cancellations ({@code cancelling-collapse}, {@code cancelling-freeing-collapse}), measured
     * against the others on the hard library. A fresh list each call.
     */
    public static List<MatchingHeuristic> onRequest() {
        return List.of(LAST_FREE_FACE, FREEING_COLLAPSE, CANCELLING_COLLAPSE, CANCELLING_FREEING_COLLAPSE, OPTIMAL);
    }

    /** {@link #all()} followed by {@link #onRequest()}, by name. A fresh unmodifiable map each call. */
    public static Map<String, MatchingHeuristic> everyKnown() {
        Map<String, MatchingHeuristic> byName = new LinkedHashMap<>(all());
        for (MatchingHeuristic h : onRequest()) {
            byName.putIfAbsent(h.name(), h);
        }
        return Collections.unmodifiableMap(byName);
    }

    /** The names of the heuristics that come with this library, in order; {@code none} is last. */
    public static List<String> builtInNames() {
        return builtIn().stream().map(MatchingHeuristic::name).toList();
    }

    private static List<MatchingHeuristic> builtIn() {
        return List.of(COREDUCTION, COLLAPSE, LEXICOGRAPHIC, RANDOM, NONE);
    }

    /** The names on offer, in order. */
    public static List<String> names() {
        return new ArrayList<>(all().keySet());
    }
}
