package dev.morse.graph;

import dev.morse.complex.Facets;
import dev.morse.poset.Poset;
import dev.morse.poset.PosetBuilder;
import it.unimi.dsi.fastutil.ints.IntArrayList;
import it.unimi.dsi.fastutil.longs.Long2IntOpenHashMap;
import it.unimi.dsi.fastutil.longs.LongArrayList;
import java.util.Arrays;

/**
 * The complexes of a graph. The clique, independence and matching complexes are flag complexes,
 * given by their facets: the maximal cliques of the graph, of its complement, and of the complement
 * of its line graph. Maximal cliques are listed by the Bron–Kerbosch algorithm with Tomita's pivot
 * (Bron and Kerbosch, Comm. ACM 16, 1973; Tomita, Tanaka and Takahashi, Theor. Comput. Sci. 363,
 * 2006), each once. The poset of connected induced subgraphs grows from single vertices one
 * neighbour at a time, so each connected set is reached and its covers are the one-vertex
 * extensions. Stateless.
 */
public final class GraphComplexes {
    /** Most facets (or poset elements) made before giving up: the complexes grow exponentially. */
    public static final int MAX_FACES = 2_000_000;
    /** Most vertices for the poset of connected induced subgraphs, whose sets are bit masks. */
    public static final int MAX_SUBGRAPH_VERTICES = 63;

    private GraphComplexes() {
    }

    /** Whether two vertices may lie in one face. */
    @FunctionalInterface
    private interface Compatible {
        boolean test(int u, int v);
    }

    /**
     * The clique complex (flag complex) of {@code graph}: one facet per maximal clique.
     *
     * @throws IllegalStateException past {@link #MAX_FACES} facets
     */
    public static Facets cliqueComplex(Graph graph) {
        return maximal(graph.vertexCount(), graph::adjacent, graph::label);
    }

    /**
     * The independence complex of {@code graph}: one facet per maximal independent set.
     *
     * @throws IllegalStateException past {@link #MAX_FACES} facets
     */
    public static Facets independenceComplex(Graph graph) {
        return maximal(graph.vertexCount(), (u, v) -> !graph.adjacent(u, v), graph::label);
    }

    /**
     * The matching complex of {@code graph}: vertices are its edges, labelled {@code u-v} with u the
     * earlier vertex, and one facet per maximal matching.
     *
     * @throws IllegalStateException past {@link #MAX_FACES} facets
     */
    public static Facets matchingComplex(Graph graph) {
        int m = graph.edgeCount();
        int[] ends = new int[2 * m];
        String[] names = new String[m];
        int e = 0;
        for (int u = 0; u < graph.vertexCount(); u++) {
            for (int i = 0; i < graph.degree(u); i++) {
                int v = graph.neighbour(u, i);
                if (u < v) {
                    ends[2 * e] = u;
                    ends[2 * e + 1] = v;
                    names[e] = graph.label(u) + "-" + graph.label(v);
                    e++;
                }
            }
        }
        return maximal(m, (a, b) -> ends[2 * a] != ends[2 * b] && ends[2 * a] != ends[2 * b + 1]
                && ends[2 * a + 1] != ends[2 * b] && ends[2 * a + 1] != ends[2 * b + 1], x -> names[x]);
    }

