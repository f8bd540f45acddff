package dev.morse.io;

import dev.morse.parallel.Workers;
import dev.morse.poset.ElementLabels;
import java.util.Arrays;
import java.util.concurrent.atomic.AtomicInteger;

/**
 * Joins the label tables of stretches of one file parsed apart into one numbering, the numbering
 * one reader going through the whole file would give: ids in order of first appearance.
 *
 * <p>A label's first appearance is the first (region, local id) pair that names it, since regions
 * follow the file and local ids follow each region; the pairs are numbered globally in that
 * order. They are grouped by hash into partitions, one worker each, that find for every pair the
 * first pair with the same bytes in a table of {@link LabelSlots}; one sequential pass in file
 * order then numbers the first appearances, and every region translates its relations on its own
 * worker. Only the sequential pass touches every label, and it only counts.
 */
final class RegionMerge {
    private final ElementLabels labels;
    private final int[] lowers;
    private final int[] uppers;

    private RegionMerge(ElementLabels labels, int[] lowers, int[] uppers) {
        this.labels = labels;
        this.lowers = lowers;
        this.uppers = uppers;
    }

    ElementLabels labels() {
        return labels;
    }

    int[] lowers() {
        return lowers;
    }

    int[] uppers() {
        return uppers;
    }

    int relations() {
        return lowers.length;
    }

    static RegionMerge of(PosetFileParser[] regions) {
        int count = regions.length;
        int workers = Workers.threads();
        // label l of region r has the global index offsets[r] + l among all regions' labels
        int[] offsets = new int[count + 1];
        for (int r = 0; r < count; r++) {
            long next = (long) offsets[r] + regions[r].labelCount();
            if (next >= LabelSlots.ID_MASK) {
                throw new IllegalStateException("more than 2^31 labels in all");
            }
            offsets[r + 1] = (int) next;
        }
        int partitions = Integer.highestOneBit(Math.max(1, workers) * 2 - 1) << 1;
        int partitionShift = 64 - Integer.numberOfTrailingZeros(partitions);
        // per region and local label: its partition, then (after the partitions) the global index of its first appearance
        byte[][] partitionOf = new byte[count][];
        int[][] first = new int[count][];
        forEachRegion(count, workers, r -> {
            PosetFileParser region = regions[r];
            int n = region.labelCount();
            byte[] arena = region.arena();
            byte[] part = new byte[n];
            for (int l = 0; l < n; l++) {
                int s = region.labelStart(l);
                int e = region.labelEnd(l);
                part[l] = (byte) (LabelSlots.mix(LabelSlots.word(arena, s, e), LabelSlots.key(arena, s, e)) >>> partitionShift);
            }
            partitionOf[r] = part;
            first[r] = new int[n];
        });
        long perPartition = (long) offsets[count] / partitions + 16;
        forEachRegion(partitions, workers, p -> new PartitionPass(regions, offsets, partitionOf, first, perPartition).run(p));
        // number first appearances in file order, and place their bytes
        int[][] ids = new int[count][];
        int labelCount = 0;
        long bytes = 0;
        for (int r = 0; r < count; r++) {
            PosetFileParser region = regions[r];
            ids[r] = new int[region.labelCount()];
            partitionOf[r] = null;
            for (int l = 0; l < region.labelCount(); l++) {
                if (first[r][l] == offsets[r] + l) {
                    ids[r][l] = labelCount++;
                    bytes += region.labelEnd(l) - region.labelStart(l);
                }
            }
        }
        if (bytes > Integer.MAX_VALUE - 16) {
            throw new IllegalStateException("labels longer than 2 GiB in all");
        }
        int[] starts = new int[labelCount + 1];
        int[] relationStart = new int[count + 1];
        int at = 0;
        for (int r = 0; r < count; r++) {
            PosetFileParser region = regions[r];
            for (int l = 0; l < region.labelCount(); l++) {
                if (first[r][l] == offsets[r] + l) {
                    starts[ids[r][l]] = at;
                    at += region.labelEnd(l) - region.labelStart(l);
                }
            }
            relationStart[r + 1] = relationStart[r] + region.relationCount();
        }
        starts[labelCount] = at;
        byte[] arena = new byte[at];
        int[] lowers = new int[relationStart[count]];
        int[] uppers = new int[relationStart[count]];
        forEachRegion(count, workers, r -> {
            PosetFileParser region = regions[r];
            int[] local = ids[r];
            int[] firstOf = first[r];
            for (int l = 0; l < region.labelCount(); l++) {
                int f = firstOf[l];
                if (f == offsets[r] + l) {
                    int s = region.labelStart(l);
                    System.arraycopy(region.arena(), s, arena, starts[local[l]], region.labelEnd(l) - s);
                } else {
                    // an earlier first appearance, in an earlier region: numbered in the sequential pass, never written here
                    int r0 = regionOf(offsets, f);
                    local[l] = ids[r0][f - offsets[r0]];
                }
            }
            int[] lo = region.lowers();
            int[] up = region.uppers();
            int base = relationStart[r];
            for (int i = 0; i < region.relationCount(); i++) {
                lowers[base + i] = local[lo[i]];
                uppers[base + i] = local[up[i]];
            }
            // other regions still read ids[r]; this region's bytes, relations and first appearances are done
            region.release();
            first[r] = null;
        });
        return new RegionMerge(ElementLabels.ofAsciiArena(arena, starts, labelCount), lowers, uppers);
    }

