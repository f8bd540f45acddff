package dev.morse.report;

import dev.morse.engine.ComparisonReport;
import dev.morse.engine.MatchingRun;
import dev.morse.matching.TrialCount;
import java.util.List;
import java.util.Locale;

/**
 * Draws a {@link ComparisonReport} as a grouped bar chart in SVG: one group per dimension, one bar
 * per heuristic within it, its height the number of critical cells, and a dashed line across each
 * group at that dimension's Morse lower bound. Bars are {@code <rect class="bar">} with
 * {@code data-matching}, {@code data-dimension} and {@code data-value} attributes and a tooltip;
 * bound marks are {@code <line class="bound">} with {@code data-dimension} and {@code data-value}.
 * The scale is linear from 0; every bar is labelled with its value, so that short bars still read.
 * Below the legend, each randomized matching run several times gets the tally of its trials as
 * horizontal bars, most frequent vector of critical cells first ({@code <rect class="trial">}).
 */
public final class ComparisonChartSvg {
    private static final String[] COLOURS = {"#4e79a7", "#f28e2b", "#59a14f", "#b07aa1", "#76b7b2", "#edc948",
        "#9c755f", "#bab0ac"};
    private static final double BAR = 22;
    private static final double GROUP_GAP = 28;
    private static final double LEFT = 70;
    private static final double RIGHT = 24;
    private static final double TOP = 56;
    private static final double PLOT_HEIGHT = 260;
    private static final double LEGEND_ROW = 18;
    private static final int TICKS = 5;
    private static final double TITLE_CHAR_WIDTH = 7.2;
    private static final double TALLY_HEADING = 24;
    private static final double TALLY_ROW = 16;
    private static final double TALLY_GAP = 16;
    private static final double TALLY_LABEL = 120;
    private static final double TALLY_BAR = 240;

    private ComparisonChartSvg() {
    }

    /** The chart as an SVG document. */
    public static String toSvg(ComparisonReport report) {
        List<MatchingRun> runs = report.runs();
        List<Long> bounds = report.boundByDimension();
        int dimensions = report.cells().size();
        double groupWidth = runs.size() * BAR;
        double plotWidth = Math.max(240, dimensions * (groupWidth + GROUP_GAP) + GROUP_GAP);
        double legendTop = TOP + PLOT_HEIGHT + 48;
        double tallyTop = legendTop + runs.size() * LEGEND_ROW + 16;
        double height = tallyTop;
        for (MatchingRun run : runs) {
            if (!run.trials().isEmpty()) {
                height += TALLY_HEADING + run.trials().size() * TALLY_ROW + TALLY_GAP;
            }
        }
        String title = "Critical cells per dimension, " + report.input() + " (" + report.complex().reportName()
                + " complex, " + report.totalCells() + " cells)";
        double width = Math.max(LEFT + plotWidth + RIGHT, LEFT + title.length() * TITLE_CHAR_WIDTH + RIGHT);
        long largest = 1;
        for (MatchingRun run : runs) {
            for (int c : run.critical()) {
                largest = Math.max(largest, c);
            }
        }
        for (long b : bounds) {
            largest = Math.max(largest, b);
        }
        long step = niceStep(largest);
        long top = ((largest + step - 1) / step) * step;
        Svg svg = new Svg(width, height);
        svg.text("title", "critical cells per dimension: " + report.input());
        svg.text("text", title, "x", Svg.number(LEFT), "y", "24", "font-size", "15");
        svg.text("text", "dashed: " + TextReportWriter.boundOver(report.homology().coefficients())
                + " of the dimension, total " + report.morseLowerBound(),
                "x", Svg.number(LEFT), "y", "42", "font-size", "11", "fill", "#555");
        double baseline = TOP + PLOT_HEIGHT;
        for (long t = 0; t <= top; t += step) {
            double y = baseline - PLOT_HEIGHT * t / top;
            svg.empty("line", "class", "tick", "x1", Svg.number(LEFT - 4), "y1", Svg.number(y),
                    "x2", Svg.number(LEFT + plotWidth), "y2", Svg.number(y), "stroke", "#ddd");
            svg.text("text", Long.toString(t), "x", Svg.number(LEFT - 8), "y", Svg.number(y + 4), "font-size", "11",
                    "text-anchor", "end");
        }
        svg.empty("line", "class", "axis", "x1", Svg.number(LEFT), "y1", Svg.number(baseline),
                "x2", Svg.number(LEFT + plotWidth), "y2", Svg.number(baseline), "stroke", "#333");
        svg.empty("line", "class", "axis", "x1", Svg.number(LEFT), "y1", Svg.number(TOP),
                "x2", Svg.number(LEFT), "y2", Svg.number(baseline), "stroke", "#333");
        for (int d = 0; d < dimensions; d++) {
            double x0 = LEFT + GROUP_GAP + d * (groupWidth + GROUP_GAP);
            for (int k = 0; k < runs.size(); k++) {
                MatchingRun run = runs.get(k);
                int value = d < run.critical().size() ? run.critical().get(d) : 0;
                double h = PLOT_HEIGHT * value / top;
                double x = x0 + k * BAR;
                svg.titled("rect", run.matching() + ", dimension " + d + ": " + value + " critical",
                        "class", "bar", "data-matching", run.matching(), "data-dimension", Integer.toString(d),
                        "data-value", Integer.toString(value), "x", Svg.number(x + 1), "y", Svg.number(baseline - h),
                        "width", Svg.number(BAR - 2), "height", Svg.number(h), "fill", COLOURS[k % COLOURS.length]);
                svg.text("text", Integer.toString(value), "x", Svg.number(x + BAR / 2), "y", Svg.number(baseline - h - 3),
                        "font-size", "9", "text-anchor", "middle");
            }
            double yb = baseline - PLOT_HEIGHT * bounds.get(d) / top;
            svg.titled("line", "dimension " + d + ": Morse lower bound " + bounds.get(d), "class", "bound",
                    "data-dimension", Integer.toString(d), "data-value", Long.toString(bounds.get(d)),
                    "x1", Svg.number(x0 - 4), "y1", Svg.number(yb), "x2", Svg.number(x0 + groupWidth + 4),
                    "y2", Svg.number(yb), "stroke", "#d62728", "stroke-width", "2", "stroke-dasharray", "5,3");
            svg.text("text", "dim " + d, "x", Svg.number(x0 + groupWidth / 2), "y", Svg.number(baseline + 18),
                    "font-size", "12", "text-anchor", "middle");
        }
        for (int k = 0; k < runs.size(); k++) {
            MatchingRun run = runs.get(k);
            double y = legendTop + k * LEGEND_ROW;
            svg.empty("rect", "class", "swatch", "x", Svg.number(LEFT), "y", Svg.number(y - 10), "width", "12",
                    "height", "12", "fill", COLOURS[k % COLOURS.length]);
            svg.text("text", run.matching() + ": " + run.totalCritical() + " critical, excess " + report.excess(run),
                    "x", Svg.number(LEFT + 18), "y", Svg.number(y), "font-size", "12");
        }
        double y = tallyTop;
        for (int k = 0; k < runs.size(); k++) {
            if (!runs.get(k).trials().isEmpty()) {
                y = tally(svg, report, runs.get(k), COLOURS[k % COLOURS.length], y);
            }
        }
        return svg.finish();
    }

