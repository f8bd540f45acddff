package dev.morse.io;

import it.unimi.dsi.fastutil.ints.IntArrayList;
import java.io.BufferedReader;
import java.io.IOException;
import java.io.Reader;
import java.math.BigDecimal;
import java.math.BigInteger;
import java.nio.file.Path;
import java.util.Locale;

/**
 * Reads one integer matrix in the coordinate form of the Matrix Market exchange format (Boisvert,
 * Pozo and Remington, NISTIR 5935, 1996), the form {@link MatrixMarketWriter} writes: the header
 * {@code %%MatrixMarket matrix coordinate integer general} ({@code real} is read too, as long as
 * every entry is a whole number), comment lines starting with {@code %}, the size line
 * {@code ROWS COLUMNS ENTRIES}, then one line {@code ROW COLUMN VALUE} per entry, 1-based. Entries
 * equal to zero are dropped; a position given twice is an error, since summing would hide a slip.
 * Every error names the file and the line to blame.
 */
public final class MatrixMarketReader {
    /** The header's first word, case-insensitive as the format allows. */
    public static final String BANNER = "%%MatrixMarket";

    private MatrixMarketReader() {
    }

    /** Reads a matrix file. */
    public static BoundaryMatrix read(Path file) throws IOException {
        return TextFiles.read(file, MatrixMarketReader::read);
    }

    /** Reads matrix text held in a string; {@code source} names it in error messages. */
    public static BoundaryMatrix parse(String text, String source) {
        return TextFiles.fromString(text, source, MatrixMarketReader::read);
    }

    /** Reads matrix text; {@code source} names it in error messages. */
    public static BoundaryMatrix read(Reader in, String source) throws IOException {
        BufferedReader reader = in instanceof BufferedReader b ? b : new BufferedReader(in);
        int lineNumber = 0;
        String line = reader.readLine();
        lineNumber++;
        if (line != null && line.startsWith("\uFEFF")) {
            line = line.substring(1);
        }
        if (line == null || !line.strip().regionMatches(true, 0, BANNER, 0, BANNER.length())) {
            throw new InputException(source, line == null ? InputException.NO_LINE : 1,
                    "not a Matrix Market file: the first line must be '" + MatrixMarketWriter.HEADER + "'");
        }
        String[] header = line.strip().toLowerCase(Locale.ROOT).split("\\s+");
        if (header.length != 5 || !header[1].equals("matrix") || !header[2].equals("coordinate")
                || !(header[3].equals("integer") || header[3].equals("real")) || !header[4].equals("general")) {
            throw new InputException(source, 1, "a boundary matrix is read in the form '" + MatrixMarketWriter.HEADER
                    + "' ('real' is accepted when every entry is a whole number)");
        }
        int rows = -1;
        int columns = -1;
        long announced = -1;
        IntArrayList entryRows = new IntArrayList();
        IntArrayList entryColumns = new IntArrayList();
        IntArrayList values = new IntArrayList();
        IntArrayList lines = new IntArrayList();
        long seen = 0;
        while ((line = reader.readLine()) != null) {
            lineNumber++;
            String content = line.strip();
            if (content.isEmpty() || content.startsWith("%")) {
                continue;
            }
            String[] words = content.split("\\s+");
            if (rows < 0) {
                if (words.length != 3) {
                    throw new InputException(source, lineNumber, "expected the size line 'ROWS COLUMNS ENTRIES'");
                }
                rows = TextFiles.wholeNumber(words[0], "number of rows", source, lineNumber);
                columns = TextFiles.wholeNumber(words[1], "number of columns", source, lineNumber);
                announced = TextFiles.wholeNumber(words[2], "number of entries", source, lineNumber);
                continue;
            }
            if (words.length != 3) {
                throw new InputException(source, lineNumber, "expected an entry 'ROW COLUMN VALUE'");
            }
            seen++;
            if (seen > announced) {
                throw new InputException(source, lineNumber, "more entries than the " + announced
                        + " the size line announces");
            }
            int row = index(words[0], rows, "row", source, lineNumber);
            int column = index(words[1], columns, "column", source, lineNumber);
            int value = value(words[2], source, lineNumber);
            if (value != 0) {
                entryRows.add(row);
                entryColumns.add(column);
                values.add(value);
                lines.add(lineNumber);
            }
        }
        if (rows < 0) {
            throw new InputException(source, InputException.NO_LINE, "no size line 'ROWS COLUMNS ENTRIES'");
        }
        if (seen < announced) {
            throw new InputException(source, InputException.NO_LINE, "the size line announces " + announced
                    + " entries, but there are " + seen);
        }
        return BoundaryMatrix.of(source, rows, columns, entryRows.toIntArray(), entryColumns.toIntArray(),
                values.toIntArray(), lines.toIntArray());
    }

    private static int index(String word, int size, String what, String source, int line) {
        try {
            int i = Integer.parseInt(word);
            if (i >= 1 && i <= size) {
                return i - 1;
            }
        } catch (NumberFormatException e) {
            // worded below
        }
        throw new InputException(source, line, what + " '" + word + "' is not between 1 and " + size);
    }

    /** A whole number that fits in 32 bits, written as an integer or as a decimal with no fractional part. */
    private static int value(String word, String source, int line) {
        BigDecimal decimal;
        try {
            decimal = new BigDecimal(word);
        } catch (NumberFormatException e) {
            throw new InputException(source, line, "the entry '" + word + "' is not a number");
        }
        if (decimal.signum() != 0 && decimal.stripTrailingZeros().scale() > 0) {
            throw new InputException(source, line, "the entry '" + word + "' is not a whole number; boundary"
                    + " matrices have integer entries");
        }
        // compared by digits before converting, so that an exponent like 1e999999999 is never expanded
        if (decimal.signum() != 0 && decimal.precision() - decimal.scale() > 10) {
            throw new InputException(source, line, "the entry '" + word + "' does not fit in 32 bits");
        }
        BigInteger whole = decimal.toBigIntegerExact();
        if (whole.bitLength() > 31) {
            throw new InputException(source, line, "the entry '" + word + "' does not fit in 32 bits");
        }
        return whole.intValueExact();
    }
}
