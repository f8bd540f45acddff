package dev.morse.input;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.morse.engine.Computation;
import dev.morse.engine.Engines;
import dev.morse.engine.Request;
import dev.morse.generate.CorpusCase;
import dev.morse.generate.CorpusManifest;
import dev.morse.homology.Coefficients;
import dev.morse.homology.HomologyGroup;
import dev.morse.report.MorseComplexExport;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.DynamicTest;
import org.junit.jupiter.api.TestFactory;
import org.junit.jupiter.api.io.TempDir;

/**
 * Export, then read back: for every corpus case, the boundary matrices of its Morse complex, written
 * as the export command writes them and read as a chain complex, have the homology the manifest
 * gives from the literature (over Z), and the same homology as the case itself over Z/3. The Morse
 * complex is chain homotopy equivalent to the complex (Forman 1998, Theorem 8.2), so both must hold.
 */
class ExportRoundTripTest {
    @TempDir
    Path temp;

    private static Path corpus() {
        return Path.of(System.getProperty("morse.corpus", "../corpus"));
    }

    private static List<CorpusCase> cases() {
        try {
            return CorpusManifest.readDirectory(corpus());
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    @TestFactory
    Stream<DynamicTest> exportedMatricesHaveTheHomologyOfTheCaseOverZ() {
        return cases().stream().map(c -> DynamicTest.dynamicTest(c.name(), () -> {
            Path directory = exported(c, Request.defaults());
            Computation back = Engines.compute(InputReaders.read(directory), Request.defaults());
            assertEquals(padded(c.expected(), c.topDimension()), padded(back.homology().groups(), c.topDimension()),
                    c.name());
        }));
    }

    @TestFactory
    Stream<DynamicTest> exportedMatricesHaveTheHomologyOfTheCaseOverZ3() {
        Request overZ3 = Request.defaults().withHomology(Coefficients.modulo(3), false);
        return cases().stream().filter(c -> !c.heavy()).map(c -> DynamicTest.dynamicTest(c.name(), () -> {
            Computation original = Engines.compute(InputReaders.read(c.path(corpus())), overZ3);
            Path directory = exported(c, overZ3);
            Computation back = Engines.compute(InputReaders.read(directory), overZ3);
            assertEquals(padded(original.homology().groups(), c.topDimension()),
                    padded(back.homology().groups(), c.topDimension()), c.name());
        }));
    }

    /** The files of the export command for the case, in a fresh directory. */
    private Path exported(CorpusCase c, Request request) throws IOException {
        Computation run = Engines.compute(InputReaders.read(c.path(corpus())), request);
        MorseComplexExport export = MorseComplexExport.of(run);
        Path directory = Files.createDirectory(temp.resolve(c.name() + "-" + request.coefficients()));
        for (int d = 0; d <= export.morse().dimension(); d++) {
            Files.writeString(directory.resolve(MorseComplexExport.matrixFileName(d)), export.matrixText(d),
                    StandardCharsets.UTF_8);
            Files.writeString(directory.resolve(MorseComplexExport.cellsFileName(d)), export.cellsText(d),
                    StandardCharsets.UTF_8);
        }
        assertTrue(Files.exists(directory.resolve(MorseComplexExport.matrixFileName(0))), c.name());
        return directory;
    }

    /**
     * The groups up to {@code top}, trivial ones added: a Morse complex without critical cells in its
     * top dimensions lists fewer groups, all of them trivial.
     */
    private static List<HomologyGroup> padded(List<HomologyGroup> groups, int top) {
        List<HomologyGroup> out = new ArrayList<>();
        for (int d = 0; d <= Math.max(top, groups.size() - 1); d++) {
            out.add(d < groups.size() ? groups.get(d) : HomologyGroup.free(d, 0));
        }
        return out;
    }
}
