package dev.morse.matching;

import dev.morse.complex.Boundary;
import dev.morse.complex.ChainComplex;
import dev.morse.homology.Coefficients;
import dev.morse.homology.Homology;
import dev.morse.homology.HomologyCalculator;
import dev.morse.homology.HomologyGroup;
import it.unimi.dsi.fastutil.ints.IntArrayList;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.ojalgo.optimisation.Expression;
import org.ojalgo.optimisation.ExpressionsBasedModel;
import org.ojalgo.optimisation.Optimisation;
import org.ojalgo.optimisation.Variable;

/**
 * Optimal Morse matchings by integer programming with lazily added cycle constraints (Joswig and
 * Pfetsch, "Computing optimal Morse matchings", SIAM J. Discrete Math. 20, 2006). One binary
 * variable per pair of cells that may be matched (a face and a coface with incidence ±1, as
 * {@link MatchingVerifier} requires), each cell in at most one chosen pair, the number of pairs
 * maximised. Acyclicity is imposed lazily: each solution is searched for closed gradient paths
 * (directed cycles of the Hasse diagram with the chosen pairs reversed, which alternate between two
 * adjacent dimensions), and for each shortest one found, on upper cells S paired with lower cells T,
 * the constraint that at most |S| − 1 pairs between T and S are chosen is added (Joswig and Pfetsch
 * constrain only the pairs on the path; the lifted form is shown valid at {@code addCycleCut}), and
 * the program is solved again. The first solution without a closed path is optimal. The integer
 * programs are solved by ojalgo's branch and bound.
 *
 * <p>What shortens the search, each valid for every Morse matching:
 * <ul>
 * <li>the Morse inequalities m_k ≥ β_k + t_k + t_(k−1) (Forman, "Morse theory for cell complexes",
 * 1998; t_k the number of torsion factors of H_k, from the Smith normal form), with the Euler
 * characteristic Σ (−1)^k m_k = χ, bound the critical cells of each dimension and in total;
 * <li>core cuts: a set of cells of one dimension none of which has a free face relative to the set
 * cannot be matched downwards entirely (dually upwards), see {@code addCoreCuts};
 * <li>vertices need no variables when every edge joins two vertices: a spanning forest of the edges
 * left pairs f_0 − β_0 of them, the most possible ({@code withSpanningForest});
 * <li>the critical cells of the top dimension must meet every core of the top cells: a depth-first
 * search for the fewest that do raises the bound of that dimension (at most half the time limit);
 * <li>the best matching of the one-pass heuristics, each improved by Forman's cancellations
 * ({@link GradientPathCancellation}) up to {@value #MODEL_CELL_LIMIT} cells, starts as incumbent, and a solution with closed
 * paths is repaired (one pair of each unmatched) into a valid matching that may improve it, so that a
 * run cut short by the time limit still returns its best.
 * </ul>
 * Whenever the incumbent meets the bound the search ends with proof, often before any program.
 *
 * <p>Size limit, measured (benchmarks/RESULTS.md): every complex of the hard library with at most
 * {@value #PROVEN_CELL_LIMIT} cells is solved with proof within a few seconds each (the slowest, the
 * sum complex X_{0,2,7} on Z/19 with 343 cells, in about 6 s). The 3-dimensional X_{0,2,5,6} on Z/13
 * (597 cells), beyond the limit, was not proven within 60 s until the incumbent was improved by
 * cancellations; coreduction followed by them meets the Morse bound 33 there, so it is now proven at
 * once, but the limit stays where programs were measured to finish. What decides is less the size than the gap between the
 * heuristics and the bounds: a complex whose best heuristic meets the Morse bound is proven at once
 * at any size up to {@value #MODEL_CELL_LIMIT} cells. The time limit
 * ({@link MatchingOptions#timeLimit()}) is kept only to within what ojalgo overruns its abort time by:
 * each program is given four fifths of the time left, yet one run on 597 cells, under heavy load,
 * ended 20 s late with a 60 s limit.
 * Above {@value #MODEL_CELL_LIMIT} cells no integer program is built and no homology computed: the
 * result is the best heuristic matching, with only |χ| as its bound. Memory: ojalgo's model, a few
 * hundred bytes per candidate pair.
 */
