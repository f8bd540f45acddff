package dev.morse.poset;

/**
 * Constructions of new posets from old: product, ordinal sum, dual, proper part, intervals,
 * rank selection, relabelling (the face poset of the order complex is dev.morse.complex.Subdivision). Most results are built from
 * covers only, since those constructions know their covers.
 */
public final class PosetOperations {
    private PosetOperations() {
    }

    /**
     * The product {@code P × Q}: pairs ordered componentwise; {@code (x,y)} is covered exactly by
     * {@code (x',y)} with {@code x ⋖ x'} and by {@code (x,y')} with {@code y ⋖ y'}. Labels are
     * {@code (x,y)}. By Walker 1988 the order complex of the product is homeomorphic to the product
     * of the order complexes.
     *
     * @throws IllegalArgumentException if two pairs would get the same label
     */
    public static Poset product(Poset p, Poset q) {
        PosetBuilder b = new PosetBuilder();
        int m = q.size();
        for (int x = 0; x < p.size(); x++) {
            for (int y = 0; y < m; y++) {
                b.element("(" + p.label(x) + "," + q.label(y) + ")");
            }
        }
        if (b.size() != p.size() * m) {
            throw new IllegalArgumentException("the labels of the factors make pair labels collide");
        }
        Adjacency pBelow = p.lowerCovers();
        Adjacency qBelow = q.lowerCovers();
        for (int x = 0; x < p.size(); x++) {
            for (int y = 0; y < m; y++) {
                int pair = x * m + y;
                for (int i = pBelow.start(x); i < pBelow.end(x); i++) {
                    b.relate(pBelow.target(i) * m + y, pair, 0);
                }
                for (int i = qBelow.start(y); i < qBelow.end(y); i++) {
                    b.relate(x * m + qBelow.target(i), pair, 0);
                }
            }
        }
        return b.buildKnownAcyclic();
    }

    /**
     * The ordinal sum {@code P ⊕ Q}: both posets, with every element of {@code lower} below every
     * element of {@code upper}. The new covers join each maximal element of {@code lower} to each
     * minimal element of {@code upper}. Its order complex is the join of the two order complexes.
     *
     * @throws IllegalArgumentException if the two posets share a label (see {@link #relabel})
     */
    public static Poset ordinalSum(Poset lower, Poset upper) {
        PosetBuilder b = new PosetBuilder();
        addCopy(b, lower);
        int offset = b.size();
        addCopy(b, upper);
        if (b.size() != lower.size() + upper.size()) {
            throw new IllegalArgumentException("the two posets share a label");
        }
        for (int x = 0; x < lower.size(); x++) {
            if (lower.upperCovers().degree(x) != 0) {
                continue;
            }
            for (int y = 0; y < upper.size(); y++) {
                if (upper.lowerCovers().degree(y) == 0) {
                    b.relate(x, offset + y, 0);
                }
            }
        }
        return b.buildKnownAcyclic();
    }

    /**
     * The ordinal sum {@code lower ⊕ upper}, as {@link #ordinalSum}; if the two share a label,
     * every label of {@code lower} gets the prefix {@code a.} and every label of {@code upper} the
     * prefix {@code b.} first.
     */
    public static Poset ordinalSumKeepingLabelsApart(Poset lower, Poset upper) {
        for (int x = 0; x < lower.size(); x++) {
            if (upper.find(lower.label(x)).isPresent()) {
                return ordinalSum(relabel(lower, "a."), relabel(upper, "b."));
            }
        }
        return ordinalSum(lower, upper);
    }

    /** The dual poset: the same elements and labels with the order reversed. */
    public static Poset dual(Poset p) {
        PosetBuilder b = new PosetBuilder();
        for (int x = 0; x < p.size(); x++) {
            b.element(p.label(x));
        }
        Adjacency below = p.lowerCovers();
        for (int x = 0; x < p.size(); x++) {
            for (int i = below.start(x); i < below.end(x); i++) {
                b.relate(x, below.target(i), 0);
            }
        }
        return b.buildKnownAcyclic();
    }

