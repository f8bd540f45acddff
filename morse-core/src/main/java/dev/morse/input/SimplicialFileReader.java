package dev.morse.input;

import dev.morse.image.ImageOptions;
import dev.morse.io.InputFormat;
import dev.morse.io.SimplicialReader;
import java.io.IOException;
import java.nio.file.Path;
import java.util.List;

/** The {@code morse-simplicial 1} format: listed faces, standing for all their faces. */
final class SimplicialFileReader implements InputReader {
    @Override
    public boolean recognises(InputProbe probe) {
        return probe.header().filter(InputFormat.SIMPLICIAL::equals).isPresent();
    }

    @Override
    public Input read(List<Path> files, ImageOptions options) throws IOException {
        long start = System.nanoTime();
        Path file = files.get(0);
        return new FacetInput(file.toString(), SimplicialReader.read(file), InputReaders.millisSince(start));
    }

    @Override
    public Input parse(String source, String text) {
        long start = System.nanoTime();
        return new FacetInput(source, SimplicialReader.parse(text, source), InputReaders.millisSince(start));
    }
}