public final class OptimalMatchingSolver {
    /**
     * Every complex of {@code dev.morse.generate.HardLibrary} with at most this many cells is solved with
     * proof within the default time limit (measured; the next larger one, 597 cells, is proven only
     * because a heuristic meets its Morse bound, not by the integer programs).
     */
    public static final int PROVEN_CELL_LIMIT = 500;

    /** No integer program is built for complexes with more cells than this. */
    public static final int MODEL_CELL_LIMIT = 5_000;

    /** Smaller cores tried per core part of a solution. */
    private static final int SUB_CORES = 200;

    private final ChainComplex complex;
    private final int n;
    private final int[] edgeLower;
    private final int[] edgeUpper;
    private final int[] cellEdgeOffsets;
    private final int[] cellEdges;
    private final int[] dimensionBound;
    private long criticalBound;
    /** Whether every 1-cell is a graph edge, so that vertices are matched by a spanning forest. */
    private final boolean graphBottom;
    /** Pairs of a vertex and an edge in every optimal matching when {@link #graphBottom}: f_0 − β_0. */
    private final int forestPairs;
    private final List<int[]> cuts = new ArrayList<>();
    private final IntArrayList cutBounds = new IntArrayList();
    private final Set<String> cutKeys = new HashSet<>();
    private final Cores cores;
    private final ClosedPaths paths;

    private OptimalMatchingSolver(ChainComplex complex, Homology homology) {
        this.complex = complex;
        this.n = complex.cellCount();
        this.cores = new Cores(complex);
        this.paths = new ClosedPaths(complex);
        Boundary boundary = complex.boundary();
        graphBottom = homology != null && complex.dimension() >= 1 && edgesAreGraphEdges(complex);
        IntArrayList lower = new IntArrayList();
        IntArrayList upper = new IntArrayList();
        // with graph edges the vertex–edge pairs are left to the spanning forest: no variables for them
        for (int s = graphBottom ? complex.firstCell(2) : 0; s < n; s++) {
            for (int i = boundary.start(s); i < boundary.end(s); i++) {
                int coefficient = boundary.coefficient(i);
                if (coefficient == 1 || coefficient == -1) {
                    lower.add(boundary.target(i));
                    upper.add(s);
                }
            }
        }
        edgeLower = lower.toIntArray();
        edgeUpper = upper.toIntArray();
        cellEdgeOffsets = new int[n + 1];
        for (int e = 0; e < edgeLower.length; e++) {
            cellEdgeOffsets[edgeLower[e] + 1]++;
            cellEdgeOffsets[edgeUpper[e] + 1]++;
        }
        for (int c = 0; c < n; c++) {
            cellEdgeOffsets[c + 1] += cellEdgeOffsets[c];
        }
        cellEdges = new int[cellEdgeOffsets[n]];
        int[] fill = Arrays.copyOf(cellEdgeOffsets, n);
        for (int e = 0; e < edgeLower.length; e++) {
            cellEdges[fill[edgeLower[e]]++] = e;
            cellEdges[fill[edgeUpper[e]]++] = e;
        }
        List<HomologyGroup> groups = homology == null ? List.of() : homology.groups();
        dimensionBound = new int[complex.dimension() + 1];
        for (int k = 0; k <= complex.dimension() && k < groups.size(); k++) {
            dimensionBound[k] = groups.get(k).betti() + groups.get(k).torsion().size()
                    + (k > 0 ? groups.get(k - 1).torsion().size() : 0);
        }
        criticalBound = eulerBound(dimensionBound);
        forestPairs = graphBottom ? complex.cellCount(0) - groups.get(0).betti() : 0;
    }

