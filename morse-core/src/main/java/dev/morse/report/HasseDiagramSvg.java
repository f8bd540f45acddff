package dev.morse.report;

import java.util.ArrayList;
import java.util.List;

/**
 * Draws a {@link HasseDrawing} as SVG, levels from the bottom up in the {@link HasseLayout#layered
 * layered layout}, each level named on the left with its number of nodes. Every node is one
 * {@code <circle class="node ...">} with a tooltip and a label, every cover one
 * {@code <line class="cover">}, or a {@code <polyline class="cover">} when it skips levels; when a
 * matching is marked, matched covers get the class {@code matched} and are drawn thick, and
 * critical nodes get the class {@code critical} and a filled mark; the nodes and covers of a marked
 * cycle get the class {@code cycle} and a green outline. No other circles, lines or polylines are
 * drawn, so a reader can count them.
 */
public final class HasseDiagramSvg {
    private static final double MARGIN = 40;
    private static final double LEVEL_COLUMN = 70;
    private static final double RADIUS = 6;
    private static final int NOTE_LINE = 100;
    private static final String MATCHED_COLOUR = "#d62728";
    private static final String CRITICAL_COLOUR = "#1f77b4";
    private static final String CYCLE_COLOUR = "#2ca02c";

    private HasseDiagramSvg() {
    }

    /** The picture as an SVG document, in the layered layout. */
    public static String toSvg(HasseDrawing drawing) {
        return toSvg(drawing, HasseLayout.layered(drawing));
    }

    /** The picture as an SVG document, with the nodes where {@code layout} puts them. */
    public static String toSvg(HasseDrawing drawing, HasseLayout layout) {
        int n = drawing.nodeCount();
        int top = drawing.topLevel();
        List<String> note = wrap(drawing.note(), NOTE_LINE);
        List<String> header = new ArrayList<>();
        if (drawing.hasCycle()) {
            header.add(drawing.cycleDescription());
        }
        header.addAll(note);
        // the caption is one line of 13-pixel text across the top, the other lines of 11-pixel text
        double left = MARGIN + LEVEL_COLUMN;
        double width = Math.max(left + layout.width() + 2 * MARGIN + 60, MARGIN + drawing.caption().length() * 7.0);
        for (String line : header) {
            width = Math.max(width, MARGIN + line.length() * 6.0);
        }
        double legendY = 38 + header.size() * 14;
        double top0 = legendY + 18 + MARGIN;
        double height = top0 + layout.height() + MARGIN;
        Svg svg = new Svg(width, height);
        svg.text("title", drawing.caption());
        svg.text("text", drawing.caption(), "x", Svg.number(MARGIN / 2), "y", "20", "font-size", "13");
        for (int i = 0; i < header.size(); i++) {
            boolean cycleLine = drawing.hasCycle() && i == 0;
            svg.text("text", header.get(i), "x", Svg.number(MARGIN / 2), "y", Svg.number(36 + 14 * i), "font-size", "11",
                    "fill", cycleLine ? CYCLE_COLOUR : "#555");
        }
        legend(svg, drawing, legendY);
        int[] perLevel = new int[top + 1];
        for (int v = 0; v < n; v++) {
            perLevel[drawing.level(v)]++;
        }
        for (int l = 0; l <= top; l++) {
            double y = top0 + layout.levelY(l);
            svg.text("text", drawing.levelName() + " " + l, "class", "level", "x", Svg.number(MARGIN / 2),
                    "y", Svg.number(y), "font-size", "11", "font-weight", "bold", "fill", "#444");
            svg.text("text", Counted.of(perLevel[l], "node"), "x", Svg.number(MARGIN / 2), "y", Svg.number(y + 13),
                    "font-size", "10", "fill", "#777");
        }
        for (int e = 0; e < drawing.coverCount(); e++) {
            int lo = drawing.lowerEnd(e);
            int up = drawing.upperEnd(e);
            boolean matched = drawing.matched(e);
            boolean cycle = drawing.coverInCycle(e);
            String title = drawing.label(lo) + " < " + drawing.label(up) + (matched ? ", matched" : "")
                    + (cycle ? ", on the cycle" : "");
            String kind = "cover" + (matched ? " matched" : "") + (cycle ? " cycle" : "");
            String colour = matched ? MATCHED_COLOUR : cycle ? CYCLE_COLOUR : "#999";
            String stroke = matched || cycle ? "3.5" : "1";
            double[] bx = layout.bendsX(e);
            double[] by = layout.bendsY(e);
            if (bx.length == 0) {
                svg.titled("line", title, "class", kind, "x1", Svg.number(left + layout.x(lo)),
                        "y1", Svg.number(top0 + layout.y(lo)), "x2", Svg.number(left + layout.x(up)),
                        "y2", Svg.number(top0 + layout.y(up)), "stroke", colour, "stroke-width", stroke);
            } else {
                StringBuilder points = new StringBuilder();
                points.append(Svg.number(left + layout.x(lo))).append(',').append(Svg.number(top0 + layout.y(lo)));
                for (int k = 0; k < bx.length; k++) {
                    points.append(' ').append(Svg.number(left + bx[k])).append(',').append(Svg.number(top0 + by[k]));
                }
                points.append(' ').append(Svg.number(left + layout.x(up))).append(',')
                        .append(Svg.number(top0 + layout.y(up)));
                svg.titled("polyline", title, "class", kind, "points", points.toString(), "fill", "none",
                        "stroke", colour, "stroke-width", stroke);
            }
        }
        for (int v = 0; v < n; v++) {
            boolean critical = drawing.critical(v);
            boolean cycle = drawing.inCycle(v);
            String kind = (!drawing.marked() ? "node" : critical ? "node critical" : "node matched")
                    + (cycle ? " cycle" : "");
            String coefficient = drawing.cycleCoefficient(v);
            String title = drawing.label(v) + (critical ? ", critical" : "")
                    + (cycle ? ", on the cycle" + (coefficient.isEmpty() ? "" : " with coefficient " + coefficient) : "");
            double x = left + layout.x(v);
            double y = top0 + layout.y(v);
            svg.titled("circle", title, "class", kind, "cx", Svg.number(x), "cy", Svg.number(y),
                    "r", Svg.number(critical || cycle ? RADIUS + 1.5 : RADIUS),
                    "fill", critical ? CRITICAL_COLOUR : "#fff",
                    "stroke", cycle ? CYCLE_COLOUR : critical ? CRITICAL_COLOUR : "#333",
                    "stroke-width", cycle ? "3" : "1.5");
            svg.text("text", drawing.label(v), "x", Svg.number(x + RADIUS + 3), "y", Svg.number(y - RADIUS - 2),
                    "font-size", "10");
        }
        return svg.finish();
    }

