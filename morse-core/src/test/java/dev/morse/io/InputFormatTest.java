package dev.morse.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class InputFormatTest {
    @Test
    void headersNameTheirFormats() {
        assertEquals(InputFormat.POSET, InputFormat.detect("# c\n\nmorse-poset 1\na\n", "p"));
        assertEquals(InputFormat.SIMPLICIAL, InputFormat.detect("morse-simplicial 1\na b\n", "s"));
    }

    @Test
    void leadingByteOrderMarkIsSkipped() {
        assertEquals(InputFormat.POSET, InputFormat.detect("\uFEFFmorse-poset 1\na\n", "p"));
        assertEquals(1, PosetReader.parse("\uFEFFmorse-poset 1\na\n", "p").size());
    }

    @Test
    void otherVersionsAreLeftToTheReader() {
        assertEquals(InputFormat.POSET, InputFormat.detect("morse-poset 7\n", "p"));
    }

    @Test
    void unknownHeaderIsReportedAtItsLine() {
        InputException e = assertThrows(InputException.class, () -> InputFormat.detect("\n# c\nmesh 1\n", "f.txt"));
        assertEquals("f.txt:3: unknown header 'mesh 1': expected 'morse-poset 1' or 'morse-simplicial 1'",
                e.getMessage());
    }

    @Test
    void longHeaderIsShortenedInTheMessage() {
        String header = "x".repeat(100);
        InputException e = assertThrows(InputException.class, () -> InputFormat.detect(header, "f"));
        assertEquals("f:1: unknown header '" + "x".repeat(40) + "...': expected 'morse-poset 1' or 'morse-simplicial 1'",
                e.getMessage());
    }

    @Test
    void emptyTextHasNoHeader() {
        InputException e = assertThrows(InputException.class, () -> InputFormat.detect("  \n", "f"));
        assertEquals("f: no header: expected 'morse-poset 1' or 'morse-simplicial 1' as the first line", e.getMessage());
    }
}
