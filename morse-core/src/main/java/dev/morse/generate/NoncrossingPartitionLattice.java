package dev.morse.generate;

import dev.morse.poset.PosetOperations;

import dev.morse.poset.Poset;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * The lattice {@code NC_n} of noncrossing partitions of {@code {1..n}} ordered by refinement: a
 * partition is noncrossing when no {@code a < b < c < d} have a, c in one block and b, d in
 * another. There are Catalan(n) of them (Kreweras, "Sur les partitions non croisées d'un cycle",
 * 1972). It is graded by {@code n} minus the number of blocks, so its covers are the merges of two
 * blocks that leave the partition noncrossing. Labels are those of {@link PartitionLattice}, like
 * {@code 14|23}. Its Möbius function is {@code μ(NC_n) = (-1)^(n-1) Catalan(n-1)} (Kreweras 1972),
 * and it is EL-shellable (Björner and Edelman, from memory), so the proper part is a wedge of
 * {@code Catalan(n-1)} spheres {@code S^(n-3)}.
 */
public final class NoncrossingPartitionLattice {
    /** Largest n accepted (Catalan(14) = 2674440 elements). */
    public static final int MAX_N = 14;

    private NoncrossingPartitionLattice() {
    }

    /** All noncrossing partitions of {@code {1..n}}, {@code n ≥ 1}. */
    public static Poset lattice(int n) {
        Sizes.inRange("n", n, 1, MAX_N);
        List<int[]> all = new ArrayList<>();
        PartitionLattice.growthStrings(new int[n], 0, 0, all);
        List<int[]> partitions = new ArrayList<>();
        for (int[] blockOf : all) {
            if (isNoncrossing(blockOf)) {
                partitions.add(blockOf);
            }
        }
        return PartitionLattice.byRefinement(partitions);
    }

    /** The proper part: noncrossing partitions other than the finest and the coarsest; {@code n ≥ 2}. */
    public static Poset properPart(int n) {
        if (n < 2) {
            throw new IllegalArgumentException("the proper part needs n ≥ 2, got " + n);
        }
        return PosetOperations.properPart(lattice(n));
    }

    /**
     * Whether no two blocks cross. Blocks numbered by least element cross exactly when some
     * {@code a < b < c < d} read blocks {@code s, t, s, t} with {@code s ≠ t}; scanning left to
     * right with a stack of open blocks finds that in one pass: a block may reappear only when it
     * is the innermost block still open.
     */
    static boolean isNoncrossing(int[] blockOf) {
        int n = blockOf.length;
        int[] last = new int[n];
        Arrays.fill(last, -1);
        for (int i = 0; i < n; i++) {
            last[blockOf[i]] = i;
        }
        int[] stack = new int[n];
        int top = 0;
        boolean[] open = new boolean[n];
        for (int i = 0; i < n; i++) {
            int block = blockOf[i];
            if (open[block]) {
                while (stack[top - 1] != block) {
                    int inner = stack[--top];
                    if (last[inner] > i) {
                        return false; // inner is still to reappear after this element of an outer block
                    }
                    open[inner] = false;
                }
            } else {
                open[block] = true;
                stack[top++] = block;
            }
        }
        return true;
    }
}
