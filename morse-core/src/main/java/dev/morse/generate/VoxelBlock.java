package dev.morse.generate;

import dev.morse.homology.HomologyGroup;
import dev.morse.poset.OrderCycleException;
import dev.morse.poset.Poset;
import dev.morse.poset.PosetBuilder;
import java.io.IOException;
import java.io.Writer;
import java.util.List;

/**
 * A solid {@code n × n × n} block of unit voxels with straight tunnels drilled through it along the
 * x axis and sealed single-voxel cavities inside, as the face poset of its cubical complex (a CW
 * poset). Its homology is known by construction: the block with {@code t} disjoint straight tunnels
 * is a handlebody of genus {@code t}, and each sealed cavity adds a 2-sphere, so
 * {@code H_0 = Z, H_1 = Z^t, H_2 = Z^c, H_3 = 0} (common practice: Alexander duality for the
 * complement in the 3-sphere; e.g. Hatcher, Algebraic Topology, 2002, §3.3).
 *
 * <p>Tunnels run along the x axis at {@code (y, z) = (2 + 3a, 2 + 3b)}; cavities sit at
 * {@code (2 + 3a, 2 + 3b, 2 + 3c)} in the layers above the last tunnel layer. Any two removed voxels
 * are thus at least two voxels apart, so no two holes share even a vertex and each cavity is sealed. A cell is named by its doubled
 * coordinates, {@code c<x>.<y>.<z>}, odd coordinates being the directions it spans.
 */
public final class VoxelBlock {
    private final int n;
    private final int tunnels;
    private final int cavities;
    private final boolean[] solid;

    private VoxelBlock(int n, int tunnels, int cavities) {
        this.n = n;
        this.tunnels = tunnels;
        this.cavities = cavities;
        this.solid = new boolean[n * n * n];
        java.util.Arrays.fill(solid, true);
        int slots = slots();
        for (int i = 0; i < tunnels; i++) {
            int y = 2 + 3 * (i % slots);
            int z = 2 + 3 * (i / slots);
            for (int x = 0; x < n; x++) {
                solid[index(x, y, z)] = false;
            }
        }
        // cavities fill the layers above the last tunnel layer, three voxels apart in every direction
        int firstLayer = tunnelLayers(tunnels, slots);
        for (int i = 0; i < cavities; i++) {
            int x = 2 + 3 * (i % slots);
            int y = 2 + 3 * ((i / slots) % slots);
            int z = 2 + 3 * (firstLayer + i / (slots * slots));
            solid[index(x, y, z)] = false;
        }
    }

    private static int tunnelLayers(int tunnels, int slots) {
        return slots == 0 ? 0 : (tunnels + slots - 1) / slots;
    }

    /** Tunnel or cavity positions per axis that fit with a margin of two voxels. */
    private int slots() {
        return Math.max(0, (n - 3) / 3);
    }

    /**
     * A block of side {@code n} with the given tunnels and cavities.
     *
     * @throws IllegalArgumentException if they do not fit with walls of at least one voxel between them
     */
    public static VoxelBlock of(int n, int tunnels, int cavities) {
        if (n < 1 || tunnels < 0 || cavities < 0) {
            throw new IllegalArgumentException("side must be positive, counts non-negative");
        }
        int slots = Math.max(0, (n - 3) / 3);
        long cavitySlots = (long) slots * slots * (slots - tunnelLayers(tunnels, slots));
        if (tunnels > (long) slots * slots || cavities > cavitySlots) {
            throw new IllegalArgumentException(tunnels + " tunnels and " + cavities + " cavities do not fit in a block of side " + n);
        }
        return new VoxelBlock(n, tunnels, cavities);
    }

    /** Side of the block in voxels. */
    public int side() {
        return n;
    }

    /** The homology known by construction, dimensions 0..3. */
    public List<HomologyGroup> expectedHomology() {
        return List.of(HomologyGroup.free(0, 1), HomologyGroup.free(1, tunnels), HomologyGroup.free(2, cavities),
                HomologyGroup.free(3, 0));
    }

