package dev.morse.homology;

import java.util.Arrays;

/**
 * Lines of a matrix (rows or columns) kept in buckets by their number of entries, so that a pivot
 * search can visit the sparsest lines first. Insert, remove and move are O(1); finding the next
 * non-empty bucket is a word-parallel scan of a bitmap. A bucket is a doubly linked list threaded through
 * primitive arrays.
 *
 * <p>Memory: 12 bytes per line plus a little over 4 bytes per possible count.
 */
final class CountBuckets {
    private static final int ABSENT = -1;

    private final int[] head;
    private final int[] next;
    private final int[] previous;
    private final int[] countOf;
    /** Bit k set when bucket k is non-empty. */
    private final long[] occupied;
    private int size;

    /**
     * @param lines number of lines, identified by {@code 0 .. lines - 1}
     * @param maxCount the largest count a line may have
     */
    CountBuckets(int lines, int maxCount) {
        head = new int[maxCount + 1];
        Arrays.fill(head, ABSENT);
        next = new int[lines];
        previous = new int[lines];
        countOf = new int[lines];
        Arrays.fill(countOf, ABSENT);
        occupied = new long[(maxCount >> 6) + 1];
    }

    /** Whether {@code line} is in some bucket. */
    boolean contains(int line) {
        return countOf[line] != ABSENT;
    }

    /** Number of lines held. */
    int size() {
        return size;
    }

    /** Puts {@code line}, which must be absent, in bucket {@code count}. */
    void add(int line, int count) {
        int first = head[count];
        next[line] = first;
        previous[line] = ABSENT;
        if (first != ABSENT) {
            previous[first] = line;
        }
        head[count] = line;
        countOf[line] = count;
        occupied[count >> 6] |= 1L << count;
        size++;
    }

    /** Takes {@code line}, which must be present, out of its bucket. */
    void remove(int line) {
        int count = countOf[line];
        int before = previous[line];
        int after = next[line];
        if (before == ABSENT) {
            head[count] = after;
            if (after == ABSENT) {
                occupied[count >> 6] &= ~(1L << count);
            }
        } else {
            next[before] = after;
        }
        if (after != ABSENT) {
            previous[after] = before;
        }
        countOf[line] = ABSENT;
        size--;
    }

    /** Moves a present {@code line} to bucket {@code count}. */
    void move(int line, int count) {
        if (countOf[line] != count) {
            remove(line);
            add(line, count);
        }
    }

    /** The smallest non-empty bucket at or above {@code from}, or -1. */
    int nextCount(int from) {
        if (from >= head.length) {
            return -1;
        }
        int word = from >> 6;
        long bits = occupied[word] & (-1L << from);
        while (bits == 0) {
            if (++word == occupied.length) {
                return -1;
            }
            bits = occupied[word];
        }
        return (word << 6) + Long.numberOfTrailingZeros(bits);
    }

    /** The first line of bucket {@code count}, or -1 (also beyond the largest count). */
    int first(int count) {
        return count < head.length ? head[count] : ABSENT;
    }

    /** The line after {@code line} in its bucket, or -1. */
    int after(int line) {
        return next[line];
    }
}