    /**
     * The rank-selected subposet {@code P_S}: the elements whose rank lies in {@code ranks}, with
     * the order of P. The rank of an element is its height (minimal elements have rank 0), the
     * rank function when P is graded. Rank selection keeps Cohen–Macaulay posets Cohen–Macaulay
     * (Munkres 1984; Stanley, Enumerative Combinatorics I, §3.13, from memory); in B_n the
     * selection of S ⊆ {1..n-1} is a wedge of β_n(S) spheres of dimension |S| - 1, β_n(S) being
     * the number of permutations of {1..n} with descent set S (Stanley, EC I, Thm 3.13.1, from
     * memory).
     *
     * <p>Covers of P_S: each selected element is related to the selected elements first met going
     * down from it, and the builder reduces that to covers.
     */
    public static Poset rankSelection(Poset p, java.util.Set<Integer> ranks) {
        PosetBuilder b = new PosetBuilder();
        int[] id = new int[p.size()];
        for (int x = 0; x < p.size(); x++) {
            id[x] = ranks.contains(p.height(x)) ? b.element(p.label(x)) : -1;
        }
        Adjacency below = p.lowerCovers();
        int[] stamp = new int[p.size()];
        java.util.Arrays.fill(stamp, -1);
        int[] stack = new int[p.size()];
        for (int x = 0; x < p.size(); x++) {
            if (id[x] < 0) {
                continue;
            }
            int top = 0;
            stack[top++] = x;
            while (top > 0) {
                int z = stack[--top];
                for (int i = below.start(z); i < below.end(z); i++) {
                    int w = below.target(i);
                    if (stamp[w] == x) {
                        continue;
                    }
                    stamp[w] = x;
                    if (id[w] >= 0) {
                        b.relate(id[w], id[x], 0);
                    } else {
                        stack[top++] = w;
                    }
                }
            }
        }
        return b.buildKnownAcyclic();
    }

    /**
     * The element labelled {@code label}.
     *
     * @throws IllegalArgumentException if there is none
     */
    public static int element(Poset p, String label) {
        return p.find(label).orElseThrow(() -> new IllegalArgumentException("no element is labelled '" + label + "'"));
    }

    /** A copy of {@code p} with {@code prefix} put before every label. */
    public static Poset relabel(Poset p, String prefix) {
        PosetBuilder b = new PosetBuilder();
        for (int x = 0; x < p.size(); x++) {
            b.element(PosetBuilder.requireWritableLabel(prefix + p.label(x)));
        }
        copyCovers(b, p, 0);
        return b.buildKnownAcyclic();
    }

    /**
     * The proper part {@code P - {0̂, 1̂}} of a bounded poset: all elements but the unique minimal
     * and the unique maximal one. A one-element poset has an empty proper part.
     *
     * @throws IllegalArgumentException if {@code p} has no unique minimal or no unique maximal element
     */
    public static Poset properPart(Poset p) {
        int bottom = uniqueExtreme(p.lowerCovers(), "minimal");
        int top = uniqueExtreme(p.upperCovers(), "maximal");
        return without(p, bottom, top);
    }

    /**
     * The poset without its unique minimal element.
     *
     * @throws IllegalArgumentException if there is no unique minimal element
     */
    public static Poset withoutBottom(Poset p) {
        int bottom = uniqueExtreme(p.lowerCovers(), "minimal");
        return without(p, bottom, bottom);
    }

    /**
     * The poset without its unique maximal element.
     *
     * @throws IllegalArgumentException if there is no unique maximal element
     */
    public static Poset withoutTop(Poset p) {
        int top = uniqueExtreme(p.upperCovers(), "maximal");
        return without(p, top, top);
    }

