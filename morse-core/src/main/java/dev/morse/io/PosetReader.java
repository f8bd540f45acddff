package dev.morse.io;

import dev.morse.poset.OrderCycleException;
import dev.morse.poset.Poset;
import dev.morse.poset.PosetBuilder;
import dev.morse.progress.Progress;
import java.io.BufferedReader;
import java.io.IOException;
import java.io.Reader;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * Reads the {@code morse-poset 1} format: a header line, then lines {@code LABEL} or
 * {@code LABEL: LOWER ...}, each LOWER being below LABEL. Streaming; relations need not be covers.
 * Files are first read as bytes ({@link PosetFileParser}), and read as text only when that parser
 * gives up (non-ASCII input or an error), so that every error message comes from one place.
 */
public final class PosetReader {
    /** The header's first word. */
    public static final String KIND = "morse-poset";
    /** The only version read. */
    public static final String VERSION = "1";

    /** Lines between two progress reports, less one (a mask). */
    static final int REPORT_EVERY = (1 << 12) - 1;

    private PosetReader() {
    }

    /** Reads a poset file; the file name appears in error messages as given. */
    public static Poset read(Path file) throws IOException {
        Poset parsed = PosetFileParser.read(file);
        if (parsed != null) {
            return parsed;
        }
        // not plain ASCII, or something is wrong: the text reader decides, and words any error
        try (BufferedReader reader = TextFiles.utf8(file)) {
            return read(reader, file.toString());
        }
    }

    /** Reads poset text from a string; {@code source} names it in error messages. */
    public static Poset parse(String text, String source) {
        return TextFiles.fromString(text, source, PosetReader::read);
    }

    /** Reads poset text from {@code reader}; {@code source} names it in error messages. */
    public static Poset read(Reader reader, String source) throws IOException {
        ContentLines lines = ContentLines.afterHeader(reader, source, KIND, VERSION);
        PosetBuilder builder = new PosetBuilder();
        Progress progress = Progress.current();
        progress.begin("read", "lines", 0);
        for (String line = lines.next(); line != null; line = lines.next()) {
            readLine(line, lines, builder);
            if ((lines.lineNumber() & REPORT_EVERY) == 0) {
                progress.reached(lines.lineNumber());
            }
        }
        progress.begin("hasse diagram", "elements", builder.size());
        try {
            return builder.build();
        } catch (OrderCycleException e) {
            throw cycleError(e, builder, lines.source());
        }
    }

    private static void readLine(String line, ContentLines lines, PosetBuilder builder) {
        int colon = line.indexOf(':');
        String head = colon < 0 ? line : line.substring(0, colon).strip();
        if (head.isEmpty()) {
            throw lines.error("empty label before ':'");
        }
        if (containsWhitespace(head)) {
            throw lines.error(colon < 0
                    ? "expected 'LABEL' or 'LABEL: LOWER ...', found several words without ':'"
                    : "expected one label before ':', found '" + head + "'");
        }
        int upper = builder.element(head);
        if (colon < 0) {
            return;
        }
        String rest = line.substring(colon + 1).strip();
        if (rest.isEmpty()) {
            return;
        }
        if (rest.indexOf(':') >= 0) {
            throw lines.error("stray ':' after the first one");
        }
        for (String word : ContentLines.words(rest)) {
            if (word.equals(head)) {
                throw lines.error("label '" + head + "' is listed below itself");
            }
            builder.relate(builder.element(word), upper, lines.lineNumber());
        }
    }

    private static boolean containsWhitespace(String s) {
        for (int i = 0; i < s.length(); i++) {
            if (Character.isWhitespace(s.charAt(i))) {
                return true;
            }
        }
        return false;
    }

    /** The most elements of a cycle an error names. */
    private static final int CYCLE_SHOWN = 8;

    private static InputException cycleError(OrderCycleException e, PosetBuilder builder, String source) {
        int[] cycle = e.cycle();
        StringBuilder text = new StringBuilder("the relations contain a cycle of ")
                .append(cycle.length).append(" elements: ");
        // a long cycle is named by its first and last few elements, so that the message stays one short line
        int shown = cycle.length <= CYCLE_SHOWN ? cycle.length : CYCLE_SHOWN - 2;
        for (int i = 0; i < shown; i++) {
            text.append(builder.label(cycle[i])).append(" < ");
        }
        if (shown < cycle.length) {
            text.append("… (").append(cycle.length - CYCLE_SHOWN).append(" more) … < ");
            for (int i = cycle.length - 2; i < cycle.length; i++) {
                text.append(builder.label(cycle[i])).append(" < ");
            }
        }
        text.append(builder.label(cycle[0]));
        return new InputException(source, e.tag(), text.toString());
    }

}
