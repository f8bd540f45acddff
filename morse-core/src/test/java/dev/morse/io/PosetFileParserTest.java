package dev.morse.io;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;

import dev.morse.poset.Poset;
import java.io.IOException;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Reading a file as bytes gives exactly what reading its text gives: the same poset (labels, ids,
 * covers, heights, linear extension) or the same one-line error, on random files mixing every line
 * ending, ASCII white space, comments, colons, repeated and self relations, cycles and non-ASCII.
 */
class PosetFileParserTest {
    private static final String[] PIECES = {
        "a", "b", "c", "d", "x1", "x2", "v.0.1", "p'", ":", ": ", " ", "\t", "\u000B", "\f", "\u001C", "\u001F", "#",
        "# note", "\n", "\r\n", "\r", "\u0000", "\u007F", "é", "\u2003", "::",
    };

    @TempDir
    Path dir;

    private static void assertSamePoset(Poset expected, Poset actual, String text) {
        assertEquals(expected.size(), actual.size(), text);
        for (int x = 0; x < expected.size(); x++) {
            assertEquals(expected.label(x), actual.label(x), text);
            assertArrayEquals(expected.lowerCovers().neighbours(x), actual.lowerCovers().neighbours(x), text);
            assertArrayEquals(expected.upperCovers().neighbours(x), actual.upperCovers().neighbours(x), text);
            assertEquals(expected.height(x), actual.height(x), text);
        }
        assertArrayEquals(expected.linearExtension(), actual.linearExtension(), text);
    }

    private void assertReadsAsText(String text, int index) throws IOException {
        Path file = dir.resolve("input" + index + ".poset");
        Files.write(file, text.getBytes(StandardCharsets.UTF_8));
        Poset fromText = null;
        String textError = null;
        try {
            fromText = PosetReader.read(new StringReader(text), file.toString());
        } catch (InputException e) {
            textError = e.getMessage();
        }
        Poset fromFile = null;
        String fileError = null;
        try {
            fromFile = PosetReader.read(file);
        } catch (InputException e) {
            fileError = e.getMessage();
        }
        String shown = "input " + index + ": " + text.replace("\r", "\\r").replace("\n", "\\n");
        assertEquals(textError, fileError, shown);
        if (fromText != null) {
            assertNotNull(fromFile, shown);
            assertSamePoset(fromText, fromFile, shown);
        }
    }

    @Test
    void randomFilesReadAsTheirText() throws IOException {
        SplittableRandom random = new SplittableRandom(2024);
        for (int index = 0; index < 3000; index++) {
            StringBuilder text = new StringBuilder(random.nextInt(10) == 0 ? "" : "morse-poset 1");
            text.append(random.nextBoolean() ? "\n" : random.nextBoolean() ? "\r\n" : "\r");
            int pieces = random.nextInt(40);
            for (int k = 0; k < pieces; k++) {
                text.append(PIECES[random.nextInt(random.nextInt(4) == 0 ? PIECES.length : 10)]);
            }
            assertReadsAsText(text.toString(), index);
        }
    }

    @Test
    void wellFormedRandomPosetsReadAsTheirText() throws IOException {
        SplittableRandom random = new SplittableRandom(99);
        for (int index = 0; index < 300; index++) {
            int n = 1 + random.nextInt(30);
            StringBuilder text = new StringBuilder("morse-poset 1\n");
            for (int y = 0; y < n; y++) {
                text.append('e').append(random.nextInt(n) == 0 ? y + n : y);
                if (y > 0 && random.nextBoolean()) {
                    text.append(random.nextBoolean() ? ":" : " :");
                    for (int k = random.nextInt(4); k >= 0; k--) {
                        text.append(random.nextBoolean() ? " " : "\t ").append('e').append(random.nextInt(y));
                    }
                }
                text.append(random.nextInt(5) == 0 ? " # done" : "").append(random.nextBoolean() ? "\n" : "\r\n");
            }
            assertReadsAsText(text.toString(), 10_000 + index);
        }
    }

