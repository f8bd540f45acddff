package dev.morse.report;

/**
 * A count with its noun, singular or plural as the count asks: {@code 1 pair}, {@code 4 pairs}; and
 * lists of counts that stay short enough to read.
 */
public final class Counted {
    /** A run of this many equal values or more is written once with its length. */
    static final int RUN = 4;
    /** Terms shown at each end of a list too long to show whole. */
    static final int ENDS = 6;

    private Counted() {
    }

    /**
     * The values joined by {@code separator}, short enough for one line whatever their number: a run
     * of {@value #RUN} or more equal values becomes {@code v (×k)}, and when more than
     * {@code 2·}{@value #ENDS} terms remain, the middle ones are replaced by {@code … (k more) …}.
     * A chain of 100,000 elements has 100,000 ranks of one element: {@code 1 (×100000)}.
     */
    public static String terms(java.util.List<? extends Number> values, String separator) {
        java.util.List<String> terms = new java.util.ArrayList<>();
        for (int i = 0; i < values.size();) {
            String v = values.get(i).toString();
            int j = i + 1;
            while (j < values.size() && values.get(j).toString().equals(v)) {
                j++;
            }
            if (j - i >= RUN) {
                terms.add(v + " (×" + (j - i) + ")");
            } else {
                for (int k = i; k < j; k++) {
                    terms.add(v);
                }
            }
            i = j;
        }
        if (terms.size() > 2 * ENDS + 1) {
            int hidden = terms.size() - 2 * ENDS;
            java.util.List<String> shown = new java.util.ArrayList<>(terms.subList(0, ENDS));
            shown.add("… (" + hidden + " more) …");
            shown.addAll(terms.subList(terms.size() - ENDS, terms.size()));
            terms = shown;
        }
        return String.join(separator, terms);
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
