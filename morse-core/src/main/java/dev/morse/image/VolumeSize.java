package dev.morse.image;

import java.util.Arrays;

/**
 * The extents of a raw volume, as given with {@code --dims}: two numbers for an image, three for a
 * volume, each at least 1.
 *
 * @param extents voxels along x, y (and z)
 */
public record VolumeSize(int[] extents) {
    /** Validates and copies. */
    public VolumeSize {
        if (extents.length < 2 || extents.length > 3) {
            throw new IllegalArgumentException("give two or three sizes, like 64,64,32");
        }
        extents = extents.clone();
        for (int e : extents) {
            if (e < 1) {
                throw new IllegalArgumentException("every size must be at least 1, not " + e);
            }
        }
        if (VoxelSet.positions(extents) > VoxelSet.MAX_POSITIONS) {
            throw new IllegalArgumentException("a volume of " + VoxelSet.describe(extents) + " has more than "
                    + VoxelSet.MAX_POSITIONS + " voxels");
        }
    }

    /**
     * Parses {@code X,Y} or {@code X,Y,Z}.
     *
     * @throws IllegalArgumentException with a message fit for users
     */
    public static VolumeSize parse(String text) {
        String[] parts = text.strip().split("\\s*[,x]\\s*", -1);
        int[] extents = new int[parts.length];
        for (int i = 0; i < parts.length; i++) {
            try {
                extents[i] = Integer.parseInt(parts[i]);
            } catch (NumberFormatException e) {
                throw new IllegalArgumentException("sizes must be whole numbers like 64,64,32, not '" + text + "'");
            }
        }
        return new VolumeSize(extents);
    }

    /** A copy. */
    @Override
    public int[] extents() {
        return extents.clone();
    }

    /** The number of voxels. */
    public int voxels() {
        return (int) VoxelSet.positions(extents);
    }

    @Override
    public boolean equals(Object other) {
        return other instanceof VolumeSize v && Arrays.equals(extents, v.extents);
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(extents);
    }

    /** Like {@code 64,64,32}. */
    @Override
    public String toString() {
        StringBuilder s = new StringBuilder();
        for (int i = 0; i < extents.length; i++) {
            s.append(i > 0 ? "," : "").append(extents[i]);
        }
        return s.toString();
    }
}
