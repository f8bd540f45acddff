package dev.morse.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.morse.complex.ChainComplex;
import dev.morse.cw.CwPosetCheck;
import dev.morse.complex.Facets;
import dev.morse.complex.OrderComplex;
import dev.morse.complex.SimplicialComplex;
import dev.morse.homology.Coefficients;
import dev.morse.homology.Homology;
import dev.morse.homology.HomologyCalculator;
import dev.morse.poset.Poset;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * Feeds random and mutated texts to both readers. Each input must be read or rejected with an
 * {@link InputException} whose message is one line starting with the source name; nothing else may
 * escape. What reads is written back and read again, and small results go on to a chain complex
 * and its homology. The seed is fixed for repeatable runs; pass {@code -Dmorse.fuzz.seed=N} to
 * explore others. Every failure message names the seed and the input.
 */
class ReaderFuzzTest {
    private static final long SEED = Long.getLong("morse.fuzz.seed", 0x6d6f727365L);
    private static final int INPUTS = 20_000;
    private static final String SOURCE = "fuzz.txt";
    private static final int SMALL_POSET = 8;
    private static final int SMALL_FACE = 6;
    private static final int SMALL_FACE_COUNT = 12;

    private static final String[] CORPUS = {
        "morse-poset 1\n# a square: two vertices below two edges\nv1\nv2\ne1: v1 v2\ne2: v1 v2\n",
        "morse-poset 1\na\nb: a\nc: b\n\n# a chain, then a redundant relation\nc: a\n",
        "morse-poset 1\n0\nx: 0\ny: 0\nz: 0\nxy: x y\nxz: x z\nyz: y z\nxyz: xy xz yz\n",
        "morse-poset 1\n  p\tq  \nr: p q   # two minimal elements\ns: p q\nt: r s\n",
        "morse-poset 1\nv\ne: v   # a loop\n",
        "morse-simplicial 1\n1 2 3\n1 3 4\n1 4 5\n1 5 6\n1 2 6\n2 3 5\n3 4 6\n4 5 2\n5 6 3\n6 2 4\n",
        "morse-simplicial 1\n# a triangle and a separate edge\na b c\nd e\n",
        "morse-simplicial 1\nα β\nβ γ\nγ α   # a circle\n",
    };

    private static final String[] NOISE = {
        ":", "#", " ", "\t", "\n", "\r\n", "\r", "::", ": ", "é", "中", "\uD83D\uDE00", "\uD83D", "\u2003", "\u00A0",
        "\u0085", "\u2028", "\uFEFF", "\u0000", "a", "b", "x1", "morse-poset 1", "morse-simplicial 1",
    };

    private static final String[] HEADERS = {
        "morse-poset 1", "morse-simplicial 1", "morse-poset", "morse-poset 2", "morse-poset 1 extra",
        "Morse-poset 1", "", "# morse-poset 1", "morse-simplicial 01", "morse-poset\t1", "\u2003morse-poset 1",
    };

    private static final String[] LABELS = {"a", "b", "c", "d", "e", "x1", "x2", "α", "中", "v_0", "p'", "\uD83D\uDE00"};

    private int accepted;
    private int rejected;

    @Test
    void readersReadOrRejectEveryInputCleanly() {
        Random random = new Random(SEED);
        for (int i = 0; i < INPUTS; i++) {
            String text = switch (i % 4) {
                case 0 -> randomPosetText(random);
                case 1 -> randomSimplicialText(random);
                case 2 -> randomNoise(random);
                default -> mutate(CORPUS[random.nextInt(CORPUS.length)], random);
            };
            checkPosetReader(text, i);
            checkSimplicialReader(text, i);
        }
        // the inputs must exercise both outcomes, or the test proves little
        assertTrue(accepted > INPUTS / 10, "accepted only " + accepted + " (seed " + SEED + ")");
        assertTrue(rejected > INPUTS / 10, "rejected only " + rejected + " (seed " + SEED + ")");
    }

