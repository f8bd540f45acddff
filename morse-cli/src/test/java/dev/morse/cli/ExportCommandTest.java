package dev.morse.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.morse.homology.SmithInvariants;
import dev.morse.homology.SparseSmithNormalForm;
import dev.morse.homology.SparseIntegerMatrix;
import dev.morse.morsecomplex.MorseComplex;
import dev.morse.engine.Engines;
import dev.morse.engine.Request;
import dev.morse.input.InputReaders;
import dev.morse.report.MorseComplexExport;
import java.io.IOException;
import java.math.BigInteger;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ExportCommandTest {
    @TempDir
    Path dir;

    /** A matrix read back from a Matrix Market coordinate file, by a reader independent of the writer. */
    private record ReadMatrix(int rows, int columns, long[][] entries, int nonZeros) {
        static ReadMatrix of(Path file) throws IOException {
            List<String> lines = Files.readAllLines(file);
            assertEquals("%%MatrixMarket matrix coordinate integer general", lines.get(0));
            int k = 1;
            while (lines.get(k).startsWith("%")) {
                k++;
            }
            String[] size = lines.get(k).trim().split("\\s+");
            int rows = Integer.parseInt(size[0]);
            int columns = Integer.parseInt(size[1]);
            int nonZeros = Integer.parseInt(size[2]);
            long[][] entries = new long[rows][columns];
            assertEquals(k + 1 + nonZeros, lines.size(), file + ": one line per entry");
            for (int e = 0; e < nonZeros; e++) {
                String[] f = lines.get(k + 1 + e).trim().split("\\s+");
                int i = Integer.parseInt(f[0]) - 1;
                int j = Integer.parseInt(f[1]) - 1;
                assertEquals(0, entries[i][j], "an entry is listed once");
                entries[i][j] = Long.parseLong(f[2]);
            }
            return new ReadMatrix(rows, columns, entries, nonZeros);
        }
    }

    @Test
    void matricesReadBackEqualTheMorseComplexAndComposeToZero() throws IOException {
        String file = Inputs.write(dir, "rp2.simplicial", Inputs.RP2);
        Path out = dir.resolve("rp2-morse");
        for (String matching : List.of("coreduction", "lexicographic", "none")) {
            CliRun run = CliRun.morse("export", file, "-o", out.toString(), "--matching", matching);
            assertEquals(0, run.code(), run.err());
            MorseComplex morse = MorseComplexExport.of(Engines.compute(InputReaders.read(Path.of(file)),
                    Request.defaults().withMatching(matching, 1L, 1))).morse();
            ReadMatrix[] read = new ReadMatrix[morse.dimension() + 1];
            for (int d = 0; d <= morse.dimension(); d++) {
                read[d] = ReadMatrix.of(out.resolve("boundary-" + d + ".mtx"));
                assertEquals(morse.cellCount(d), read[d].columns(), matching + " columns of d_" + d);
                assertEquals(morse.cellCount(d), Files.readAllLines(out.resolve("critical-" + d + ".txt")).size());
                if (d == 0) {
                    assertEquals(0, read[d].rows());
                    continue;
                }
                SparseIntegerMatrix m = morse.boundary(d);
                assertEquals(m.rows(), read[d].rows());
                assertEquals(m.nonZeros(), read[d].nonZeros());
                for (int j = 0; j < m.columns(); j++) {
                    for (int i = m.start(j); i < m.end(j); i++) {
                        assertEquals(m.value(i), read[d].entries()[m.row(i)][j], matching + " entry of d_" + d);
                    }
                }
            }
            for (int d = 1; d < morse.dimension(); d++) {
                assertZeroProduct(read[d], read[d + 1], matching + ": d_" + d + " d_" + (d + 1));
            }
            // the exported matrices alone give H_1(RP^2) = Z/2: the torsion is the one non-unit invariant
            // factor of d_2 (Hatcher, Algebraic Topology, 2002, from memory)
            SmithInvariants d2 = SparseSmithNormalForm.compute(SparseIntegerMatrix.fromDense(read[2].entries(), read[2].columns()));
            assertEquals(List.of(BigInteger.TWO), d2.nonUnitFactors(), matching);
        }
    }

    private static void assertZeroProduct(ReadMatrix a, ReadMatrix b, String what) {
        assertEquals(a.columns(), b.rows(), what + ": shapes compose");
        for (int i = 0; i < a.rows(); i++) {
            for (int k = 0; k < b.columns(); k++) {
                long sum = 0;
                for (int j = 0; j < a.columns(); j++) {
                    sum = Math.addExact(sum, Math.multiplyExact(a.entries()[i][j], b.entries()[j][k]));
                }
                assertEquals(0, sum, what + " at (" + (i + 1) + ", " + (k + 1) + ")");
            }
        }
    }

    @Test
    void summaryNamesEveryFileWithItsShape() throws IOException {
        String file = Inputs.write(dir, "square.poset", Inputs.SQUARE);
        Path out = dir.resolve("square-morse");
        CliRun run = CliRun.morse("export", file, "-o", out.toString());
        assertEquals(0, run.code(), run.err());
        // coreduction is perfect on the disk: one critical vertex and nothing else
        assertEquals("wrote the Morse complex of " + file + " (cellular complex, matching coreduction) to " + out + "\n"
                + "  boundary-0.mtx   0 x 1, 0 nonzero entries; critical-0.txt: 1 critical cell\n"
                + "  boundary-1.mtx   1 x 0, 0 nonzero entries; critical-1.txt: 0 critical cells\n"
                + "  boundary-2.mtx   0 x 0, 0 nonzero entries; critical-2.txt: 0 critical cells\n"
                // a closed disk is contractible (common practice)
                + "  homology  coefficients Z: H_0 = Z, H_1 = 0, H_2 = 0\n", run.out());
        assertEquals(List.of("a"), Files.readAllLines(out.resolve("critical-0.txt")));
    }

    @Test
    void anOutputPathThatIsAFileIsAnError() throws IOException {
        String file = Inputs.write(dir, "square.poset", Inputs.SQUARE);
        Path taken = Files.writeString(dir.resolve("taken"), "x");
        CliRun run = CliRun.morse("export", file, "-o", taken.toString());
        assertEquals(2, run.code());
        assertEquals("", run.out());
        assertEquals(List.of(taken + ": exists and is not a directory"), run.errLines());
        assertTrue(Files.isRegularFile(taken));
    }

    @Test
    void theOutputDirectoryIsRequired() throws IOException {
        String file = Inputs.write(dir, "square.poset", Inputs.SQUARE);
        CliRun run = CliRun.morse("export", file);
        assertEquals(2, run.code());
        assertTrue(run.errLines().get(0).startsWith("morse: Missing required option"), run.err());
    }

    @Test
    void exportWritesAllFilesOrNone() throws IOException {
        String file = Inputs.write(dir, "square.poset", Inputs.SQUARE);
        Path out = Files.createDirectories(dir.resolve("blocked"));
        // the last file's name is taken by a directory: nothing else may appear either
        Files.createDirectory(out.resolve("critical-2.txt"));
        CliRun run = CliRun.morse("export", file, "-o", out.toString());
        assertEquals(2, run.code());
        assertEquals("", run.out());
        assertEquals(List.of(out.resolve("critical-2.txt") + ": is a directory; name a file to write"), run.errLines());
        try (var left = Files.list(out)) {
            assertEquals(List.of("critical-2.txt"), left.map(p -> p.getFileName().toString()).toList());
        }
    }

    @Test
    void aFailedRunCreatesNoDirectory() throws IOException {
        String file = Inputs.write(dir, "square.poset", Inputs.SQUARE);
        Path out = dir.resolve("fresh");
        // a bad combination of options stops the run before anything is written: no directory appears
        CliRun run = CliRun.morse("export", file, "-o", out.toString(), "--complex", "implicit", "--matching", "none");
        assertEquals(2, run.code());
        assertTrue(Files.notExists(out));
    }
}
