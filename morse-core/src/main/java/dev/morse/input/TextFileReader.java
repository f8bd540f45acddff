package dev.morse.input;

import dev.morse.io.InputFormat;
import dev.morse.io.PosetReader;
import dev.morse.io.SimplicialReader;
import java.io.IOException;
import java.nio.file.Path;
import java.util.List;

/**
 * A text format told by its header line: {@code morse-poset 1} (a poset, standing for its order
 * complex) or {@code morse-simplicial 1} (listed faces, standing for all their faces).
 *
 * @param <T> what the format's reader makes
 */
final class TextFileReader<T> implements InputReader {
    /** Reads a file of the format. */
    @FunctionalInterface
    interface FileRead<T> {
        T read(Path file) throws IOException;
    }

    /** Parses text of the format; {@code source} names it in error messages. */
    @FunctionalInterface
    interface TextParse<T> {
        T parse(String text, String source);
    }

    /** Wraps what was read as an input. */
    @FunctionalInterface
    interface Wrap<T> {
        Input wrap(String source, T value, double readMillis);
    }

    /** Posets. */
    static final TextFileReader<?> POSETS = new TextFileReader<>(InputFormat.POSET, PosetReader::read,
            PosetReader::parse, PosetInput::new);
    /** Listed faces. */
    static final TextFileReader<?> FACES = new TextFileReader<>(InputFormat.SIMPLICIAL, SimplicialReader::read,
            SimplicialReader::parse, FacetInput::new);

    private final InputFormat format;
    private final FileRead<T> fileRead;
    private final TextParse<T> textParse;
    private final Wrap<T> wrap;

    private TextFileReader(InputFormat format, FileRead<T> fileRead, TextParse<T> textParse, Wrap<T> wrap) {
        this.format = format;
        this.fileRead = fileRead;
        this.textParse = textParse;
        this.wrap = wrap;
    }

    @Override
    public boolean recognises(InputProbe probe) {
        return probe.header().filter(format::equals).isPresent();
    }

    @Override
    public Input read(List<Path> files, ReadOptions options) throws IOException {
        long start = System.nanoTime();
        Path file = files.get(0);
        T value = fileRead.read(file);
        return wrap.wrap(file.toString(), value, InputReaders.millisSince(start));
    }

    /** Reads text held in memory; {@code source} names it in error messages. */
    Input parse(String source, String text) {
        long start = System.nanoTime();
        T value = textParse.parse(text, source);
        return wrap.wrap(source, value, InputReaders.millisSince(start));
    }
}
