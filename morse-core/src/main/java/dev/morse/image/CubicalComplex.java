package dev.morse.image;

import dev.morse.complex.Boundary;
import dev.morse.complex.CoboundaryCache;
import dev.morse.complex.ChainComplex;
import dev.morse.complex.ComplexKind;
import dev.morse.complex.GradedCells;

/**
 * The cubical complex of a set of pixels or voxels: the union of the closed unit cubes of its
 * positions, with one cell per elementary cube of that union (Kaczynski, Mischaikow and Mrozek,
 * Computational Homology, 2004, Ch. 2). Two foreground voxels that share only a corner are thus
 * connected (8-connectivity in the plane, 26 in space).
 *
 * <p>An elementary cube is a product of intervals, one per axis, each either a point {@code [c]}
 * or a unit interval {@code [c, c+1]}. Its <em>type</em> is the set of axes along which it has
 * unit intervals, and its dimension is the size of that set. The cubes of one type form a regular
 * grid, so each type keeps one bit per grid position saying whether the cube is present, with a
 * running count per 64-bit word: the index of a present cube among those of its type is then a
 * constant-time rank, and no cell ever needs a name or an object. Cells are numbered by dimension,
 * then by type, then by grid position.
 *
 * <p>The boundary is the cubical one of Kaczynski–Mischaikow–Mrozek: with unit intervals along
 * the axes {@code a_0 < a_1 < ... < a_(d-1)}, {@code ∂Q = Σ_j (-1)^j (Q_j^+ - Q_j^-)}, where
 * {@code Q_j^-} and {@code Q_j^+} replace the interval {@code [c, c+1]} on axis {@code a_j} by
 * {@code [c]} and {@code [c+1]}. It follows from {@code ∂[c, c+1] = [c+1] - [c]} and
 * {@code ∂(P × Q) = ∂P × Q + (-1)^(dim P) P × ∂Q}.
 *
 * <p>Memory: a cell of dimension d costs {@code 4 + 16 d} bytes of boundary (an offset and 2d
 * entries of target and coefficient), so 4, 20, 36 and 52 bytes in dimensions 0 to 3, and about
 * 28 bytes per cell on average for a solid block; the coboundary, once requested, costs as much
 * again. The presence bits add about 1.5 bits per grid position of every type, some
 * {@code 2^axes × 1.5} bits per position of the box, present or not.
 */
public final class CubicalComplex implements ChainComplex {
    /** The default bound on the number of cells: every cell id must be an int. */
    public static final long DEFAULT_CELL_LIMIT = Integer.MAX_VALUE - 8;

    private final int axes;
    private final int[] extents;
    private final int[][] gridSize;
    private final int[][] stride;
    private final long[][] present;
    private final int[][] rankBefore;
    private final int[] typeFirstCell;
    private final int[] typeOrder;
    private final GradedCells cells;
    private final Boundary boundary;
    private final CoboundaryCache coboundary;

    private CubicalComplex(VoxelSet voxels, long maxCells) {
        axes = voxels.axes();
        extents = voxels.sizes();
        int types = 1 << axes;
        gridSize = new int[types][axes];
        stride = new int[types][axes];
        present = new long[types][];
        for (int t = 0; t < types; t++) {
            long positions = 1;
            for (int a = 0; a < axes; a++) {
                gridSize[t][a] = spans(t, a) ? extents[a] : extents[a] + 1;
                stride[t][a] = (int) positions;
                positions *= gridSize[t][a];
            }
            if (positions > Integer.MAX_VALUE) {
                throw new IllegalStateException("a box of " + VoxelSet.describe(extents)
                        + " has more elementary cubes of one type than an int can number");
            }
            present[t] = new long[(int) ((positions + 63) >>> 6)];
        }
        markClosures(voxels);
        rankBefore = new int[types][];
        long[] typeCount = new long[types];
        for (int t = 0; t < types; t++) {
            long[] bits = present[t];
            int[] before = new int[bits.length + 1];
            for (int w = 0; w < bits.length; w++) {
                before[w + 1] = before[w] + Long.bitCount(bits[w]);
            }
            rankBefore[t] = before;
            typeCount[t] = before[bits.length];
        }
        typeOrder = typesByDimension(axes);
        typeFirstCell = new int[types];
        int[] perDimension = new int[axes + 1];
        long next = 0;
        long entries = 0;
        for (int t : typeOrder) {
            typeFirstCell[t] = (int) Math.min(next, Integer.MAX_VALUE);
            next += typeCount[t];
            int d = Integer.bitCount(t);
            entries += 2L * d * typeCount[t];
            if (next > maxCells) {
                throw new IllegalStateException("the cubical complex of " + voxels.count() + " foreground positions"
                        + " has more than the limit of " + maxCells + " cells");
            }
            perDimension[d] += (int) typeCount[t];
        }
        if (entries > DEFAULT_CELL_LIMIT) {
            throw new IllegalStateException("the cubical complex has " + next
                    + " cells and more boundary entries than one array holds");
        }
        cells = new GradedCells(perDimension);
        boundary = buildBoundary((int) next, (int) entries);
        coboundary = new CoboundaryCache(boundary);
    }

