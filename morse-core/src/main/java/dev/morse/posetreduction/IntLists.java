package dev.morse.posetreduction;

import java.util.Arrays;

/**
 * One growable, unordered list of ints per vertex, all kept in one shared array: each list owns a
 * slot of some capacity, and a full list moves to a slot of twice the size at the end. Removing a
 * value swaps the last one into its place. Not thread-safe.
 *
 * <p>Memory: 12 bytes per list plus about 8 bytes per value held (slots are at most twice as long
 * as their lists, and moved lists leave their old slots behind).
 */
final class IntLists {
    private final int[] start;
    private final int[] size;
    private final int[] capacity;
    private int[] pool;
    private int used;

    /** Empty lists with room reserved for {@code expectedTotal} values in all. */
    IntLists(int lists, int expectedTotal) {
        start = new int[lists];
        size = new int[lists];
        capacity = new int[lists];
        pool = new int[Math.max(16, expectedTotal)];
    }

    /** Gives list {@code list} exactly room for {@code room} values, for the initial fill. */
    void reserve(int list, int room) {
        ensurePool(room);
        start[list] = used;
        capacity[list] = room;
        used += room;
    }

    int size(int list) {
        return size[list];
    }

    int get(int list, int i) {
        return pool[start[list] + i];
    }

    void add(int list, int value) {
        if (size[list] == capacity[list]) {
            int room = Math.max(4, 2 * capacity[list]);
            ensurePool(room);
            System.arraycopy(pool, start[list], pool, used, size[list]);
            start[list] = used;
            capacity[list] = room;
            used += room;
        }
        pool[start[list] + size[list]++] = value;
    }

    /** Removes one occurrence of {@code value}; returns whether there was one. */
    boolean remove(int list, int value) {
        int s = start[list];
        int n = size[list];
        for (int i = 0; i < n; i++) {
            if (pool[s + i] == value) {
                pool[s + i] = pool[s + n - 1];
                size[list] = n - 1;
                return true;
            }
        }
        return false;
    }

    /** A copy of the list. */
    int[] toArray(int list) {
        return Arrays.copyOfRange(pool, start[list], start[list] + size[list]);
    }

    void clear(int list) {
        size[list] = 0;
    }

    private void ensurePool(int more) {
        if ((long) used + more > pool.length) {
            long grown = Math.max((long) used + more, 2L * pool.length);
            if (grown > Integer.MAX_VALUE - 8) {
                throw new IllegalStateException("too many covers to hold");
            }
            pool = Arrays.copyOf(pool, (int) grown);
        }
    }
}