    /**
     * The tally of one randomized matching's trials as horizontal bars, most frequent vector first:
     * {@code <rect class="trial">} with {@code data-matching}, {@code data-vector} and
     * {@code data-count}; the bar's length is the vector's share of the trials.
     */
    private static double tally(Svg svg, ComparisonReport report, MatchingRun run, String colour, double top) {
        int trials = run.trialCount();
        svg.text("text", run.matching() + ": " + trials + " trials, by vector of critical cells (excess over the bound "
                + report.morseLowerBound() + ")", "x", Svg.number(LEFT), "y", Svg.number(top + 14), "font-size", "12");
        double y = top + TALLY_HEADING;
        int most = run.trials().stream().mapToInt(TrialCount::count).max().orElse(1);
        for (TrialCount t : TrialTable.sorted(run.trials())) {
            String vector = TrialTable.vector(t.critical());
            double length = TALLY_BAR * t.count() / most;
            svg.text("text", vector, "x", Svg.number(LEFT + TALLY_LABEL - 8), "y", Svg.number(y + 11), "font-size", "11",
                    "text-anchor", "end");
            svg.titled("rect", run.matching() + " " + vector + ": " + t.count() + " of " + trials + " trials",
                    "class", "trial", "data-matching", run.matching(), "data-vector", vector,
                    "data-count", Integer.toString(t.count()), "x", Svg.number(LEFT + TALLY_LABEL), "y", Svg.number(y + 2),
                    "width", Svg.number(length), "height", Svg.number(TALLY_ROW - 4), "fill", colour);
            svg.text("text", String.format(Locale.ROOT, "%d (%.1f%%), excess %d", t.count(), 100.0 * t.count() / trials,
                    TrialTable.excess(t, report.morseLowerBound())), "x", Svg.number(LEFT + TALLY_LABEL + length + 6),
                    "y", Svg.number(y + 11), "font-size", "11");
            y += TALLY_ROW;
        }
        return y + TALLY_GAP;
    }

    /** A tick step of 1, 2 or 5 times a power of ten giving about {@link #TICKS} ticks up to {@code largest}. */
    static long niceStep(long largest) {
        long raw = Math.max(1, (largest + TICKS - 1) / TICKS);
        long power = 1;
        while (power * 10 <= raw) {
            power *= 10;
        }
        for (long m : new long[] {1, 2, 5, 10}) {
            if (m * power >= raw) {
                return m * power;
            }
        }
        return 10 * power;
    }
}
