package dev.morse.io;

import dev.morse.homology.SparseIntegerMatrix;
import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.util.List;

/**
 * Writes a sparse integer matrix in the Matrix Market exchange format of NIST (Boisvert, Pozo and
 * Remington, "The Matrix Market exchange formats: initial design", NISTIR 5935, 1996), in its
 * coordinate form: the header {@code %%MatrixMarket matrix coordinate integer general}, comment lines
 * starting with {@code %}, a line {@code ROWS COLUMNS ENTRIES}, then one line {@code ROW COLUMN VALUE}
 * per nonzero entry with 1-based indices, column by column. Streams; holds nothing.
 */
public final class MatrixMarketWriter {
    /** The header line of the coordinate integer general format. */
    public static final String HEADER = "%%MatrixMarket matrix coordinate integer general";

    private MatrixMarketWriter() {
    }

    /** Writes {@code matrix} with {@code comments} (one line each, without the {@code %}) to {@code out}. */
    public static void write(SparseIntegerMatrix matrix, List<String> comments, Writer out) throws IOException {
        out.write(HEADER);
        out.write('\n');
        for (String comment : comments) {
            if (comment.indexOf('\n') >= 0 || comment.indexOf('\r') >= 0) {
                throw new IllegalArgumentException("a comment is one line");
            }
            out.write("% ");
            out.write(comment);
            out.write('\n');
        }
        out.write(matrix.rows() + " " + matrix.columns() + " " + matrix.nonZeros() + "\n");
        StringBuilder line = new StringBuilder();
        for (int j = 0; j < matrix.columns(); j++) {
            for (int i = matrix.start(j); i < matrix.end(j); i++) {
                line.setLength(0);
                line.append(matrix.row(i) + 1).append(' ').append(j + 1).append(' ').append(matrix.value(i)).append('\n');
                out.append(line);
            }
        }
        out.flush();
    }

    /** The matrix as Matrix Market text. */
    public static String toText(SparseIntegerMatrix matrix, List<String> comments) {
        StringWriter out = new StringWriter();
        try {
            write(matrix, comments, out);
        } catch (IOException e) {
            throw new UncheckedIOException("a string writer does not fail", e);
        }
        return out.toString();
    }
}
