package dev.morse.io;

import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.io.Writer;

/** Text made by a writer of streams, for the callers that want a string: the one place a string writer's impossible failure is handled. */
public final class TextOutput {
    private TextOutput() {
    }

    /** Something that writes to a {@link Writer}. */
    @FunctionalInterface
    public interface Body {
        /** Writes to {@code out}. */
        void writeTo(Writer out) throws IOException;
    }

    /** What {@code body} writes, as a string. */
    public static String render(Body body) {
        StringWriter out = new StringWriter();
        try {
            body.writeTo(out);
        } catch (IOException e) {
            throw new UncheckedIOException("a string writer does not fail", e);
        }
        return out.toString();
    }
}
