package dev.morse.matching;

import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

class MatchingHeuristicsTest {
    @Test
    void theHeuristicsOnRequestAreFoundByNameButNotListedByDefault() {
        // names() is what runs by default (compare, the property tests): the exact solver is not in it
        assertEquals(List.of("coreduction", "collapse", "lexicographic", "random", "none"),
                MatchingHeuristics.builtInNames());
        assertSame(MatchingHeuristics.OPTIMAL, MatchingHeuristics.byName("optimal").orElseThrow());
        assertSame(MatchingHeuristics.LAST_FREE_FACE, MatchingHeuristics.byName("last-free-face").orElseThrow());
        assertSame(MatchingHeuristics.FREEING_COLLAPSE, MatchingHeuristics.byName("freeing-collapse").orElseThrow());
        assertSame(MatchingHeuristics.CANCELLING_COLLAPSE, MatchingHeuristics.byName("cancelling-collapse").orElseThrow());
        assertTrue(MatchingHeuristics.byName("steepest").isEmpty());
        assertTrue(!MatchingHeuristics.names().contains("optimal"));
    }

    @Test
    void everyKnownListsTheDefaultOnesThenThoseOnRequest() {
        List<String> names = List.copyOf(MatchingHeuristics.everyKnown().keySet());
        assertEquals(MatchingHeuristics.names(), names.subList(0, MatchingHeuristics.names().size()));
        assertEquals(List.of("last-free-face", "freeing-collapse", "cancelling-collapse", "cancelling-freeing-collapse",
                "optimal"),
                names.subList(MatchingHeuristics.names().size(), names.size()));
    }
}
