package dev.morse.io;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.Reader;
import java.io.StringReader;
import java.nio.file.Path;

/**
 * The formats this program reads. The two text formats are told apart by the first word of their
 * header line; images and volumes are binary files recognised by {@code dev.morse.image.ImageInput}
 * and have no header line of this kind.
 */
public enum InputFormat {
    /** {@code morse-poset 1}, read by {@link PosetReader}. */
    POSET(PosetReader.KIND, PosetReader.VERSION),
    /** {@code morse-simplicial 1}, read by {@link SimplicialReader}. */
    SIMPLICIAL(SimplicialReader.KIND, SimplicialReader.VERSION),
    /** A 2D image (Netpbm, PNG and the other formats of javax.imageio), read as its foreground pixels. */
    IMAGE("image", ""),
    /** A 3D volume (a stack of 2D slices, or raw bytes), read as its foreground voxels. */
    VOLUME("volume", "");

    private static final int QUOTED_HEADER_LENGTH = 40;

    private final String kind;
    private final String version;

    InputFormat(String kind, String version) {
        this.kind = kind;
        this.version = version;
    }

    /** Whether this is a text format with a header line, as opposed to an image or volume. */
    public boolean isText() {
        return !version.isEmpty();
    }

    /** The header's first word; for images and volumes, just their name. */
    public String kind() {
        return kind;
    }

    /** The header line this program writes and expects, such as {@code morse-poset 1}. */
    public String header() {
        return isText() ? kind + " " + version : kind;
    }

    /**
     * The format of a file, from its first meaningful line. Only the header is read; the version is
     * left for the format's reader to check.
     *
     * @throws InputException {@code FILE: ...} when there is no header line, {@code FILE:LINE: ...}
     *     when the header names no format known here
     */
    public static InputFormat detect(Path file) throws IOException {
        try (BufferedReader reader = PosetReader.utf8(file)) {
            return detect(reader, file.toString());
        }
    }

    /** The format of text held in a string; {@code source} names it in error messages. */
    public static InputFormat detect(String text, String source) {
        try {
            return detect(new StringReader(text), source);
        } catch (IOException e) {
            throw new AssertionError("a string reader does not fail", e);
        }
    }

    /** The format of text read from {@code reader}; {@code source} names it in error messages. */
    public static InputFormat detect(Reader reader, String source) throws IOException {
        BufferedReader buffered = reader instanceof BufferedReader b ? b : new BufferedReader(reader);
        ContentLines lines = new ContentLines(buffered, source);
        String header = lines.next();
        if (header == null) {
            throw new InputException(source, InputException.NO_LINE,
                    "no header: expected '" + POSET.header() + "' or '" + SIMPLICIAL.header() + "' as the first line");
        }
        String first = ContentLines.words(header)[0];
        for (InputFormat format : values()) {
            if (format.isText() && format.kind.equals(first)) {
                return format;
            }
        }
        throw lines.error("unknown header '" + shorten(header) + "': expected '" + POSET.header()
                + "' or '" + SIMPLICIAL.header() + "'");
    }

    private static String shorten(String text) {
        return text.codePointCount(0, text.length()) <= QUOTED_HEADER_LENGTH
                ? text
                : text.substring(0, text.offsetByCodePoints(0, QUOTED_HEADER_LENGTH)) + "...";
    }
}
