package dev.morse.report;

import dev.morse.layout.BarycentreSweeps;
import dev.morse.layout.CrossingCount;
import dev.morse.layout.LayeredGraph;
import dev.morse.layout.MedianSweeps;
import dev.morse.layout.PriorityPlacement;

/**
 * Where the nodes and covers of a {@link HasseDrawing} go, in a frame whose origin is the top left
 * corner of the diagram (levels from the bottom up, so the top level has the smallest y). Two
 * methods: {@link #layered}, the one pictures use, and {@link #evenRows}, the first layout, kept
 * for comparison. Immutable.
 */
public final class HasseLayout {
    /** Vertical distance between two levels (between the bands of wrapped levels). */
    static final double ROW = 90;
    /** Vertical distance between the rows a wide level is wrapped into. */
    static final double SUB_ROW = 24;
    /** The width beyond which a level is wrapped into staggered rows. */
    static final double WRAP_WIDTH = 1500;
    /** The most rows one level is wrapped into. */
    static final int MAX_SUB_ROWS = 6;
    private static final double MIN_SPACING = 44;
    private static final double MAX_SPACING = 140;
    private static final double LEAST_SEPARATION = 16;
    private static final double CHAR_WIDTH = 6.2;

    private final double[] x;
    private final double[] y;
    private final double[][] bendX;
    private final double[][] bendY;
    private final double[] levelY;
    private final int[] subRows;
    private final double width;
    private final double height;
    private final long crossings;

    private HasseLayout(double[] x, double[] y, double[][] bendX, double[][] bendY, double[] levelY, int[] subRows,
            double width, double height, long crossings) {
        this.x = x;
        this.y = y;
        this.bendX = bendX;
        this.bendY = bendY;
        this.levelY = levelY;
        this.subRows = subRows;
        this.width = width;
        this.height = height;
        this.crossings = crossings;
    }

    /**
     * The layered layout: levels as layers, a cover spanning several levels bent through one point
     * per level between (Sugiyama, Tagawa and Toda 1981); each level ordered by the weighted median
     * heuristic with transposition ({@link MedianSweeps}, after Gansner, Koutsofios, North and Vo
     * 1993), which never leaves more crossings than the barycentre sweeps of {@link #evenRows};
     * x coordinates by the priority method ({@link PriorityPlacement}). A level wider than
     * {@value #WRAP_WIDTH} px at the spacing its labels need is wrapped into up to {@value #MAX_SUB_ROWS}
     * staggered rows, consecutive nodes going to consecutive rows, so that labels on one row keep
     * their spacing while the level takes a fraction of the width; the left-to-right order, and so the
     * crossing count, is unchanged.
     */
    public static HasseLayout layered(HasseDrawing drawing) {
        LayeredGraph graph = graphOf(drawing);
        int[][] rows = new MedianSweeps().order(graph);
        double spacing = spacing(drawing);
        int layers = rows.length;
        int[] wraps = new int[layers];
        double[] separation = new double[layers];
        for (int l = 0; l < layers; l++) {
            int real = 0;
            for (int v : rows[l]) {
                real += graph.isDummy(v) ? 0 : 1;
            }
            wraps[l] = (int) Math.max(1, Math.min(MAX_SUB_ROWS, Math.ceil(real * spacing / WRAP_WIDTH)));
            separation[l] = Math.max(LEAST_SEPARATION, spacing / wraps[l]);
        }
        double[] gx = PriorityPlacement.place(graph, rows, separation);
        double[] levelY = new double[layers];
        double yNext = 0;
        for (int l = layers - 1; l >= 0; l--) {
            double band = (wraps[l] - 1) * SUB_ROW;
            levelY[l] = yNext + band / 2;
            yNext += band + ROW;
        }
        double diagramHeight = Math.max(0, yNext - ROW);
        double[] gy = new double[graph.nodeCount()];
        for (int l = 0; l < layers; l++) {
            int k = 0;
            for (int v : rows[l]) {
                if (graph.isDummy(v)) {
                    gy[v] = levelY[l];
                } else {
                    // the first node of a wrapped level on its lowest row, the next one row up, and so on
                    int sub = k++ % wraps[l];
                    gy[v] = levelY[l] + ((wraps[l] - 1) / 2.0 - sub) * SUB_ROW;
                }
            }
        }
        double diagramWidth = 0;
        for (double v : gx) {
            diagramWidth = Math.max(diagramWidth, v);
        }
        return withBends(drawing, graph, gx, gy, levelY, wraps, diagramWidth, diagramHeight,
                CrossingCount.of(graph, rows));
    }