    private void checkPosetReader(String text, int index) {
        Poset poset;
        try {
            poset = PosetReader.parse(text, SOURCE);
        } catch (InputException e) {
            checkMessage(e, text, index);
            rejected++;
            return;
        } catch (RuntimeException | Error e) {
            throw failure("the poset reader threw " + e, text, index, e);
        }
        accepted++;
        try {
            Poset again = PosetReader.parse(PosetWriter.toText(poset), "written");
            assertEquals(PosetReaderTest.labels(poset), PosetReaderTest.labels(again), context(text, index));
            assertEquals(PosetReaderTest.covers(poset), PosetReaderTest.covers(again), context(text, index));
            if (poset.size() <= SMALL_POSET) {
                Homology order = checkedHomology(OrderComplex.of(poset), text, index);
                if (CwPosetCheck.check(poset).isCwPoset()) {
                    // the cellular complex of a CW poset has the homology of its order complex (Björner 1984)
                    Homology cellular = checkedHomology(CwPosetCheck.cellularComplex(poset), text, index);
                    assertEquals(order.groups(), cellular.groups(), context(text, index));
                }
            }
        } catch (RuntimeException | Error e) {
            throw failure("after reading, " + e, text, index, e);
        }
    }

    private void checkSimplicialReader(String text, int index) {
        Facets facets;
        try {
            facets = SimplicialReader.parse(text, SOURCE);
        } catch (InputException e) {
            checkMessage(e, text, index);
            rejected++;
            return;
        } catch (RuntimeException | Error e) {
            throw failure("the simplicial reader threw " + e, text, index, e);
        }
        accepted++;
        try {
            Facets again = SimplicialReader.parse(SimplicialWriter.toText(facets), "written");
            assertEquals(faceLabels(facets), faceLabels(again), context(text, index));
            boolean small = facets.faceCount() <= SMALL_FACE_COUNT;
            for (int f = 0; f < facets.faceCount() && small; f++) {
                small = facets.faceSize(f) <= SMALL_FACE;
            }
            if (small) {
                checkedHomology(SimplicialComplex.of(facets), text, index);
            }
        } catch (RuntimeException | Error e) {
            throw failure("after reading, " + e, text, index, e);
        }
    }

    /** Homology over Z, checked against the Euler–Poincaré formula Σ(-1)^d f_d = Σ(-1)^d β_d (common practice). */
    private static Homology checkedHomology(ChainComplex complex, String text, int index) {
        Homology homology = HomologyCalculator.compute(complex, Coefficients.INTEGERS);
        long chi = 0;
        for (int d = 0; d <= complex.dimension(); d++) {
            chi += (d % 2 == 0 ? 1 : -1) * (long) complex.cellCount(d);
        }
        assertEquals(chi, homology.eulerCharacteristic(), context(text, index));
        return homology;
    }

    private static void checkMessage(InputException e, String text, int index) {
        String message = e.getMessage();
        if (!message.startsWith(SOURCE + ":")) {
            throw failure("message does not start with the source name: " + message, text, index, e);
        }
        if (message.indexOf('\n') >= 0 || message.indexOf('\r') >= 0) {
            throw failure("message spans several lines: " + escape(message), text, index, e);
        }
        long lines = text.lines().count();
        if (e.line() < 0 || e.line() > lines) {
            throw failure("line " + e.line() + " is outside the input of " + lines + " lines", text, index, e);
        }
        String expected = e.line() > 0 ? SOURCE + ":" + e.line() + ": " + e.problem() : SOURCE + ": " + e.problem();
        if (!message.equals(expected) || e.problem().isBlank()) {
            throw failure("message is not 'FILE:LINE: problem': " + message, text, index, e);
        }
    }

    private static List<List<String>> faceLabels(Facets facets) {
        List<List<String>> faces = new ArrayList<>();
        for (int f = 0; f < facets.faceCount(); f++) {
            List<String> face = new ArrayList<>();
            for (int v : facets.face(f)) {
                face.add(facets.vertexLabel(v));
            }
            faces.add(face);
        }
        return faces;
    }

    private static String randomPosetText(Random random) {
        StringBuilder text = new StringBuilder(HEADERS[random.nextInt(4) == 0 ? random.nextInt(HEADERS.length) : 0])
                .append('\n');
        int n = 1 + random.nextInt(9);
        for (int x = 0; x < n; x++) {
            text.append(LABELS[x]);
            // lower elements come earlier in LABELS, so the relations are acyclic unless a cycle is added
            List<String> lower = new ArrayList<>();
            for (int y = 0; y < x; y++) {
                if (random.nextInt(3) == 0) {
                    lower.add(LABELS[y]);
                }
            }
            if (!lower.isEmpty()) {
                text.append(random.nextBoolean() ? ": " : ":").append(String.join(random.nextBoolean() ? " " : "\t", lower));
            }
            text.append(random.nextInt(5) == 0 ? "  # note\n" : "\n");
        }
        if (random.nextInt(6) == 0) {
            text.append(LABELS[0]).append(": ").append(LABELS[n - 1]).append('\n');
        }
        return text.toString();
    }

