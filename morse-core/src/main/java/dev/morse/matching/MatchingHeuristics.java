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
     * solver {@code optimal}, which may take up to its time limit, and the collapse orders
     * {@code last-free-face} and {@code freeing-collapse}, measured against the others on the hard
     * library. A fresh list each call.
     */
    public static List<MatchingHeuristic> onRequest() {
        return List.of(LAST_FREE_FACE, FREEING_COLLAPSE, OPTIMAL);
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
