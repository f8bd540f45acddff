package dev.morse.io;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.morse.homology.SparseIntegerMatrix;
import java.util.List;
import org.junit.jupiter.api.Test;

class MatrixMarketWriterTest {
    @Test
    void coordinateFormatHasHeaderCommentsSizesAndOneBasedEntries() {
        // the boundary of a triangle's edges ab, bc, ca over its vertices a, b, c (signs by vertex order)
        long[][] dense = {{-1, 0, 1}, {1, -1, 0}, {0, 1, -1}};
        SparseIntegerMatrix m = SparseIntegerMatrix.fromDense(dense, 3);
        // the layout is that of NISTIR 5935 (Boisvert, Pozo, Remington 1996): header, %-comments,
        // "rows columns entries", then "row column value", 1-based
        assertEquals("""
                %%MatrixMarket matrix coordinate integer general
                % triangle
                3 3 6
                1 1 -1
                2 1 1
                2 2 -1
                3 2 1
                1 3 1
                3 3 -1
                """, MatrixMarketWriter.toText(m, List.of("triangle")));
    }

    @Test
    void aMatrixWithoutRowsHasOnlyItsSizes() {
        SparseIntegerMatrix m = new SparseIntegerMatrix(0, new int[4], new int[0], new long[0]);
        assertEquals("%%MatrixMarket matrix coordinate integer general\n0 3 0\n", MatrixMarketWriter.toText(m, List.of()));
    }
}