    /**
     * The fewest critical cells that per-dimension bounds {@code b_k} allow: every vector of critical
     * counts has the Euler characteristic χ = Σ (−1)^k f_k as alternating sum (pairs join adjacent
     * dimensions), so at least Σ b_k + |χ − Σ (−1)^k b_k| cells, the excess placed in one dimension
     * of the right parity; this also gives the parity of the cell count.
     */
    private long eulerBound(int[] bounds) {
        long total = 0;
        long alternating = 0;
        long euler = 0;
        for (int k = 0; k < bounds.length; k++) {
            total += bounds[k];
            alternating += (k % 2 == 0 ? 1 : -1) * (long) bounds[k];
            euler += (k % 2 == 0 ? 1 : -1) * (long) complex.cellCount(k);
        }
        return total + Math.abs(euler - alternating);
    }

    /** Raises the bound on critical cells of the top dimension, and the total with it. */
    private void raiseTopBound(int top) {
        int d = complex.dimension();
        if (top > dimensionBound[d]) {
            dimensionBound[d] = top;
            criticalBound = Math.max(criticalBound, eulerBound(dimensionBound));
        }
    }

    /** Whether the boundary of every 1-cell is empty or v − w for two distinct vertices. */
    private static boolean edgesAreGraphEdges(ChainComplex complex) {
        Boundary boundary = complex.boundary();
        for (int e = complex.firstCell(1); e < complex.firstCell(2); e++) {
            int size = boundary.size(e);
            if (size == 0) {
                continue;
            }
            if (size != 2 || boundary.coefficient(boundary.start(e)) + boundary.coefficient(boundary.start(e) + 1) != 0
                    || Math.abs(boundary.coefficient(boundary.start(e))) != 1) {
                return false;
            }
        }
        return true;
    }

    /**
     * Replaces the vertex–edge pairs of {@code mates} by a spanning forest of the graph of edges not
     * matched upwards, each tree's vertices matched to the edge towards its root. Why this loses
     * nothing: the pairs above dimension 1 alone form a Morse matching whose critical edges are those
     * of this graph and whose Morse boundary on them is the ordinary one, so the graph has β_0
     * components and its forest f_0 − β_0 edges, the most any matching can pair with vertices. A
     * forest closes no gradient path, and paths never mix the two layers. No-op unless
     * {@link #graphBottom}.
     */
    private int[] withSpanningForest(int[] mates) {
        if (!graphBottom) {
            return mates;
        }
        Boundary boundary = complex.boundary();
        Boundary coboundary = complex.coboundary();
        int firstEdge = complex.firstCell(1);
        int endEdge = complex.firstCell(2);
        for (int v = 0; v < firstEdge; v++) {
            if (mates[v] != Matching.CRITICAL) {
                mates[mates[v]] = Matching.CRITICAL;
                mates[v] = Matching.CRITICAL;
            }
        }
        boolean[] reached = new boolean[firstEdge];
        int[] queue = new int[firstEdge];
        for (int root = 0; root < firstEdge; root++) {
            if (reached[root]) {
                continue;
            }
            reached[root] = true;
            int tail = 0;
            queue[tail++] = root;
            for (int head = 0; head < tail; head++) {
                int v = queue[head];
                for (int i = coboundary.start(v); i < coboundary.end(v); i++) {
                    int e = coboundary.target(i);
                    if (e >= endEdge || mates[e] != Matching.CRITICAL || boundary.size(e) != 2) {
                        continue;
                    }
                    int w = boundary.target(boundary.start(e)) == v ? boundary.target(boundary.start(e) + 1)
                            : boundary.target(boundary.start(e));
                    if (!reached[w]) {
                        reached[w] = true;
                        mates[w] = e;
                        mates[e] = w;
                        queue[tail++] = w;
                    }
                }
            }
        }
        return mates;
    }

