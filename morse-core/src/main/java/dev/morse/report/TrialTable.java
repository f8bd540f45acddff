package dev.morse.report;

import dev.morse.matching.TrialCount;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.StringJoiner;

/**
 * The tally of repeated seeded trials of a randomized matching as a table: one row per vector of
 * critical cells that occurred, with how many trials found it, their share, and the critical cells
 * beyond the Morse lower bound. The most frequent vector comes first; ties are ordered by the
 * vector itself, fewest critical cells in the lowest dimension first, so the table is the same
 * whatever order the trials ran in.
 */
final class TrialTable {
    static final String VECTOR = "critical cells";
    static final String COUNT = "count";
    static final String SHARE = "share";
    static final String EXCESS = "excess";
    static final String GAP = "gap";

    private TrialTable() {
    }

    /** Most frequent first, then by vector, compared dimension by dimension. */
    static List<TrialCount> sorted(List<TrialCount> trials) {
        List<TrialCount> rows = new ArrayList<>(trials);
        rows.sort(Comparator.comparingInt(TrialCount::count).reversed().thenComparing(TrialCount::critical,
                TrialTable::compareVectors));
        return rows;
    }

    private static int compareVectors(List<Integer> a, List<Integer> b) {
        for (int i = 0; i < Math.min(a.size(), b.size()); i++) {
            int c = Integer.compare(a.get(i), b.get(i));
            if (c != 0) {
                return c;
            }
        }
        return Integer.compare(a.size(), b.size());
    }

    /** A vector of critical cells as reports write it: {@code (1, 2, 1)}. */
    static String vector(List<Integer> critical) {
        StringJoiner j = new StringJoiner(", ", "(", ")");
        critical.forEach(c -> j.add(Integer.toString(c)));
        return j.toString();
    }

    /** Critical cells of one vector beyond the bound. */
    static long excess(TrialCount trial, long bound) {
        return trial.critical().stream().mapToLong(Integer::longValue).sum() - bound;
    }

    /**
     * The table, each line starting with {@code indent} and ending with a newline: a header, then one
     * row per vector. Shares are percentages of all trials with one decimal.
     */
    static String toText(List<TrialCount> trials, long bound, String indent) {
        return toText(trials, bound, Optional.empty(), indent);
    }

    /**
     * As {@link #toText(List, long, String)}, with a last column {@code gap}, the critical cells beyond
     * {@code optimum}, when the exact search ran.
     */
    static String toText(List<TrialCount> trials, long bound, Optional<Long> optimum, String indent) {
        long total = trials.stream().mapToLong(TrialCount::count).sum();
        List<String[]> rows = new ArrayList<>();
        rows.add(optimum.isPresent() ? new String[] {VECTOR, COUNT, SHARE, EXCESS, GAP}
                : new String[] {VECTOR, COUNT, SHARE, EXCESS});
        for (TrialCount t : sorted(trials)) {
            List<String> row = new ArrayList<>(List.of(vector(t.critical()), Integer.toString(t.count()),
                    String.format(Locale.ROOT, "%.1f%%", 100.0 * t.count() / total), Long.toString(excess(t, bound))));
            optimum.ifPresent(o -> row.add(Long.toString(excess(t, o))));
            rows.add(row.toArray(new String[0]));
        }
        int columns = rows.get(0).length;
        int[] width = new int[columns];
        for (String[] row : rows) {
            for (int c = 0; c < columns; c++) {
                width[c] = Math.max(width[c], row[c].length());
            }
        }
        StringBuilder text = new StringBuilder();
        for (String[] row : rows) {
            // the vector left-aligned, the numbers right-aligned under their headings
            StringBuilder line = new StringBuilder(String.format(Locale.ROOT, "%-" + width[0] + "s", row[0]));
            for (int c = 1; c < columns; c++) {
                line.append(String.format(Locale.ROOT, "  %" + width[c] + "s", row[c]));
            }
            text.append(indent).append(line.toString().stripTrailing()).append('\n');
        }
        return text.toString();
    }
}
