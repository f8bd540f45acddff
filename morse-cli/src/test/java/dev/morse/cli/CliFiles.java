package dev.morse.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/** Shared helpers of the command tests: JSON runs of {@code morse homology} and Betti numbers. */
final class CliFiles {
    private CliFiles() {
    }

    /** Runs {@code morse homology ARGS --json}, asserts success, and returns the parsed object. */
    @SuppressWarnings("unchecked")
    static Map<String, Object> homologyJson(String... args) {
        List<String> all = new ArrayList<>(List.of("homology", "--json"));
        all.addAll(List.of(args));
        CliRun run = CliRun.morse(all.toArray(new String[0]));
        assertEquals(0, run.code(), run.err());
        assertEquals("", run.err());
        return (Map<String, Object>) JsonValues.parse(run.out());
    }

    /** The Betti numbers of a JSON report, as longs. */
    @SuppressWarnings("unchecked")
    static List<Long> betti(Map<String, Object> json) {
        return ((List<Map<String, Object>>) json.get("homology")).stream()
                .map(g -> ((BigInteger) g.get("betti")).longValue()).toList();
    }

    /** The torsion of dimension {@code d} of a JSON report, as longs. */
    @SuppressWarnings("unchecked")
    static List<Long> torsion(Map<String, Object> json, int d) {
        Map<String, Object> group = ((List<Map<String, Object>>) json.get("homology")).get(d);
        return ((List<Object>) group.get("torsion")).stream().map(t -> ((BigInteger) t).longValue()).toList();
    }
}
