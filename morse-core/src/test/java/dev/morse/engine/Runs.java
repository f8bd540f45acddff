package dev.morse.engine;

import dev.morse.complex.ComplexChoice;
import dev.morse.homology.Coefficients;
import dev.morse.image.ImageOptions;
import dev.morse.input.InputReaders;
import java.io.IOException;
import java.nio.file.Path;
import java.util.List;

/** Shorthands for tests: read an input through the registry and compute, as every command does. */
public final class Runs {
    private Runs() {
    }

    /** Computes on text held in memory. */
    public static Computation run(String source, String text, Request request) {
        return Engines.compute(InputReaders.parse(source, text), request);
    }

    /** Computes on one file. */
    public static Computation run(Path file, Request request) throws IOException {
        return Engines.compute(InputReaders.read(file), request);
    }

    /** Computes on files read with the given image options. */
    public static Computation run(List<Path> files, ImageOptions image, Request request) throws IOException {
        return Engines.compute(InputReaders.read(files, image), request);
    }

    /** The default request with another complex, coefficients, reduction and matching. */
    public static Request request(ComplexChoice complex, Coefficients coefficients, boolean reduced, String matching) {
        return Request.defaults().withComplex(complex).withHomology(coefficients, reduced).withMatching(matching, 1L, 1);
    }
}
