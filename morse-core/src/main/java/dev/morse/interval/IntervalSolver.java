package dev.morse.interval;

import dev.morse.engine.Computation;
import dev.morse.engine.Engines;
import dev.morse.engine.Request;
import dev.morse.input.PosetInput;
import dev.morse.poset.Adjacency;
import dev.morse.poset.Poset;
import dev.morse.poset.PosetBuilder;
import dev.morse.progress.Progress;
import dev.morse.progress.ProgressScope;
import java.util.Arrays;

/**
 * Finds the reduced homology of one open interval of P̂ at a time. The elements of the interval come
 * from the down-sets and up-sets {@link PosetWithBounds} holds; one pass over them in a linear
 * extension finds the longest and the shortest maximal chain (so the dimension and whether the
 * interval is graded), the minimal and maximal elements and the components. Then, cheapest first:
 * <ul>
 * <li>an order complex of dimension at most 1 is a graph (points and edges, the comparable pairs):
 *     {@code H̃_0 = Z^(c-1)} and {@code H̃_1 = Z^(E-V+c)} for V vertices, E edges and c components
 *     (Euler's formula for graphs; e.g. Hatcher, Algebraic Topology, 2002, Prop. 2.7 and §1.A, from
 *     memory); the empty interval gives {@code H̃_{-1} = Z};
 * <li>an open interval with a least or a greatest element has a cone for its order complex, which is
 *     contractible: all reduced homology vanishes (Quillen 1978, §1; Wachs, "Poset topology", 2007,
 *     §1.1, from memory);
 * <li>any other interval goes to the homology engine ({@link Engines#compute}) as a poset of its
 *     own, with everything that makes one homology fast: poset reduction, the cellular complex of a
 *     CW poset, Morse reduction, the implicit order complex when large.
 * </ul>
 * Keeps scratch arrays of size n: one solver per thread; not thread-safe.
 */
public final class IntervalSolver {
    private final PosetWithBounds hat;
    private final Request request;
    private final String source;
    private final int[] members;
    private final int[] order;
    private final int[] stamp;
    private final int[] longest;
    private final int[] shortest;
    private final int[] hasUpper;
    private final int[] parent;
    private int generation;

    /**
     * A solver for the intervals of {@code hat}.
     *
     * @param request how the engine computes; its coefficients are used, and homology is always reduced
     * @param source the input's name, for messages about an interval the engine cannot take
     */
    public IntervalSolver(PosetWithBounds hat, Request request, String source) {
        this.hat = hat;
        this.request = request.withHomology(request.coefficients(), true);
        this.source = source;
        int n = hat.size();
        this.members = new int[n];
        this.order = new int[n];
        this.stamp = new int[n + 2];
        this.longest = new int[n + 2];
        this.shortest = new int[n + 2];
        this.hasUpper = new int[n + 2];
        this.parent = new int[n + 2];
    }

