package dev.morse.spark;

import java.io.Serializable;
import java.util.ArrayList;
import java.util.List;

/**
 * One task of a distributed sweep: runs of intervals that share their lower end. Run {@code i} holds
 * the intervals {@code (lowers[i], y)} for the upper ends {@code y} at the indices
 * {@code from[i] .. to[i]-1} of {@code PosetWithBounds.uppers(lowers[i])}. A plain serialisable value.
 *
 * @param lowers the lower end of each run, an id of P̂
 * @param from the first index of each run among the upper ends of its lower end
 * @param to one past the last index of each run
 */
public record IntervalBlock(int[] lowers, int[] from, int[] to) implements Serializable {
    private static final long serialVersionUID = 1L;

    /** Validates. */
    public IntervalBlock {
        if (lowers.length != from.length || lowers.length != to.length) {
            throw new IllegalArgumentException("runs need a lower end, a start and an end each");
        }
    }

    /** How many intervals the block holds. */
    public long size() {
        long total = 0;
        for (int i = 0; i < lowers.length; i++) {
            total += to[i] - from[i];
        }
        return total;
    }

    /**
     * Cuts the intervals of P̂ into blocks of at most {@code blockSize} intervals, by lower end: the few
     * lower ends that own more intervals than that (0̂ owns n + 1; the bottom elements of a large poset
     * own most of the rest) are split into several blocks, and lower ends with few intervals are packed
     * together, so that every task has about the same number of intervals.
     *
     * @param upperCounts the number of upper ends of each lower end, by id of P̂
     * @throws IllegalArgumentException unless {@code blockSize} is positive
     */
    public static List<IntervalBlock> plan(int[] upperCounts, int blockSize) {
        if (blockSize < 1) {
            throw new IllegalArgumentException("a block needs room for at least one interval");
        }
        List<IntervalBlock> blocks = new ArrayList<>();
        Packing open = new Packing();
        for (int x = 0; x < upperCounts.length; x++) {
            int start = 0;
            while (start < upperCounts[x]) {
                int room = blockSize - open.size;
                int end = (int) Math.min(upperCounts[x], (long) start + room);
                open.add(x, start, end);
                start = end;
                if (open.size == blockSize) {
                    blocks.add(open.close());
                    open = new Packing();
                }
            }
        }
        if (open.size > 0) {
            blocks.add(open.close());
        }
        return blocks;
    }

    /**
     * A block size that gives each of {@code parallelism} task slots about four tasks, so that one slow
     * task does not hold up the others, and never less than {@code minimum} intervals per task, so that
     * the cost of a task stays small beside its work.
     */
    public static int blockSize(long intervals, int parallelism, int minimum) {
        long perTask = (intervals + 4L * parallelism - 1) / (4L * Math.max(1, parallelism));
        return (int) Math.max(minimum, Math.min(Integer.MAX_VALUE, perTask));
    }

    /** The runs of a block being filled. */
    private static final class Packing {
        private final List<int[]> runs = new ArrayList<>();
        private int size;

        void add(int lower, int start, int end) {
            runs.add(new int[] {lower, start, end});
            size += end - start;
        }

        IntervalBlock close() {
            int[] lowers = new int[runs.size()];
            int[] from = new int[runs.size()];
            int[] to = new int[runs.size()];
            for (int i = 0; i < runs.size(); i++) {
                lowers[i] = runs.get(i)[0];
                from[i] = runs.get(i)[1];
                to[i] = runs.get(i)[2];
            }
            return new IntervalBlock(lowers, from, to);
        }
    }
}