    /** The region that holds the label of global index {@code g}. */
    private static int regionOf(int[] offsets, int g) {
        int r = 0;
        while (offsets[r + 1] <= g) {
            r++;
        }
        return r;
    }

    /**
     * For the labels of one partition, in file order: the global index of the first label with the
     * same bytes. Like the parser, it looks labels up a batch at a time, touching all their slots
     * first so that the cache misses overlap.
     */
    private static final class PartitionPass {
        private static final int BATCH = 256;
        private final PosetFileParser[] regions;
        private final int[] offsets;
        private final byte[][] partitionOf;
        private final int[][] first;
        private long[] table;
        private int used;
        private final int[] batchRegion = new int[BATCH];
        private final int[] batchLabel = new int[BATCH];
        private final long[] batchWord = new long[BATCH];
        private final long[] batchKey = new long[BATCH];
        private int batched;
        /** Sums the touched slots, so that the compiler cannot drop the touching loads. */
        long touchedSum;

        PartitionPass(PosetFileParser[] regions, int[] offsets, byte[][] partitionOf, int[][] first, long expected) {
            this.regions = regions;
            this.offsets = offsets;
            this.partitionOf = partitionOf;
            this.first = first;
            this.table = new long[2 * Integer.highestOneBit((int) Math.min(1 << 28, Math.max(16, 2 * expected)))];
        }

        void run(int p) {
            for (int r = 0; r < regions.length; r++) {
                PosetFileParser region = regions[r];
                byte[] part = partitionOf[r];
                byte[] arena = region.arena();
                for (int l = 0; l < part.length; l++) {
                    if (part[l] != (byte) p) {
                        continue;
                    }
                    int s = region.labelStart(l);
                    int e = region.labelEnd(l);
                    batchRegion[batched] = r;
                    batchLabel[batched] = l;
                    batchWord[batched] = LabelSlots.word(arena, s, e);
                    batchKey[batched] = LabelSlots.key(arena, s, e);
                    if (++batched == BATCH) {
                        flush();
                    }
                }
            }
            flush();
        }

        private void flush() {
            touchedSum += LabelSlots.touch(table, batchWord, batchKey, batched);
            for (int t = 0; t < batched; t++) {
                first[batchRegion[t]][batchLabel[t]] = find(batchRegion[t], batchLabel[t], batchWord[t], batchKey[t]);
            }
            batched = 0;
        }

        /** The global index of the first label with these bytes, this one's if it is the first. */
        private int find(int r, int l, long word, long key) {
            int mask = (table.length >> 1) - 1;
            for (int slot = LabelSlots.slotOf(word, key, mask); ; slot = (slot + 1) & mask) {
                long entry = table[2 * slot + 1];
                if (entry == 0) {
                    int g = offsets[r] + l;
                    table[2 * slot] = word;
                    table[2 * slot + 1] = key | (g + 1);
                    if (LabelSlots.crowded(++used, mask + 1)) {
                        table = LabelSlots.grow(table);
                    }
                    return g;
                }
                if ((entry & ~LabelSlots.ID_MASK) == key && table[2 * slot] == word) {
                    int g = (int) (entry & LabelSlots.ID_MASK) - 1;
                    int r0 = regionOf(offsets, g);
                    if (key != 0 || sameLabel(regions[r0], g - offsets[r0], regions[r], l)) {
                        return g;
                    }
                }
            }
        }
    }

    private static boolean sameLabel(PosetFileParser a, int la, PosetFileParser b, int lb) {
        int as = a.labelStart(la);
        int ae = a.labelEnd(la);
        int bs = b.labelStart(lb);
        int be = b.labelEnd(lb);
        return ae - as == be - bs && Arrays.equals(a.arena(), as, ae, b.arena(), bs, be);
    }

    /** Runs {@code task} for every index below {@code count}, shared among the workers. */
    private static void forEachRegion(int count, int workers, java.util.function.IntConsumer task) {
        AtomicInteger next = new AtomicInteger();
        Workers.share(Math.min(count, workers), w -> {
            for (int i = next.getAndIncrement(); i < count; i = next.getAndIncrement()) {
                task.accept(i);
            }
        });
    }
}
