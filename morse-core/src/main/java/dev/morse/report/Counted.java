package dev.morse.report;

/** A count with its noun, singular or plural as the count asks: {@code 1 pair}, {@code 4 pairs}. */
public final class Counted {
    private Counted() {
    }

    /** {@code count} and {@code noun}, with an {@code s} unless the count is one. */
    public static String of(long count, String noun) {
        return of(count, noun, noun + "s");
    }

    /** {@code count} and the singular or the plural, as the count asks. */
    public static String of(long count, String singular, String plural) {
        return count + " " + (count == 1 ? singular : plural);
    }
}
