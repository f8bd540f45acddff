package dev.morse.io;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.io.StringReader;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * Opening the text formats one way: UTF-8 that is checked, not silently replaced, so a binary or
 * mis-encoded file is one clear error; and text held in a string read the same way as a file.
 */
public final class TextFiles {
    private TextFiles() {
    }

    /** A reader of one text format. */
    @FunctionalInterface
    public interface TextRead<T> {
        /** Reads all of {@code reader}; {@code source} names it in error messages. */
        T read(BufferedReader reader, String source) throws IOException;
    }

    /**
     * Reads {@code file} as UTF-8 text with {@code read}; text that is not UTF-8 is an
     * {@link InputException} on the file.
     */
    public static <T> T read(Path file, TextRead<T> read) throws IOException {
        try (BufferedReader reader = utf8(file)) {
            return read.read(reader, file.toString());
        } catch (CharacterCodingException e) {
            throw new InputException(file.toString(), InputException.NO_LINE, "not valid UTF-8 text");
        }
    }

    /** Reads text held in a string with {@code read}: no read can fail. */
    public static <T> T fromString(String text, String source, TextRead<T> read) {
        try {
            return read.read(new BufferedReader(new StringReader(text)), source);
        } catch (IOException e) {
            throw new AssertionError("a string reader does not fail", e);
        }
    }

    /** A buffered reader of {@code file} that reports malformed UTF-8 instead of replacing it. */
    public static BufferedReader utf8(Path file) throws IOException {
        return new BufferedReader(new InputStreamReader(Files.newInputStream(file), StandardCharsets.UTF_8.newDecoder()
                .onMalformedInput(CodingErrorAction.REPORT)
                .onUnmappableCharacter(CodingErrorAction.REPORT)), 1 << 16);
    }

    /**
     * {@code word} as a whole number from 0 to {@link Integer#MAX_VALUE}, or an {@link InputException}
     * on line {@code line} saying that {@code what} must be one.
     */
    public static int wholeNumber(String word, String what, String source, int line) {
        try {
            int n = Integer.parseInt(word);
            if (n >= 0) {
                return n;
            }
        } catch (NumberFormatException e) {
            // worded below
        }
        throw new InputException(source, line, "the " + what + " must be a whole number from 0 to "
                + Integer.MAX_VALUE + ", not '" + word + "'");
    }
}