    private static void legend(Svg svg, HasseDrawing drawing, double y) {
        double x = MARGIN / 2;
        if (drawing.marked()) {
            svg.empty("rect", "class", "key", "x", Svg.number(x), "y", Svg.number(y - 6), "width", "18",
                    "height", "4", "fill", MATCHED_COLOUR);
            svg.text("text", Counted.of(drawing.matchedCount(), "matched pair"), "x", Svg.number(x + 24),
                    "y", Svg.number(y), "font-size", "11");
            svg.empty("rect", "class", "key", "x", Svg.number(x + 150), "y", Svg.number(y - 9), "width", "10",
                    "height", "10", "fill", CRITICAL_COLOUR);
            svg.text("text", Counted.of(drawing.criticalCount(), "critical cell"), "x", Svg.number(x + 166),
                    "y", Svg.number(y), "font-size", "11");
            x += 290;
        }
        if (drawing.hasCycle()) {
            int cells = 0;
            for (int v = 0; v < drawing.nodeCount(); v++) {
                cells += drawing.inCycle(v) ? 1 : 0;
            }
            svg.empty("rect", "class", "key", "x", Svg.number(x), "y", Svg.number(y - 9), "width", "10",
                    "height", "10", "fill", "#fff", "stroke", CYCLE_COLOUR, "stroke-width", "3");
            svg.text("text", Counted.of(cells, "node") + " on the cycle", "x", Svg.number(x + 16), "y", Svg.number(y),
                    "font-size", "11");
        }
    }

    /** Splits text at spaces into lines of at most about {@code width} characters. */
    static List<String> wrap(String text, int width) {
        List<String> lines = new ArrayList<>();
        StringBuilder line = new StringBuilder();
        for (String word : text.split(" ")) {
            if (word.isEmpty()) {
                continue;
            }
            if (line.length() > 0 && line.length() + 1 + word.length() > width) {
                lines.add(line.toString());
                line.setLength(0);
            }
            line.append(line.length() > 0 ? " " : "").append(word);
        }
        if (line.length() > 0) {
            lines.add(line.toString());
        }
        return lines;
    }
}