    /**
     * The first layout of the pictures: each level one row, nodes evenly spaced and centred, in the
     * order of six barycentre sweeps ({@link BarycentreSweeps}); covers straight.
     */
    public static HasseLayout evenRows(HasseDrawing drawing) {
        LayeredGraph graph = graphOf(drawing);
        int[][] rows = new BarycentreSweeps(6).order(graph);
        double spacing = spacing(drawing);
        int widest = 1;
        for (int[] row : rows) {
            widest = Math.max(widest, row.length);
        }
        int top = rows.length - 1;
        double diagramWidth = widest * spacing;
        double[] gx = new double[graph.nodeCount()];
        double[] gy = new double[graph.nodeCount()];
        double[] levelY = new double[rows.length];
        for (int l = 0; l <= top; l++) {
            levelY[l] = (top - l) * ROW;
            double start = (diagramWidth - rows[l].length * spacing) / 2 + spacing / 2;
            for (int k = 0; k < rows[l].length; k++) {
                gx[rows[l][k]] = start + k * spacing;
                gy[rows[l][k]] = levelY[l];
            }
        }
        HasseLayout placed = withBends(drawing, graph, gx, gy, levelY, new int[rows.length], diagramWidth,
                Math.max(0, top) * ROW, CrossingCount.of(graph, rows));
        // the first layout drew every cover straight, whatever the levels between
        double[][] none = new double[drawing.coverCount()][0];
        return new HasseLayout(placed.x, placed.y, none, none, levelY, placed.subRows, diagramWidth,
                placed.height, countStraight(drawing, placed.x, placed.y, graph, rows));
    }

    private static long countStraight(HasseDrawing drawing, double[] x, double[] y, LayeredGraph graph, int[][] rows) {
        for (int e = 0; e < drawing.coverCount(); e++) {
            if (drawing.level(drawing.upperEnd(e)) - drawing.level(drawing.lowerEnd(e)) > 1) {
                return -1;
            }
        }
        return CrossingCount.of(graph, rows);
    }

    private static HasseLayout withBends(HasseDrawing drawing, LayeredGraph graph, double[] gx, double[] gy,
            double[] levelY, int[] subRows, double width, double height, long crossings) {
        int n = drawing.nodeCount();
        double[][] bendX = new double[drawing.coverCount()][];
        double[][] bendY = new double[drawing.coverCount()][];
        for (int e = 0; e < drawing.coverCount(); e++) {
            int[] route = graph.route(e);
            bendX[e] = new double[route.length - 2];
            bendY[e] = new double[route.length - 2];
            for (int k = 1; k + 1 < route.length; k++) {
                bendX[e][k - 1] = gx[route[k]];
                bendY[e][k - 1] = gy[route[k]];
            }
        }
        return new HasseLayout(java.util.Arrays.copyOf(gx, n), java.util.Arrays.copyOf(gy, n), bendX, bendY, levelY,
                subRows, width, height, crossings);
    }

    private static LayeredGraph graphOf(HasseDrawing drawing) {
        int n = drawing.nodeCount();
        int[] levels = new int[n];
        for (int v = 0; v < n; v++) {
            levels[v] = drawing.level(v);
        }
        int[] lower = new int[drawing.coverCount()];
        int[] upper = new int[drawing.coverCount()];
        for (int e = 0; e < lower.length; e++) {
            lower[e] = drawing.lowerEnd(e);
            upper[e] = drawing.upperEnd(e);
        }
        return LayeredGraph.of(levels, lower, upper);
    }

    /** The distance labels need between neighbours on one row. */
    private static double spacing(HasseDrawing drawing) {
        int longestLabel = 1;
        for (int v = 0; v < drawing.nodeCount(); v++) {
            longestLabel = Math.max(longestLabel, drawing.label(v).length());
        }
        return Math.min(MAX_SPACING, Math.max(MIN_SPACING, longestLabel * CHAR_WIDTH + 16));
    }

    /** The x coordinate of node {@code v}. */
    public double x(int v) {
        return x[v];
    }

    /** The y coordinate of node {@code v}; smaller is higher. */
    public double y(int v) {
        return y[v];
    }

    /** The x coordinates of the points cover {@code e} bends through, from the bottom up; none when straight. */
    public double[] bendsX(int e) {
        return bendX[e].clone();
    }

    /** The y coordinates of the points cover {@code e} bends through, from the bottom up. */
    public double[] bendsY(int e) {
        return bendY[e].clone();
    }

    /** The y coordinate of the middle of level {@code l}. */
    public double levelY(int l) {
        return levelY[l];
    }

    /** Into how many staggered rows level {@code l} is wrapped (1 when it is not; 0 for the first layout). */
    public int subRows(int l) {
        return subRows[l];
    }

    /** Width of the diagram from the leftmost to the rightmost node centre. */
    public double width() {
        return width;
    }

    /** Height of the diagram from the top to the bottom node centre. */
    public double height() {
        return height;
    }

    /**
     * The edge crossings, counted on the order of each level (bent covers through their bends), by
     * {@link CrossingCount}; -1 for the first layout when a cover there skips a level, since it was
     * drawn straight across.
     */
    public long crossings() {
        return crossings;
    }
}
