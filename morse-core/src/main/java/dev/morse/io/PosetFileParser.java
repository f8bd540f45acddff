package dev.morse.io;

import dev.morse.poset.ElementLabels;
import dev.morse.poset.OrderCycleException;
import dev.morse.poset.Poset;
import dev.morse.poset.PosetBuilder;
import dev.morse.parallel.Workers;
import dev.morse.progress.Progress;
import java.io.IOException;
import java.io.InputStream;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.file.Files;
import java.nio.file.StandardOpenOption;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicInteger;
import java.nio.file.Path;
import java.util.Arrays;

/**
 * Reads a {@code morse-poset 1} file as bytes: no string or other object per line or per label.
 * Labels are interned as byte slices in an open-addressing table of ints over one byte arena, and
 * the relations go into two int arrays; ids are given in order of first appearance, exactly as the
 * text reader gives them.
 *
 * <p>It reads only what it can read exactly like the text reader: pure ASCII input in which
 * nothing is wrong. At the first non-ASCII byte, the first problem of any kind, or a cycle, it
 * gives up and returns nothing, and the caller reads the file again with the text reader, which
 * then gives the same poset or the same one-line error as ever, with its line number. So errors
 * cost a second reading, and correct files never do.
 *
 * <p>Each line is scanned once, byte by byte through a table of byte classes, and each label is
 * looked up where the scan finds it. Lookups dominate: they are random accesses into a table too
 * large for the caches, so the table holds short labels in its slots and a lookup touches nothing
 * else.
 *
 * <p>Memory: the label bytes, 4 bytes per label for its offset and 26 to 52 for the table
 * (16-byte slots, at most 5/8 full), 8 bytes per listed relation, plus a buffer of {@value #BUFFER} bytes.
 */
final class PosetFileParser {
    static final int BUFFER = 1 << 20;
    private static final byte[] HEADER_KIND = PosetReader.KIND.getBytes(java.nio.charset.StandardCharsets.US_ASCII);
    private static final byte[] HEADER_VERSION = PosetReader.VERSION.getBytes(java.nio.charset.StandardCharsets.US_ASCII);

    private byte[] arena = new byte[1 << 16];
    private int arenaSize;
    private int[] starts = new int[1 << 10];
    private int count;
    /** The labels seen so far, in the format of {@link LabelSlots}. */
    private long[] table = new long[2 << 11];
    private int[] lowers = new int[1 << 12];
    private int[] uppers = new int[1 << 12];
    private int relations;
    private boolean headerSeen;
    private int lineNumber;
    private final Progress progress;

    /** Signals that the text reader must decide; carries no message, since it never reaches users. */
    private static final class GiveUp extends Exception {
        private static final long serialVersionUID = 1L;

        GiveUp() {
            super(null, null, false, false);
        }
    }

    private static final GiveUp GIVE_UP = new GiveUp();

    private PosetFileParser(Progress progress, boolean afterHeader) {
        this.progress = progress;
        this.headerSeen = afterHeader;
    }

    /** The poset in {@code file}, or null if the text reader must read it. */
    static Poset read(Path file) throws IOException {
        Progress progress = Progress.current();
        progress.begin("read", "lines", 0);
        long size = Files.size(file);
        int regions = size >= PARALLEL_FROM ? Workers.threads() : 1;
        PosetFileParser[] parsers;
        try (FileChannel channel = FileChannel.open(file, StandardOpenOption.READ)) {
            parsers = parseRegions(channel, size, regions, progress);
        }
        if (parsers == null) {
            return null;
        }
        PosetFileParser first = parsers[0];
        int labelCount = 0;
        for (PosetFileParser parser : parsers) {
            labelCount += parser.count;
        }
        progress.begin("hasse diagram", "elements", labelCount);
        if (parsers.length == 1) {
            first.starts[first.count] = first.arenaSize;
            return build(ElementLabels.ofAsciiArena(first.arena, first.starts, first.count), first.lowers,
                    first.uppers, first.relations);
        }
        RegionMerge merged = RegionMerge.of(parsers);
        // the regions gave up their arrays to the merge; drop the shells too before the diagram is built
        Arrays.fill(parsers, null);
        return build(merged.labels(), merged.lowers(), merged.uppers(), merged.relations());
    }

