package dev.morse.io;

/**
 * Bad input: carries the file name and, where one line is to blame, its 1-based number, so that the
 * message reads {@code FILE:LINE: what is wrong}. Unchecked so that streaming readers can raise it
 * from inside callbacks.
 */
public final class InputException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    /** Marks an error that no single line is to blame for. */
    public static final int NO_LINE = 0;

    private final String source;
    private final int line;
    private final String problem;

    /**
     * @param source the file name as the user gave it
     * @param line the 1-based line number, or {@link #NO_LINE}
     * @param problem what is wrong, without the location
     */
    public InputException(String source, int line, String problem) {
        super(format(source, line, problem));
        this.source = source;
        this.line = line;
        this.problem = problem;
    }

    private static String format(String source, int line, String problem) {
        return line > 0 ? source + ":" + line + ": " + problem : source + ": " + problem;
    }

    /** The file name as the user gave it. */
    public String source() {
        return source;
    }

    /** The 1-based line to blame, or {@link #NO_LINE}. */
    public int line() {
        return line;
    }

    /** What is wrong, without the location. */
    public String problem() {
        return problem;
    }
}
