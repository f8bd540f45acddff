package dev.morse.cw;

import it.unimi.dsi.fastutil.longs.Long2ObjectOpenHashMap;
import java.util.Arrays;

/**
 * Lower sets already proven to have the homology of a sphere, remembered by their exact local
 * boundary lists, so that the next lower set with the very same lists (cells numbered alike, each
 * with the same faces in the same order: the cubes of a voxel block, the faces of one dimension of
 * a simplex or a cube, whose elements come in a regular order) needs no second proof. Two lower
 * sets with equal lists are the same complex up to renaming, so they have the same homology; the
 * lists are compared in full, never trusted to their hash, so a lower set that merely looks alike
 * is tested on its own. One instance per thread; it keeps at most {@value #MAX_INTS} ints.
 */
final class KnownSpheres {
    private static final int MAX_INTS = 1 << 22;

    private final Long2ObjectOpenHashMap<int[][]> byHash = new Long2ObjectOpenHashMap<>();
    private int kept;

    /** A hash of the lists: cell count, sphere dimension, offsets and faces. */
    static long hash(int size, int sphere, int[] faceStart, int[] faces) {
        long h = 0x9E3779B97F4A7C15L * (size + 31L * sphere + 1);
        for (int c = 0; c <= size; c++) {
            h = (h ^ faceStart[c]) * 0x100000001B3L;
        }
        int e = faceStart[size];
        for (int i = 0; i < e; i++) {
            h = (h ^ faces[i]) * 0x100000001B3L;
        }
        return h ^ (h >>> 29);
    }

    /** Whether these exact lists were proven a homology sphere of dimension {@code sphere} before. */
    boolean contains(long hash, int size, int sphere, int[] faceStart, int[] faces) {
        int[][] known = byHash.get(hash);
        if (known == null || known[0][0] != size || known[0][1] != sphere) {
            return false;
        }
        int e = faceStart[size];
        return known[2].length == e && Arrays.equals(known[1], 0, size + 1, faceStart, 0, size + 1)
                && Arrays.equals(known[2], 0, e, faces, 0, e);
    }

    /** Remembers lists just proven a homology sphere, while there is room and the hash is free. */
    void add(long hash, int size, int sphere, int[] faceStart, int[] faces) {
        int e = faceStart[size];
        if (kept + size + e > MAX_INTS || byHash.containsKey(hash)) {
            return;
        }
        byHash.put(hash, new int[][] {{size, sphere}, Arrays.copyOf(faceStart, size + 1), Arrays.copyOf(faces, e)});
        kept += size + e;
    }
}
