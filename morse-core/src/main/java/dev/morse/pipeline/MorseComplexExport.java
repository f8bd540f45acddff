package dev.morse.pipeline;

import dev.morse.complex.ChainComplex;
import dev.morse.complex.ComplexKind;
import dev.morse.homology.SparseIntegerMatrix;
import dev.morse.io.InputException;
import dev.morse.io.MatrixMarketWriter;
import dev.morse.matching.Matching;
import dev.morse.matching.MatchingHeuristic;
import dev.morse.matching.MatchingHeuristics;
import dev.morse.matching.MatchingOptions;
import dev.morse.matching.MatchingVerdict;
import dev.morse.matching.MatchingVerifier;
import dev.morse.morsecomplex.GradientSweep;
import dev.morse.morsecomplex.MorseComplex;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/**
 * The Morse complex of one input, ready to be written as matrices: read, build the complex, match,
 * verify, and sweep the gradient into the boundary matrices between critical cells (before any
 * algebraic reduction). Stateless.
 *
 * @param source the input file as given
 * @param complexKind which complex was matched
 * @param matching the heuristic used
 * @param cells cells per dimension of the complex
 * @param morse the Morse complex
 * @param criticalNames for each dimension, the names of its critical cells in the order of the
 *     matrices' rows and columns
 */
public record MorseComplexExport(String source, ComplexKind complexKind, String matching, List<Integer> cells,
        MorseComplex morse, List<List<String>> criticalNames) {
    /** Copies. */
    public MorseComplexExport {
        cells = List.copyOf(cells);
        List<List<String>> copied = new ArrayList<>();
        criticalNames.forEach(names -> copied.add(List.copyOf(names)));
        criticalNames = List.copyOf(copied);
    }

    /**
     * Builds the Morse complex of a file.
     *
     * @throws InputException for bad input, or when a Morse coefficient does not fit in a long
     * @throws IOException when reading fails for another reason
     */
    public static MorseComplexExport build(Path file, ExportOptions options) throws IOException {
        return build(InputLoader.load(file), options);
    }

    /** Builds the Morse complex of an input already read. */
    public static MorseComplexExport build(LoadedInput input, ExportOptions options) {
        ChainComplex complex = InputLoader.complex(input, options.complex()).complex();
        MatchingHeuristic heuristic = MatchingHeuristics.byName(options.matching()).orElseThrow();
        Matching matching = heuristic.match(complex, new MatchingOptions(options.seed()));
        MatchingVerdict verdict = MatchingVerifier.verify(complex, matching);
        if (!verdict.valid()) {
            throw new IllegalStateException("heuristic " + heuristic.name() + " produced an invalid matching: "
                    + verdict.defect());
        }
        MorseComplex morse;
        try {
            morse = GradientSweep.build(complex, matching);
        } catch (ArithmeticException overflow) {
            throw new InputException(input.source(), InputException.NO_LINE,
                    "a coefficient of the Morse complex does not fit in 64 bits, so it cannot be exported");
        }
        List<List<String>> names = new ArrayList<>();
        for (int d = 0; d <= complex.dimension(); d++) {
            List<String> dimension = new ArrayList<>();
            for (int c : matching.criticalCells(complex, d)) {
                dimension.add(complex.cellName(c));
            }
            names.add(dimension);
        }
        List<Integer> cells = new ArrayList<>();
        for (int c : complex.cellCounts()) {
            cells.add(c);
        }
        return new MorseComplexExport(input.source(), complex.kind(), heuristic.name(), cells, morse, names);
    }

    /** The file name of the matrix of {@code ∂_d}. */
    public static String matrixFileName(int d) {
        return "boundary-" + d + ".mtx";
    }

    /** The file name of the list of critical cells of dimension {@code d}. */
    public static String cellsFileName(int d) {
        return "critical-" + d + ".txt";
    }

    /**
     * The Matrix Market text of {@code ∂_d}, for {@code d} from 0 (a matrix with no rows, whose
     * columns are the critical vertices) to the top dimension.
     */
    public String matrixText(int d) {
        List<String> comments = List.of(
                "boundary d_" + d + " of the Morse complex of " + source + " (" + complexKind.reportName()
                        + " complex, matching " + matching + ")",
                d == 0
                        ? "no rows (a vertex has no boundary), columns: critical cells of dimension 0, as listed in "
                                + cellsFileName(0)
                        : "rows: critical cells of dimension " + (d - 1) + ", columns: critical cells of dimension " + d
                                + ", as listed in " + cellsFileName(d - 1) + " and " + cellsFileName(d));
        return MatrixMarketWriter.toText(d == 0 ? zeroBoundary() : morse.boundary(d), comments);
    }

    /** The names of the critical cells of dimension {@code d}, one per line. */
    public String cellsText(int d) {
        StringBuilder s = new StringBuilder();
        for (String name : criticalNames.get(d)) {
            s.append(name).append('\n');
        }
        return s.toString();
    }

    private SparseIntegerMatrix zeroBoundary() {
        return new SparseIntegerMatrix(0, new int[morse.cellCount(0) + 1], new int[0], new long[0]);
    }
}
