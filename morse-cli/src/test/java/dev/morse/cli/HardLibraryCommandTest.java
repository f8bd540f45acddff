package dev.morse.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigInteger;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

class HardLibraryCommandTest {
    @Test
    @SuppressWarnings("unchecked")
    void everyComplexHasItsOptimumProvenAndTheKnownOnesAgree() {
        CliRun run = CliRun.morse("hard-library", "--matching", "collapse,cancelling-collapse", "--json");
        assertEquals(0, run.code(), run.err());
        Map<String, Object> json = (Map<String, Object>) JsonValues.parse(run.out());
        List<Map<String, Object>> complexes = (List<Map<String, Object>>) json.get("complexes");
        assertEquals(18, complexes.size());
        for (Map<String, Object> c : complexes) {
            Map<String, Object> optimum = (Map<String, Object>) c.get("optimum");
            assertEquals(true, optimum.get("proven"), c.get("complex").toString());
            for (Map<String, Object> m : (List<Map<String, Object>>) c.get("matchings")) {
                assertTrue(((BigInteger) m.get("gap")).signum() >= 0, c.get("complex") + " " + m.get("matching"));
            }
        }
        // Zeeman 1964: the dunce hat needs a critical cell in each dimension; Rudin's ball collapses
        assertEquals(List.of(BigInteger.ONE, BigInteger.ONE, BigInteger.ONE), optimum(complexes, "dunce-hat"));
        assertEquals(List.of(BigInteger.ONE, BigInteger.ZERO, BigInteger.ZERO, BigInteger.ZERO),
                optimum(complexes, "rudin-ball"));
        Map<String, Map<String, Object>> totals = (Map<String, Map<String, Object>>) json.get("totals");
        assertTrue(((BigInteger) totals.get("cancelling-collapse").get("excess"))
                .compareTo((BigInteger) totals.get("collapse").get("excess")) < 0, totals.toString());
    }

    @Test
    void anUnknownMatchingIsAnOptionError() {
        CliRun run = CliRun.morse("hard-library", "--matching", "steepest");
        assertEquals(2, run.code());
        assertEquals("", run.out());
        assertTrue(run.err().contains("unknown matching 'steepest'"), run.err());
    }

    @SuppressWarnings("unchecked")
    private static List<BigInteger> optimum(List<Map<String, Object>> complexes, String name) {
        Map<String, Object> c = complexes.stream().filter(x -> x.get("complex").equals(name)).findFirst().orElseThrow();
        return (List<BigInteger>) ((Map<String, Object>) c.get("optimum")).get("critical");
    }
}