    /**
     * The vertex sets of {@code graph} that induce connected subgraphs, ordered by inclusion; each
     * labelled by its vertices in order, as {@code {a,b,c}}.
     *
     * @throws IllegalArgumentException for more than {@link #MAX_SUBGRAPH_VERTICES} vertices, or when
     *     two sets would get the same label (vertex labels containing ',')
     * @throws IllegalStateException past {@link #MAX_FACES} sets
     */
    public static Poset connectedSubgraphs(Graph graph) {
        int n = graph.vertexCount();
        if (n > MAX_SUBGRAPH_VERTICES) {
            throw new IllegalArgumentException("the poset of connected induced subgraphs is made for graphs of at most "
                    + MAX_SUBGRAPH_VERTICES + " vertices, and this one has " + n);
        }
        long[] neighbourMask = new long[n];
        for (int v = 0; v < n; v++) {
            for (int i = 0; i < graph.degree(v); i++) {
                neighbourMask[v] |= 1L << graph.neighbour(v, i);
            }
        }
        Long2IntOpenHashMap ids = new Long2IntOpenHashMap();
        ids.defaultReturnValue(-1);
        LongArrayList sets = new LongArrayList();
        for (int v = 0; v < n; v++) {
            ids.put(1L << v, sets.size());
            sets.add(1L << v);
        }
        IntArrayList lowers = new IntArrayList();
        IntArrayList uppers = new IntArrayList();
        for (int k = 0; k < sets.size(); k++) {
            long set = sets.getLong(k);
            long frontier = 0;
            for (long rest = set; rest != 0; rest &= rest - 1) {
                frontier |= neighbourMask[Long.numberOfTrailingZeros(rest)];
            }
            frontier &= ~set;
            for (; frontier != 0; frontier &= frontier - 1) {
                long bigger = set | Long.lowestOneBit(frontier);
                int id = ids.get(bigger);
                if (id < 0) {
                    if (sets.size() >= MAX_FACES) {
                        throw new IllegalStateException("more than " + MAX_FACES + " connected induced subgraphs");
                    }
                    id = sets.size();
                    ids.put(bigger, id);
                    sets.add(bigger);
                }
                lowers.add(k);
                uppers.add(id);
            }
        }
        PosetBuilder builder = new PosetBuilder();
        for (int k = 0; k < sets.size(); k++) {
            StringBuilder label = new StringBuilder("{");
            for (long rest = sets.getLong(k); rest != 0; rest &= rest - 1) {
                label.append(label.length() > 1 ? "," : "").append(graph.label(Long.numberOfTrailingZeros(rest)));
            }
            if (builder.element(label.append('}').toString()) != k) {
                throw new IllegalArgumentException("two connected subgraphs would both be labelled " + label
                        + "; vertex labels must not contain ','");
            }
        }
        for (int i = 0; i < lowers.size(); i++) {
            builder.relate(lowers.getInt(i), uppers.getInt(i), 0);
        }
        return builder.buildKnownAcyclic();
    }

    /** The maximal sets of pairwise compatible vertices among {@code 0..n-1}, as facets. */
    private static Facets maximal(int n, Compatible compatible, java.util.function.IntFunction<String> label) {
        IntArrayList offsets = new IntArrayList();
        offsets.add(0);
        IntArrayList members = new IntArrayList();
        int[] all = new int[n];
        for (int v = 0; v < n; v++) {
            all[v] = v;
        }
        expand(new IntArrayList(), all, new int[0], compatible, offsets, members);
        String[] labels = new String[n];
        for (int v = 0; v < n; v++) {
            labels[v] = label.apply(v);
        }
        return new Facets(labels, offsets.toIntArray(), members.toIntArray());
    }

    /**
     * Bron–Kerbosch with pivot: reports R when P and X are empty; else branches on the vertices of P
     * not compatible with the pivot, the vertex of P ∪ X compatible with most of P.
     */
    private static void expand(IntArrayList chosen, int[] candidates, int[] excluded, Compatible compatible,
            IntArrayList offsets, IntArrayList members) {
        if (candidates.length == 0) {
            if (excluded.length == 0 && !chosen.isEmpty()) {
                if (offsets.size() > MAX_FACES) {
                    throw new IllegalStateException("more than " + MAX_FACES + " facets");
                }
                members.addAll(chosen);
                offsets.add(members.size());
            }
            return;
        }
        int pivot = -1;
        int best = -1;
        for (int[] pool : new int[][] {candidates, excluded}) {
            for (int u : pool) {
                int count = 0;
                for (int v : candidates) {
                    if (v != u && compatible.test(u, v)) {
                        count++;
                    }
                }
                if (count > best) {
                    best = count;
                    pivot = u;
                }
            }
        }
        int[] p = candidates.clone();
        int pSize = p.length;
        int[] x = Arrays.copyOf(excluded, excluded.length + candidates.length);
        int xSize = excluded.length;
        for (int v : candidates) {
            if (v != pivot && compatible.test(pivot, v)) {
                continue;
            }
            chosen.add(v);
            expand(chosen, restrict(p, pSize, v, compatible), restrict(x, xSize, v, compatible), compatible, offsets,
                    members);
            chosen.removeInt(chosen.size() - 1);
            for (int i = 0; i < pSize; i++) {
                if (p[i] == v) {
                    p[i] = p[--pSize];
                    break;
                }
            }
            x[xSize++] = v;
        }
    }

    private static int[] restrict(int[] set, int size, int v, Compatible compatible) {
        int[] out = new int[size];
        int k = 0;
        for (int i = 0; i < size; i++) {
            if (set[i] != v && compatible.test(v, set[i])) {
                out[k++] = set[i];
            }
        }
        return Arrays.copyOf(out, k);
    }
}
