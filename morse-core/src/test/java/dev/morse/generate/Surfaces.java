package dev.morse.generate;

import dev.morse.complex.Facets;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/** Combinatorial checks on 2-dimensional simplicial complexes given by their triangles. */
final class Surfaces {
    private Surfaces() {
    }

    /** How many triangles contain each edge, keyed by the edge's vertex pair (smaller first). */
    static Map<Long, Integer> edgeMultiplicities(Facets triangles) {
        Map<Long, Integer> count = new HashMap<>();
        for (int f = 0; f < triangles.faceCount(); f++) {
            int[] t = triangles.face(f);
            for (int i = 0; i < 3; i++) {
                count.merge(edge(t[i], t[(i + 1) % 3]), 1, Integer::sum);
            }
        }
        return count;
    }

    /** Whether the link of every vertex (the opposite edges of its triangles) is one circle. */
    static boolean vertexLinksAreCircles(Facets triangles) {
        for (int v = 0; v < triangles.vertexCount(); v++) {
            Map<Integer, List<Integer>> link = new HashMap<>();
            for (int f = 0; f < triangles.faceCount(); f++) {
                int[] t = triangles.face(f);
                for (int i = 0; i < 3; i++) {
                    if (t[i] == v) {
                        int a = t[(i + 1) % 3];
                        int b = t[(i + 2) % 3];
                        link.computeIfAbsent(a, k -> new ArrayList<>()).add(b);
                        link.computeIfAbsent(b, k -> new ArrayList<>()).add(a);
                    }
                }
            }
            if (link.isEmpty() || link.values().stream().anyMatch(n -> n.size() != 2)) {
                return false;
            }
            int start = link.keySet().iterator().next();
            java.util.Set<Integer> seen = new java.util.HashSet<>();
            ArrayDeque<Integer> stack = new ArrayDeque<>(List.of(start));
            while (!stack.isEmpty()) {
                int x = stack.pop();
                if (seen.add(x)) {
                    stack.addAll(link.get(x));
                }
            }
            if (seen.size() != link.size()) {
                return false;
            }
        }
        return true;
    }

    /**
     * Whether the triangles of a connected closed surface can be oriented so that every edge is
     * traversed once in each direction: orient one triangle and propagate across edges.
     */
    static boolean isOrientable(Facets triangles) {
        int n = triangles.faceCount();
        int[][] oriented = new int[n][];
        Map<Long, List<Integer>> trianglesOfEdge = new HashMap<>();
        for (int f = 0; f < n; f++) {
            int[] t = triangles.face(f);
            for (int i = 0; i < 3; i++) {
                trianglesOfEdge.computeIfAbsent(edge(t[i], t[(i + 1) % 3]), k -> new ArrayList<>()).add(f);
            }
        }
        oriented[0] = triangles.face(0);
        ArrayDeque<Integer> queue = new ArrayDeque<>(List.of(0));
        while (!queue.isEmpty()) {
            int f = queue.poll();
            int[] t = oriented[f];
            for (int i = 0; i < 3; i++) {
                int a = t[i];
                int b = t[(i + 1) % 3];
                for (int g : trianglesOfEdge.get(edge(a, b))) {
                    if (g == f) {
                        continue;
                    }
                    if (oriented[g] == null) {
                        // the neighbour must run along the shared edge as b -> a
                        int c = third(triangles.face(g), a, b);
                        oriented[g] = new int[] {b, a, c};
                        queue.add(g);
                    } else if (runs(oriented[g], a, b)) {
                        return false;
                    }
                }
            }
        }
        for (int[] t : oriented) {
            if (t == null) {
                throw new IllegalArgumentException("the triangles do not form a connected surface");
            }
        }
        return true;
    }

    private static boolean runs(int[] t, int a, int b) {
        for (int i = 0; i < 3; i++) {
            if (t[i] == a && t[(i + 1) % 3] == b) {
                return true;
            }
        }
        return false;
    }

    private static int third(int[] t, int a, int b) {
        for (int x : t) {
            if (x != a && x != b) {
                return x;
            }
        }
        throw new IllegalArgumentException("not a triangle on the edge");
    }

    private static long edge(int a, int b) {
        return ((long) Math.min(a, b) << 32) | Math.max(a, b);
    }
}
