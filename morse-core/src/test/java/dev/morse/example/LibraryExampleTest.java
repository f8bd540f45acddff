package dev.morse.example;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.morse.engine.Computation;
import dev.morse.engine.Engines;
import dev.morse.engine.Request;
import dev.morse.homology.Coefficients;
import dev.morse.homology.Homology;
import dev.morse.homology.HomologyGroup;
import dev.morse.input.Input;
import dev.morse.input.InputReaders;
import dev.morse.report.JsonReportWriter;
import java.math.BigInteger;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The README's "Use it as a library" example, compiled and run: the code between the markers is
 * the code the README shows, so that it cannot drift from the API. It lives outside the library's
 * packages and so uses only its public API.
 */
class LibraryExampleTest {
    @Test
    void theReadmeExampleComputesTheHomologyOfRp2() {
        // --- README example begins
        Input input = InputReaders.parse("rp2", """
                morse-simplicial 1
                1 2 3
                1 3 4
                1 4 5
                1 5 6
                1 2 6
                2 3 5
                3 4 6
                4 5 2
                5 6 3
                6 2 4
                """);
        Computation run = Engines.compute(input, Request.defaults());
        Homology homology = run.homology();                  // H_0 = Z, H_1 = Z/2, H_2 = 0
        long critical = run.totalCritical();                 // critical cells of the matching
        String json = JsonReportWriter.toJson(run);          // the report `morse homology --json` prints
        Computation overQ = Engines.compute(input, Request.defaults().withHomology(Coefficients.RATIONALS, true));
        // --- README example ends

        // RP^2: Z, Z/2, 0 (Hatcher 2002, Example 2.42, from memory); the bound 1 + 1 + 1 (Forman 1998)
        assertEquals(List.of(HomologyGroup.free(0, 1), new HomologyGroup(1, 0, List.of(BigInteger.TWO)),
                HomologyGroup.free(2, 0)), homology.groups());
        assertEquals(3, critical);
        assertEquals(true, json.contains("\"morse_lower_bound\": 3"));
        // reduced homology over Q of RP^2 vanishes: it is Q-acyclic (universal coefficients)
        assertEquals(List.of(HomologyGroup.free(0, 0), HomologyGroup.free(1, 0), HomologyGroup.free(2, 0)),
                overQ.homology().groups());
    }
}
