package dev.morse.io;

/**
 * The slot format of the label tables of {@link PosetFileParser} and {@link RegionMerge}: open
 * addressing, two longs per slot, the second 0 when the slot is empty.
 *
 * <p>A label of at most {@value #INLINE} ASCII bytes, the usual case, is held in the slot itself:
 * its first 8 bytes in the first long, its length and its next 4 bytes (7 bits each) in the second
 * beside the id. A longer label is held by a 64-bit hash of its bytes, with length 0, and must be
 * compared with its bytes on a match. So a lookup costs one cache miss, the slot's, and the label
 * bytes are touched only for long labels.
 */
final class LabelSlots {
    /** Labels up to this many bytes live inside their slot. */
    static final int INLINE = 12;
    /** The low bits of the second long: the id + 1. */
    static final int ID_BITS = 31;
    static final long ID_MASK = (1L << ID_BITS) - 1;
    /** Where bytes 8 to 11 of an inline label start, above the id and the 4-bit length. */
    private static final int REST_SHIFT = ID_BITS + 4;

    private LabelSlots() {
    }

    /** The first long of the slot of the ASCII label {@code b[s..e)}. */
    static long word(byte[] b, int s, int e) {
        if (e - s > INLINE) {
            long h = 1125899906842597L;
            for (int i = s; i < e; i++) {
                h = 31 * h + b[i];
            }
            return h;
        }
        long word = 0;
        int firstEight = Math.min(e, s + 8);
        for (int i = s, shift = 0; i < firstEight; i++, shift += 8) {
            word |= (long) b[i] << shift;
        }
        return word;
    }

    /** The second long of the slot of the ASCII label {@code b[s..e)}, without the id: 0 for a long label. */
    static long key(byte[] b, int s, int e) {
        if (e - s > INLINE) {
            return 0;
        }
        long key = (long) (e - s) << ID_BITS;
        for (int i = s + 8, shift = REST_SHIFT; i < e; i++, shift += 7) {
            key |= (long) b[i] << shift;
        }
        return key;
    }

    /** The home slot of a label in a table of {@code mask + 1} slots. */
    static int slotOf(long word, long key, int mask) {
        return (int) mix(word, key) & mask;
    }

    /** 64 well-mixed bits of a label's slot contents, for home slots and partitions alike. */
    static long mix(long word, long key) {
        long h = word ^ (key * 0x9E3779B97F4A7C15L);
        h ^= h >>> 33;
        h *= 0xFF51AFD7ED558CCDL;
        h ^= h >>> 33;
        return h;
    }

    /**
     * Loads the second long of the home slot of each of the first {@code count} labels and returns
     * their sum, which the caller must keep. The loads do not depend on each other, so their cache
     * misses overlap; the lookups that follow then find their slots in the cache. Looking labels up
     * one by one instead waits for each miss in turn, which is most of the cost of reading a file.
     */
    static long touch(long[] table, long[] words, long[] keys, int count) {
        int mask = (table.length >> 1) - 1;
        long sum = 0;
        for (int t = 0; t < count; t++) {
            sum += table[2 * slotOf(words[t], keys[t], mask) + 1];
        }
        return sum;
    }

    /** Whether a table of {@code slots} slots holding {@code count} labels must grow: kept at most 5/8 full. */
    static boolean crowded(long count, int slots) {
        return 8L * count > 5L * slots;
    }

    /** The table twice as large, every entry placed again from its own contents. */
    static long[] grow(long[] table) {
        long[] bigger = new long[table.length * 2];
        int mask = (bigger.length >> 1) - 1;
        for (int old = 0; old < table.length; old += 2) {
            long entry = table[old + 1];
            if (entry != 0) {
                int slot = slotOf(table[old], entry & ~ID_MASK, mask);
                while (bigger[2 * slot + 1] != 0) {
                    slot = (slot + 1) & mask;
                }
                bigger[2 * slot] = table[old];
                bigger[2 * slot + 1] = entry;
            }
        }
        return bigger;
    }
}
