package dev.morse.report;

import dev.morse.engine.ComparisonReport;
import dev.morse.engine.MatchingRun;
import dev.morse.matching.OptimalMatching;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.StringJoiner;

/**
 * Several comparisons in one table, one row per complex: its cells, the Morse lower bound, the best
 * matching of the exact search (and whether it is proven optimal), and per matching its total
 * critical cells with the gap to that optimum; the last rows add up each matching's excess over the
 * Morse bounds and its gap. Every report must compare the same matchings in the same order.
 */
public final class ComparisonSummaryWriter {
    private ComparisonSummaryWriter() {
    }

    /** The table as lines of text, each ending with a newline. */
    public static String toText(List<ComparisonReport> reports) {
        List<String> matchings = requireSameMatchings(reports);
        List<String[]> rows = new ArrayList<>();
        List<String> header = new ArrayList<>(List.of("complex", "cells", "bound", "optimum", "proven"));
        header.addAll(matchings);
        rows.add(header.toArray(new String[0]));
        Map<String, Long> excess = new LinkedHashMap<>();
        Map<String, Long> gap = new LinkedHashMap<>();
        boolean everyOptimum = true;
        for (ComparisonReport report : reports) {
            List<String> row = new ArrayList<>(List.of(report.input(), Long.toString(report.totalCells()),
                    Long.toString(report.morseLowerBound())));
            if (report.optimum().isPresent()) {
                OptimalMatching o = report.optimum().get();
                row.add(o.criticalTotal() + " " + vector(o.critical()));
                row.add(o.proven() ? "yes" : "no, >= " + o.lowerBound());
            } else {
                everyOptimum = false;
                row.add("-");
                row.add("-");
            }
            for (MatchingRun run : report.runs()) {
                excess.merge(run.matching(), report.excess(run), Long::sum);
                report.gap(run).ifPresent(g -> gap.merge(run.matching(), g, Long::sum));
                row.add(run.totalCritical() + report.gap(run).map(g -> " (+" + g + ")").orElse(""));
            }
            rows.add(row.toArray(new String[0]));
        }
        List<String> excessRow = new ArrayList<>(List.of("excess over the bound", "", "", "", ""));
        List<String> gapRow = new ArrayList<>(List.of("gap to the optimum", "", "", "", ""));
        for (String m : matchings) {
            excessRow.add(Long.toString(excess.get(m)));
            gapRow.add(everyOptimum ? Long.toString(gap.getOrDefault(m, 0L)) : "-");
        }
        rows.add(excessRow.toArray(new String[0]));
        rows.add(gapRow.toArray(new String[0]));
        StringBuilder text = new StringBuilder();
        text.append("Total critical cells per complex and matching, the gap to the optimum in parentheses.\n");
        text.append(align(rows));
        return text.toString();
    }

    private static String align(List<String[]> rows) {
        int columns = rows.get(0).length;
        int[] width = new int[columns];
        for (String[] r : rows) {
            for (int c = 0; c < columns; c++) {
                width[c] = Math.max(width[c], c == 0 && r != rows.get(0) && r[1].isEmpty() ? 0 : r[c].length());
            }
        }
        StringBuilder text = new StringBuilder();
        for (String[] r : rows) {
            StringBuilder line = new StringBuilder("  ");
            for (int c = 0; c < columns; c++) {
                // the complex, optimum and proven columns left-aligned, counts right-aligned
                boolean left = c == 0 || c == 3 || c == 4;
                String cell = r[c];
                if (c == 0 && r[1].isEmpty() && r != rows.get(0)) {
                    // a total row: its label spans the columns up to the first matching
                    int span = 0;
                    for (int k = 0; k < 5; k++) {
                        span += width[k] + (k > 0 ? 2 : 0);
                    }
                    line.append(String.format(Locale.ROOT, "%-" + span + "s", cell)).append("  ");
                    c = 4;
                    continue;
                }
                String fill = " ".repeat(width[c] - cell.length());
                line.append(left ? cell + fill : fill + cell).append(c + 1 < columns ? "  " : "");
            }
            text.append(line.toString().stripTrailing()).append('\n');
        }
        return text.toString();
    }

    /**
     * The same as one JSON object: {@code complexes}, each with {@code complex} (the input's name),
     * {@code cells}, {@code morse_lower_bound}, {@code optimum} (as in comparisons, when sought) and
     * {@code matchings} (each {@code matching}, {@code critical}, {@code total}, {@code excess} and
     * {@code gap} when the optimum was sought); then {@code totals}: per matching its summed
     * {@code excess} and, when every complex has an optimum, {@code gap}.
     */
    public static String toJson(List<ComparisonReport> reports) {
        List<String> matchings = requireSameMatchings(reports);
        return JsonStyle.toText(json -> {
            json.writeStartObject();
            json.writeArrayFieldStart("complexes");
            Map<String, Long> excess = new LinkedHashMap<>();
            Map<String, Long> gap = new LinkedHashMap<>();
            boolean everyOptimum = true;
            for (ComparisonReport report : reports) {
                json.writeStartObject();
                json.writeStringField("complex", report.input());
                json.writeNumberField("cells", report.totalCells());
                json.writeNumberField("morse_lower_bound", report.morseLowerBound());
                if (report.optimum().isPresent()) {
                    OptimalMatching o = report.optimum().get();
                    json.writeObjectFieldStart("optimum");
                    JsonStyle.intArray(json, "critical", Arrays.stream(o.critical()).boxed().toList());
                    json.writeNumberField("total", o.criticalTotal());
                    json.writeBooleanField("proven", o.proven());
                    json.writeNumberField("lower_bound", o.lowerBound());
                    json.writeNumberField("ms", o.elapsed().toMillis());
                    json.writeEndObject();
                } else {
                    everyOptimum = false;
                }
                json.writeArrayFieldStart("matchings");
                for (MatchingRun run : report.runs()) {
                    json.writeStartObject();
                    json.writeStringField("matching", run.matching());
                    JsonStyle.intArray(json, "critical", run.critical());
                    json.writeNumberField("total", run.totalCritical());
                    json.writeNumberField("excess", report.excess(run));
                    excess.merge(run.matching(), report.excess(run), Long::sum);
                    if (report.gap(run).isPresent()) {
                        json.writeNumberField("gap", report.gap(run).get());
                        gap.merge(run.matching(), report.gap(run).get(), Long::sum);
                    }
                    json.writeEndObject();
                }
                json.writeEndArray();
                json.writeEndObject();
            }
            json.writeEndArray();
            json.writeObjectFieldStart("totals");
            for (String m : matchings) {
                json.writeObjectFieldStart(m);
                json.writeNumberField("excess", excess.get(m));
                if (everyOptimum) {
                    json.writeNumberField("gap", gap.getOrDefault(m, 0L));
                }
                json.writeEndObject();
            }
            json.writeEndObject();
            json.writeEndObject();
        });
    }

    private static List<String> requireSameMatchings(List<ComparisonReport> reports) {
        if (reports.isEmpty()) {
            throw new IllegalArgumentException("nothing to summarise");
        }
        List<String> names = reports.get(0).runs().stream().map(MatchingRun::matching).toList();
        for (ComparisonReport r : reports) {
            if (!r.runs().stream().map(MatchingRun::matching).toList().equals(names)) {
                throw new IllegalArgumentException("the comparisons ran different matchings");
            }
        }
        return names;
    }

    private static String vector(int[] counts) {
        StringJoiner j = new StringJoiner(", ", "(", ")");
        for (int c : counts) {
            j.add(Integer.toString(c));
        }
        return j.toString();
    }
}
