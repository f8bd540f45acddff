package dev.morse.io;

import dev.morse.poset.Adjacency;
import dev.morse.poset.Poset;
import java.io.IOException;
import java.io.Writer;

/**
 * Writes a poset in the {@code morse-poset 1} format: one line per element in a linear extension,
 * listing the elements it covers, so that reading the text back gives the same Hasse diagram.
 */
public final class PosetWriter {
    private PosetWriter() {
    }

    /** Writes {@code poset} to {@code out}; does not close it. */
    public static void write(Poset poset, Writer out) throws IOException {
        out.write(PosetReader.KIND + " " + PosetReader.VERSION + "\n");
        Adjacency below = poset.lowerCovers();
        for (int x : poset.linearExtension()) {
            out.write(poset.label(x));
            if (below.degree(x) > 0) {
                out.write(':');
                for (int i = below.start(x); i < below.end(x); i++) {
                    out.write(' ');
                    out.write(poset.label(below.target(i)));
                }
            }
            out.write('\n');
        }
    }

    /** The poset as text. */
    public static String toText(Poset poset) {
        return TextOutput.render(w -> write(poset, w));
    }
}
