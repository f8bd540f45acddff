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
        return List.of(new LastFreeFaceHeuristic(), new FreeingCollapseHeuristic(), new CancellingCollapseHeuristic(),
                new CancellingFreeingCollapseHeuristic(), new OptimalHeuristic());
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
        return List.of(new CoreductionHeuristic(), new CollapseHeuristic(), new LexicographicHeuristic(),
                new RandomHeuristic(), new NoMatchingHeuristic());
    }

    /** The names on offer, in order. */
    public static List<String> names() {
        return new ArrayList<>(all().keySet());
    }
}
