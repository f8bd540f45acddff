package dev.morse.input;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import dev.morse.engine.Computation;
import dev.morse.engine.Engines;
import dev.morse.engine.Request;
import dev.morse.homology.Coefficients;
import dev.morse.homology.HomologyGroup;
import dev.morse.io.InputException;
import java.io.IOException;
import java.math.BigInteger;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Chain complexes given by boundary matrices, checked against the cellular homology of classical
 * CW structures (Hatcher, Algebraic Topology, 2002, Section 2.2: the real projective plane with one
 * cell in each dimension and ∂_2 = 2; the torus and the Klein bottle with one vertex, two edges and
 * one square), and every way such input can be wrong.
 */
class ChainComplexInputTest {
    private static final String HEADER = "%%MatrixMarket matrix coordinate integer general\n";

    @TempDir
    Path temp;

    private Path matrix(String name, String body) throws IOException {
        return Files.writeString(temp.resolve(name), HEADER + body);
    }

    private static Computation run(Input input, Coefficients coefficients) {
        return Engines.compute(input, Request.defaults().withHomology(coefficients, false));
    }

    @Test
    void projectivePlaneHasTorsionTwoOverZ() throws IOException {
        // Hatcher 2002, Example 2.42 (from memory): RP^2 with one cell per dimension, ∂_1 = 0, ∂_2 = 2
        matrix("boundary-1.mtx", "1 1 0\n");
        matrix("boundary-2.mtx", "1 1 1\n1 1 2\n");
        Computation run = run(InputReaders.read(temp), Coefficients.INTEGERS);
        assertEquals(List.of(HomologyGroup.free(0, 1), new HomologyGroup(1, 0, List.of(BigInteger.TWO)),
                HomologyGroup.free(2, 0)), run.homology().groups());
    }

    @Test
    void projectivePlaneOverZ2AndQ() throws IOException {
        // over Z/2 multiplication by 2 is zero: ranks 1, 1, 1; over Q it is invertible: 1, 0, 0
        matrix("boundary-1.mtx", "1 1 0\n");
        matrix("boundary-2.mtx", "1 1 1\n1 1 2\n");
        Input input = InputReaders.read(temp);
        assertEquals(List.of(1, 1, 1), betti(run(input, Coefficients.modulo(2))));
        assertEquals(List.of(1, 0, 0), betti(run(input, Coefficients.RATIONALS)));
    }

    @Test
    void kleinBottleHasZPlusZ2InDimensionOne() throws IOException {
        // Hatcher 2002, Section 2.2, cellular homology of the Klein bottle abab^-1: ∂_2(f) = 2a,
        // so H_1 = Z + Z/2 and H_2 = 0 (standard)
        matrix("boundary-1.mtx", "1 2 0\n");
        matrix("boundary-2.mtx", "2 1 1\n1 1 2\n");
        Computation run = run(InputReaders.read(temp), Coefficients.INTEGERS);
        assertEquals(List.of(HomologyGroup.free(0, 1), new HomologyGroup(1, 1, List.of(BigInteger.TWO)),
                HomologyGroup.free(2, 0)), run.homology().groups());
    }

    @Test
    void torusFromTheListedFilesInAnyOrder() throws IOException {
        // the torus aba^-1b^-1: all boundaries zero, H = Z, Z^2, Z (Hatcher 2002, Section 2.2)
        Path one = matrix("d1.mtx", "1 2 0\n");
        Path two = matrix("d2.mtx", "2 1 0\n");
        Computation run = run(InputReaders.read(List.of(one, two), ReadOptions.defaults()), Coefficients.INTEGERS);
        assertEquals(List.of(1, 2, 1), betti(run));
    }

    @Test
    void namedFilesAreOrderedByTheirDimension() throws IOException {
        // a shell glob lists boundary-10 before boundary-2; the names decide the order, not the listing
        Path zero = matrix("boundary-0.mtx", "0 1 0\n");
        Path one = matrix("boundary-1.mtx", "1 1 0\n");
        Path two = matrix("boundary-2.mtx", "1 1 1\n1 1 2\n");
        Computation run = run(InputReaders.read(List.of(two, zero, one), ReadOptions.defaults()), Coefficients.INTEGERS);
        assertEquals(List.of(BigInteger.TWO), run.homology().group(1).torsion());
    }

