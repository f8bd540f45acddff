package dev.morse.report;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Draws a {@link HasseDrawing} as SVG: levels from the bottom up, nodes of a level spread evenly in
 * an order found by a few sweeps of the barycentre heuristic (each node moves toward the mean
 * position of its neighbours on the level next to it, to untangle lines; Sugiyama, Tagawa and Toda
 * 1981). Every node is one {@code <circle class="node ...">} with a tooltip and a label, every cover
 * one {@code <line class="cover">}; when a matching is marked, matched covers get the class
 * {@code matched} and are drawn thick, and critical nodes get the class {@code critical} and a
 * filled mark. No other circles or lines are drawn, so a reader can count them.
 */
public final class HasseDiagramSvg {
    private static final double MARGIN = 40;
    private static final double ROW = 90;
    private static final double RADIUS = 6;
    private static final double MIN_SPACING = 44;
    private static final double MAX_SPACING = 140;
    private static final double CHAR_WIDTH = 6.2;
    private static final int SWEEPS = 6;
    private static final int NOTE_LINE = 100;
    private static final String MATCHED_COLOUR = "#d62728";
    private static final String CRITICAL_COLOUR = "#1f77b4";

    private HasseDiagramSvg() {
    }

    /** The picture as an SVG document. */
    public static String toSvg(HasseDrawing drawing) {
        int n = drawing.nodeCount();
        int top = drawing.topLevel();
        List<List<Integer>> rows = orderedLevels(drawing);
        int widest = 1;
        int longestLabel = 1;
        for (List<Integer> row : rows) {
            widest = Math.max(widest, row.size());
        }
        for (int v = 0; v < n; v++) {
            longestLabel = Math.max(longestLabel, drawing.label(v).length());
        }
        double spacing = Math.min(MAX_SPACING, Math.max(MIN_SPACING, longestLabel * CHAR_WIDTH + 16));
        List<String> note = wrap(drawing.note(), NOTE_LINE);
        // the caption is one line of 13-pixel text across the top, the note lines of 11-pixel text
        double width = Math.max(2 * MARGIN + widest * spacing, MARGIN + drawing.caption().length() * 7.0);
        for (String line : note) {
            width = Math.max(width, MARGIN + line.length() * 6.0);
        }
        double legendY = 38 + note.size() * 14;
        double legendHeight = legendY + 18;
        double height = 2 * MARGIN + Math.max(0, top) * ROW + legendHeight;
        double[] x = new double[n];
        double[] y = new double[n];
        for (int level = 0; level <= top; level++) {
            List<Integer> row = rows.get(level);
            double start = (width - row.size() * spacing) / 2 + spacing / 2;
            for (int k = 0; k < row.size(); k++) {
                int v = row.get(k);
                x[v] = start + k * spacing;
                y[v] = legendHeight + MARGIN + (top - level) * ROW;
            }
        }
        Svg svg = new Svg(width, height);
        svg.text("title", drawing.caption());
        svg.text("text", drawing.caption(), "x", Svg.number(MARGIN / 2), "y", "20", "font-size", "13");
        for (int i = 0; i < note.size(); i++) {
            svg.text("text", note.get(i), "x", Svg.number(MARGIN / 2), "y", Svg.number(36 + 14 * i), "font-size", "11",
                    "fill", "#555");
        }
        legend(svg, drawing, legendY);
        for (int e = 0; e < drawing.coverCount(); e++) {
            int lo = drawing.lowerEnd(e);
            int up = drawing.upperEnd(e);
            boolean matched = drawing.matched(e);
            svg.titled("line", drawing.label(lo) + " < " + drawing.label(up) + (matched ? ", matched" : ""),
                    "class", matched ? "cover matched" : "cover", "x1", Svg.number(x[lo]), "y1", Svg.number(y[lo]),
                    "x2", Svg.number(x[up]), "y2", Svg.number(y[up]),
                    "stroke", matched ? MATCHED_COLOUR : "#999", "stroke-width", matched ? "3.5" : "1");
        }
        for (int v = 0; v < n; v++) {
            boolean critical = drawing.critical(v);
            String kind = !drawing.marked() ? "node" : critical ? "node critical" : "node matched";
            svg.titled("circle", drawing.label(v) + (critical ? ", critical" : ""), "class", kind,
                    "cx", Svg.number(x[v]), "cy", Svg.number(y[v]), "r", Svg.number(critical ? RADIUS + 1.5 : RADIUS),
                    "fill", critical ? CRITICAL_COLOUR : "#fff", "stroke", critical ? CRITICAL_COLOUR : "#333",
                    "stroke-width", "1.5");
            svg.text("text", drawing.label(v), "x", Svg.number(x[v] + RADIUS + 3), "y", Svg.number(y[v] - RADIUS - 2),
                    "font-size", "10");
        }
        return svg.finish();
    }