    /** Removing a minimal or a maximal element leaves a convex set. */
    private static Poset without(Poset p, int extreme, int otherExtreme) {
        boolean[] keep = new boolean[p.size()];
        java.util.Arrays.fill(keep, true);
        keep[extreme] = false;
        keep[otherExtreme] = false;
        return convexSubposet(p, keep);
    }

    /**
     * The open interval {@code (x, y) = {z : x < z < y}}.
     *
     * @throws IllegalArgumentException unless {@code x < y}
     */
    public static Poset openInterval(Poset p, int x, int y) {
        boolean[] keep = closedIntervalMembers(p, x, y);
        keep[x] = false;
        keep[y] = false;
        return convexSubposet(p, keep);
    }

    /**
     * The closed interval {@code [x, y] = {z : x ≤ z ≤ y}}.
     *
     * @throws IllegalArgumentException unless {@code x ≤ y}
     */
    public static Poset closedInterval(Poset p, int x, int y) {
        return convexSubposet(p, closedIntervalMembers(p, x, y));
    }

    private static boolean[] closedIntervalMembers(Poset p, int x, int y) {
        boolean[] up = reach(p.upperCovers(), x, p.size());
        boolean[] down = reach(p.lowerCovers(), y, p.size());
        if (!up[y]) {
            throw new IllegalArgumentException(p.label(x) + " is not below " + p.label(y));
        }
        boolean[] keep = new boolean[p.size()];
        for (int z = 0; z < p.size(); z++) {
            keep[z] = up[z] && down[z];
        }
        return keep;
    }

    /** Elements reachable from {@code start} along {@code edges}, {@code start} included. */
    static boolean[] reach(Adjacency edges, int start, int n) {
        boolean[] seen = new boolean[n];
        int[] stack = new int[n];
        int top = 0;
        stack[top++] = start;
        seen[start] = true;
        while (top > 0) {
            int z = stack[--top];
            for (int i = edges.start(z); i < edges.end(z); i++) {
                int w = edges.target(i);
                if (!seen[w]) {
                    seen[w] = true;
                    stack[top++] = w;
                }
            }
        }
        return seen;
    }

    private static int uniqueExtreme(Adjacency covers, String kind) {
        int found = -1;
        for (int x = 0; x < covers.vertexCount(); x++) {
            if (covers.degree(x) == 0) {
                if (found >= 0) {
                    throw new IllegalArgumentException("the poset has more than one " + kind + " element");
                }
                found = x;
            }
        }
        if (found < 0) {
            throw new IllegalArgumentException("the poset is empty");
        }
        return found;
    }

    /**
     * The subposet on the kept elements, which must form a convex set (with any two comparable kept
     * elements, everything between them is kept): then its covers are exactly the covers of
     * {@code p} between kept elements.
     */
    private static Poset convexSubposet(Poset p, boolean[] keep) {
        PosetBuilder b = new PosetBuilder();
        int[] id = new int[p.size()];
        for (int x = 0; x < p.size(); x++) {
            id[x] = keep[x] ? b.element(p.label(x)) : -1;
        }
        Adjacency below = p.lowerCovers();
        for (int x = 0; x < p.size(); x++) {
            if (!keep[x]) {
                continue;
            }
            for (int i = below.start(x); i < below.end(x); i++) {
                int y = below.target(i);
                if (keep[y]) {
                    b.relate(id[y], id[x], 0);
                }
            }
        }
        return b.buildKnownAcyclic();
    }

    private static void addCopy(PosetBuilder b, Poset p) {
        int offset = b.size();
        for (int x = 0; x < p.size(); x++) {
            b.element(p.label(x));
        }
        if (b.size() == offset + p.size()) {
            copyCovers(b, p, offset);
        }
    }

    private static void copyCovers(PosetBuilder b, Poset p, int offset) {
        Adjacency below = p.lowerCovers();
        for (int x = 0; x < p.size(); x++) {
            for (int i = below.start(x); i < below.end(x); i++) {
                b.relate(offset + below.target(i), offset + x, 0);
            }
        }
    }
}
