package dev.morse.generate;

import dev.morse.image.VoxelSet;
import dev.morse.poset.OrderCycleException;
import dev.morse.poset.Poset;
import dev.morse.poset.PosetBuilder;
import java.io.IOException;
import java.io.Writer;

/**
 * The face poset of the cubical complex of a set of pixels or voxels (the union of their closed
 * unit cubes), a CW poset: one element per elementary cube, each covering the 2d cubes of its
 * boundary. A cube is named by its doubled coordinates, {@code c<x>.<y>.<z>} (one number per
 * axis), odd coordinates being the directions it spans. Cells are listed by increasing dimension,
 * then by coordinates, the first axis varying slowest.
 */
public final class CubicalFacePoset {
    private CubicalFacePoset() {
    }

    /**
     * Writes the face poset in the {@code morse-poset 1} format, covers only, streaming: nothing but
     * one line is held. {@code comments} are written after the header, each as a {@code #} line.
     */
    public static void write(VoxelSet voxels, Writer out, String... comments) throws IOException {
        out.write("morse-poset 1\n");
        for (String comment : comments) {
            out.write("# " + comment + "\n");
        }
        StringBuilder line = new StringBuilder(160);
        int axes = voxels.axes();
        forEachCell(voxels, at -> {
            line.setLength(0);
            name(line, at);
            boolean first = true;
            for (int a = 0; a < axes; a++) {
                if ((at[a] & 1) == 1) {
                    line.append(first ? ":" : "");
                    first = false;
                    at[a]--;
                    line.append(' ');
                    name(line, at);
                    at[a] += 2;
                    line.append(' ');
                    name(line, at);
                    at[a]--;
                }
            }
            line.append('\n');
            out.append(line);
        });
    }

    /** The face poset, built in memory. */
    public static Poset toPoset(VoxelSet voxels) {
        PosetBuilder builder = new PosetBuilder();
        StringBuilder s = new StringBuilder();
        int axes = voxels.axes();
        try {
            forEachCell(voxels, at -> {
                int cell = builder.element(label(s, at));
                for (int a = 0; a < axes; a++) {
                    if ((at[a] & 1) == 1) {
                        at[a]--;
                        builder.relate(builder.element(label(s, at)), cell, 0);
                        at[a] += 2;
                        builder.relate(builder.element(label(s, at)), cell, 0);
                        at[a]--;
                    }
                }
            });
            return builder.build();
        } catch (IOException | OrderCycleException e) {
            throw new IllegalStateException("face relations of a cubical complex are acyclic", e);
        }
    }

    private static String label(StringBuilder s, int[] at) {
        s.setLength(0);
        name(s, at);
        return s.toString();
    }

    private static void name(StringBuilder s, int[] at) {
        s.append('c');
        for (int a = 0; a < at.length; a++) {
            if (a > 0) {
                s.append('.');
            }
            s.append(at[a]);
        }
    }

    /** Receives the doubled coordinates of one cell; may change them if it restores them. */
    private interface CellVisitor {
        void visit(int[] at) throws IOException;
    }

    private static void forEachCell(VoxelSet voxels, CellVisitor visitor) throws IOException {
        int axes = voxels.axes();
        int[] side = new int[axes];
        for (int a = 0; a < axes; a++) {
            side[a] = 2 * voxels.size(a) + 1;
        }
        int[] at = new int[axes];
        int[] voxel = new int[axes];
        for (int dim = 0; dim <= axes; dim++) {
            java.util.Arrays.fill(at, 0);
            while (true) {
                int spanning = 0;
                for (int c : at) {
                    spanning += c & 1;
                }
                if (spanning == dim && present(voxels, at, voxel, 0)) {
                    visitor.visit(at);
                }
                int a = axes - 1;
                while (a >= 0 && ++at[a] == side[a]) {
                    at[a] = 0;
                    a--;
                }
                if (a < 0) {
                    break;
                }
            }
        }
    }

    /**
     * Whether some voxel containing the cell is in the set: along an odd (spanned) coordinate the
     * voxel it lies in, along an even one either neighbour.
     */
    private static boolean present(VoxelSet voxels, int[] at, int[] voxel, int axis) {
        if (axis == at.length) {
            return voxels.contains(voxel);
        }
        int c = at[axis];
        if ((c & 1) == 1) {
            voxel[axis] = c / 2;
            return present(voxels, at, voxel, axis + 1);
        }
        voxel[axis] = c / 2 - 1;
        if (present(voxels, at, voxel, axis + 1)) {
            return true;
        }
        voxel[axis] = c / 2;
        return present(voxels, at, voxel, axis + 1);
    }
}