    /**
     * The cubical complex of {@code voxels}, with at most {@link #DEFAULT_CELL_LIMIT} cells.
     *
     * @throws IllegalStateException if it would have more cells or boundary entries than that
     */
    public static CubicalComplex of(VoxelSet voxels) {
        return of(voxels, DEFAULT_CELL_LIMIT);
    }

    /**
     * The cubical complex of {@code voxels}. The cells are counted before the boundary is built,
     * so a complex over the limit fails early.
     *
     * @throws IllegalStateException if it would have more than {@code maxCells} cells
     */
    public static CubicalComplex of(VoxelSet voxels, long maxCells) {
        if (maxCells < 0) {
            throw new IllegalArgumentException("the cell limit must not be negative");
        }
        return new CubicalComplex(voxels, Math.min(maxCells, DEFAULT_CELL_LIMIT));
    }

    private static boolean spans(int type, int axis) {
        return (type & (1 << axis)) != 0;
    }

    /** Types ordered by dimension, then by value. */
    private static int[] typesByDimension(int axes) {
        int types = 1 << axes;
        int[] order = new int[types];
        int k = 0;
        for (int d = 0; d <= axes; d++) {
            for (int t = 0; t < types; t++) {
                if (Integer.bitCount(t) == d) {
                    order[k++] = t;
                }
            }
        }
        return order;
    }

    /**
     * Marks every elementary cube in the closure of every foreground voxel: along an axis where the
     * cube is a point, both ends of the voxel's interval; along an axis where it is an interval, the
     * voxel's own. That is {@code 3^axes} cubes per voxel.
     */
    private void markClosures(VoxelSet voxels) {
        int types = 1 << axes;
        int[][] deltas = new int[types][];
        for (int t = 0; t < types; t++) {
            int free = axes - Integer.bitCount(t);
            int[] d = new int[1 << free];
            for (int subset = 0; subset < d.length; subset++) {
                int delta = 0;
                int bit = 0;
                for (int a = 0; a < axes; a++) {
                    if (!spans(t, a)) {
                        if ((subset & (1 << bit)) != 0) {
                            delta += stride[t][a];
                        }
                        bit++;
                    }
                }
                d[subset] = delta;
            }
            deltas[t] = d;
        }
        int[] c = new int[axes];
        for (int v = voxels.next(0); v >= 0; v = voxels.next(v + 1)) {
            int rest = v;
            for (int a = 0; a < axes; a++) {
                c[a] = rest % extents[a];
                rest /= extents[a];
            }
            for (int t = 0; t < types; t++) {
                int base = 0;
                for (int a = 0; a < axes; a++) {
                    base += c[a] * stride[t][a];
                }
                long[] bits = present[t];
                for (int delta : deltas[t]) {
                    int i = base + delta;
                    bits[i >>> 6] |= 1L << i;
                }
            }
        }
    }

    private int rank(int type, int index) {
        long word = present[type][index >>> 6];
        return rankBefore[type][index >>> 6] + Long.bitCount(word & ((1L << index) - 1));
    }