    @Test
    void aBoundaryOfABoundaryThatIsNotZeroNamesBothMatrices() throws IOException {
        // a triangle's edges e1 = v2 - v1, e2 = v3 - v2, e3 = v3 - v1; the face e1 + e2 + e3 has
        // boundary 2 v3 - 2 v1, not 0 (the correct face is e1 + e2 - e3)
        matrix("boundary-1.mtx", "3 3 6\n1 1 -1\n2 1 1\n2 2 -1\n3 2 1\n1 3 -1\n3 3 1\n");
        Path two = matrix("boundary-2.mtx", "3 1 3\n1 1 1\n2 1 1\n3 1 1\n");
        InputException e = assertThrows(InputException.class, () -> InputReaders.read(temp));
        assertEquals(two + ": boundary-1.mtx times boundary-2.mtx (∂_1 ∂_2) is not zero: its entry at row 1,"
                + " column 1 is -2; the boundary of a boundary must vanish", e.getMessage());
    }

    @Test
    void theCorrectTriangleIsADisc() throws IOException {
        matrix("boundary-1.mtx", "3 3 6\n1 1 -1\n2 1 1\n2 2 -1\n3 2 1\n1 3 -1\n3 3 1\n");
        matrix("boundary-2.mtx", "3 1 3\n1 1 1\n2 1 1\n3 1 -1\n");
        assertEquals(List.of(1, 0, 0), betti(run(InputReaders.read(temp), Coefficients.INTEGERS)));
    }

    @Test
    void sizesThatDoNotFitNameBothMatrices() throws IOException {
        matrix("boundary-1.mtx", "2 3 0\n");
        Path two = matrix("boundary-2.mtx", "4 1 0\n");
        InputException e = assertThrows(InputException.class, () -> InputReaders.read(temp));
        assertEquals(two + ": ∂_2 has 4 rows, but boundary-1.mtx (∂_1) has 3 columns; the rows of ∂_2 are the"
                + " columns of ∂_1", e.getMessage());
    }

    @Test
    void aFractionalEntryIsALineError() throws IOException {
        Path one = Files.writeString(temp.resolve("boundary-1.mtx"),
                "%%MatrixMarket matrix coordinate real general\n% a comment\n2 1 2\n1 1 -1\n2 1 1.5\n");
        InputException e = assertThrows(InputException.class, () -> InputReaders.read(temp));
        assertEquals(one + ":5: the entry '1.5' is not a whole number; boundary matrices have integer entries",
                e.getMessage());
    }

    @Test
    void aWholeRealEntryIsAccepted() throws IOException {
        Files.writeString(temp.resolve("boundary-1.mtx"),
                "%%MatrixMarket matrix coordinate real general\n2 1 2\n1 1 -1.0\n2 1 1e0\n");
        assertEquals(List.of(1, 0), betti(run(InputReaders.read(temp), Coefficients.INTEGERS)));
    }

    @Test
    void anEntryOutsideTheMatrixIsALineError() throws IOException {
        Path one = matrix("boundary-1.mtx", "2 1 1\n3 1 1\n");
        InputException e = assertThrows(InputException.class, () -> InputReaders.read(temp));
        assertEquals(one + ":3: row '3' is not between 1 and 2", e.getMessage());
    }

    @Test
    void aPositionGivenTwiceIsALineError() throws IOException {
        Path one = matrix("boundary-1.mtx", "2 1 2\n1 1 1\n1 1 -1\n");
        InputException e = assertThrows(InputException.class, () -> InputReaders.read(temp));
        assertEquals(one + ":4: the entry at row 1, column 1 is given a second time (first on line 3)", e.getMessage());
    }

    @Test
    void aMissingMatrixBetweenTwoIsNamed() throws IOException {
        matrix("boundary-1.mtx", "1 1 0\n");
        matrix("boundary-3.mtx", "1 1 0\n");
        InputException e = assertThrows(InputException.class, () -> InputReaders.read(temp));
        assertEquals(temp + ": boundary-2.mtx is missing between boundary-1.mtx and boundary-3.mtx", e.getMessage());
    }

    @Test
    void fewerEntriesThanAnnouncedIsAnError() throws IOException {
        Path one = matrix("boundary-1.mtx", "2 1 2\n1 1 1\n");
        InputException e = assertThrows(InputException.class, () -> InputReaders.read(temp));
        assertEquals(one + ": the size line announces 2 entries, but there are 1", e.getMessage());
    }

    private static List<Integer> betti(Computation run) {
        return run.homology().groups().stream().map(HomologyGroup::betti).toList();
    }
}
