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
 * <p>Memory: the label bytes, 4 bytes per label for its offset and 16 to 32 for the table (8-byte
 * slots holding hash and id, at most half full), 8 bytes per listed relation, plus a buffer of {@value #BUFFER} bytes.
 */
final class PosetFileParser {
    static final int BUFFER = 1 << 20;
    private static final byte[] HEADER_KIND = PosetReader.KIND.getBytes(java.nio.charset.StandardCharsets.US_ASCII);
    private static final byte[] HEADER_VERSION = PosetReader.VERSION.getBytes(java.nio.charset.StandardCharsets.US_ASCII);

    private byte[] arena = new byte[1 << 16];
    private int arenaSize;
    private int[] starts = new int[1 << 10];
    private int count;
    /** Slots: the label's hash in the high half, its id + 1 in the low half; 0 when empty. */
    private long[] table = new long[1 << 11];
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

    /**
     * Handles the complete lines in {@code b[0..filled)} and returns where the first incomplete one
     * starts; at the end of the input the last line is complete without a terminator. Lines end as
     * {@link java.io.BufferedReader#readLine()} ends them: at \n, \r or \r\n.
     */
    private int lines(byte[] b, int filled, boolean end) throws GiveUp {
        int s = 0;
        while (s < filled) {
            int e = s;
            int comment = -1;
            while (e < filled) {
                byte c = b[e];
                if (c == '\n' || c == '\r') {
                    break;
                }
                if (c < 0) {
                    throw GIVE_UP;
                }
                if (c == '#' && comment < 0) {
                    comment = e;
                }
                e++;
            }
            int next;
            if (e == filled) {
                if (!end) {
                    return s;
                }
                next = filled;
            } else if (b[e] == '\r') {
                if (e + 1 == filled && !end) {
                    return s; // a \n may follow in the next read
                }
                next = e + 1 < filled && b[e + 1] == '\n' ? e + 2 : e + 1;
            } else {
                next = e + 1;
            }
            lineNumber++;
            line(b, s, comment >= 0 ? comment : e);
            if ((lineNumber & PosetReader.REPORT_EVERY) == 0) {
                progress.reached(lineNumber);
            }
            s = next;
        }
        return s;
    }

    /** ASCII white space in the sense of {@link Character#isWhitespace}, as the text reader splits. */
    private static boolean space(byte c) {
        return c == ' ' || (c >= 9 && c <= 13) || (c >= 28 && c <= 31);
    }

    private void line(byte[] b, int s, int e) throws GiveUp {
        while (s < e && space(b[s])) {
            s++;
        }
        while (e > s && space(b[e - 1])) {
            e--;
        }
        if (s == e) {
            return;
        }
        if (!headerSeen) {
            header(b, s, e);
            return;
        }
        int colon = s;
        while (colon < e && b[colon] != ':') {
            colon++;
        }
        int headEnd = colon;
        while (headEnd > s && space(b[headEnd - 1])) {
            headEnd--;
        }
        if (headEnd == s) {
            throw GIVE_UP;
        }
        for (int i = s; i < headEnd; i++) {
            if (space(b[i])) {
                throw GIVE_UP;
            }
        }
        int upper = intern(b, s, headEnd);
        int i = colon + 1;
        while (i < e) {
            while (i < e && space(b[i])) {
                i++;
            }
            int w = i;
            while (i < e && !space(b[i])) {
                if (b[i] == ':') {
                    throw GIVE_UP;
                }
                i++;
            }
            if (i > w) {
                if (i - w == headEnd - s && Arrays.equals(b, w, i, b, s, headEnd)) {
                    throw GIVE_UP;
                }
                relate(intern(b, w, i), upper);
            }
        }
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

    /** The id of the label {@code b[s..e)}, a new one if it was not seen before. */
    private int intern(byte[] b, int s, int e) {
        int h = hash(b, s, e);
        int mask = table.length - 1;
        for (int slot = h & mask; ; slot = (slot + 1) & mask) {
            long entry = table[slot];
            if (entry == 0) {
                int id = add(b, s, e, h);
                table[slot] = ((long) h << 32) | (id + 1);
                if (2 * count > table.length) {
                    rehash();
                }
                return id;
            }
            int id = (int) entry - 1;
            if ((int) (entry >>> 32) == h && sameBytes(b, s, e, id)) {
                return id;
            }
        }
    }

    /**
     * The hash of the label {@code b[s..e)}: a polynomial in its bytes, then the finaliser of
     * MurmurHash3, so that labels differing in one digit do not cluster under linear probing.
     */
    static int hash(byte[] b, int s, int e) {
        int h = 0;
        for (int i = s; i < e; i++) {
            h = 31 * h + b[i];
        }
        h ^= h >>> 16;
        h *= 0x85EBCA6B;
        h ^= h >>> 13;
        h *= 0xC2B2AE35;
        h ^= h >>> 16;
        return h;
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

    private int add(byte[] b, int s, int e, int h) {
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

    private void rehash() {
        long[] bigger = new long[table.length * 2];
        int mask = bigger.length - 1;
        for (long entry : table) {
            if (entry != 0) {
                int slot = (int) (entry >>> 32) & mask;
                while (bigger[slot] != 0) {
                    slot = (slot + 1) & mask;
                }
                bigger[slot] = entry;
            }
        }
        table = bigger;
    }
}