    /** Files smaller than this are read by one thread: splitting would cost more than it saves. */
    static final long PARALLEL_FROM = 4L << 20;

    /**
     * Parses {@code regions} stretches of the file, each starting at a line start, on all workers;
     * null if any gave up. Only the first stretch expects the header, and only it reports progress.
     */
    private static PosetFileParser[] parseRegions(FileChannel channel, long size, int regions, Progress progress)
            throws IOException {
        long[] bounds = lineStarts(channel, size, regions);
        PosetFileParser[] parsers = new PosetFileParser[regions];
        for (int r = 0; r < regions; r++) {
            parsers[r] = new PosetFileParser(r == 0 ? progress : Progress.SILENT, r > 0);
        }
        AtomicInteger next = new AtomicInteger();
        AtomicBoolean gaveUp = new AtomicBoolean();
        IOException[] failure = new IOException[1];
        Workers.share(Math.min(regions, Workers.threads()), w -> {
            for (int r = next.getAndIncrement(); r < regions && !gaveUp.get(); r = next.getAndIncrement()) {
                try {
                    parsers[r].parse(new RegionStream(channel, bounds[r], bounds[r + 1]));
                    if (regions > 1) {
                        parsers[r].table = null; // the merge finds labels by their bytes, not by this table
                    }
                } catch (GiveUp e) {
                    gaveUp.set(true);
                } catch (IOException e) {
                    synchronized (failure) {
                        failure[0] = failure[0] != null ? failure[0] : e;
                    }
                    gaveUp.set(true);
                }
            }
        });
        if (failure[0] != null) {
            throw failure[0];
        }
        return gaveUp.get() ? null : parsers;
    }

    /**
     * Region boundaries near equal shares of the file: each just after a \n, which ends a line
     * whichever of \n and \r\n ends it; a share with no \n in it is left empty.
     */
    private static long[] lineStarts(FileChannel channel, long size, int regions) throws IOException {
        long[] bounds = new long[regions + 1];
        bounds[regions] = size;
        ByteBuffer probe = ByteBuffer.allocate(1 << 12);
        for (int r = 1; r < regions; r++) {
            long at = Math.max(bounds[r - 1], size * r / regions);
            long found = size;
            while (at < size && found == size) {
                probe.clear();
                int read = channel.read(probe, at);
                if (read <= 0) {
                    break;
                }
                for (int i = 0; i < read; i++) {
                    if (probe.get(i) == '\n') {
                        found = at + i + 1;
                        break;
                    }
                }
                at += read;
            }
            bounds[r] = found;
        }
        return bounds;
    }

    /** The bytes of {@code [from, to)} of a channel, read at explicit positions so that threads can share it. */
    private static final class RegionStream extends InputStream {
        private final FileChannel channel;
        private long position;
        private final long end;

        RegionStream(FileChannel channel, long from, long to) {
            this.channel = channel;
            this.position = from;
            this.end = to;
        }

        @Override
        public int read() throws IOException {
            byte[] one = new byte[1];
            return read(one, 0, 1) < 0 ? -1 : one[0] & 0xFF;
        }

        @Override
        public int read(byte[] b, int off, int len) throws IOException {
            if (position >= end) {
                return -1;
            }
            int want = (int) Math.min(len, end - position);
            int got = channel.read(ByteBuffer.wrap(b, off, want), position);
            if (got > 0) {
                position += got;
            }
            return got;
        }
    }

    private static Poset build(ElementLabels labels, int[] lo, int[] up, int relations) {
        try {
            return PosetBuilder.fromRelations(labels, lo, up, relations);
        } catch (OrderCycleException e) {
            return null;
        }
    }

