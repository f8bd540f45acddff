package dev.morse.generate;

import dev.morse.homology.HomologyGroup;
import java.nio.file.Path;
import java.util.List;

/**
 * One case of the reference corpus, as listed in its manifest.
 *
 * @param name short unique name, also the file's base name
 * @param file the file name, relative to the corpus directory
 * @param format {@value #POSET} or {@value #SIMPLICIAL}
 * @param expected unreduced integral homology of the complex the file denotes (the order complex
 *     for a poset), one group per dimension from 0 to its top dimension; from the literature
 * @param cwPoset whether the poset is expected to be a CW poset (always false for simplicial files)
 * @param description what the case is
 * @param source where the expected homology comes from
 * @param heavy whether the case is large enough that quick test runs may skip it
 * @param cells faces per dimension of the complex the file denotes (chains of the poset, or faces
 *     of the simplicial complex), as counted by {@link FaceCounts}: a size, not a check value
 */
public record CorpusCase(String name, String file, String format, List<HomologyGroup> expected, boolean cwPoset,
        String description, String source, boolean heavy, List<Long> cells) {
    /** The format of poset files. */
    public static final String POSET = "poset";
    /** The format of simplicial files. */
    public static final String SIMPLICIAL = "simplicial";

    /** Validates and copies. */
    public CorpusCase {
        if (!format.equals(POSET) && !format.equals(SIMPLICIAL)) {
            throw new IllegalArgumentException("unknown format '" + format + "'");
        }
        if (cwPoset && format.equals(SIMPLICIAL)) {
            throw new IllegalArgumentException("a simplicial case cannot be a CW poset");
        }
        expected = List.copyOf(expected);
        for (int d = 0; d < expected.size(); d++) {
            if (expected.get(d).dimension() != d) {
                throw new IllegalArgumentException("expected groups must be listed by dimension from 0");
            }
        }
        cells = List.copyOf(cells);
    }

    /** Whether the file is in the poset format. */
    public boolean isPoset() {
        return format.equals(POSET);
    }

    /** The file inside {@code corpusDirectory}. */
    public Path path(Path corpusDirectory) {
        return corpusDirectory.resolve(file);
    }

    /** The total number of cells of the complex the file denotes. */
    public long totalCells() {
        long total = 0;
        for (long c : cells) {
            total = Math.addExact(total, c);
        }
        return total;
    }

    /** The top dimension of the complex the file denotes. */
    public int topDimension() {
        return expected.size() - 1;
    }
}