    private static void legend(Svg svg, HasseDrawing drawing, double y) {
        if (!drawing.marked()) {
            return;
        }
        svg.empty("rect", "class", "key", "x", Svg.number(MARGIN / 2), "y", Svg.number(y - 6), "width", "18",
                "height", "4", "fill", MATCHED_COLOUR);
        svg.text("text", Counted.of(drawing.matchedCount(), "matched pair"), "x", Svg.number(MARGIN / 2 + 24), "y", Svg.number(y),
                "font-size", "11");
        svg.empty("rect", "class", "key", "x", Svg.number(MARGIN / 2 + 150), "y", Svg.number(y - 9), "width", "10",
                "height", "10", "fill", CRITICAL_COLOUR);
        svg.text("text", Counted.of(drawing.criticalCount(), "critical cell"), "x", Svg.number(MARGIN / 2 + 166),
                "y", Svg.number(y), "font-size", "11");
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

    /** The nodes of each level, in the order to draw them left to right. */
    static List<List<Integer>> orderedLevels(HasseDrawing drawing) {
        int n = drawing.nodeCount();
        int top = drawing.topLevel();
        List<List<Integer>> rows = new ArrayList<>();
        for (int l = 0; l <= top; l++) {
            rows.add(new ArrayList<>());
        }
        for (int v = 0; v < n; v++) {
            rows.get(drawing.level(v)).add(v);
        }
        List<List<Integer>> below = neighbours(drawing, true);
        List<List<Integer>> above = neighbours(drawing, false);
        double[] position = new double[n];
        placeInOrder(rows, position);
        for (int sweep = 0; sweep < SWEEPS; sweep++) {
            boolean upward = sweep % 2 == 0;
            for (int k = 1; k <= top; k++) {
                int level = upward ? k : top - k;
                reorder(rows.get(level), upward ? below : above, position);
                placeInOrder(rows, position);
            }
        }
        return rows;
    }

    private static List<List<Integer>> neighbours(HasseDrawing drawing, boolean lowerNeighbours) {
        List<List<Integer>> lists = new ArrayList<>();
        for (int v = 0; v < drawing.nodeCount(); v++) {
            lists.add(new ArrayList<>());
        }
        for (int e = 0; e < drawing.coverCount(); e++) {
            if (lowerNeighbours) {
                lists.get(drawing.upperEnd(e)).add(drawing.lowerEnd(e));
            } else {
                lists.get(drawing.lowerEnd(e)).add(drawing.upperEnd(e));
            }
        }
        return lists;
    }

    /** Sorts a level by the mean position of each node's neighbours; nodes without any keep theirs. */
    private static void reorder(List<Integer> row, List<List<Integer>> neighbours, double[] position) {
        double[] key = new double[position.length];
        for (int v : row) {
            List<Integer> ns = neighbours.get(v);
            key[v] = ns.isEmpty() ? position[v] : ns.stream().mapToDouble(u -> position[u]).average().orElse(0);
        }
        Integer[] sorted = row.toArray(new Integer[0]);
        // stable, so ties keep the order of the last sweep
        Arrays.sort(sorted, (a, b) -> Double.compare(key[a], key[b]));
        row.clear();
        row.addAll(Arrays.asList(sorted));
    }

    /** Positions centred on 0 within each level, so that levels of different widths line up. */
    private static void placeInOrder(List<List<Integer>> rows, double[] position) {
        for (List<Integer> row : rows) {
            for (int k = 0; k < row.size(); k++) {
                position[row.get(k)] = k - (row.size() - 1) / 2.0;
            }
        }
    }
}