    private void parse(InputStream in) throws IOException, GiveUp {
        byte[] buffer = new byte[BUFFER];
        int filled = 0;
        while (true) {
            int read = in.read(buffer, filled, buffer.length - filled);
            boolean end = read < 0;
            if (!end) {
                filled += read;
                if (filled < buffer.length) {
                    continue;
                }
            }
            int consumed = lines(buffer, filled, end);
            if (end) {
                break;
            }
            if (consumed == 0) {
                // one line longer than the buffer: make room
                buffer = Arrays.copyOf(buffer, 2 * buffer.length);
            } else {
                System.arraycopy(buffer, consumed, buffer, 0, filled - consumed);
                filled -= consumed;
            }
        }
        if (!headerSeen) {
            throw GIVE_UP;
        }
    }

    /** Byte classes of the one-pass scanner; a byte's class is {@code CLASS[b & 0xFF]}. */
    private static final byte ORDINARY = 0;
    private static final byte SPACE = 1;
    private static final byte COLON = 2;
    private static final byte COMMENT = 3;
    private static final byte LINE_END = 4;
    private static final byte FOREIGN = 5;
    private static final byte[] CLASS = new byte[256];

    static {
        for (int c = 0; c < 256; c++) {
            byte b = (byte) c;
            CLASS[c] = b < 0 ? FOREIGN
                    : b == '\n' || b == '\r' ? LINE_END
                    : space(b) ? SPACE
                    : b == ':' ? COLON
                    : b == '#' ? COMMENT
                    : ORDINARY;
        }
    }

    /**
     * Handles the complete lines in {@code b[0..filled)} and returns where the first incomplete one
     * starts; at the end of the input the last line is complete without a terminator. Lines end as
     * {@link java.io.BufferedReader#readLine()} ends them: at \n, \r or \r\n. A \r that ends the
     * buffer is left for the next call, since the \n of a \r\n may follow.
     */
    private int lines(byte[] b, int filled, boolean end) throws GiveUp {
        int limit = filled;
        if (!end) {
            limit = lastLineEnd(b, filled);
            if (limit > 0 && b[limit - 1] == '\r') {
                limit = lastLineEnd(b, limit - 1);
            }
        }
        int s = 0;
        while (s < limit) {
            s = line(b, s, limit);
            if ((++lineNumber & PosetReader.REPORT_EVERY) == 0) {
                progress.reached(lineNumber);
            }
        }
        flush(b); // the queued labels point into b, which the caller is about to move
        return limit;
    }

    /** Just after the last \n or \r in {@code b[0..to)}, or 0 if there is none. */
    private static int lastLineEnd(byte[] b, int to) {
        int i = to;
        while (i > 0 && b[i - 1] != '\n' && b[i - 1] != '\r') {
            i--;
        }
        return i;
    }

    /** ASCII white space in the sense of {@link Character#isWhitespace}, as the text reader splits. */
    private static boolean space(byte c) {
        return c == ' ' || (c >= 9 && c <= 13) || (c >= 28 && c <= 31);
    }

    /**
     * Reads the line starting at {@code i} in one pass over its bytes, and returns where the next
     * line starts. Gives up on everything the text reader would refuse or read differently: a
     * second word before the colon, a colon among the lower labels, a label below itself, a line
     * starting with a colon, and any byte outside ASCII, comments included.
     */
    private int line(byte[] b, int i, int limit) throws GiveUp {
        i = skipSpaces(b, i, limit);
        if (restIsBlank(b, i, limit)) {
            return lineEnd(b, i, limit);
        }
        if (!headerSeen) {
            return headerLine(b, i, limit);
        }
        int headStart = i;
        int headEnd = wordEnd(b, i, limit);
        queue(b, headStart, headEnd, true);
        i = skipSpaces(b, headEnd, limit);
        if (restIsBlank(b, i, limit)) {
            return lineEnd(b, i, limit);
        }
        if (CLASS[b[i] & 0xFF] != COLON) {
            throw GIVE_UP;
        }
        for (i = skipSpaces(b, i + 1, limit); !restIsBlank(b, i, limit); i = skipSpaces(b, i, limit)) {
            int w = i;
            i = wordEnd(b, w, limit);
            if (i - w == headEnd - headStart && Arrays.equals(b, w, i, b, headStart, headEnd)) {
                throw GIVE_UP;
            }
            queue(b, w, i, false);
        }
        return lineEnd(b, i, limit);
    }

