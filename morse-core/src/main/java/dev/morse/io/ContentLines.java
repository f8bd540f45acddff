package dev.morse.io;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.Reader;
import java.io.UncheckedIOException;

/**
 * The meaningful lines of a text input: comments ({@code #} to the end of the line) cut off,
 * surrounding white space trimmed, blank lines skipped, the first line checked as a header.
 * Streaming: holds one line at a time.
 */
final class ContentLines {
    private static final String BYTE_ORDER_MARK = "\uFEFF";

    private final BufferedReader reader;
    private final String source;
    private int lineNumber;

    ContentLines(BufferedReader reader, String source) {
        this.reader = reader;
        this.source = source;
    }

    /** The lines of {@code reader} after its header line, checked to be {@code kind version}. */
    static ContentLines afterHeader(Reader reader, String source, String kind, String version) {
        ContentLines lines = new ContentLines(reader instanceof BufferedReader b ? b : new BufferedReader(reader), source);
        lines.expectHeader(kind, version);
        return lines;
    }

    /** The next meaningful line, or {@code null} at the end. */
    String next() {
        try {
            String line;
            while ((line = reader.readLine()) != null) {
                lineNumber++;
                if (lineNumber == 1 && line.startsWith(BYTE_ORDER_MARK)) {
                    // some editors start UTF-8 files with an invisible byte order mark
                    line = line.substring(1);
                }
                int hash = line.indexOf('#');
                if (hash >= 0) {
                    line = line.substring(0, hash);
                }
                line = line.strip();
                if (!line.isEmpty()) {
                    return line;
                }
            }
            return null;
        } catch (java.nio.charset.CharacterCodingException e) {
            // the decoder runs ahead of the lines handed out, so no line number would be trustworthy
            throw new InputException(source, InputException.NO_LINE, "not valid UTF-8 text");
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Reads and checks the header {@code KIND VERSION}. */
    void expectHeader(String kind, String version) {
        String header = next();
        if (header == null) {
            throw new InputException(source, InputException.NO_LINE,
                    "no header: expected '" + kind + " " + version + "' as the first line");
        }
        String[] words = words(header);
        if (words.length == 2 && words[0].equals(kind) && !words[1].equals(version)) {
            throw error("unsupported version '" + words[1] + "' of " + kind + ": this program reads version " + version);
        }
        if (words.length != 2 || !words[0].equals(kind)) {
            throw error("missing or unknown header: expected '" + kind + " " + version + "'");
        }
    }

    /** An input error located at the current line. */
    InputException error(String problem) {
        return new InputException(source, lineNumber, problem);
    }

    /** The 1-based number of the line last returned. */
    int lineNumber() {
        return lineNumber;
    }

    String source() {
        return source;
    }

    /**
     * Splits on runs of white space in the sense of {@link Character#isWhitespace}, the same sense
     * in which {@link String#strip()} trims lines, so that no word ever contains white space; the
     * line is already trimmed and non-empty. Scans by hand: a regular expression per line costs
     * more than the rest of parsing on big files.
     */
    static String[] words(String line) {
        int count = 0;
        int n = line.length();
        for (int i = 0; i < n; ) {
            while (i < n && Character.isWhitespace(line.charAt(i))) {
                i++;
            }
            if (i < n) {
                count++;
            }
            while (i < n && !Character.isWhitespace(line.charAt(i))) {
                i++;
            }
        }
        String[] words = new String[count];
        int k = 0;
        for (int i = 0; i < n; ) {
            while (i < n && Character.isWhitespace(line.charAt(i))) {
                i++;
            }
            int start = i;
            while (i < n && !Character.isWhitespace(line.charAt(i))) {
                i++;
            }
            if (i > start) {
                words[k++] = line.substring(start, i);
            }
        }
        return words;
    }
}
