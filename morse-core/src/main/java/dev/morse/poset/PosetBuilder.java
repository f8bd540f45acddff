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
        int n = labels.size();
        int m = lowers.size();
        int[] lo = lowers.elements();
        int[] up = uppers.elements();
        // listed lower elements of each element, deduplicated
        Adjacency listedBelow = dedupe(Adjacency.fromEdges(n, up, lo, m));
        Adjacency listedAbove = listedBelow.transpose();
        int[] order = topologicalOrder(listedBelow, listedAbove);
        if (order.length < n) {
            throw findCycle(listedBelow, order);
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
        return new Poset(labels.toArray(new String[0]), covers, covers.transpose(), heights, order);
    }

    private static Adjacency dedupe(Adjacency a) {
        int n = a.vertexCount();
        int[] offsets = new int[n + 1];
        IntArrayList targets = new IntArrayList(a.edgeCount());
        for (int x = 0; x < n; x++) {
            int previous = -1;
            for (int i = a.start(x); i < a.end(x); i++) {
                int t = a.target(i);
                if (t != previous) {
                    targets.add(t);
                    previous = t;
                }
            }
            offsets[x + 1] = targets.size();
        }
        return new Adjacency(offsets, targets.toIntArray());
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
    private OrderCycleException findCycle(Adjacency below, int[] partialOrder) {
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
        return new OrderCycleException(cycle, tagOf(cycle[cycle.length - 1], cycle[0]));
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
        IntArrayList covers = new IntArrayList(below.edgeCount());
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
                    covers.add(x);
                }
            }
            offsets[y + 1] = covers.size();
        }
        return new Adjacency(offsets, covers.toIntArray());
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