    private static int skipSpaces(byte[] b, int i, int limit) {
        while (i < limit && CLASS[b[i] & 0xFF] == SPACE) {
            i++;
        }
        return i;
    }

    /** Whether nothing but a comment or the terminator is left of the line at {@code i}. */
    private static boolean restIsBlank(byte[] b, int i, int limit) {
        if (i == limit) {
            return true;
        }
        byte c = CLASS[b[i] & 0xFF];
        return c == LINE_END || c == COMMENT;
    }

    /**
     * The end of the label starting at {@code i}: the first byte that is not a label byte. A label
     * must start there, and it must end at white space, a comment or the line's end; a colon or a
     * byte outside ASCII there (or at the start) makes the text reader decide.
     */
    private static int wordEnd(byte[] b, int i, int limit) throws GiveUp {
        int e = i;
        while (e < limit && CLASS[b[e] & 0xFF] == ORDINARY) {
            e++;
        }
        if (e == i || e < limit && CLASS[b[e] & 0xFF] == FOREIGN) {
            throw GIVE_UP;
        }
        return e;
    }

    /**
     * From {@code i}, which holds white space, a comment or the line's terminator, to the start of
     * the next line; a comment's bytes must be ASCII too.
     */
    private static int lineEnd(byte[] b, int i, int limit) throws GiveUp {
        while (i < limit && b[i] != '\n' && b[i] != '\r') {
            if (b[i] < 0) {
                throw GIVE_UP;
            }
            i++;
        }
        if (i == limit) {
            return i;
        }
        return b[i] == '\r' && i + 1 < limit && b[i + 1] == '\n' ? i + 2 : i + 1;
    }

    /** The first line with content: it must be the header, a comment after it allowed. */
    private int headerLine(byte[] b, int s, int limit) throws GiveUp {
        int e = s;
        while (e < limit && b[e] != '\n' && b[e] != '\r' && b[e] != '#') {
            if (b[e] < 0) {
                throw GIVE_UP;
            }
            e++;
        }
        int next = lineEnd(b, e, limit);
        while (e > s && space(b[e - 1])) {
            e--;
        }
        header(b, s, e);
        return next;
    }

    private void header(byte[] b, int s, int e) throws GiveUp {
        int k = s;
        while (k < e && !space(b[k])) {
            k++;
        }
        int v = k;
        while (v < e && space(b[v])) {
            v++;
        }
        if (!Arrays.equals(b, s, k, HEADER_KIND, 0, HEADER_KIND.length)
                || !Arrays.equals(b, v, e, HEADER_VERSION, 0, HEADER_VERSION.length)) {
            throw GIVE_UP;
        }
        headerSeen = true;
    }

    private void relate(int lower, int upper) {
        if (relations == lowers.length) {
            int length = lowers.length + (lowers.length >> 1);
            lowers = Arrays.copyOf(lowers, length);
            uppers = Arrays.copyOf(uppers, length);
        }
        lowers[relations] = lower;
        uppers[relations] = upper;
        relations++;
    }

    /**
     * Queues the label {@code b[s..e)} for lookup: as the upper element of the lines that follow,
     * or as a lower element of the last upper one. Lookups are made a batch at a time so that the
     * processor can wait for many table slots at once (see {@link #flush}).
     */
    private void queue(byte[] b, int s, int e, boolean upper) {
        if (queued == QUEUE) {
            flush(b);
        }
        int t = queued++;
        queuedStart[t] = upper ? ~s : s;
        queuedEnd[t] = e;
        long word = LabelSlots.word(b, s, e);
        long key = LabelSlots.key(b, s, e);
        queuedWord[t] = word;
        queuedKey[t] = key;
    }