    /**
     * Searches for a Morse matching with the fewest critical cells within
     * {@link MatchingOptions#timeLimit()}; the seed goes to the randomised starting heuristic.
     */
    public static OptimalMatching solve(ChainComplex complex, MatchingOptions options) {
        return solve(complex, options, true, true);
    }

    /**
     * As {@link #solve(ChainComplex, MatchingOptions)}, for tests: without {@code startFromHeuristics}
     * the search starts from the empty matching, and without {@code coreSearch} the bound on critical
     * top cells is not searched for, so that the integer programs alone find the optimum.
     */
    static OptimalMatching solve(ChainComplex complex, MatchingOptions options, boolean startFromHeuristics,
            boolean coreSearch) {
        long start = System.nanoTime();
        long deadline = start + options.timeLimit().toNanos();
        // beyond the model limit no program is built, and the Smith normal form would only cost time
        Homology homology = complex.cellCount() <= MODEL_CELL_LIMIT
                ? HomologyCalculator.compute(complex, Coefficients.INTEGERS) : null;
        OptimalMatchingSolver solver = new OptimalMatchingSolver(complex, homology);
        return solver.run(options, start, deadline, startFromHeuristics, coreSearch);
    }

    /** The heuristics whose best matching starts the search. */
    static List<MatchingHeuristic> startingHeuristics(int cellCount) {
        List<MatchingHeuristic> list = new ArrayList<>(List.of(MatchingHeuristics.COREDUCTION,
                MatchingHeuristics.COLLAPSE, MatchingHeuristics.RANDOM, MatchingHeuristics.LAST_FREE_FACE,
                MatchingHeuristics.FREEING_COLLAPSE));
        if (cellCount <= MODEL_CELL_LIMIT) {
            // quadratic in the worst case, so only where an integer program would be built anyway
            list.add(MatchingHeuristics.LEXICOGRAPHIC);
        }
        return list;
    }

    private OptimalMatching run(MatchingOptions options, long start, long deadline, boolean startFromHeuristics,
            boolean coreSearch) {
        Matching best = Matching.empty(n);
        for (MatchingHeuristic h : startFromHeuristics ? startingHeuristics(n) : List.<MatchingHeuristic>of()) {
            Matching m = h.match(complex, options);
            if (MatchingVerifier.verify(complex, m).valid()) {
                if (n <= MODEL_CELL_LIMIT) {
                    // Forman's cancellations cost O(c · N) a pass: only where a program would be built
                    m = GradientPathCancellation.improve(complex, m);
                }
                m = Matching.adopt(withSpanningForest(mates(m)));
            }
            if (MatchingVerifier.verify(complex, m).valid() && m.pairCount() > best.pairCount()) {
                best = m;
            }
        }
        long upperPairs = (n - criticalBound) / 2;
        int solves = 0;
        if (coreSearch && best.pairCount() < upperPairs && n <= MODEL_CELL_LIMIT && complex.dimension() >= 1) {
            int top = complex.dimension();
            // half the time at most, so that the integer programs get the rest
            long searchDeadline = System.nanoTime() + (deadline - System.nanoTime()) / 2;
            raiseTopBound(cores.topCellBound(dimensionBound[top], best.criticalCounts(complex)[top], searchDeadline));
            upperPairs = (n - criticalBound) / 2;
        }
        if (best.pairCount() < upperPairs && n <= MODEL_CELL_LIMIT) {
            addCoreCuts(null);
            while (System.nanoTime() < deadline) {
                // ojalgo may overrun its abort time a little: ask for less than what is left
                long remainingMillis = Math.max(1, (deadline - System.nanoTime()) / 1_250_000);
                Optimisation.Result result = solveModel(remainingMillis);
                solves++;
                Optimisation.State state = result.getState();
                if (!state.isFeasible()) {
                    break;
                }
                int[] mates = withSpanningForest(chosenMates(result));
                if (state.isOptimal()) {
                    upperPairs = Math.min(upperPairs, Math.round(result.getValue()) + forestPairs);
                }
                List<int[]> cycles = paths.shortestCycles(mates);
                for (int[] cycle : cycles) {
                    addCycleCut(cycle, mates);
                }
                addCoreCuts(mates);
                Matching repaired = Matching.adopt(paths.repair(mates));
                if (repaired.pairCount() > best.pairCount()) {
                    best = repaired;
                }
                if (best.pairCount() >= upperPairs || !state.isOptimal() || cycles.isEmpty()) {
                    break;
                }
            }
        }
        boolean proven = best.pairCount() >= upperPairs;
        MatchingVerdict verdict = MatchingVerifier.verify(complex, best);
        if (!verdict.valid()) {
            throw new IllegalStateException("the optimal matching search produced an invalid matching: " + verdict.defect());
        }
        long bound = n - 2 * upperPairs;
        return new OptimalMatching(best, best.criticalCounts(complex), proven, bound,
                Duration.ofNanos(System.nanoTime() - start), solves, cuts.size());
    }

