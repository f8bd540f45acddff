package dev.morse.report;

import dev.morse.complex.Boundary;
import dev.morse.complex.ChainComplex;
import dev.morse.matching.Matching;
import dev.morse.poset.Adjacency;
import dev.morse.poset.Poset;
import it.unimi.dsi.fastutil.ints.IntArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Objects;

/**
 * What a Hasse diagram picture shows: nodes with a label and a level (rank, or dimension), covers
 * between them, and optionally a matching: which covers are matched pairs and which nodes are
 * critical. Immutable; built only for pictures, so limited to {@link #MAX_NODES} nodes.
 *
 * <p>Memory: about 12 bytes per node and 9 per cover, plus the labels.
 */
public final class HasseDrawing {
    /** The most nodes a picture takes: beyond a few hundred a Hasse diagram no longer reads. */
    public static final int MAX_NODES = 500;

    private final List<String> labels;
    private final int[] levels;
    private final int[] lower;
    private final int[] upper;
    private final boolean[] matched;
    private final boolean[] critical;
    private final String caption;
    private final String note;
    private final String levelName;
    private final CycleMark cycle;
    private final boolean[] cycleCovers;

    private HasseDrawing(List<String> labels, int[] levels, int[] lower, int[] upper, boolean[] matched,
            boolean[] critical, String caption, String note, String levelName, CycleMark cycle) {
        if (labels.size() > MAX_NODES) {
            throw new IllegalArgumentException(labels.size() + " nodes are more than a picture takes (" + MAX_NODES + ")");
        }
        this.labels = List.copyOf(labels);
        this.levels = levels;
        this.lower = lower;
        this.upper = upper;
        this.matched = matched;
        this.critical = critical;
        this.caption = Objects.requireNonNull(caption, "caption");
        this.note = Objects.requireNonNull(note, "note");
        this.levelName = Objects.requireNonNull(levelName, "levelName");
        this.cycle = cycle;
        this.cycleCovers = cycle == null ? null : cycle.covers();
        if (cycle != null && (cycle.coefficients().size() != labels.size() || cycleCovers.length != lower.length)) {
            throw new IllegalArgumentException("a cycle mark has one entry per node and one per cover");
        }
    }

    /**
     * The cells of one representative cycle marked on a drawing.
     *
     * @param description one line naming the cycle (dimension, generator, size)
     * @param coefficients per node its coefficient in the cycle as written, empty for a node in the
     *     cycle without one (an element on its chains), null for a node not in it
     * @param covers per cover whether the cycle runs along it (consecutive elements of one of its chains)
     */
    public record CycleMark(String description, List<String> coefficients, boolean[] covers) {
        /** Copies. */
        public CycleMark {
            Objects.requireNonNull(description, "description");
            coefficients = java.util.Collections.unmodifiableList(new java.util.ArrayList<>(coefficients));
            covers = covers.clone();
        }

        /** A copy of the covers' marks. */
        @Override
        public boolean[] covers() {
            return covers.clone();
        }
    }

    /**
     * The Hasse diagram of {@code poset} by height, with nothing marked.
     *
     * @param caption one short line saying what is shown
     * @param note more words on it, possibly long; empty for none
     */
    public static HasseDrawing ofPoset(Poset poset, String caption, String note) {
        int n = poset.size();
        String[] labels = new String[n];
        int[] levels = new int[n];
        for (int x = 0; x < n; x++) {
            labels[x] = poset.label(x);
            levels[x] = poset.height(x);
        }
        Adjacency covers = poset.lowerCovers();
        int[] lo = covers.edgeTargets();
        int[] up = covers.edgeSources();
        boolean graded = true;
        for (int k = 0; k < lo.length; k++) {
            graded &= levels[up[k]] == levels[lo[k]] + 1;
        }
        // by height; in a graded poset that is the rank
        return new HasseDrawing(Arrays.asList(labels), levels, lo, up, null, null, caption, note,
                graded ? "rank" : "height", null);
    }