    /**
     * Looks up the queued labels in order, and relates each lower one to its upper one. The slots
     * are all touched first: those loads do not depend on each other, so their cache misses
     * overlap instead of coming one after the other, which is most of the cost of reading a file.
     */
    private void flush(byte[] b) {
        touchedSum += LabelSlots.touch(table, queuedWord, queuedKey, queued);
        for (int t = 0; t < queued; t++) {
            int s = queuedStart[t];
            if (s < 0) {
                upper = intern(b, ~s, queuedEnd[t], queuedWord[t], queuedKey[t]);
            } else {
                relate(intern(b, s, queuedEnd[t], queuedWord[t], queuedKey[t]), upper);
            }
        }
        queued = 0;
    }

    private static final int QUEUE = 256;
    private final int[] queuedStart = new int[QUEUE];
    private final int[] queuedEnd = new int[QUEUE];
    private final long[] queuedWord = new long[QUEUE];
    private final long[] queuedKey = new long[QUEUE];
    private int queued;
    /** The upper element of the line being related; kept across batches, since a line may span two. */
    private int upper;
    /** Where the touched slots are summed, so that the compiler cannot drop the touching loads. */
    private long touchedSum;

    /**
     * The id of the label {@code b[s..e)}, whose slot contents are {@code word} and {@code key},
     * a new one if it was not seen before.
     *
     * <p>Only a label longer than {@link LabelSlots#INLINE} bytes is compared in the arena.
     */
    private int intern(byte[] b, int s, int e, long word, long key) {
        long[] slots = table;
        int mask = (slots.length >> 1) - 1;
        for (int slot = LabelSlots.slotOf(word, key, mask); ; slot = (slot + 1) & mask) {
            long entry = slots[2 * slot + 1];
            if (entry == 0) {
                int id = add(b, s, e);
                slots[2 * slot] = word;
                slots[2 * slot + 1] = key | (id + 1);
                if (LabelSlots.crowded(count, mask + 1)) {
                    table = LabelSlots.grow(table);
                }
                return id;
            }
            if ((entry & ~LabelSlots.ID_MASK) == key && slots[2 * slot] == word) {
                int id = (int) (entry & LabelSlots.ID_MASK) - 1;
                if (key != 0 || sameBytes(b, s, e, id)) {
                    return id;
                }
            }
        }
    }

    /** Number of labels of this region, in order of first appearance in it. */
    int labelCount() {
        return count;
    }

    /** The label bytes of this region; label {@code l} is {@code labelStart(l) .. labelEnd(l)}. */
    byte[] arena() {
        return arena;
    }

    int labelStart(int l) {
        return starts[l];
    }

    int labelEnd(int l) {
        return l + 1 < count ? starts[l + 1] : arenaSize;
    }

    /** Relations of this region in local label ids: {@code lowers()[i] < uppers()[i]} for {@code i < relationCount()}. */
    int[] lowers() {
        return lowers;
    }

    int[] uppers() {
        return uppers;
    }

    int relationCount() {
        return relations;
    }

    /** Lets go of the labels and relations once a merge has taken what it needs. */
    void release() {
        arena = null;
        starts = null;
        lowers = null;
        uppers = null;
    }

    private boolean sameBytes(byte[] b, int s, int e, int id) {
        int start = starts[id];
        int end = id + 1 < count ? starts[id + 1] : arenaSize;
        if (end - start != e - s) {
            return false;
        }
        // labels are short: a plain loop beats the vectorised comparison's set-up cost
        for (int i = start, j = s; i < end; i++, j++) {
            if (arena[i] != b[j]) {
                return false;
            }
        }
        return true;
    }

    private int add(byte[] b, int s, int e) {
        int length = e - s;
        if (arenaSize + length > arena.length) {
            arena = Arrays.copyOf(arena, Math.max(arenaSize + length, arena.length + (arena.length >> 1)));
        }
        System.arraycopy(b, s, arena, arenaSize, length);
        if (count + 1 >= starts.length) {
            int grown = starts.length + (starts.length >> 1);
            starts = Arrays.copyOf(starts, grown);
        }
        starts[count] = arenaSize;
        arenaSize += length;
        return count++;
    }

}
