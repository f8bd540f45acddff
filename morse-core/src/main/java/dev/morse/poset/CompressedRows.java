package dev.morse.poset;

import java.util.Arrays;

/**
 * Rows of ints stored one after another in one array, compressed sparse row form: the entries of
 * row {@code r} are {@code target(start(r)) .. target(end(r) - 1)}. Hasse diagrams, down-sets,
 * boundaries and sparse matrices share this layout and these accessors; each subclass adds what
 * its entries mean.
 *
 * <p>Memory: 4 bytes per row plus 4 bytes per entry.
 */
public abstract class CompressedRows {
    /** Where each row starts; {@code offsets[r + 1]} is where it ends. Length rows + 1. */
    protected final int[] offsets;
    /** The entries of every row, one after another. */
    protected final int[] targets;

    /**
     * Wraps arrays without copying; callers hand over ownership.
     *
     * @param offsets length rows + 1, non-decreasing, starting at 0 and ending at {@code targets.length}
     * @throws IllegalArgumentException when the offsets do not describe the targets
     */
    protected CompressedRows(int[] offsets, int[] targets) {
        if (offsets.length == 0 || offsets[0] != 0 || offsets[offsets.length - 1] != targets.length) {
            throw new IllegalArgumentException("inconsistent compressed rows: the offsets do not describe the entries");
        }
        this.offsets = offsets;
        this.targets = targets;
    }

    /** Number of rows. */
    public final int rowCount() {
        return offsets.length - 1;
    }

    /** Number of entries over all rows. */
    public final int entryCount() {
        return targets.length;
    }

    /** First entry index of row {@code r}. */
    public final int start(int r) {
        return offsets[r];
    }

    /** One past the last entry index of row {@code r}. */
    public final int end(int r) {
        return offsets[r + 1];
    }

    /** Number of entries of row {@code r}. */
    public final int size(int r) {
        return offsets[r + 1] - offsets[r];
    }

    /** The entry at index {@code i}. */
    public final int target(int i) {
        return targets[i];
    }

    /**
     * Lays out the transpose over {@code columns} rows and returns its offsets: row t of the
     * transpose lists the rows holding entry t. {@code place} is told, for every entry, its index,
     * its row and its slot in the transpose; rows are visited in ascending order, so every
     * transposed row comes out sorted.
     */
    protected final int[] transpose(int columns, EntryPlacement place) {
        int[] tOffsets = new int[columns + 1];
        for (int t : targets) {
            tOffsets[t + 1]++;
        }
        for (int v = 0; v < columns; v++) {
            tOffsets[v + 1] += tOffsets[v];
        }
        int[] fill = Arrays.copyOf(tOffsets, columns);
        for (int r = 0; r < rowCount(); r++) {
            for (int i = offsets[r]; i < offsets[r + 1]; i++) {
                place.place(i, r, fill[targets[i]]++);
            }
        }
        return tOffsets;
    }

    /** Where an entry goes in a transpose; see {@link #transpose}. */
    @FunctionalInterface
    protected interface EntryPlacement {
        /** Entry {@code entry} of row {@code row} goes to {@code slot} of the transpose. */
        void place(int entry, int row, int slot);
    }
}