    /**
     * The reduced homology of the open interval {@code task}.
     *
     * @throws IllegalArgumentException unless {@code lower < upper} in P̂
     * @throws dev.morse.io.InputException if the engine cannot take the interval
     */
    public IntervalResult solve(IntervalTask task) {
        int x = task.lower();
        int y = task.upper();
        if (!hat.isBelow(x, y)) {
            throw new IllegalArgumentException("not an interval of P-hat: " + x + " is not below " + y);
        }
        int m = hat.openInterval(x, y, members);
        int g = ++generation;
        // the members in the order of a linear extension, so that lower covers come first
        for (int i = 0; i < m; i++) {
            order[i] = hat.position(members[i]);
        }
        Arrays.sort(order, 0, m);
        for (int i = 0; i < m; i++) {
            order[i] = hat.atPosition(order[i]);
            stamp[order[i]] = g;
        }
        stamp[x] = g;
        longest[x] = 0;
        shortest[x] = 0;
        long edges = 0;
        int minimalCount = 0;
        int components = m;
        for (int i = 0; i < m; i++) {
            int z = order[i];
            parent[z] = z;
            int lo = Integer.MAX_VALUE;
            int hi = Integer.MIN_VALUE;
            boolean minimal = true;
            for (int k = hat.lowerCoverStart(z); k < hat.lowerCoverEnd(z); k++) {
                int w = hat.lowerCover(k);
                if (stamp[w] != g) {
                    continue;
                }
                lo = Math.min(lo, shortest[w] + 1);
                hi = Math.max(hi, longest[w] + 1);
                if (w != x) {
                    minimal = false;
                    edges++;
                    hasUpper[w] = g;
                    components -= union(w, z);
                }
            }
            shortest[z] = lo;
            longest[z] = hi;
            if (minimal) {
                minimalCount++;
            }
        }
        int lo = Integer.MAX_VALUE;
        int hi = Integer.MIN_VALUE;
        for (int k = hat.lowerCoverStart(y); k < hat.lowerCoverEnd(y); k++) {
            int w = hat.lowerCover(k);
            if (stamp[w] == g) {
                lo = Math.min(lo, shortest[w] + 1);
                hi = Math.max(hi, longest[w] + 1);
            }
        }
        int dimension = hi - 2;
        boolean graded = lo == hi;
        if (m == 0) {
            return new IntervalResult(task, -1, graded, IntervalHomology.emptyComplex(), IntervalResult.How.GRAPH);
        }
        if (dimension <= 1) {
            // in a poset without chains of three elements the comparable pairs are the covers
            IntervalHomology graph = dimension == 0 ? IntervalHomology.free(components - 1)
                    : IntervalHomology.free(components - 1, Math.toIntExact(edges - m + components));
            return new IntervalResult(task, dimension, graded, graph, IntervalResult.How.GRAPH);
        }
        int maximalCount = 0;
        for (int i = 0; i < m; i++) {
            if (hasUpper[order[i]] != g) {
                maximalCount++;
            }
        }
        if (minimalCount == 1 || maximalCount == 1) {
            return new IntervalResult(task, dimension, graded, IntervalHomology.free(new int[dimension + 1]),
                    IntervalResult.How.CONE);
        }
        return new IntervalResult(task, dimension, graded, compute(task, m), IntervalResult.How.COMPUTED);
    }

    private IntervalHomology compute(IntervalTask task, int m) {
        Poset poset = hat.poset();
        PosetBuilder builder = new PosetBuilder();
        int g = generation;
        // the open interval is convex, so its covers are the covers of P between its elements
        for (int i = 0; i < m; i++) {
            parent[members[i]] = builder.element(poset.label(members[i]));
        }
        Adjacency covers = poset.lowerCovers();
        for (int i = 0; i < m; i++) {
            int z = members[i];
            for (int k = covers.start(z); k < covers.end(z); k++) {
                int w = covers.target(k);
                if (stamp[w] == g && w != task.lower()) {
                    builder.relate(parent[w], parent[z], 0);
                }
            }
        }
        Poset interval = builder.buildKnownAcyclic();
        String name = source + " interval (" + name(task.lower()) + ", " + name(task.upper()) + ")";
        Computation run;
        try (ProgressScope silent = Progress.use(Progress.SILENT)) {
            run = Engines.compute(new PosetInput(name, interval, 0), request);
        }
        return IntervalHomology.of(run.homology());
    }

    private String name(int x) {
        String label = hat.label(x);
        return label != null ? label : x == hat.bottom() ? "0^" : "1^";
    }

    /** Union by linking roots; returns 1 when two components merged. */
    private int union(int a, int b) {
        int ra = find(a);
        int rb = find(b);
        if (ra == rb) {
            return 0;
        }
        parent[ra] = rb;
        return 1;
    }

    private int find(int a) {
        while (parent[a] != a) {
            parent[a] = parent[parent[a]];
            a = parent[a];
        }
        return a;
    }
}
