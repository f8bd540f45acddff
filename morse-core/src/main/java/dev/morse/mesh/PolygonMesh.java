package dev.morse.mesh;

import dev.morse.io.InputException;
import dev.morse.poset.Poset;
import dev.morse.poset.PosetBuilder;
import it.unimi.dsi.fastutil.longs.Long2IntOpenHashMap;
import java.util.Arrays;

/**
 * A polygon mesh as read: a number of vertices and simple polygons, each a cyclic sequence of at
 * least three distinct vertices. As a regular CW complex its cells are the vertices, the edges
 * (pairs of vertices consecutive in some polygon) and the polygons, each polygon's closure a disc
 * whose boundary circle runs through its edges. Memory: 4 bytes per polygon corner plus 8 per
 * polygon. Immutable.
 */
public final class PolygonMesh {
    private final String source;
    private final int vertexCount;
    private final int firstIndex;
    private final int[] offsets;
    private final int[] corners;

    private PolygonMesh(String source, int vertexCount, int firstIndex, int[] offsets, int[] corners) {
        this.source = source;
        this.vertexCount = vertexCount;
        this.firstIndex = firstIndex;
        this.offsets = offsets;
        this.corners = corners;
    }

    /**
     * Checks and keeps the polygons.
     *
     * @param firstIndex the number the file gives its first vertex (1 for OBJ, 0 for OFF), used in labels
     * @param lines the line of each polygon, for error messages
     * @throws InputException for a polygon with fewer than three vertices or a repeated vertex
     */
    static PolygonMesh of(String source, int vertexCount, int firstIndex, int[] offsets, int[] corners, int[] lines) {
        for (int f = 0; f + 1 < offsets.length; f++) {
            int size = offsets[f + 1] - offsets[f];
            if (size < 3) {
                throw new InputException(source, lines[f], "a polygon needs at least 3 vertices, this one has " + size);
            }
            int[] sorted = Arrays.copyOfRange(corners, offsets[f], offsets[f + 1]);
            Arrays.sort(sorted);
            for (int i = 1; i < sorted.length; i++) {
                if (sorted[i] == sorted[i - 1]) {
                    throw new InputException(source, lines[f], "vertex " + (sorted[i] + firstIndex)
                            + " appears twice in this polygon; a polygon must be simple (its vertices distinct)");
                }
            }
        }
        return new PolygonMesh(source, vertexCount, firstIndex, offsets.clone(), corners.clone());
    }

    /** Number of vertices. */
    public int vertexCount() {
        return vertexCount;
    }

    /** Number of polygons. */
    public int polygonCount() {
        return offsets.length - 1;
    }

    /** The vertices of polygon {@code f} in order, 0-based. A copy. */
    public int[] polygon(int f) {
        return Arrays.copyOfRange(corners, offsets[f], offsets[f + 1]);
    }

    /**
     * The face poset: elements {@code v<i>} for the vertices (numbered as in the file), {@code v<i>-v<j>}
     * (i < j) for the edges, {@code f<k>} for the polygons (from 1, in file order), each edge above
     * its two ends and each polygon above its edges. Every vertex is a cell, used by a polygon or not.
     */
    public Poset facePoset() {
        PosetBuilder builder = new PosetBuilder();
        for (int v = 0; v < vertexCount; v++) {
            builder.element(vertexLabel(v));
        }
        Long2IntOpenHashMap edges = new Long2IntOpenHashMap();
        edges.defaultReturnValue(-1);
        for (int f = 0; f < polygonCount(); f++) {
            int from = offsets[f];
            int size = offsets[f + 1] - from;
            for (int i = 0; i < size; i++) {
                int a = corners[from + i];
                int b = corners[from + (i + 1) % size];
                long key = ((long) Math.min(a, b) << 32) | Math.max(a, b);
                if (edges.get(key) < 0) {
                    int id = builder.element(vertexLabel(Math.min(a, b)) + "-" + vertexLabel(Math.max(a, b)));
                    edges.put(key, id);
                    builder.relate(a, id, 0);
                    builder.relate(b, id, 0);
                }
            }
        }
        for (int f = 0; f < polygonCount(); f++) {
            int polygon = builder.element("f" + (f + 1));
            int from = offsets[f];
            int size = offsets[f + 1] - from;
            for (int i = 0; i < size; i++) {
                int a = corners[from + i];
                int b = corners[from + (i + 1) % size];
                builder.relate(edges.get(((long) Math.min(a, b) << 32) | Math.max(a, b)), polygon, 0);
            }
        }
        return builder.buildKnownAcyclic();
    }

    private String vertexLabel(int v) {
        return "v" + (v + firstIndex);
    }

    /** The file it was read from. */
    public String source() {
        return source;
    }
}