    private Boundary buildBoundary(int cellTotal, int entryTotal) {
        int[] offsets = new int[cellTotal + 1];
        int[] targets = new int[entryTotal];
        int[] coefficients = new int[entryTotal];
        int cell = 0;
        int entry = 0;
        int[] c = new int[axes];
        for (int t : typeOrder) {
            long[] bits = present[t];
            for (int w = 0; w < bits.length; w++) {
                long word = bits[w];
                while (word != 0) {
                    int index = (w << 6) + Long.numberOfTrailingZeros(word);
                    word &= word - 1;
                    decode(t, index, c);
                    int j = 0;
                    for (int a = 0; a < axes; a++) {
                        if (!spans(t, a)) {
                            continue;
                        }
                        int face = t & ~(1 << a);
                        int lower = 0;
                        for (int b = 0; b < axes; b++) {
                            lower += c[b] * stride[face][b];
                        }
                        int sign = (j & 1) == 0 ? 1 : -1;
                        targets[entry] = typeFirstCell[face] + rank(face, lower);
                        coefficients[entry++] = -sign;
                        targets[entry] = typeFirstCell[face] + rank(face, lower + stride[face][a]);
                        coefficients[entry++] = sign;
                        j++;
                    }
                    offsets[++cell] = entry;
                }
            }
        }
        return new Boundary(offsets, targets, coefficients);
    }

    /** The coordinates (lower corner) of the cube of {@code type} at grid {@code index}. */
    private void decode(int type, int index, int[] into) {
        int rest = index;
        for (int a = 0; a < axes; a++) {
            into[a] = rest % gridSize[type][a];
            rest /= gridSize[type][a];
        }
    }

    /** Number of axes of the box: 2 for an image, 3 for a volume. */
    public int axes() {
        return axes;
    }

    /**
     * The elementary cube of {@code cell}: for each axis its lower end and whether it spans a unit
     * interval there, as {@code [c_0, s_0, c_1, s_1, ...]} with {@code s} 1 for an interval and 0 for a point.
     */
    public int[] cube(int cell) {
        int d = cells.dimensionOf(cell);
        int type = -1;
        for (int t : typeOrder) {
            if (Integer.bitCount(t) == d && typeFirstCell[t] <= cell
                    && cell - typeFirstCell[t] < rankBefore[t][present[t].length]) {
                type = t;
            }
        }
        int index = select(type, cell - typeFirstCell[type]);
        int[] c = new int[axes];
        decode(type, index, c);
        int[] cube = new int[2 * axes];
        for (int a = 0; a < axes; a++) {
            cube[2 * a] = c[a];
            cube[2 * a + 1] = spans(type, a) ? 1 : 0;
        }
        return cube;
    }

    /** The grid index of the present cube of {@code type} with rank {@code r}. */
    private int select(int type, int r) {
        int[] before = rankBefore[type];
        int lo = 0;
        int hi = before.length - 2;
        while (lo < hi) {
            int mid = (lo + hi + 1) >>> 1;
            if (before[mid] <= r) {
                lo = mid;
            } else {
                hi = mid - 1;
            }
        }
        long word = present[type][lo];
        for (int skip = r - before[lo]; skip > 0; skip--) {
            word &= word - 1;
        }
        return (lo << 6) + Long.numberOfTrailingZeros(word);
    }

    @Override
    public ComplexKind kind() {
        return ComplexKind.CUBICAL;
    }

    @Override
    public GradedCells grading() {
        return cells;
    }

    @Override
    public Boundary boundary() {
        return boundary;
    }

    @Override
    public Boundary coboundary() {
        return coboundary.get();
    }

    /** The elementary cube as a product of intervals, like {@code [2,3]x[5]x[0,1]}; made on request. */
    @Override
    public String cellName(int cell) {
        int[] cube = cube(cell);
        StringBuilder name = new StringBuilder();
        for (int a = 0; a < axes; a++) {
            if (a > 0) {
                name.append('x');
            }
            int lower = cube[2 * a];
            name.append('[').append(lower);
            if (cube[2 * a + 1] == 1) {
                name.append(',').append(lower + 1);
            }
            name.append(']');
        }
        return name.toString();
    }
}
