package dev.morse.poset;

import dev.morse.progress.Progress;
import it.unimi.dsi.fastutil.ints.IntArrayList;
import it.unimi.dsi.fastutil.objects.Object2IntOpenHashMap;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Collects elements and generating relations {@code lower < upper} and builds the {@link Poset}
 * they generate: the transitive closure is implied, and the Hasse diagram is its transitive
 * reduction.
 *
 * <p>Input listing only covers (the usual case for face posets) is reduced in time linear in the
 * relations: a listed relation {@code x < y} is redundant only if {@code x} lies below another
 * listed lower element of {@code y}, and the search for that is cut off below the lowest height
 * among the listed lower elements; when they all share one height nothing is searched at all.
 * Not thread-safe.
 */
public final class PosetBuilder {
    private final List<String> labels = new ArrayList<>();
    private final Object2IntOpenHashMap<String> ids = new Object2IntOpenHashMap<>();
    private final IntArrayList lowers = new IntArrayList();
    private final IntArrayList uppers = new IntArrayList();
    private final IntArrayList tags = new IntArrayList();

    /** An empty builder. */
    public PosetBuilder() {
        ids.defaultReturnValue(-1);
    }

    /** The id of the element with this label, adding it if new. Ids count up from 0. */
    public int element(String label) {
        int id = ids.getInt(label);
        if (id < 0) {
            id = labels.size();
            ids.put(label, id);
            labels.add(label);
        }
        return id;
    }

    /** The label of element {@code id}. */
    public String label(int id) {
        return labels.get(id);
    }

    /** Number of elements so far. */
    public int size() {
        return labels.size();
    }

    /**
     * States {@code lower < upper}.
     *
     * @param tag carried into {@link OrderCycleException#tag()} (readers pass the line number)
     * @throws IllegalArgumentException if {@code lower == upper} or an id is unknown
     */
    public void relate(int lower, int upper, int tag) {
        if (lower == upper) {
            throw new IllegalArgumentException("an element cannot be below itself: " + labels.get(lower));
        }
        if (lower < 0 || upper < 0 || lower >= labels.size() || upper >= labels.size()) {
            throw new IllegalArgumentException("unknown element id");
        }
        lowers.add(lower);
        uppers.add(upper);
        tags.add(tag);
    }

    /**
     * Builds a poset whose relations are acyclic by construction, as a generator's are.
     *
     * @throws IllegalStateException if they are not after all: a defect in the caller
     */
    public Poset buildKnownAcyclic() {
        try {
            return build();
        } catch (OrderCycleException e) {
            throw new IllegalStateException("relations meant to be acyclic have a cycle", e);
        }
    }

    /**
     * Returns {@code label} if the text formats can write it: nonempty, without white space, ':' or '#'.
     *
     * @throws IllegalArgumentException naming the character that cannot be written
     */
    public static String requireWritableLabel(String label) {
        if (label.isEmpty()) {
            throw new IllegalArgumentException("empty label");
        }
        for (int i = 0; i < label.length(); i++) {
            char c = label.charAt(i);
            if (Character.isWhitespace(c) || c == ':' || c == '#') {
                throw new IllegalArgumentException("label '" + label + "' contains '" + c + "'");
            }
        }
        return label;
    }

    /**
     * Builds the poset.
     *
     * @throws OrderCycleException if the relations contain a directed cycle
     */
    public Poset build() throws OrderCycleException {
        int[] cycle = new int[0];
        try {
            return assemble(ElementLabels.ofStrings(labels.toArray(new String[0])), lowers.elements(),
                    uppers.elements(), lowers.size());
        } catch (CycleFound e) {
            cycle = e.cycle;
        }
        throw new OrderCycleException(cycle, tagOf(cycle[cycle.length - 1], cycle[0]));
    }

    /**
     * Builds the poset that the relations {@code lowers[i] < uppers[i]}, {@code i < count}, generate
     * on elements labelled by {@code labels}: the path of a reader that has interned its labels
     * itself and keeps no line numbers. The arrays are only read.
     *
     * @throws OrderCycleException if the relations contain a directed cycle; its tag is 0
     * @throws IllegalArgumentException if a relation names an unknown element or relates one to itself
     */
    public static Poset fromRelations(ElementLabels labels, int[] lowers, int[] uppers, int count)
            throws OrderCycleException {
        int n = labels.size();
        for (int i = 0; i < count; i++) {
            if (lowers[i] < 0 || uppers[i] < 0 || lowers[i] >= n || uppers[i] >= n) {
                throw new IllegalArgumentException("unknown element id");
            }
            if (lowers[i] == uppers[i]) {
                throw new IllegalArgumentException("an element cannot be below itself: " + labels.get(lowers[i]));
            }
        }
        try {
            return assemble(labels, lowers, uppers, count);
        } catch (CycleFound e) {
            throw new OrderCycleException(e.cycle, 0);
        }
    }

    /** The cycle found while assembling, before it is matched to a tag. */
    private static final class CycleFound extends Exception {
        private static final long serialVersionUID = 1L;
        private final transient int[] cycle;

        CycleFound(int[] cycle) {
            super(null, null, false, false);
            this.cycle = cycle;
        }
    }

