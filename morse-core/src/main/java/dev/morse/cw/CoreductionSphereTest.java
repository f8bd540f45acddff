package dev.morse.cw;

import java.util.Arrays;

/**
 * A sufficient test that a small chain complex with unit incidences has the homology of the
 * sphere {@code S^k}, {@code k >= 2}: coreduction (Mrozek and Batko, "Coreduction homology
 * algorithm", Discrete Comput. Geom. 41, 2009) pairs cells into an acyclic matching, and when
 * exactly one vertex and one cell of dimension {@code k} stay critical, the Morse complex is
 * {@code Z} in dimensions 0 and {@code k} with zero boundary (the two dimensions are not adjacent),
 * so the homology is that of {@code S^k} (Forman, "Morse theory for cell complexes", Adv. Math.
 * 134, 1998; over Z for any complex with unit matched incidences: Kozlov, "Combinatorial
 * Algebraic Topology", 2008, Thm. 11.24, from memory). Any other outcome answers nothing: the
 * caller then computes the homology in full.
 *
 * <p>Cells are given by dimension with boundary and coboundary lists in CSR form; all incidences
 * are units, so any single remaining face can be matched. Time linear in cells plus incidences;
 * scratch arrays grow to the largest complex seen and are reused.
 */
final class CoreductionSphereTest {
    private int[] facesLeft = new int[0];
    private boolean[] removed = new boolean[0];
    private int[] queue = new int[0];
    private int[] order = new int[0];
    private int[] levelStart = new int[0];

    /**
     * Whether coreduction leaves exactly one critical vertex and one critical cell of dimension
     * {@code sphere}, which proves the homology is that of {@code S^sphere}.
     *
     * @param size number of cells {@code 0..size-1}
     * @param dimension the dimension of each cell, all in {@code 0..sphere}
     * @param faceStart CSR offsets of the boundary, {@code size + 1} entries
     * @param faces the boundary faces of each cell
     * @param cofaceStart CSR offsets of the coboundary
     * @param cofaces the cells having each cell as a face
     */
    boolean perfectSphere(int size, int[] dimension, int[] faceStart, int[] faces, int[] cofaceStart, int[] cofaces,
            int sphere) {
        grow(size, faceStart[size], sphere);
        // cells by dimension, so that the first cell left is always one of lowest dimension
        Arrays.fill(levelStart, 0, sphere + 2, 0);
        for (int c = 0; c < size; c++) {
            levelStart[dimension[c] + 1]++;
        }
        for (int d = 0; d <= sphere; d++) {
            levelStart[d + 1] += levelStart[d];
        }
        for (int c = 0; c < size; c++) {
            order[levelStart[dimension[c]]++] = c;
            facesLeft[c] = faceStart[c + 1] - faceStart[c];
            removed[c] = false;
        }
        int criticalVertices = 0;
        int criticalTop = 0;
        for (int k = 0; k < size; k++) {
            int next = order[k];
            if (removed[next]) {
                continue;
            }
            int d = dimension[next];
            if (d == 0 ? ++criticalVertices > 1 : d != sphere || ++criticalTop > 1) {
                return false;
            }
            int tail = remove(next, cofaceStart, cofaces, 0);
            for (int head = 0; head < tail; head++) {
                int s = queue[head];
                if (removed[s] || facesLeft[s] != 1) {
                    continue;
                }
                int face = -1;
                for (int i = faceStart[s]; i < faceStart[s + 1] && face < 0; i++) {
                    if (!removed[faces[i]]) {
                        face = faces[i];
                    }
                }
                removed[s] = true;
                tail = remove(face, cofaceStart, cofaces, tail);
                removed[s] = false;
                tail = remove(s, cofaceStart, cofaces, tail);
            }
        }
        return criticalVertices == 1 && criticalTop == 1;
    }

    /** Removes {@code c} and queues its cofaces still present; returns the new queue tail. */
    private int remove(int c, int[] cofaceStart, int[] cofaces, int tail) {
        removed[c] = true;
        for (int i = cofaceStart[c]; i < cofaceStart[c + 1]; i++) {
            int t = cofaces[i];
            if (!removed[t]) {
                facesLeft[t]--;
                queue[tail++] = t;
            }
        }
        return tail;
    }

    private void grow(int size, int incidences, int sphere) {
        if (facesLeft.length < size) {
            int length = Math.max(size, 2 * facesLeft.length);
            facesLeft = new int[length];
            removed = new boolean[length];
            order = new int[length];
        }
        // every cell is queued at most once per face it loses
        if (queue.length < incidences) {
            queue = new int[Math.max(incidences, 2 * queue.length)];
        }
        if (levelStart.length < sphere + 2) {
            levelStart = new int[sphere + 2];
        }
    }
}
