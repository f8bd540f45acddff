package dev.morse.generate;

import dev.morse.image.VoxelSet;
import java.util.SplittableRandom;

/**
 * A random set of pixels or voxels in a box: each position is in the set with probability
 * {@code density}, independently (site percolation, common practice). The same seed gives the
 * same set.
 */
public final class RandomVoxels {
    private RandomVoxels() {
    }

    /**
     * A random set in a box of the given extents (two or three axes).
     *
     * @throws IllegalArgumentException for a bad box or a density outside [0, 1]
     */
    public static VoxelSet of(int[] extents, double density, long seed) {
        if (!(density >= 0 && density <= 1)) {
            throw new IllegalArgumentException("the density must be in [0, 1], got " + density);
        }
        VoxelSet.Builder builder = VoxelSet.builder(extents);
        long positions = 1;
        for (int e : extents) {
            positions *= e;
        }
        SplittableRandom random = new SplittableRandom(seed);
        for (int i = 0; i < positions; i++) {
            if (random.nextDouble() < density) {
                builder.add(i);
            }
        }
        return builder.build();
    }
}
