package dev.morse.poset;

import java.nio.charset.StandardCharsets;
import java.util.Arrays;

/**
 * The labels of a poset's elements {@code 0..n-1}, kept either as strings or, as the file reader
 * keeps them, as ASCII bytes in one arena with an offset per element, a string being made only
 * when a label is asked for. Immutable.
 *
 * <p>Memory in the arena form: the label bytes plus 4 bytes per element, where a string costs
 * about 40 bytes of object headers and array besides its characters.
 */
public final class ElementLabels {
    private final String[] strings;
    private final byte[] arena;
    private final int[] starts;

    private ElementLabels(String[] strings, byte[] arena, int[] starts) {
        this.strings = strings;
        this.arena = arena;
        this.starts = starts;
    }

    /** Labels given as strings; the array is not copied, the caller hands it over. */
    static ElementLabels ofStrings(String[] labels) {
        return new ElementLabels(labels, null, null);
    }

    /**
     * Labels as ASCII bytes: label {@code x} is {@code arena[starts[x] .. starts[x + 1])}. The
     * arrays are trimmed to {@code count} labels and not otherwise copied.
     *
     * @throws IllegalArgumentException if the offsets are not non-decreasing within the arena or a
     *     byte is not ASCII
     */
    public static ElementLabels ofAsciiArena(byte[] arena, int[] starts, int count) {
        if (starts.length < count + 1 || starts[0] != 0 || starts[count] > arena.length) {
            throw new IllegalArgumentException("offsets do not describe the arena");
        }
        for (int x = 0; x < count; x++) {
            if (starts[x + 1] < starts[x]) {
                throw new IllegalArgumentException("offsets decrease at label " + x);
            }
        }
        int length = starts[count];
        for (int i = 0; i < length; i++) {
            if (arena[i] < 0) {
                throw new IllegalArgumentException("label bytes must be ASCII");
            }
        }
        byte[] bytes = arena.length == length ? arena : Arrays.copyOf(arena, length);
        int[] offsets = starts.length == count + 1 ? starts : Arrays.copyOf(starts, count + 1);
        return new ElementLabels(null, bytes, offsets);
    }

    /** Number of labels. */
    public int size() {
        return strings != null ? strings.length : starts.length - 1;
    }

    /** The label of element {@code x}. */
    public String get(int x) {
        if (strings != null) {
            return strings[x];
        }
        return new String(arena, starts[x], starts[x + 1] - starts[x], StandardCharsets.ISO_8859_1);
    }
}
