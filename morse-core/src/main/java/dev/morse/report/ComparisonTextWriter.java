package dev.morse.report;

import dev.morse.engine.ComparisonReport;
import dev.morse.engine.MatchingRun;
import dev.morse.engine.TrialSpectrum;
import dev.morse.matching.OptimalMatching;

import dev.morse.homology.HomologyGroup;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.StringJoiner;

/**
 * Writes a {@link ComparisonReport} for people: the complex and its homology, then one table row
 * per heuristic with its critical cells per dimension, total, excess over the Morse lower bound,
 * milliseconds per phase and approximate peak heap, then the tallies of repeated trials.
 */
public final class ComparisonTextWriter {
    private static final String ROW = "  %-10s%s\n";
    private static final List<String> PHASES = List.of("match", "verify", "sweep", "reduce", "homology");
    private static final double MIB = 1024.0 * 1024.0;

    private ComparisonTextWriter() {
    }

    /** The report as lines of text, each ending with a newline. */
    public static String toText(ComparisonReport report) {
        StringBuilder text = new StringBuilder();
        text.append(String.format(Locale.ROOT, "%s (%s file)\n", report.input(),
                report.format().name().toLowerCase(Locale.ROOT)));
        row(text, "complex", report.complex().reportName() + report.cwCheck()
                .map(v -> v.isCwPoset() ? ", the poset is a CW poset" : ", not a CW poset: " + v.reason()).orElse(""));
        row(text, "cells", counted(report.cells()));
        row(text, "homology", homologyLine(report) + " (by " + report.referenceMatching()
                + (report.runs().size() > 1 ? "; every matching agrees)" : ")"));
        row(text, "bound", TextReportWriter.boundOver(report.homology().coefficients()) + " "
                + counted(report.boundByDimension()) + TextReportWriter.boundCaveat(report.homology().coefficients()));
        report.optimum().ifPresent(o -> row(text, "optimum", optimumLine(o)));
        text.append('\n');
        table(text, report);
        for (MatchingRun run : report.runs()) {
            if (!run.trials().isEmpty()) {
                text.append(String.format(Locale.ROOT, "\n  %s, %d trials with seeds %d..%d:\n", run.matching(),
                        run.trialCount(), report.seed(), report.seed() + run.trialCount() - 1));
                Optional<Long> optimum = report.optimum().map(OptimalMatching::criticalTotal);
                text.append(TrialTable.toText(run.trials(), report.morseLowerBound(), optimum, "    "));
                report.spectrum(run).ifPresent(spectrum -> text.append(spectrumText(spectrum, "    ")));
            }
        }
        text.append("\n  Times are milliseconds. Peak heap is approximate: the sum of the heap pools' peaks while\n"
                + "  the matching ran, the complex itself included.\n");
        return text.toString();
    }

    private static void table(StringBuilder text, ComparisonReport report) {
        List<String[]> rows = new ArrayList<>();
        List<String> header = new ArrayList<>(List.of("matching", "critical", "total", "excess"));
        if (report.optimum().isPresent()) {
            header.add("gap");
        }
        header.addAll(PHASES);
        header.add("all");
        header.add("peak heap");
        rows.add(header.toArray(new String[0]));
        for (MatchingRun run : report.runs()) {
            List<String> cells = new ArrayList<>(List.of(run.matching(), spaced(run.critical()),
                    Long.toString(run.totalCritical()), Long.toString(report.excess(run))));
            report.gap(run).ifPresent(gap -> cells.add(Long.toString(gap)));
            for (String phase : PHASES) {
                double ms = run.millis(phase);
                cells.add(ms < 0 ? "-" : String.format(Locale.ROOT, "%.2f", ms));
            }
            cells.add(String.format(Locale.ROOT, "%.2f", run.totalMillis()));
            cells.add(run.peakHeapBytes() < 0 ? "-" : String.format(Locale.ROOT, "%.1f MiB", run.peakHeapBytes() / MIB));
            rows.add(cells.toArray(new String[0]));
        }
        int columns = header.size();
        int[] width = new int[columns];
        for (String[] r : rows) {
            for (int c = 0; c < columns; c++) {
                width[c] = Math.max(width[c], r[c].length());
            }
        }
        for (String[] r : rows) {
            StringBuilder line = new StringBuilder("  ");
            for (int c = 0; c < columns; c++) {
                boolean left = c < 2;
                String cell = left ? pad(r[c], width[c], false) : pad(r[c], width[c], true);
                line.append(cell).append(c + 1 < columns ? "  " : "");
            }
            text.append(line.toString().stripTrailing()).append('\n');
        }
    }

    /**
     * The exact search's answer: a proven optimum, or the best matching found with the bound proven
     * when time ran out. The gap column counts critical cells beyond that best matching.
     */
    private static String optimumLine(OptimalMatching o) {
        String found = counted(java.util.Arrays.stream(o.critical()).boxed().toList());
        return o.proven()
                ? found + ", proven optimal by the exact search (combinatorial bounds, then integer programming after Joswig-Pfetsch) in "
                        + o.elapsed().toMillis() + " ms"
                : found + " found; no matching has fewer than " + o.lowerBound() + " critical cells (time limit "
                        + "reached after " + o.elapsed().toMillis() + " ms)";
    }

    /**
     * The spread of the trials' totals in one or two lines: least, median and most, how many trials
     * met the Morse bound, and when the exact search ran, how many reached its best matching and the
     * spread of their gap to it.
     */
    static String spectrumText(TrialSpectrum s, String indent) {
        StringBuilder text = new StringBuilder(String.format(Locale.ROOT,
                "%stotal critical cells: least %d, median %d, most %d; %d of %d trials at the Morse bound %d\n",
                indent, s.minTotal(), s.medianTotal(), s.maxTotal(), s.atBound(), s.trials(), s.bound()));
        s.optimum().ifPresent(o -> text.append(String.format(Locale.ROOT,
                "%s%d of %d trials reach the optimum %d; gap least %d, median %d, most %d\n", indent, s.atOptimum(),
                s.trials(), o, s.minTotal() - o, s.medianTotal() - o, s.maxTotal() - o)));
        return text.toString();
    }

    private static String pad(String s, int width, boolean right) {
        String fill = " ".repeat(width - s.length());
        return right ? fill + s : s + fill;
    }

    private static String homologyLine(ComparisonReport report) {
        StringJoiner parts = new StringJoiner(", ");
        String prefix = report.reducedShown() ? "~H_" : "H_";
        for (HomologyGroup g : report.shownHomology().groups()) {
            parts.add(prefix + g.dimension() + " = " + TextReportWriter.groupText(g, report.homology().coefficients()));
        }
        return parts.length() == 0 ? "none (no cells)" : parts.toString();
    }

    private static void row(StringBuilder text, String label, String value) {
        text.append(String.format(Locale.ROOT, ROW, label, value));
    }

    private static String counted(List<? extends Number> counts) {
        if (counts.isEmpty()) {
            return "0, no cells";
        }
        long total = counts.stream().mapToLong(Number::longValue).sum();
        return counts.size() == 1 ? total + " in dimension 0"
                : total + " = " + Counted.terms(counts, " + ") + " in dimensions 0.." + (counts.size() - 1);
    }

    private static String spaced(List<Integer> counts) {
        StringJoiner j = new StringJoiner(" ");
        counts.forEach(c -> j.add(Integer.toString(c)));
        return j.toString();
    }
}
