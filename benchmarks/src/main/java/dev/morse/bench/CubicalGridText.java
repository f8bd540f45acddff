package dev.morse.bench;

import java.io.IOException;
import java.io.Writer;

/**
 * Writes, in the {@code morse-poset 1} format, the face poset of the cubical complex of an
 * {@code n × n × n} block of unit cubes, listing covers only. A cell is named by its coordinates in the
 * doubled grid {@code 0..2n} (odd coordinates are the directions the cell spans), so the poset has
 * {@code (2n+1)^3} elements; it is a CW poset whose cellular complex is a 3-ball.
 *
 * <p>Benchmark input only: it stands for the face posets of voxel scans that users read.
 */
public final class CubicalGridText {
    private CubicalGridText() {
    }

    /** Number of elements for side {@code n}. */
    public static long elementCount(int n) {
        long side = 2L * n + 1;
        return side * side * side;
    }

    /** Writes the poset text for side {@code n}, cells in order of increasing dimension. */
    public static void write(int n, Writer out) throws IOException {
        int side = 2 * n + 1;
        out.write("morse-poset 1\n# face poset of a " + n + "^3 block of unit cubes\n");
        StringBuilder line = new StringBuilder(128);
        for (int dim = 0; dim <= 3; dim++) {
            for (int x = 0; x < side; x++) {
                for (int y = 0; y < side; y++) {
                    for (int z = 0; z < side; z++) {
                        if ((x & 1) + (y & 1) + (z & 1) != dim) {
                            continue;
                        }
                        line.setLength(0);
                        name(line, x, y, z);
                        if (dim > 0) {
                            line.append(':');
                            if ((x & 1) == 1) {
                                line.append(' ');
                                name(line, x - 1, y, z);
                                line.append(' ');
                                name(line, x + 1, y, z);
                            }
                            if ((y & 1) == 1) {
                                line.append(' ');
                                name(line, x, y - 1, z);
                                line.append(' ');
                                name(line, x, y + 1, z);
                            }
                            if ((z & 1) == 1) {
                                line.append(' ');
                                name(line, x, y, z - 1);
                                line.append(' ');
                                name(line, x, y, z + 1);
                            }
                        }
                        line.append('\n');
                        out.append(line);
                    }
                }
            }
        }
    }

    private static void name(StringBuilder s, int x, int y, int z) {
        s.append('c').append(x).append('.').append(y).append('.').append(z);
    }
}
