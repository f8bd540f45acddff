package dev.morse.generate;

import dev.morse.homology.HomologyGroup;
import dev.morse.image.VoxelSet;
import dev.morse.poset.Poset;
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
    /** The largest side whose cube of voxels, {@code side^3}, still fits an int index: 1290^3 = 2,146,689,000. */
    public static final int MAX_SIDE = 1290;

    private final int n;
    private final int tunnels;
    private final int cavities;
    private final boolean[] solid;
    private final VoxelSet voxels;

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
        VoxelSet.Builder set = VoxelSet.builder(n, n, n);
        for (int x = 0; x < n; x++) {
            for (int y = 0; y < n; y++) {
                for (int z = 0; z < n; z++) {
                    if (solid[index(x, y, z)]) {
                        set.add(x, y, z);
                    }
                }
            }
        }
        this.voxels = set.build();
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
     * @throws IllegalArgumentException if the side is not in 1..{@link #MAX_SIDE}, or the holes do not fit with
     *     walls of at least one voxel between them
     */
    public static VoxelBlock of(int n, int tunnels, int cavities) {
        Sizes.inRange("side", n, 1, MAX_SIDE);
        if (tunnels < 0 || cavities < 0) {
            throw new IllegalArgumentException("side must be positive, counts non-negative");
        }
        int slots = Math.max(0, (n - 3) / 3);
        long cavitySlots = (long) slots * slots * (slots - tunnelLayers(tunnels, slots));
        if (tunnels > (long) slots * slots || cavities > cavitySlots) {
            throw new IllegalArgumentException(tunnels + " tunnels and " + cavities + " cavities do not fit in a block of side " + n);
        }
        return new VoxelBlock(n, tunnels, cavities);
    }

    /** The solid voxels, at coordinates {@code (x, y, z)}. */
    public VoxelSet voxels() {
        return voxels;
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
        CubicalFacePoset.write(voxels, out, "a " + n + "^3 voxel block with " + tunnels + " tunnels and " + cavities
                + " cavities: H = Z, Z^" + tunnels + ", Z^" + cavities + ", 0");
    }

    /** The face poset, built in memory. */
    public Poset toPoset() {
        return CubicalFacePoset.toPoset(voxels);
    }
}