    private static String randomSimplicialText(Random random) {
        StringBuilder text = new StringBuilder(HEADERS[random.nextInt(4) == 0 ? random.nextInt(HEADERS.length) : 1])
                .append('\n');
        int faces = random.nextInt(8);
        for (int f = 0; f < faces; f++) {
            int size = 1 + random.nextInt(5);
            List<String> face = new ArrayList<>();
            for (int i = 0; i < size; i++) {
                String v = LABELS[random.nextInt(LABELS.length)];
                // a repeated vertex is an error, kept now and then
                if (!face.contains(v) || random.nextInt(8) == 0) {
                    face.add(v);
                }
            }
            text.append(String.join(" ", face)).append('\n');
        }
        return text.toString();
    }

    private static String randomNoise(Random random) {
        StringBuilder text = new StringBuilder();
        if (random.nextBoolean()) {
            text.append(HEADERS[random.nextInt(HEADERS.length)]).append('\n');
        }
        int tokens = random.nextInt(30);
        for (int i = 0; i < tokens; i++) {
            text.append(random.nextInt(3) == 0
                    ? LABELS[random.nextInt(LABELS.length)]
                    : NOISE[random.nextInt(NOISE.length)]);
        }
        return text.toString();
    }

    private static String mutate(String seed, Random random) {
        String text = seed;
        int rounds = 1 + random.nextInt(3);
        for (int r = 0; r < rounds; r++) {
            text = switch (random.nextInt(9)) {
                case 0 -> deleteChar(text, random);
                case 1 -> insert(text, random, NOISE[random.nextInt(NOISE.length)]);
                case 2 -> insert(text, random, ":");
                case 3 -> insert(text, random, "#");
                case 4 -> duplicateSlice(text, random);
                case 5 -> swapLines(text, random);
                case 6 -> text + firstLabel(text, random) + ": " + firstLabel(text, random) + "\n";
                case 7 -> withCycle(text, random);
                default -> replaceHeader(text, random);
            };
        }
        return text;
    }

    private static String deleteChar(String text, Random random) {
        if (text.isEmpty()) {
            return text;
        }
        int at = random.nextInt(text.length());
        return text.substring(0, at) + text.substring(at + 1);
    }

    private static String insert(String text, Random random, String piece) {
        int at = random.nextInt(text.length() + 1);
        return text.substring(0, at) + piece + text.substring(at);
    }

    private static String duplicateSlice(String text, Random random) {
        if (text.isEmpty()) {
            return text;
        }
        int from = random.nextInt(text.length());
        int to = Math.min(text.length(), from + 1 + random.nextInt(12));
        return text.substring(0, to) + text.substring(from, to) + text.substring(to);
    }

    private static String swapLines(String text, Random random) {
        List<String> lines = new ArrayList<>(Arrays.asList(text.split("\n", -1)));
        if (lines.size() < 2) {
            return text;
        }
        int i = random.nextInt(lines.size());
        int j = random.nextInt(lines.size());
        String t = lines.get(i);
        lines.set(i, lines.get(j));
        lines.set(j, t);
        return String.join("\n", lines);
    }

    /** A label taken from the text's second line onwards, or a fresh one. */
    private static String firstLabel(String text, Random random) {
        String[] words = text.split("[\\s:#]+");
        return words.length > 2 && random.nextInt(4) > 0 ? words[2 + random.nextInt(words.length - 2)] : "fresh";
    }

    private static String withCycle(String text, Random random) {
        String a = firstLabel(text, random);
        String b = firstLabel(text, random);
        return text + a + ": " + b + "\n" + b + ": " + a + "\n";
    }

    private static String replaceHeader(String text, Random random) {
        int end = text.indexOf('\n');
        String rest = end < 0 ? "" : text.substring(end);
        return HEADERS[random.nextInt(HEADERS.length)] + rest;
    }

    private static String context(String text, int index) {
        return "seed " + SEED + ", input #" + index + ": \"" + escape(text) + "\"";
    }

    private static AssertionError failure(String what, String text, int index, Throwable cause) {
        return new AssertionError(what + " -- " + context(text, index), cause);
    }

    private static String escape(String text) {
        StringBuilder s = new StringBuilder();
        for (char c : text.toCharArray()) {
            if (c == '\n') {
                s.append("\\n");
            } else if (c == '\\' || c == '"') {
                s.append('\\').append(c);
            } else if (c < 0x20 || c > 0x7e) {
                s.append(String.format("\\u%04x", (int) c));
            } else {
                s.append(c);
            }
        }
        return s.toString();
    }
}
