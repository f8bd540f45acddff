package dev.morse.image;

import java.util.Arrays;

/**
 * A set of pixels (two axes) or voxels (three axes) in a box, as one bit per position. Position
 * {@code (x, y, z)} has index {@code x + X (y + Y z)}: x varies fastest. Immutable once built.
 *
 * <p>Memory: one bit per position of the box, foreground or not.
 */
public final class VoxelSet {
    /** The most positions a box may have: indices are ints. */
    public static final long MAX_POSITIONS = Integer.MAX_VALUE;

    private final int[] sizes;
    private final long[] bits;
    private final long count;

    private VoxelSet(int[] sizes, long[] bits) {
        this.sizes = sizes;
        this.bits = bits;
        long c = 0;
        for (long word : bits) {
            c += Long.bitCount(word);
        }
        this.count = c;
    }

    /**
     * A builder for a box of the given sizes, one per axis (one to three axes, each at least 1).
     *
     * @throws IllegalArgumentException for a bad shape or a box of more than {@link #MAX_POSITIONS} positions
     */
    public static Builder builder(int... sizes) {
        return new Builder(sizes);
    }

    /** Number of axes: 2 for an image, 3 for a volume. */
    public int axes() {
        return sizes.length;
    }

    /** The box's extent along {@code axis}. */
    public int size(int axis) {
        return sizes[axis];
    }

    /** The extents of the box, one per axis. A copy. */
    public int[] sizes() {
        return sizes.clone();
    }

    /** Number of positions in the box. */
    public int positions() {
        return (int) positions(sizes);
    }

    /**
     * The product of {@code sizes}: the number of positions of a box of these extents, or some
     * number above {@link #MAX_POSITIONS} when it is larger. It stops there, so that three large
     * extents cannot wrap a long round to a small product.
     */
    static long positions(int[] sizes) {
        long p = 1;
        for (int s : sizes) {
            p *= s; // at most MAX_POSITIONS times an int: far inside a long
            if (p > MAX_POSITIONS) {
                return p;
            }
        }
        return p;
    }

    /** Number of positions in the set. */
    public long count() {
        return count;
    }

    /** Whether the position with this index is in the set. */
    public boolean contains(int index) {
        return (bits[index >>> 6] & (1L << index)) != 0;
    }

    /** Whether the position with these coordinates, one per axis, is in the set; false outside the box. */
    public boolean contains(int... coordinates) {
        int index = 0;
        int stride = 1;
        for (int a = 0; a < sizes.length; a++) {
            int c = coordinates[a];
            if (c < 0 || c >= sizes[a]) {
                return false;
            }
            index += c * stride;
            stride *= sizes[a];
        }
        return contains(index);
    }

    /** The first position in the set at or after {@code from}, or -1. */
    public int next(int from) {
        int positions = positions();
        if (from >= positions) {
            return -1;
        }
        int w = from >>> 6;
        long word = bits[w] & (-1L << from);
        while (true) {
            if (word != 0) {
                int index = (w << 6) + Long.numberOfTrailingZeros(word);
                return index < positions ? index : -1;
            }
            if (++w == bits.length) {
                return -1;
            }
            word = bits[w];
        }
    }

    @Override
    public boolean equals(Object other) {
        return other instanceof VoxelSet v && Arrays.equals(sizes, v.sizes) && Arrays.equals(bits, v.bits);
    }

    @Override
    public int hashCode() {
        return 31 * Arrays.hashCode(sizes) + Arrays.hashCode(bits);
    }

    /** Sets positions one at a time; not thread-safe. */
    public static final class Builder {
        private final int[] sizes;
        private long[] bits;

        private Builder(int[] sizes) {
            if (sizes.length < 1 || sizes.length > 3) {
                throw new IllegalArgumentException("a box has one to three axes, not " + sizes.length);
            }
            long positions = 1;
            for (int s : sizes) {
                if (s < 1) {
                    throw new IllegalArgumentException("every extent must be at least 1, got " + s);
                }
                positions *= s;
                if (positions > MAX_POSITIONS) {
                    throw new IllegalArgumentException("a box of " + describe(sizes) + " has more than "
                            + MAX_POSITIONS + " positions");
                }
            }
            this.sizes = sizes.clone();
            this.bits = new long[(int) ((positions + 63) >>> 6)];
        }

        /** Puts the position with this index into the set. */
        public Builder add(int index) {
            bits[index >>> 6] |= 1L << index;
            return this;
        }

        /** Puts the position with these coordinates, one per axis, into the set. */
        public Builder add(int... coordinates) {
            int index = 0;
            int stride = 1;
            for (int a = 0; a < sizes.length; a++) {
                if (coordinates[a] < 0 || coordinates[a] >= sizes[a]) {
                    throw new IndexOutOfBoundsException("coordinate " + coordinates[a] + " outside 0.." + (sizes[a] - 1));
                }
                index += coordinates[a] * stride;
                stride *= sizes[a];
            }
            return add(index);
        }

        /** The set; the builder must not be used afterwards. */
        public VoxelSet build() {
            VoxelSet set = new VoxelSet(sizes, bits);
            bits = null;
            return set;
        }
    }

    /** Like {@code 3 x 4 x 5}. */
    static String describe(int[] sizes) {
        StringBuilder s = new StringBuilder();
        for (int a = 0; a < sizes.length; a++) {
            s.append(a > 0 ? " x " : "").append(sizes[a]);
        }
        return s.toString();
    }
}
