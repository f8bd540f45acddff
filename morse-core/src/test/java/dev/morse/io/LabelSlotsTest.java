package dev.morse.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;

import java.nio.charset.StandardCharsets;
import java.util.HashMap;
import java.util.Map;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * A label of at most {@link LabelSlots#INLINE} ASCII bytes is held in its slot without loss: two
 * such labels have the same slot contents exactly when they have the same bytes. Longer labels
 * are held by a hash and compared by their bytes, so for them only the length mark is checked.
 */
class LabelSlotsTest {
    private static long[] contents(String label) {
        byte[] b = label.getBytes(StandardCharsets.US_ASCII);
        return new long[] {LabelSlots.word(b, 0, b.length), LabelSlots.key(b, 0, b.length)};
    }

    @Test
    void shortLabelsAreHeldWithoutLoss() {
        // every byte value a label can have (ASCII, no white space, ':' or '#'), lengths 1 to 12
        StringBuilder alphabet = new StringBuilder();
        for (char c = 0; c < 128; c++) {
            if (!Character.isWhitespace(c) && c != ':' && c != '#') {
                alphabet.append(c);
            }
        }
        SplittableRandom random = new SplittableRandom(7);
        Map<String, String> byContents = new HashMap<>();
        for (int trial = 0; trial < 200_000; trial++) {
            int length = 1 + random.nextInt(LabelSlots.INLINE);
            StringBuilder label = new StringBuilder();
            for (int i = 0; i < length; i++) {
                // mostly a few characters, so that labels share long prefixes and differ late
                label.append(random.nextInt(4) == 0 ? alphabet.charAt(random.nextInt(alphabet.length()))
                        : "0\u0000a\u007F".charAt(random.nextInt(4)));
            }
            long[] slot = contents(label.toString());
            assertNotEquals(0, slot[1], "the length keeps a short label's second long from reading as empty");
            String previous = byContents.putIfAbsent(slot[0] + "/" + slot[1], label.toString());
            if (previous != null) {
                assertEquals(previous, label.toString());
            }
        }
    }

    @Test
    void labelsDifferingOnlyInTheirLastInlineByteOrInLengthDiffer() {
        assertNotEquals(contents("c215.215.215")[1], contents("c215.215.214")[1]);
        assertNotEquals(contents("c215.215.21")[1], contents("c215.215.21\u0000")[1]);
        assertNotEquals(contents("abcdefgh")[1], contents("abcdefgh\u0000")[1]);
        assertEquals(contents("abcdefgh")[0], contents("abcdefgh\u0000")[0]);
    }

    @Test
    void longLabelsCarryNoLengthAndAreComparedByTheirBytes() {
        assertEquals(0, contents("c1000.1000.1000")[1]);
        assertNotEquals(contents("c1000.1000.1000")[0], contents("c1000.1000.1001")[0]);
    }
}
