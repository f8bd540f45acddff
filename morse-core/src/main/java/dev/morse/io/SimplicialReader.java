package dev.morse.io;

import dev.morse.complex.Facets;
import dev.morse.progress.Progress;
import it.unimi.dsi.fastutil.ints.IntArrayList;
import it.unimi.dsi.fastutil.ints.IntOpenHashSet;
import it.unimi.dsi.fastutil.objects.Object2IntOpenHashMap;
import java.io.IOException;
import java.io.Reader;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * Reads the {@code morse-simplicial 1} format: a header line, then one face per line as its vertex
 * labels. Streaming.
 */
public final class SimplicialReader {
    /** The header's first word. */
    public static final String KIND = "morse-simplicial";
    /** The only version read. */
    public static final String VERSION = "1";

    private SimplicialReader() {
    }

    /** Reads a simplicial file. */
    public static Facets read(Path file) throws IOException {
        return TextFiles.read(file, SimplicialReader::read);
    }

    /** Reads simplicial text from a string; {@code source} names it in error messages. */
    public static Facets parse(String text, String source) {
        return TextFiles.fromString(text, source, SimplicialReader::read);
    }

    /** Reads simplicial text; {@code source} names it in error messages. */
    public static Facets read(Reader reader, String source) throws IOException {
        ContentLines lines = ContentLines.afterHeader(reader, source, KIND, VERSION);
        Object2IntOpenHashMap<String> ids = new Object2IntOpenHashMap<>();
        ids.defaultReturnValue(-1);
        List<String> labels = new ArrayList<>();
        IntArrayList offsets = new IntArrayList();
        offsets.add(0);
        IntArrayList vertices = new IntArrayList();
        IntOpenHashSet inFace = new IntOpenHashSet();
        Progress progress = Progress.current();
        progress.begin("read", "lines", 0);
        for (String line = lines.next(); line != null; line = lines.next()) {
            if ((lines.lineNumber() & PosetReader.REPORT_EVERY) == 0) {
                progress.reached(lines.lineNumber());
            }
            if (line.indexOf(':') >= 0) {
                throw lines.error("stray ':': a face is a list of vertex labels");
            }
            inFace.clear();
            for (String word : ContentLines.words(line)) {
                int id = ids.getInt(word);
                if (id < 0) {
                    id = labels.size();
                    ids.put(word, id);
                    labels.add(word);
                }
                if (!inFace.add(id)) {
                    throw lines.error("vertex '" + word + "' is repeated within one face");
                }
                vertices.add(id);
            }
            offsets.add(vertices.size());
        }
        return new Facets(labels.toArray(new String[0]), offsets.toIntArray(), vertices.toIntArray());
    }
}
