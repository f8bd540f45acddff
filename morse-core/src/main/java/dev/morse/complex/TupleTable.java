package dev.morse.complex;

import it.unimi.dsi.fastutil.ints.IntArrays;
import java.util.Arrays;

/**
 * A set of int tuples of one fixed width, stored flat, with an open-addressing hash index over
 * primitive arrays: no object per tuple. Tuples are numbered in the order first added until
 * {@link #sortLexicographically()} renumbers them. Memory: {@code 4 * width} bytes per tuple plus
 * about 8 bytes per tuple of index. Not thread-safe.
 */
final class TupleTable {
    /** At most this many tuples, so that the index (at most 2^30 slots) stays at most half full. */
    static final int MAX_TUPLES = 1 << 29;

    private final int width;
    private int[] data;
    private int count;
    private int[] slots;

    TupleTable(int width, int expected) {
        this.width = width;
        this.data = new int[Math.max(1, expected) * width];
        this.slots = newSlots(expected);
    }

    int width() {
        return width;
    }

    int size() {
        return count;
    }

    /** The flat tuple array, exactly {@code size() * width()} long. */
    int[] toFlatArray() {
        return Arrays.copyOf(data, count * width);
    }

    /** The backing array, without copying: tuple i is at {@code i * width()}; longer than needed. */
    int[] backingArray() {
        return data;
    }

    /** Adds {@code source[from .. from+width)} unless present; returns its number. */
    int add(int[] source, int from) {
        int slot = slotOf(source, from);
        if (slots[slot] >= 0) {
            return slots[slot];
        }
        if (count >= MAX_TUPLES || (long) (count + 1) * width > CellLimits.MAX_ARRAY) {
            throw new IllegalStateException("more than " + Math.min(MAX_TUPLES, CellLimits.MAX_ARRAY / width)
                    + " faces of dimension " + (width - 1));
        }
        if ((count + 1) * width > data.length) {
            data = Arrays.copyOf(data, (int) Math.min(CellLimits.MAX_ARRAY, 2L * data.length + width));
        }
        System.arraycopy(source, from, data, count * width, width);
        slots[slot] = count;
        count++;
        if (2L * count > slots.length) {
            rehash();
        }
        return count - 1;
    }

    /** The number of {@code source[from .. from+width)}, or -1. */
    int find(int[] source, int from) {
        return slots[slotOf(source, from)];
    }

    /** The slot holding {@code source[from .. from+width)}, or the empty slot (-1) where it belongs. */
    private int slotOf(int[] source, int from) {
        int mask = slots.length - 1;
        int slot = hash(source, from) & mask;
        while (slots[slot] >= 0 && !equalsAt(slots[slot], source, from)) {
            slot = (slot + 1) & mask;
        }
        return slot;
    }

    /** Renumbers the tuples in lexicographic order. */
    void sortLexicographically() {
        int[] order = new int[count];
        for (int i = 0; i < count; i++) {
            order[i] = i;
        }
        IntArrays.quickSort(order, (a, b) -> {
            for (int t = 0; t < width; t++) {
                int c = Integer.compare(data[a * width + t], data[b * width + t]);
                if (c != 0) {
                    return c;
                }
            }
            return 0;
        });
        int[] sorted = new int[count * width];
        for (int i = 0; i < count; i++) {
            System.arraycopy(data, order[i] * width, sorted, i * width, width);
        }
        data = sorted;
        rehash();
    }

    private boolean equalsAt(int tuple, int[] source, int from) {
        int at = tuple * width;
        for (int t = 0; t < width; t++) {
            if (data[at + t] != source[from + t]) {
                return false;
            }
        }
        return true;
    }

    private int hash(int[] source, int from) {
        int h = 0x9E3779B9;
        for (int t = 0; t < width; t++) {
            h = (h ^ source[from + t]) * 0x01000193;
            h ^= h >>> 15;
        }
        return h ^ (h >>> 16);
    }

    private void rehash() {
        slots = newSlots(count);
        int mask = slots.length - 1;
        for (int i = 0; i < count; i++) {
            int slot = hash(data, i * width) & mask;
            while (slots[slot] >= 0) {
                slot = (slot + 1) & mask;
            }
            slots[slot] = i;
        }
    }

    /** A power of two at least twice {@code expected} (load at most one half), filled with -1. */
    private static int[] newSlots(int expected) {
        long wanted = Math.min(1L << 30, Math.max(16L, 2L * expected + 2));
        int size = Integer.highestOneBit((int) wanted);
        if (size < wanted) {
            size <<= 1;
        }
        int[] slots = new int[size];
        Arrays.fill(slots, -1);
        return slots;
    }
}
