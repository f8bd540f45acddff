package dev.morse.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;

class DrawCommandTest {
    @TempDir
    Path dir;

    private static Document parse(byte[] svg) throws Exception {
        return DocumentBuilderFactory.newInstance().newDocumentBuilder().parse(new ByteArrayInputStream(svg));
    }

    /** Elements named {@code tag} whose class attribute has the word {@code word} ({@code null}: all). */
    private static int count(Document doc, String tag, String word) {
        NodeList nodes = doc.getElementsByTagName(tag);
        int count = 0;
        for (int i = 0; i < nodes.getLength(); i++) {
            if (word == null || List.of(((Element) nodes.item(i)).getAttribute("class").split(" ")).contains(word)) {
                count++;
            }
        }
        return count;
    }

    @Test
    void cwPosetIsDrawnWithItsMatchingMarked() throws Exception {
        String file = Inputs.write(dir, "square.poset", Inputs.SQUARE);
        Path svg = dir.resolve("square.svg");
        CliRun run = CliRun.morse("draw", file, "-o", svg.toString());
        assertEquals(0, run.code(), run.err());
        // a disk is collapsible and coreduction perfect on it: 1 critical cell, (9 - 1) / 2 pairs
        assertEquals("wrote " + svg + ": 9 nodes, 12 covers, 4 matched pairs, 1 critical", run.out().lines().findFirst()
                .orElseThrow());
        Document doc = parse(Files.readAllBytes(svg));
        assertEquals(9, count(doc, "circle", null));
        assertEquals(12, count(doc, "line", null));
        assertEquals(4, count(doc, "line", "matched"));
        assertEquals(1, count(doc, "circle", "critical"));
    }

    @Test
    void withoutAnOutputFileTheSvgGoesToStandardOutput() throws Exception {
        String file = Inputs.write(dir, "loop.poset", Inputs.LOOP);
        CliRun run = CliRun.morse("draw", file);
        assertEquals(0, run.code(), run.err());
        Document doc = parse(run.out().getBytes(StandardCharsets.UTF_8));
        // not a CW poset: its own Hasse diagram, two elements and one cover, nothing marked
        assertEquals(2, count(doc, "circle", null));
        assertEquals(1, count(doc, "line", null));
        assertEquals(0, count(doc, "line", "matched"));
        assertEquals(0, count(doc, "circle", "critical"));
    }

    @Test
    void theOrderComplexOfAPosetCanBeDrawnWithItsMatching() throws Exception {
        String file = Inputs.write(dir, "loop.poset", Inputs.LOOP);
        CliRun run = CliRun.morse("draw", file, "--complex", "order", "--matching", "collapse");
        assertEquals(0, run.code(), run.err());
        Document doc = parse(run.out().getBytes(StandardCharsets.UTF_8));
        // Δ = a segment: v, e and v<e; one collapse leaves one critical vertex
        assertEquals(3, count(doc, "circle", null));
        assertEquals(2, count(doc, "line", null));
        assertEquals(1, count(doc, "line", "matched"));
        assertEquals(1, count(doc, "circle", "critical"));
    }

    @Test
    void tooLargeToDrawIsRefusedWithTheLimitAndNoFile() throws IOException {
        StringBuilder text = new StringBuilder("morse-poset 1\n");
        for (int i = 0; i < 600; i++) {
            text.append('x').append(i).append('\n');
        }
        String file = Inputs.write(dir, "wide.poset", text.toString());
        Path svg = dir.resolve("wide.svg");
        CliRun run = CliRun.morse("draw", file, "-o", svg.toString());
        assertEquals(2, run.code());
        assertEquals("", run.out());
        assertEquals(List.of(file + ": too large to draw: a picture takes at most 500 nodes, and this has 600 elements"),
                run.errLines());
        assertFalse(Files.exists(svg));
    }
}
