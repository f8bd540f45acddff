package dev.morse.io;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.Reader;
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
    VOLUME("volume", ""),
    /** Boundary matrices in the Matrix Market format, read by {@link MatrixMarketReader}: a chain complex. */
    MATRICES("matrices", ""),
    /** A graph in the Graphviz DOT language. */
    DOT("dot", ""),
    /** A graph in GraphML. */
    GRAPHML("graphml", ""),
    /** A graph as a plain edge list, one edge {@code u v} per line; told by the file name ending {@code .edges}. */
    EDGES("edges", ""),
    /** A polygon mesh in the Wavefront OBJ format; told by the file name ending {@code .obj}. */
    OBJ("obj", ""),
    /** A polygon mesh in the OFF format, told by its first line {@code OFF}. */
    OFF("off", "");

    /** How many characters the content sniffing of {@link #sniff(Path)} looks at. */
    private static final int SNIFF_CHARS = 4096;

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
        try (BufferedReader reader = TextFiles.utf8(file)) {
            return detect(reader, file.toString());
        }
    }

    /**
     * The format of a single file that is not an image: told by its first bytes for Matrix Market,
     * OFF, GraphML and DOT, by its name for OBJ ({@code .obj}) and edge lists ({@code .edges}), which
     * have no header, and otherwise by its header line as in {@link #detect(Path)}.
     *
     * @throws InputException as {@link #detect(Path)} does when no format is recognised
     */
    public static InputFormat sniff(Path file) throws IOException {
        String name = file.getFileName() == null ? "" : file.getFileName().toString().toLowerCase(java.util.Locale.ROOT);
        if (name.endsWith(".obj")) {
            return OBJ;
        }
        if (name.endsWith(".edges")) {
            return EDGES;
        }
        char[] buffer = new char[SNIFF_CHARS];
        int length = 0;
        try (Reader reader = new java.io.InputStreamReader(java.nio.file.Files.newInputStream(file),
                java.nio.charset.StandardCharsets.UTF_8)) {
            int read;
            while (length < buffer.length && (read = reader.read(buffer, length, buffer.length - length)) > 0) {
                length += read;
            }
        }
        InputFormat byContent = byContent(new String(buffer, 0, length));
        return byContent != null ? byContent : detect(file);
    }

    /** The format told by the start of a text, or null when the start names none of the headerless formats. */
    static InputFormat byContent(String start) {
        String text = start.startsWith("\uFEFF") ? start.substring(1) : start;
        String trimmed = text.stripLeading();
        if (trimmed.regionMatches(true, 0, MatrixMarketReader.BANNER, 0, MatrixMarketReader.BANNER.length())) {
            return MATRICES;
        }
        if (trimmed.startsWith("<")) {
            return trimmed.contains("<graphml") ? GRAPHML : null;
        }
        String first = firstDotWord(text);
        if (first.equals("OFF")) {
            return OFF;
        }
        String lower = first.toLowerCase(java.util.Locale.ROOT);
        return lower.equals("graph") || lower.equals("digraph") || lower.equals("strict") ? DOT : null;
    }

    /**
     * The first word of a text once comments are skipped: {@code #} lines (comments in the house
     * formats and OFF, preprocessor lines in DOT), {@code //} and {@code /* ... *}{@code /} comments (DOT).
     */
    private static String firstDotWord(String text) {
        int i = 0;
        int n = text.length();
        while (i < n) {
            char c = text.charAt(i);
            if (Character.isWhitespace(c)) {
                i++;
            } else if (c == '#' || text.startsWith("//", i)) {
                int end = text.indexOf('\n', i);
                i = end < 0 ? n : end + 1;
            } else if (text.startsWith("/*", i)) {
                int end = text.indexOf("*/", i + 2);
                i = end < 0 ? n : end + 2;
            } else {
                int start = i;
                while (i < n && (Character.isLetterOrDigit(text.charAt(i)) || text.charAt(i) == '-'
                        || text.charAt(i) == '_')) {
                    i++;
                }
                return text.substring(start, i);
            }
        }
        return "";
    }

    /** The format of text held in a string; {@code source} names it in error messages. */
    public static InputFormat detect(String text, String source) {
        return TextFiles.fromString(text, source, InputFormat::detect);
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
