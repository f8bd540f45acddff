package dev.morse.poset;

import java.util.Arrays;

/** The generating relations contain a directed cycle, so they do not define a partial order. */
public final class OrderCycleException extends Exception {
    private static final long serialVersionUID = 1L;

    private final int[] cycle;
    private final int tag;

    OrderCycleException(int[] cycle, int tag) {
        super("the relations contain a cycle of " + cycle.length + " elements");
        this.cycle = cycle;
        this.tag = tag;
    }

    /**
     * Elements {@code c[0] < c[1] < ... < c[k-1] < c[0]} as the relations state them.
     */
    public int[] cycle() {
        return Arrays.copyOf(cycle, cycle.length);
    }

    /** The tag given with one relation of the cycle (readers pass the line number). */
    public int tag() {
        return tag;
    }
}