    /**
     * The face poset of {@code complex} (one node per cell at the level of its dimension, one cover
     * per nonzero boundary entry) with {@code matching} marked. For the cellular complex of a CW
     * poset this is the poset's own Hasse diagram.
     */
    public static HasseDrawing ofComplex(ChainComplex complex, Matching matching, String caption) {
        int n = complex.cellCount();
        if (n > MAX_NODES) {
            throw new IllegalArgumentException(n + " nodes are more than a picture takes (" + MAX_NODES + ")");
        }
        String[] labels = new String[n];
        int[] levels = new int[n];
        boolean[] critical = new boolean[n];
        for (int c = 0; c < n; c++) {
            labels[c] = complex.cellName(c);
            levels[c] = complex.dimensionOf(c);
            critical[c] = matching.isCritical(c);
        }
        Boundary boundary = complex.boundary();
        IntArrayList lo = new IntArrayList();
        IntArrayList up = new IntArrayList();
        for (int c = 0; c < n; c++) {
            for (int i = boundary.start(c); i < boundary.end(c); i++) {
                if (boundary.coefficient(i) != 0) {
                    lo.add(boundary.target(i));
                    up.add(c);
                }
            }
        }
        boolean[] matched = new boolean[lo.size()];
        for (int e = 0; e < matched.length; e++) {
            matched[e] = matching.mate(lo.getInt(e)) == up.getInt(e);
        }
        return new HasseDrawing(Arrays.asList(labels), levels, lo.toIntArray(), up.toIntArray(), matched, critical,
                caption, "", "dim", null);
    }

    /** This drawing with the cells of one cycle marked as well. */
    public HasseDrawing withCycle(CycleMark mark) {
        return new HasseDrawing(labels, levels, lower, upper, matched, critical, caption, note, levelName,
                Objects.requireNonNull(mark, "mark"));
    }

    /** Number of nodes. */
    public int nodeCount() {
        return labels.size();
    }

    /** Number of covers (lines). */
    public int coverCount() {
        return lower.length;
    }

    /** The label of node {@code v}. */
    public String label(int v) {
        return labels.get(v);
    }

    /** The level of node {@code v}: its height or dimension. */
    public int level(int v) {
        return levels[v];
    }

    /** The lower end of cover {@code e}. */
    public int lowerEnd(int e) {
        return lower[e];
    }

    /** The upper end of cover {@code e}. */
    public int upperEnd(int e) {
        return upper[e];
    }

    /** Whether a matching is marked. */
    public boolean marked() {
        return matched != null;
    }

    /** Whether cover {@code e} is a matched pair; false when nothing is marked. */
    public boolean matched(int e) {
        return matched != null && matched[e];
    }

    /** Whether node {@code v} is critical; false when nothing is marked. */
    public boolean critical(int v) {
        return critical != null && critical[v];
    }

    /** Number of matched pairs. */
    public int matchedCount() {
        int count = 0;
        for (int e = 0; e < coverCount(); e++) {
            count += matched(e) ? 1 : 0;
        }
        return count;
    }

    /** Number of critical nodes. */
    public int criticalCount() {
        int count = 0;
        for (int v = 0; v < nodeCount(); v++) {
            count += critical(v) ? 1 : 0;
        }
        return count;
    }

    /** One line saying what the picture shows. */
    public String caption() {
        return caption;
    }

    /** Further words on what is shown, or empty. */
    public String note() {
        return note;
    }

    /** What a level is: {@code rank} (a graded poset), {@code height} (any other poset) or {@code dim} (cells). */
    public String levelName() {
        return levelName;
    }

    /** The node matched with {@code v}, or -1 when it is critical or nothing is marked. */
    public int partner(int v) {
        if (matched == null) {
            return -1;
        }
        for (int e = 0; e < lower.length; e++) {
            if (matched[e] && (lower[e] == v || upper[e] == v)) {
                return lower[e] == v ? upper[e] : lower[e];
            }
        }
        return -1;
    }

    /** Whether the cells of a cycle are marked. */
    public boolean hasCycle() {
        return cycle != null;
    }

    /** The line naming the marked cycle; empty without one. */
    public String cycleDescription() {
        return cycle == null ? "" : cycle.description();
    }

    /** Whether node {@code v} belongs to the marked cycle. */
    public boolean inCycle(int v) {
        return cycle != null && cycle.coefficients().get(v) != null;
    }

    /** The coefficient of node {@code v} in the marked cycle, empty when it has none or is not in it. */
    public String cycleCoefficient(int v) {
        String a = cycle == null ? null : cycle.coefficients().get(v);
        return a == null ? "" : a;
    }

    /** Whether the marked cycle runs along cover {@code e}. */
    public boolean coverInCycle(int e) {
        return cycleCovers != null && cycleCovers[e];
    }

    /** The top level, -1 without nodes. */
    public int topLevel() {
        int top = -1;
        for (int l : levels) {
            top = Math.max(top, l);
        }
        return top;
    }
}
