package dev.morse.generate;

import dev.morse.poset.ChainCounts;
import dev.morse.complex.FaceCounts;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.morse.complex.Facets;
import dev.morse.homology.HomologyGroup;
import dev.morse.io.PosetReader;
import dev.morse.io.SimplicialReader;
import dev.morse.poset.Poset;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The committed corpus is exactly what the generators write, and its manifest is consistent. */
class CorpusFilesTest {
    private static final Set<String> HAND_WRITTEN = Set.of("README.md");

    private static Path corpus() {
        String dir = System.getProperty("morse.corpus");
        assertTrue(dir != null, "the system property morse.corpus names the corpus directory");
        return Path.of(dir);
    }

    private static Set<String> generatedFileNames(Path dir) throws IOException {
        try (Stream<Path> files = Files.list(dir)) {
            return files.map(p -> p.getFileName().toString()).filter(n -> !HAND_WRITTEN.contains(n))
                    .collect(Collectors.toCollection(TreeSet::new));
        }
    }

    @Test
    void committedCorpusEqualsAFreshRun(@TempDir Path fresh) throws IOException {
        CorpusWriter.writeAll(fresh);
        Set<String> expected = generatedFileNames(fresh);
        assertEquals(expected, generatedFileNames(corpus()),
                "corpus files differ from the generators' output; rerun CorpusWriter (see corpus/README.md)");
        for (String name : expected) {
            assertEquals(Files.readString(fresh.resolve(name)), Files.readString(corpus().resolve(name)),
                    name + " differs from the generators' output; rerun CorpusWriter (see corpus/README.md)");
        }
    }

    @Test
    void manifestListsEnoughDistinctCases() throws IOException {
        List<CorpusCase> cases = CorpusManifest.readDirectory(corpus());
        assertTrue(cases.size() >= 34, "at least 34 cases, found " + cases.size());
        Set<String> names = new HashSet<>();
        for (CorpusCase c : cases) {
            assertTrue(names.add(c.name()), "duplicate case " + c.name());
            assertFalse(c.source().isBlank(), c.name() + " names no source");
            assertFalse(c.description().isBlank(), c.name() + " has no description");
        }
        assertTrue(cases.stream().anyMatch(c -> !c.isPoset()));
        assertTrue(cases.stream().anyMatch(CorpusCase::cwPoset));
        assertTrue(cases.stream().anyMatch(c -> c.isPoset() && !c.cwPoset()));
    }

    @Test
    void everyCaseFileParsesAndMatchesItsManifestEntry() throws IOException {
        for (CorpusCase c : CorpusManifest.readDirectory(corpus())) {
            Path file = c.path(corpus());
            assertTrue(Files.isRegularFile(file), c.file() + " is missing");
            long[] cells;
            if (c.isPoset()) {
                Poset p = PosetReader.read(file);
                cells = ChainCounts.perDimension(p);
                assertEquals(p.maxHeight() + 1, c.expected().size(), c.name() + ": groups for 0..max height");
            } else {
                Facets f = SimplicialReader.read(file);
                cells = FaceCounts.ofSimplicial(f);
            }
            assertEquals(cells.length, c.expected().size(), c.name() + ": groups for 0..top dimension");
            assertEquals(c.cells(), java.util.Arrays.stream(cells).boxed().toList(), c.name() + ": cell counts");
        }
    }

    @Test
    void expectedHomologySatisfiesEulerPoincare() throws IOException {
        // Euler–Poincaré: Σ (-1)^d f_d = Σ (-1)^d β_d, a check of each literature value against the
        // file's own face numbers that does not compute any homology
        for (CorpusCase c : CorpusManifest.readDirectory(corpus())) {
            long betti = 0;
            for (HomologyGroup g : c.expected()) {
                betti += (g.dimension() % 2 == 0 ? 1 : -1) * (long) g.betti();
            }
            long[] cells = c.cells().stream().mapToLong(Long::longValue).toArray();
            assertEquals(FaceCounts.eulerCharacteristic(cells), betti, c.name());
        }
    }

    @Test
    void topDimensionalHomologyIsTorsionFree() throws IOException {
        // H_top of a finite complex is a subgroup of the free top chain group (common practice)
        for (CorpusCase c : CorpusManifest.readDirectory(corpus())) {
            assertTrue(c.expected().get(c.topDimension()).torsion().isEmpty(), c.name());
        }
    }
}
