package dev.morse.generate;

import dev.morse.poset.PosetOperations;

import dev.morse.poset.Poset;
import dev.morse.poset.PosetBuilder;
import it.unimi.dsi.fastutil.objects.Object2IntOpenHashMap;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * The partition lattice {@code Π_n}: set partitions of {@code {1..n}} ordered by refinement (finer
 * below coarser), so a partition is covered by the partitions made by merging two of its blocks.
 * Labels list the blocks by least element, separated by {@code |}, like {@code 13|2|4}; for
 * {@code n ≥ 10} the elements of a block are separated by dots ({@code 1.10|2}). There are Bell
 * number many elements; the proper part is a wedge of {@code (n-1)!} spheres {@code S^(n-3)}
 * (Björner 1980).
 */
public final class PartitionLattice {
    /** Largest n accepted (Bell(12) = 4213597 elements). */
    public static final int MAX_N = 12;

    private PartitionLattice() {
    }

    /** All set partitions of {@code {1..n}}, {@code n ≥ 1}. */
    public static Poset lattice(int n) {
        Sizes.inRange("n", n, 1, MAX_N);
        List<int[]> partitions = new ArrayList<>();
        growthStrings(new int[n], 0, 0, partitions);
        return byRefinement(partitions);
    }

    /** The proper part: partitions other than the finest and the coarsest; for {@code n ≥ 2}. */
    public static Poset properPart(int n) {
        if (n < 2) {
            throw new IllegalArgumentException("the proper part needs n ≥ 2, got " + n);
        }
        return PosetOperations.properPart(lattice(n));
    }

    /**
     * The given partitions (growth strings), in the order given and labelled by {@link #label},
     * each below those among them made by merging two of its blocks: the covers of the partition
     * lattice, and of the noncrossing partition lattice when given only the noncrossing partitions.
     */
    static Poset byRefinement(List<int[]> partitions) {
        PosetBuilder b = new PosetBuilder();
        Object2IntOpenHashMap<String> ids = new Object2IntOpenHashMap<>();
        ids.defaultReturnValue(-1);
        for (int[] blockOf : partitions) {
            ids.put(Arrays.toString(blockOf), b.element(label(blockOf)));
        }
        for (int[] blockOf : partitions) {
            int id = ids.getInt(Arrays.toString(blockOf));
            int blocks = blockCount(blockOf);
            for (int s = 0; s < blocks; s++) {
                for (int t = s + 1; t < blocks; t++) {
                    int upper = ids.getInt(Arrays.toString(merge(blockOf, s, t)));
                    if (upper >= 0) {
                        b.relate(id, upper, 0);
                    }
                }
            }
        }
        return b.buildKnownAcyclic();
    }

    /**
     * All restricted growth strings: {@code blockOf[i]} is the block of element {@code i+1}, blocks
     * numbered in order of their least elements, so each partition appears exactly once.
     */
    static void growthStrings(int[] blockOf, int position, int blocksSoFar, List<int[]> out) {
        if (position == blockOf.length) {
            out.add(blockOf.clone());
            return;
        }
        for (int block = 0; block <= blocksSoFar; block++) {
            blockOf[position] = block;
            growthStrings(blockOf, position + 1, Math.max(blocksSoFar, block + 1), out);
        }
    }

    static int blockCount(int[] blockOf) {
        int max = -1;
        for (int block : blockOf) {
            max = Math.max(max, block);
        }
        return max + 1;
    }

    /** Merges block {@code t} into block {@code s < t} and renumbers to a growth string again. */
    static int[] merge(int[] blockOf, int s, int t) {
        int[] merged = new int[blockOf.length];
        for (int i = 0; i < blockOf.length; i++) {
            int block = blockOf[i] == t ? s : blockOf[i];
            merged[i] = block > t ? block - 1 : block;
        }
        return merged;
    }

    static String label(int[] blockOf) {
        int n = blockOf.length;
        StringBuilder s = new StringBuilder();
        for (int block = 0; block < blockCount(blockOf); block++) {
            if (block > 0) {
                s.append('|');
            }
            boolean first = true;
            for (int i = 0; i < n; i++) {
                if (blockOf[i] == block) {
                    if (!first && n >= 10) {
                        s.append('.');
                    }
                    s.append(i + 1);
                    first = false;
                }
            }
        }
        return s.toString();
    }
}