    private Optimisation.Result solveModel(long timeMillis) {
        ExpressionsBasedModel model = new ExpressionsBasedModel();
        int edges = edgeLower.length;
        Variable[] x = new Variable[edges];
        for (int e = 0; e < edges; e++) {
            x[e] = model.addVariable("x" + e).binary().weight(1);
        }
        for (int c = 0; c < n; c++) {
            if (cellEdgeOffsets[c + 1] - cellEdgeOffsets[c] > 1) {
                Expression once = model.addExpression("cell" + c).upper(1);
                for (int i = cellEdgeOffsets[c]; i < cellEdgeOffsets[c + 1]; i++) {
                    once.set(x[cellEdges[i]], 1);
                }
            }
        }
        // Morse inequalities: at most f_k − (β_k + t_k + t_(k−1)) cells of dimension k are matched
        for (int k = graphBottom ? 1 : 0; k <= complex.dimension(); k++) {
            // the spanning forest matches f_0 − β_0 vertices and as many edges
            int fixed = graphBottom && k <= 1 ? forestPairs : 0;
            Expression matched = model.addExpression("dimension" + k).upper(complex.cellCount(k) - dimensionBound[k] - fixed);
            for (int e = 0; e < edges; e++) {
                if (complex.dimensionOf(edgeLower[e]) == k || complex.dimensionOf(edgeUpper[e]) == k) {
                    matched.set(x[e], 1);
                }
            }
        }
        Expression total = model.addExpression("pairs").upper((n - criticalBound) / 2 - forestPairs);
        for (int e = 0; e < edges; e++) {
            total.set(x[e], 1);
        }
        for (int j = 0; j < cuts.size(); j++) {
            int[] cut = cuts.get(j);
            Expression cycle = model.addExpression("cut" + j).upper(cutBounds.getInt(j));
            for (int e : cut) {
                cycle.set(x[e], 1);
            }
        }
        model.options.time_abort = timeMillis;
        model.options.time_suffice = timeMillis;
        return model.maximise();
    }

    private int[] mates(Matching m) {
        int[] mates = new int[n];
        for (int c = 0; c < n; c++) {
            mates[c] = m.mate(c);
        }
        return mates;
    }

    private int[] chosenMates(Optimisation.Result result) {
        int[] mates = new int[n];
        Arrays.fill(mates, Matching.CRITICAL);
        for (int e = 0; e < edgeLower.length; e++) {
            if (result.doubleValue(e) > 0.5) {
                if (mates[edgeLower[e]] != Matching.CRITICAL || mates[edgeUpper[e]] != Matching.CRITICAL) {
                    throw new IllegalStateException("the integer program chose two pairs at one cell");
                }
                mates[edgeLower[e]] = edgeUpper[e];
                mates[edgeUpper[e]] = edgeLower[e];
            }
        }
        return mates;
    }

