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
 * follow the file and local ids follow each region. The pairs are grouped by hash into partitions,
 * one worker each, that find for every pair the first pair with the same bytes; one sequential
 * pass in file order then numbers the first appearances, and every region translates its
 * relations on its own worker. Only the sequential pass touches every label, and it only counts.
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
        // per region and local label: its hash, then (after the partitions) its first appearance
        int[][] hashes = new int[count][];
        long[][] first = new long[count][];
        forEachRegion(count, workers, r -> {
            PosetFileParser region = regions[r];
            int n = region.labelCount();
            int[] h = new int[n];
            for (int l = 0; l < n; l++) {
                h[l] = PosetFileParser.hash(region.arena(), region.labelStart(l), region.labelEnd(l));
            }
            hashes[r] = h;
            first[r] = new long[n];
        });
        int partitions = Integer.highestOneBit(Math.max(1, workers) * 2 - 1) << 1;
        long total = 0;
        for (PosetFileParser region : regions) {
            total += region.labelCount();
        }
        long perPartition = total / partitions + 16;
        forEachRegion(partitions, workers, p -> findFirsts(regions, hashes, first, p, partitions, perPartition));
        // number first appearances in file order, and place their bytes
        int[][] ids = hashes; // the hashes are spent: reuse their arrays for global ids
        int labelCount = 0;
        long bytes = 0;
        for (int r = 0; r < count; r++) {
            PosetFileParser region = regions[r];
            for (int l = 0; l < region.labelCount(); l++) {
                if (first[r][l] == key(r, l)) {
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
                if (first[r][l] == key(r, l)) {
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
            long[] firstOf = first[r];
            for (int l = 0; l < region.labelCount(); l++) {
                long f = firstOf[l];
                if (f == key(r, l)) {
                    int s = region.labelStart(l);
                    System.arraycopy(region.arena(), s, arena, starts[local[l]], region.labelEnd(l) - s);
                } else {
                    // an earlier first appearance: numbered in the sequential pass, never written here
                    local[l] = ids[(int) (f >>> 32)][(int) f];
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

    private static long key(int region, int local) {
        return ((long) region << 32) | local;
    }

    /** For the labels whose hash falls in partition {@code p}: the first pair naming the same bytes. */
    private static void findFirsts(PosetFileParser[] regions, int[][] hashes, long[][] first, int p, int partitions,
            long expected) {
        int shift = 32 - Integer.numberOfTrailingZeros(partitions);
        long[] table = new long[Integer.highestOneBit((int) Math.min(1 << 29, 2 * expected)) << 1];
        int used = 0;
        for (int r = 0; r < regions.length; r++) {
            PosetFileParser region = regions[r];
            int[] h = hashes[r];
            for (int l = 0; l < region.labelCount(); l++) {
                int hash = h[l];
                if (partitions > 1 && hash >>> shift != p) {
                    continue;
                }
                int mask = table.length - 1;
                int slot = hash & mask;
                long found = -1;
                for (long entry = table[slot]; entry != 0; slot = (slot + 1) & mask, entry = table[slot]) {
                    long k = entry - 1;
                    int r0 = (int) (k >>> 32);
                    int l0 = (int) k;
                    if (hashes[r0][l0] == hash && sameLabel(regions[r0], l0, region, l)) {
                        found = k;
                        break;
                    }
                }
                if (found >= 0) {
                    first[r][l] = found;
                } else {
                    first[r][l] = key(r, l);
                    table[slot] = key(r, l) + 1;
                    if (2 * ++used > table.length) {
                        table = rehash(table, hashes);
                    }
                }
            }
        }
    }

    private static long[] rehash(long[] table, int[][] hashes) {
        long[] bigger = new long[table.length * 2];
        int mask = bigger.length - 1;
        for (long entry : table) {
            if (entry != 0) {
                long k = entry - 1;
                int slot = hashes[(int) (k >>> 32)][(int) k] & mask;
                while (bigger[slot] != 0) {
                    slot = (slot + 1) & mask;
                }
                bigger[slot] = entry;
            }
        }
        return bigger;
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