    private int index(int x, int y, int z) {
        return (x * n + y) * n + z;
    }

    private boolean voxel(int x, int y, int z) {
        return x >= 0 && y >= 0 && z >= 0 && x < n && y < n && z < n && solid[index(x, y, z)];
    }

    /** Whether the cell at doubled coordinates lies in the closure of some solid voxel. */
    private boolean present(int x, int y, int z) {
        // the voxels containing a cell: for each even coordinate either neighbour, for each odd one the one it lies in
        int[] xs = choices(x);
        int[] ys = choices(y);
        int[] zs = choices(z);
        for (int a : xs) {
            for (int b : ys) {
                for (int c : zs) {
                    if (voxel(a, b, c)) {
                        return true;
                    }
                }
            }
        }
        return false;
    }

    private static int[] choices(int doubled) {
        return doubled % 2 == 1 ? new int[] {doubled / 2} : new int[] {doubled / 2 - 1, doubled / 2};
    }

    /** Counts the cells of the cubical complex, by dimension. */
    public long[] cellCounts() {
        long[] counts = new long[4];
        int side = 2 * n + 1;
        for (int x = 0; x < side; x++) {
            for (int y = 0; y < side; y++) {
                for (int z = 0; z < side; z++) {
                    if (present(x, y, z)) {
                        counts[(x & 1) + (y & 1) + (z & 1)]++;
                    }
                }
            }
        }
        return counts;
    }

    /**
     * Writes the face poset in the {@code morse-poset 1} format, covers only, cells in order of
     * increasing dimension, streaming.
     */
    public void write(Writer out) throws IOException {
        out.write("morse-poset 1\n# a " + n + "^3 voxel block with " + tunnels + " tunnels and " + cavities
                + " cavities: H = Z, Z^" + tunnels + ", Z^" + cavities + ", 0\n");
        StringBuilder line = new StringBuilder(160);
        forEachCell((x, y, z) -> {
            line.setLength(0);
            name(line, x, y, z);
            int dim = (x & 1) + (y & 1) + (z & 1);
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
        });
    }

    /** The face poset, built in memory. */
    public Poset toPoset() {
        PosetBuilder builder = new PosetBuilder();
        StringBuilder s = new StringBuilder();
        try {
            forEachCell((x, y, z) -> {
                int cell = builder.element(label(s, x, y, z));
                int[][] steps = {{1, 0, 0}, {0, 1, 0}, {0, 0, 1}};
                int[] at = {x, y, z};
                for (int axis = 0; axis < 3; axis++) {
                    if ((at[axis] & 1) == 1) {
                        int[] st = steps[axis];
                        builder.relate(builder.element(label(s, x - st[0], y - st[1], z - st[2])), cell, 0);
                        builder.relate(builder.element(label(s, x + st[0], y + st[1], z + st[2])), cell, 0);
                    }
                }
            });
            return builder.build();
        } catch (IOException | OrderCycleException e) {
            throw new IllegalStateException("face relations of a cubical complex are acyclic", e);
        }
    }

    private static String label(StringBuilder s, int x, int y, int z) {
        s.setLength(0);
        name(s, x, y, z);
        return s.toString();
    }

    private interface CellVisitor {
        void visit(int x, int y, int z) throws IOException;
    }

    private void forEachCell(CellVisitor visitor) throws IOException {
        int side = 2 * n + 1;
        for (int dim = 0; dim <= 3; dim++) {
            for (int x = 0; x < side; x++) {
                for (int y = 0; y < side; y++) {
                    for (int z = 0; z < side; z++) {
                        if ((x & 1) + (y & 1) + (z & 1) == dim && present(x, y, z)) {
                            visitor.visit(x, y, z);
                        }
                    }
                }
            }
        }
    }

    private static void name(StringBuilder s, int x, int y, int z) {
        s.append('c').append(x).append('.').append(y).append('.').append(z);
    }
}