    private static Poset assemble(ElementLabels labels, int[] lo, int[] up, int m) throws CycleFound {
        int n = labels.size();
        // listed lower elements of each element, deduplicated
        Adjacency listedBelow = dedupe(Adjacency.fromEdges(n, up, lo, m));
        Adjacency listedAbove = listedBelow.transpose();
        int[] order = topologicalOrder(listedBelow, listedAbove);
        listedAbove = null; // not needed any more: let it go before the reduction allocates
        if (order.length < n) {
            throw new CycleFound(findCycle(listedBelow, order));
        }
        int[] heights = new int[n];
        for (int x : order) {
            int h = 0;
            for (int i = listedBelow.start(x); i < listedBelow.end(x); i++) {
                h = Math.max(h, heights[listedBelow.target(i)] + 1);
            }
            heights[x] = h;
        }
        Adjacency covers = transitiveReduction(listedBelow, heights);
        return new Poset(labels, covers, covers.transpose(), heights, order);
    }

    /** Drops repeated targets in each row, reusing the arrays when there are none. */
    private static Adjacency dedupe(Adjacency a) {
        int n = a.vertexCount();
        int[] offsets = new int[n + 1];
        int[] targets = a.targetArray();
        int kept = 0;
        for (int x = 0; x < n; x++) {
            int previous = -1;
            for (int i = a.start(x); i < a.end(x); i++) {
                int t = targets[i];
                if (t != previous) {
                    targets[kept++] = t; // kept <= i: compacting in place never overwrites what is still to be read
                    previous = t;
                }
            }
            offsets[x + 1] = kept;
        }
        return new Adjacency(offsets, kept == targets.length ? targets : Arrays.copyOf(targets, kept));
    }

    /** Kahn's algorithm from the minimal elements; shorter than n exactly when there is a cycle. */
    private static int[] topologicalOrder(Adjacency below, Adjacency above) {
        int n = below.vertexCount();
        int[] remaining = new int[n];
        int[] order = new int[n];
        int count = 0;
        for (int x = 0; x < n; x++) {
            remaining[x] = below.degree(x);
            if (remaining[x] == 0) {
                order[count++] = x;
            }
        }
        for (int head = 0; head < count; head++) {
            int x = order[head];
            for (int i = above.start(x); i < above.end(x); i++) {
                int y = above.target(i);
                if (--remaining[y] == 0) {
                    order[count++] = y;
                }
            }
        }
        return Arrays.copyOf(order, count);
    }

    /**
     * Every element left out of a partial topological order has a listed lower element that was
     * left out too, so walking down through left-out elements must revisit one: that closes a cycle.
     * Iterative, so a cycle of any length is found without deep recursion.
     */
    private static int[] findCycle(Adjacency below, int[] partialOrder) {
        int n = below.vertexCount();
        boolean[] placed = new boolean[n];
        for (int x : partialOrder) {
            placed[x] = true;
        }
        int start = 0;
        while (placed[start]) {
            start++;
        }
        int[] step = new int[n];
        Arrays.fill(step, -1);
        IntArrayList walk = new IntArrayList();
        int x = start;
        while (step[x] < 0) {
            step[x] = walk.size();
            walk.add(x);
            int next = -1;
            for (int i = below.start(x); i < below.end(x) && next < 0; i++) {
                if (!placed[below.target(i)]) {
                    next = below.target(i);
                }
            }
            x = next;
        }
        // walk[step[x]..] descends x > ... > x; report it ascending
        int[] descending = walk.subList(step[x], walk.size()).toIntArray();
        int[] cycle = new int[descending.length];
        for (int i = 0; i < descending.length; i++) {
            cycle[i] = descending[descending.length - 1 - i];
        }
        return cycle;
    }

    private int tagOf(int lower, int upper) {
        for (int e = 0; e < lowers.size(); e++) {
            if (lowers.getInt(e) == lower && uppers.getInt(e) == upper) {
                return tags.getInt(e);
            }
        }
        return 0;
    }

    private static Adjacency transitiveReduction(Adjacency below, int[] heights) {
        int n = below.vertexCount();
        int[] offsets = new int[n + 1];
        int[] covers = new int[below.edgeCount()];
        int kept = 0;
        int[] stamp = new int[n];
        Arrays.fill(stamp, -1);
        IntArrayList stack = new IntArrayList();
        Progress progress = Progress.current();
        for (int y = 0; y < n; y++) {
            if ((y & 0xFFF) == 0) {
                progress.reached(y);
            }
            int s = below.start(y);
            int e = below.end(y);
            int minHeight = Integer.MAX_VALUE;
            int maxHeight = Integer.MIN_VALUE;
            for (int i = s; i < e; i++) {
                int h = heights[below.target(i)];
                minHeight = Math.min(minHeight, h);
                maxHeight = Math.max(maxHeight, h);
            }
            if (e - s > 1 && minHeight != maxHeight) {
                markStrictlyBelow(below, heights, y, minHeight, stamp, stack);
            }
            for (int i = s; i < e; i++) {
                int x = below.target(i);
                if (stamp[x] != y) {
                    covers[kept++] = x;
                }
            }
            offsets[y + 1] = kept;
        }
        return new Adjacency(offsets, kept == covers.length ? covers : Arrays.copyOf(covers, kept));
    }

    /**
     * Stamps with {@code y} every element reachable by at least two listed relations down from
     * {@code y}, never descending below {@code floor}: nothing there can be a listed lower element.
     */
    private static void markStrictlyBelow(Adjacency below, int[] heights, int y, int floor, int[] stamp, IntArrayList stack) {
        stack.clear();
        for (int i = below.start(y); i < below.end(y); i++) {
            int z = below.target(i);
            if (heights[z] > floor) {
                stack.add(z);
            }
        }
        while (!stack.isEmpty()) {
            int z = stack.popInt();
            for (int i = below.start(z); i < below.end(z); i++) {
                int w = below.target(i);
                if (stamp[w] != y) {
                    stamp[w] = y;
                    if (heights[w] > floor) {
                        stack.add(w);
                    }
                }
            }
        }
    }
}