    @Test
    void linesAcrossTheBufferBoundary() throws IOException {
        // a file several buffers long whose line endings, \r\n among them, fall on every offset
        StringBuilder text = new StringBuilder("morse-poset 1\r\n");
        int k = 0;
        while (text.length() < 3 * PosetFileParser.BUFFER + 1000) {
            text.append("element").append(k).append(": ").append(k > 0 ? "element" + (k - 1) : "")
                    .append(k % 3 == 0 ? "\r\n" : k % 3 == 1 ? "\r" : "\n");
            k++;
        }
        // and one line longer than a buffer
        text.append("wide:");
        for (int i = 0; text.length() < 5 * PosetFileParser.BUFFER; i++) {
            text.append(" element").append(i);
        }
        text.append('\n');
        assertReadsAsText(text.toString(), 20_000);
        assertNotNull(PosetFileParser.read(dir.resolve("input20000.poset")));
    }

    @Test
    void filesSplitAmongThreadsReadAsOneReaderReadsThem() throws IOException {
        // labels named again and again across the stretches that different threads parse
        SplittableRandom random = new SplittableRandom(31);
        String[] endings = {"\n", "\r\n", "\r"};
        for (int trial = 0; trial < 3; trial++) {
            StringBuilder text = new StringBuilder("# several threads\nmorse-poset 1\n");
            int k = 0;
            while (text.length() < PosetFileParser.PARALLEL_FROM + (trial + 1) * 1_500_000L) {
                text.append('n').append(k);
                if (k > 0) {
                    text.append(':');
                    for (int j = random.nextInt(4); j >= 0; j--) {
                        text.append(" n").append(random.nextInt(k));
                    }
                }
                text.append(endings[trial == 2 ? 2 : random.nextInt(2)]);
                k++;
            }
            for (int threads : new int[] {2, 3, 5}) {
                int index = 30_000 + 10 * trial + threads;
                withThreads(threads, () -> assertReadsAsText(text.toString(), index));
            }
        }
    }

    @Test
    void labelsOfEveryLengthAroundTheInlineLimitReadAsTheirText() throws IOException {
        // lengths 1 to 20 share prefixes, so short labels held in their slot and long ones held
        // by a hash meet on the same lines, in one stretch and split among threads
        SplittableRandom random = new SplittableRandom(12);
        StringBuilder text = new StringBuilder("morse-poset 1\n");
        String[] labels = new String[4000];
        for (int k = 0; k < labels.length; k++) {
            String digits = Integer.toString(k);
            int length = 1 + k % 20;
            StringBuilder label = new StringBuilder();
            while (label.length() + digits.length() < length) {
                label.append(k % 3 == 0 ? 'x' : '.');
            }
            labels[k] = label.append(digits).toString();
        }
        while (text.length() < PosetFileParser.PARALLEL_FROM + 500_000) {
            int y = 1 + random.nextInt(labels.length - 1);
            text.append(labels[y]).append(':');
            for (int j = random.nextInt(3); j >= 0; j--) {
                text.append(' ').append(labels[random.nextInt(y)]);
            }
            text.append('\n');
        }
        assertReadsAsText(text.substring(0, 200_000 + text.substring(200_000).indexOf('\n') + 1), 40_000);
        for (int threads : new int[] {2, 3}) {
            int index = 40_000 + threads;
            withThreads(threads, () -> {
                assertReadsAsText(text.toString(), index);
                // and the bytes were read by the byte reader, not left to the text reader
                assertNotNull(PosetFileParser.read(dir.resolve("input" + index + ".poset")));
            });
        }
    }

    /** A step that reads files. */
    private interface Reading {
        void run() throws IOException;
    }

    /** Runs {@code reading} with the workers' thread count set to {@code threads}, then restores it. */
    private static void withThreads(int threads, Reading reading) throws IOException {
        String before = System.getProperty("morse.threads");
        System.setProperty("morse.threads", Integer.toString(threads));
        try {
            reading.run();
        } finally {
            if (before == null) {
                System.clearProperty("morse.threads");
            } else {
                System.setProperty("morse.threads", before);
            }
        }
    }

    @Test
    void theByteReaderLeavesErrorsAndNonAsciiToTheTextReader() throws IOException {
        Path cycle = dir.resolve("cycle.poset");
        Files.writeString(cycle, "morse-poset 1\na: b\nb: a\n");
        assertNull(PosetFileParser.read(cycle));
        Path greek = dir.resolve("greek.poset");
        Files.writeString(greek, "morse-poset 1\nβ: α\n", StandardCharsets.UTF_8);
        assertNull(PosetFileParser.read(greek));
        assertEquals("β", PosetReader.read(greek).label(0));
    }
}
