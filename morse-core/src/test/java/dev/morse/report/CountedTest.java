package dev.morse.report;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Collections;
import java.util.List;
import java.util.stream.IntStream;
import org.junit.jupiter.api.Test;

class CountedTest {
    @Test
    void shortListsAreWrittenWhole() {
        assertEquals("6 + 15 + 10", Counted.terms(List.of(6, 15, 10), " + "));
        assertEquals("1 + 1 + 1", Counted.terms(List.of(1, 1, 1), " + "));
    }

    @Test
    void aLongRunOfOneValueIsWrittenOnceWithItsLength() {
        // a chain of 100,000 elements: one element of each rank
        assertEquals("1 (×100000)", Counted.terms(Collections.nCopies(100_000, 1), " + "));
        assertEquals("2 + 1 (×5) + 2", Counted.terms(List.of(2, 1, 1, 1, 1, 1, 2), " + "));
    }

    @Test
    void manyDistinctTermsKeepTheirEndsAndCountTheRest() {
        List<Integer> values = IntStream.rangeClosed(1, 100).boxed().toList();
        assertEquals("1 + 2 + 3 + 4 + 5 + 6 + … (88 more) … + 95 + 96 + 97 + 98 + 99 + 100",
                Counted.terms(values, " + "));
    }
}
