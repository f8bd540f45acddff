package dev.morse.report;

import dev.morse.complex.ComplexKind;
import dev.morse.engine.Computation;
import dev.morse.homology.SparseIntegerMatrix;
import dev.morse.io.InputException;
import dev.morse.io.MatrixMarketWriter;
import dev.morse.morsecomplex.GradientSweep;
import dev.morse.morsecomplex.MorseComplex;
import java.util.ArrayList;
import java.util.List;

/**
 * The Morse complex of one computation, ready to be written as matrices: the boundary matrices
 * between critical cells (before any algebraic reduction) and the critical cells' names. A view of
 * the {@link Computation}, which already holds it.
 *
 * @param source the input file as given
 * @param complexKind which complex was matched
 * @param matching the heuristic used
 * @param cells cells per dimension of the complex
 * @param morse the Morse complex
 * @param criticalNames for each dimension, the names of its critical cells in the order of the
 *     matrices' rows and columns
 */
public record MorseComplexExport(String source, ComplexKind complexKind, String matching, List<Long> cells,
        MorseComplex morse, List<List<String>> criticalNames) {
    /** Copies. */
    public MorseComplexExport {
        cells = List.copyOf(cells);
        List<List<String>> copied = new ArrayList<>();
        criticalNames.forEach(names -> copied.add(List.copyOf(names)));
        criticalNames = List.copyOf(copied);
    }

    /**
     * The Morse complex a computation kept. Without a matching ({@code none}) every cell is critical
     * and the Morse complex is the complex itself, made from the kept complex and matching.
     *
     * @throws InputException when a Morse coefficient does not fit in a long
     */
    public static MorseComplexExport of(Computation run) {
        MorseComplex morse;
        if (run.morseComplex().isPresent()) {
            morse = run.morseComplex().get();
        } else if (run.complex().isPresent() && run.matching().isPresent()) {
            try {
                morse = GradientSweep.build(run.complex().get(), run.matching().get());
            } catch (ArithmeticException overflow) {
                throw new InputException(run.source(), InputException.NO_LINE,
                        "a coefficient of the Morse complex does not fit in 64 bits, so it cannot be exported");
            }
        } else {
            throw new InputException(run.source(), InputException.NO_LINE,
                    "a coefficient of the Morse complex does not fit in 64 bits, so it cannot be exported");
        }
        List<List<String>> names = new ArrayList<>();
        for (int d = 0; d <= morse.dimension(); d++) {
            names.add(run.criticalCellNames(d));
        }
        return new MorseComplexExport(run.source(), run.complexKind(), run.matchingName(), run.cells(), morse, names);
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
