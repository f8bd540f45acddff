package dev.morse.input;

import dev.morse.complex.ChainComplex;
import dev.morse.io.BoundaryMatrices;
import dev.morse.io.BoundaryMatrix;
import dev.morse.io.InputException;
import dev.morse.io.InputFormat;
import dev.morse.io.MatrixMarketReader;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * A chain complex given by Matrix Market boundary matrices, in the convention the export command
 * writes: a directory holding {@code boundary-D.mtx} for consecutive D (from 0, a matrix with no rows
 * whose columns are the vertices, or from 1), with the names of the cells of dimension D in
 * {@code critical-D.txt} when that file is there; or the matrix files themselves, ordered by D when
 * every name is {@code boundary-D.mtx} and as given otherwise, a first matrix with no rows being ∂_0.
 */
final class MatrixFilesReader implements InputReader {
    /** The name the export command gives the matrix of ∂_D. */
    static final Pattern MATRIX_NAME = Pattern.compile("boundary-(\\d{1,9})\\.mtx");

    @Override
    public boolean recognises(InputProbe probe) {
        return probe.header().filter(InputFormat.MATRICES::equals).isPresent();
    }

    /** Whether a directory holds boundary matrices rather than image slices. */
    static boolean holdsMatrices(Path directory) throws IOException {
        try (var listing = Files.list(directory)) {
            return listing.anyMatch(f -> MATRIX_NAME.matcher(f.getFileName().toString()).matches());
        }
    }

    @Override
    public Input read(List<Path> files, ReadOptions options) throws IOException {
        long start = System.nanoTime();
        String source = files.size() == 1 ? files.get(0).toString() : String.join(" ", files.stream().map(Path::toString).toList());
        ChainComplex complex = files.size() == 1 && Files.isDirectory(files.get(0))
                ? fromDirectory(files.get(0))
                : fromFiles(files);
        return new ChainComplexInput(source, complex, InputReaders.millisSince(start));
    }

    private static ChainComplex fromDirectory(Path directory) throws IOException {
        List<Path> matrices;
        try (var listing = Files.list(directory)) {
            matrices = listing.filter(f -> MATRIX_NAME.matcher(f.getFileName().toString()).matches()).toList();
        }
        List<Path> ordered = byDimension(matrices, directory.toString());
        int first = dimensionOf(ordered.get(0));
        List<BoundaryMatrix> read = readAll(ordered);
        List<String[]> names = new ArrayList<>();
        int top = first + read.size() - 1;
        for (int d = 0; d <= top; d++) {
            Path file = directory.resolve("critical-" + d + ".txt");
            names.add(Files.isRegularFile(file) ? names(file, cellsOf(read, first, d)) : null);
        }
        return BoundaryMatrices.assemble(read, first, names);
    }

    private static ChainComplex fromFiles(List<Path> files) throws IOException {
        boolean named = files.stream().allMatch(f -> MATRIX_NAME.matcher(fileName(f)).matches());
        List<Path> ordered = named ? byDimension(files, files.get(0).toString()) : files;
        List<BoundaryMatrix> read = readAll(ordered);
        int first = named ? dimensionOf(ordered.get(0)) : read.get(0).rows() == 0 && read.size() > 1 ? 0 : 1;
        return BoundaryMatrices.assemble(read, first, List.of());
    }

    /** The files in order of D, which must run without gaps from 0 or 1. */
    private static List<Path> byDimension(List<Path> files, String source) {
        List<Path> ordered = new ArrayList<>(files);
        ordered.sort(Comparator.comparingInt(MatrixFilesReader::dimensionOf));
        int first = dimensionOf(ordered.get(0));
        if (first > 1) {
            throw new InputException(source, InputException.NO_LINE, "the matrices start at boundary-" + first
                    + ".mtx; boundary-1.mtx (∂_1) is missing");
        }
        for (int k = 0; k < ordered.size(); k++) {
            int d = dimensionOf(ordered.get(k));
            if (d != first + k) {
                throw new InputException(source, InputException.NO_LINE, d == first + k - 1
                        ? "boundary-" + d + ".mtx is given twice"
                        : "boundary-" + (first + k) + ".mtx is missing between boundary-" + (first + k - 1)
                                + ".mtx and boundary-" + d + ".mtx");
            }
        }
        return ordered;
    }

    private static List<BoundaryMatrix> readAll(List<Path> files) throws IOException {
        List<BoundaryMatrix> read = new ArrayList<>();
        for (Path file : files) {
            read.add(MatrixMarketReader.read(file));
        }
        return read;
    }

    private static int cellsOf(List<BoundaryMatrix> read, int first, int d) {
        if (d == 0 && first == 1) {
            return read.get(0).rows();
        }
        return read.get(d - first).columns();
    }

    private static String[] names(Path file, int cells) throws IOException {
        List<String> lines;
        try {
            lines = Files.readAllLines(file, StandardCharsets.UTF_8);
        } catch (java.nio.charset.MalformedInputException e) {
            throw new InputException(file.toString(), InputException.NO_LINE, "not valid UTF-8 text");
        }
        if (lines.size() != cells) {
            throw new InputException(file.toString(), InputException.NO_LINE, "names " + lines.size()
                    + " cells, but the matrices have " + cells + " of that dimension");
        }
        return lines.toArray(new String[0]);
    }

    private static int dimensionOf(Path file) {
        Matcher m = MATRIX_NAME.matcher(fileName(file));
        if (!m.matches()) {
            throw new IllegalArgumentException("not a matrix name: " + file);
        }
        return Integer.parseInt(m.group(1));
    }

    private static String fileName(Path file) {
        return file.getFileName() == null ? "" : file.getFileName().toString();
    }
}
