package dev.morse.report;

import java.util.Locale;

/**
 * A small writer of SVG text, for the pictures here: elements with attributes, escaped text, and
 * coordinates with two decimals. Hand-written on purpose: the pictures are simple and the format
 * is plain XML.
 */
final class Svg {
    private final StringBuilder out = new StringBuilder();
    private int depth;

    /** Starts a document of the given size in pixels. */
    Svg(double width, double height) {
        out.append("<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n");
        open("svg", "xmlns", "http://www.w3.org/2000/svg", "width", number(width), "height", number(height),
                "viewBox", "0 0 " + number(width) + " " + number(height), "font-family", "sans-serif");
    }

    /** Opens an element; attributes come as name, value pairs. */
    Svg open(String name, String... attributes) {
        startTag(name, attributes).append(">\n");
        depth++;
        return this;
    }

    /** Closes the innermost open element, which must be {@code name}. */
    Svg close(String name) {
        depth--;
        indent();
        out.append("</").append(name).append(">\n");
        return this;
    }

    /** An element without content. */
    Svg empty(String name, String... attributes) {
        startTag(name, attributes).append("/>\n");
        return this;
    }

    /** An element holding escaped text. */
    Svg text(String name, String content, String... attributes) {
        startTag(name, attributes).append('>').append(escape(content)).append("</").append(name).append(">\n");
        return this;
    }

    /** An empty element with a tooltip: a {@code <title>} child. */
    Svg titled(String name, String title, String... attributes) {
        startTag(name, attributes).append("><title>").append(escape(title)).append("</title></").append(name)
                .append(">\n");
        return this;
    }

    /** Indents and writes the start of an element with its attributes, leaving the tag open. */
    private StringBuilder startTag(String name, String... attributes) {
        indent();
        out.append('<').append(name);
        attributes(attributes);
        return out;
    }

    /** The finished document. */
    String finish() {
        while (depth > 0) {
            close("svg");
        }
        return out.toString();
    }

    /** A coordinate or length with at most two decimals. */
    static String number(double value) {
        String s = String.format(Locale.ROOT, "%.2f", value);
        s = s.contains(".") ? s.replaceAll("0+$", "").replaceAll("\\.$", "") : s;
        return s.equals("-0") ? "0" : s;
    }

    /** Text made safe for XML content and attribute values. */
    static String escape(String text) {
        StringBuilder s = new StringBuilder(text.length());
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            switch (c) {
                case '&' -> s.append("&amp;");
                case '<' -> s.append("&lt;");
                case '>' -> s.append("&gt;");
                case '"' -> s.append("&quot;");
                case '\'' -> s.append("&apos;");
                default -> {
                    // control characters other than tab and line ends are not allowed in XML 1.0
                    if (c >= 0x20 || c == '\t' || c == '\n' || c == '\r') {
                        s.append(c);
                    }
                }
            }
        }
        return s.toString();
    }

    private void attributes(String[] attributes) {
        if (attributes.length % 2 != 0) {
            throw new IllegalArgumentException("attributes come in name, value pairs");
        }
        for (int i = 0; i < attributes.length; i += 2) {
            out.append(' ').append(attributes[i]).append("=\"").append(escape(attributes[i + 1])).append('"');
        }
    }

    private void indent() {
        out.append("  ".repeat(depth));
    }
}
