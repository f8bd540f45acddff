package dev.morse.complex;

import java.util.Arrays;
import java.util.List;

/**
 * The listed faces of a simplicial complex, as read: vertex labels, and each face as a run of
 * vertex ids in a flat array. Immutable. Memory: 4 bytes per listed vertex occurrence plus 4 per face.
 */
public final class Facets {
    private final String[] vertexLabels;
    private final int[] offsets;
    private final int[] vertices;

    /**
     * @param vertexLabels label of each vertex id
     * @param offsets length faces + 1; face f is {@code vertices[offsets[f] .. offsets[f+1])}
     * @param vertices vertex ids; no id repeated within a face
     */
    public Facets(String[] vertexLabels, int[] offsets, int[] vertices) {
        if (offsets.length == 0 || offsets[0] != 0 || offsets[offsets.length - 1] != vertices.length) {
            throw new IllegalArgumentException("offsets do not describe the vertex array");
        }
        for (int f = 0; f + 1 < offsets.length; f++) {
            if (offsets[f + 1] <= offsets[f]) {
                throw new IllegalArgumentException("face " + f + " is empty");
            }
            int[] sorted = Arrays.copyOfRange(vertices, offsets[f], offsets[f + 1]);
            Arrays.sort(sorted);
            for (int i = 0; i < sorted.length; i++) {
                if (sorted[i] < 0 || sorted[i] >= vertexLabels.length || (i > 0 && sorted[i] == sorted[i - 1])) {
                    throw new IllegalArgumentException("face " + f + " has a bad or repeated vertex");
                }
            }
        }
        this.vertexLabels = vertexLabels.clone();
        this.offsets = offsets.clone();
        this.vertices = vertices.clone();
    }

    /** Builds from faces given as lists of labels; vertex ids follow first appearance. */
    public static Facets ofLabels(List<List<String>> faces) {
        java.util.LinkedHashMap<String, Integer> ids = new java.util.LinkedHashMap<>();
        int[] offsets = new int[faces.size() + 1];
        int total = 0;
        for (List<String> face : faces) {
            total += face.size();
        }
        int[] vertices = new int[total];
        int k = 0;
        for (int f = 0; f < faces.size(); f++) {
            for (String v : faces.get(f)) {
                Integer id = ids.get(v);
                if (id == null) {
                    id = ids.size();
                    ids.put(v, id);
                }
                vertices[k++] = id;
            }
            offsets[f + 1] = k;
        }
        return new Facets(ids.keySet().toArray(new String[0]), offsets, vertices);
    }

    /** Number of vertices. */
    public int vertexCount() {
        return vertexLabels.length;
    }

    /** The label of vertex {@code v}. */
    public String vertexLabel(int v) {
        return vertexLabels[v];
    }

    /** Number of listed faces. */
    public int faceCount() {
        return offsets.length - 1;
    }

    /** The vertex ids of listed face {@code f}, in the order read. A copy. */
    public int[] face(int f) {
        return Arrays.copyOfRange(vertices, offsets[f], offsets[f + 1]);
    }

    /** Number of vertices of listed face {@code f}. */
    public int faceSize(int f) {
        return offsets[f + 1] - offsets[f];
    }
}