    /**
     * The cut of a closed path given by its upper cells S, with T the lower cells of their pairs: at
     * most |S| − 1 pairs between T and S. This lifts the cut of Joswig and Pfetsch (only the pairs on
     * the path) to every pair between T and S. Still valid: if each cell of S had its partner in T, the
     * partner of every σ in S would also be a face of the cell before σ on the path, so following
     * partners backwards never stops and closes a gradient path.
     */
    private void addCycleCut(int[] uppers, int[] mates) {
        boolean[] inS = new boolean[n];
        boolean[] inT = new boolean[n];
        for (int s : uppers) {
            inS[s] = true;
            inT[mates[s]] = true;
        }
        IntArrayList edges = new IntArrayList();
        for (int s : uppers) {
            for (int i = cellEdgeOffsets[s]; i < cellEdgeOffsets[s + 1]; i++) {
                int e = cellEdges[i];
                if (edgeUpper[e] == s && inT[edgeLower[e]]) {
                    edges.add(e);
                }
            }
        }
        addCut(edges.toIntArray(), uppers.length - 1);
    }

    private void addCut(int[] edges, int bound) {
        if (edges.length <= bound) {
            return;
        }
        int[] sorted = edges.clone();
        Arrays.sort(sorted);
        if (cutKeys.add(bound + ":" + Arrays.toString(sorted))) {
            cuts.add(sorted);
            cutBounds.add(bound);
        }
    }

    /**
     * Cuts that say a set S of cells of one dimension cannot all be matched downwards (upwards) when no
     * cell of S has a free face (free coface) relative to S. Why: the pairs of S, ordered by the
     * gradient flow, would have a first one; its lower cell lies in no other cell of S, so it is a
     * free face relative to S (dually, a last one). Without {@code mates}, S starts as all cells of a
     * dimension; with them, as the cells a solution matched that way, which yields a violated cut
     * whenever the relative core is not empty. Each connected part of the core gives its own cut.
     */
    private void addCoreCuts(int[] mates) {
        for (int d = 0; d <= complex.dimension(); d++) {
            for (boolean down : new boolean[] {true, false}) {
                boolean[] in = new boolean[n];
                int first = complex.firstCell(d);
                int end = first + complex.cellCount(d);
                for (int c = first; c < end; c++) {
                    in[c] = mates == null || (mates[c] != Matching.CRITICAL
                            && complex.dimensionOf(mates[c]) == (down ? d - 1 : d + 1));
                }
                core(first, end, in, down, mates != null);
            }
        }
    }

    /**
     * Adds the cut of each connected part of the core of {@code in}; for a solution's cells, also the
     * cuts of the cores left when one cell of a part is taken out (up to {@value #SUB_CORES} per part),
     * since the next solution would otherwise only trade that one cell for another.
     */
    private void core(int first, int end, boolean[] in, boolean down, boolean fromSolution) {
        cores.prune(first, end, in, down);
        for (IntArrayList part : cores.parts(first, end, in, down)) {
            addCut(pairsOf(part, down), part.size() - 1);
            if (!fromSolution) {
                continue;
            }
            for (int k = 0; k < Math.min(part.size(), SUB_CORES); k++) {
                boolean[] smaller = new boolean[n];
                for (int v : part) {
                    smaller[v] = true;
                }
                smaller[part.getInt(k)] = false;
                cores.prune(first, end, smaller, down);
                for (IntArrayList rest : cores.parts(first, end, smaller, down)) {
                    addCut(pairsOf(rest, down), rest.size() - 1);
                }
            }
        }
    }

    /** The variables pairing a cell of {@code cells} downwards (upwards). */
    private int[] pairsOf(IntArrayList cells, boolean down) {
        IntArrayList edges = new IntArrayList();
        for (int v : cells) {
            for (int i = cellEdgeOffsets[v]; i < cellEdgeOffsets[v + 1]; i++) {
                int e = cellEdges[i];
                if ((down ? edgeUpper[e] : edgeLower[e]) == v) {
                    edges.add(e);
                }
            }
        }
        return edges.toIntArray();
    }
}
