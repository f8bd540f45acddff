package dev.morse.implicit;

import it.unimi.dsi.fastutil.ints.IntArrayList;
import java.util.Arrays;

/**
 * A set of chains of one length, each given an index in order of insertion: open addressing over a
 * flat pool of ints. Memory: 4 bytes per element of each chain plus 8 bytes of table per chain
 * (the table stays at most half full).
 */
final class ChainTable {
    private static final int EMPTY = -1;

    private final int width;
    private final IntArrayList pool = new IntArrayList();
    private int[] slots = new int[16];
    private int size;

    ChainTable(int width) {
        this.width = width;
        Arrays.fill(slots, EMPTY);
    }

    /** Number of chains held. */
    int size() {
        return size;
    }

    /** The index of {@code chain[0..width)}, or -1. */
    int find(int[] chain) {
        int mask = slots.length - 1;
        for (int s = hash(chain, 0) & mask; ; s = (s + 1) & mask) {
            int index = slots[s];
            if (index == EMPTY) {
                return -1;
            }
            if (matches(index, chain)) {
                return index;
            }
        }
    }

    /** Adds {@code chain[0..width)} if absent; returns its index either way. */
    int add(int[] chain) {
        int found = find(chain);
        if (found >= 0) {
            return found;
        }
        if (2 * (size + 1) > slots.length) {
            grow();
        }
        pool.addElements(pool.size(), chain, 0, width);
        insert(size);
        return size++;
    }

    /** Copies chain {@code index} into {@code out}. */
    void copy(int index, int[] out) {
        pool.getElements(index * width, out, 0, width);
    }

    private void insert(int index) {
        int mask = slots.length - 1;
        int s = hash(pool.elements(), index * width) & mask;
        while (slots[s] != EMPTY) {
            s = (s + 1) & mask;
        }
        slots[s] = index;
    }

    private void grow() {
        if (slots.length >= 1 << 30) {
            throw new IllegalStateException("more chains than one table holds");
        }
        slots = new int[slots.length * 2];
        Arrays.fill(slots, EMPTY);
        for (int i = 0; i < size; i++) {
            insert(i);
        }
    }

    private boolean matches(int index, int[] chain) {
        int base = index * width;
        int[] data = pool.elements();
        for (int t = 0; t < width; t++) {
            if (data[base + t] != chain[t]) {
                return false;
            }
        }
        return true;
    }

    /** Hash of the chain {@code data[from..from + width)}. */
    private int hash(int[] data, int from) {
        long h = 0x9E3779B97F4A7C15L;
        for (int t = 0; t < width; t++) {
            h = (h ^ data[from + t]) * 0xBF58476D1CE4E5B9L;
            h ^= h >>> 31;
        }
        return (int) (h ^ (h >>> 32));
    }
}
