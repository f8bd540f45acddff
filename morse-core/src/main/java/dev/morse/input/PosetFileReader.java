package dev.morse.input;

import dev.morse.image.ImageOptions;
import dev.morse.io.InputFormat;
import dev.morse.io.PosetReader;
import java.io.IOException;
import java.nio.file.Path;
import java.util.List;

/** The {@code morse-poset 1} format: a poset, standing for its order complex. */
final class PosetFileReader implements InputReader {
    @Override
    public boolean recognises(InputProbe probe) {
        return probe.header().filter(InputFormat.POSET::equals).isPresent();
    }

    @Override
    public Input read(List<Path> files, ImageOptions options) throws IOException {
        long start = System.nanoTime();
        Path file = files.get(0);
        return new PosetInput(file.toString(), PosetReader.read(file), InputReaders.millisSince(start));
    }

    @Override
    public Input parse(String source, String text) {
        long start = System.nanoTime();
        return new PosetInput(source, PosetReader.parse(text, source), InputReaders.millisSince(start));
    }
}
