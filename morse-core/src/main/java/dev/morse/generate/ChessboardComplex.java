package dev.morse.generate;

import dev.morse.complex.Facets;
import java.util.ArrayList;
import java.util.List;

/**
 * The chessboard complex {@code M_(m,n)}: vertices are the cells of an m × n board, labelled
 * {@code r<i>c<j>}, and faces are placements of rooks no two of which share a row or a column.
 * Any placement of fewer than {@code min(m,n)} rooks leaves a free row and a free column, so the
 * facets are the placements of {@code min(m,n)} rooks; there are {@code C(m,k) C(n,k) k!}
 * placements of k rooks (common practice).
 */
public final class ChessboardComplex {
    /** Largest side accepted. */
    public static final int MAX_SIDE = 12;

    private ChessboardComplex() {
    }

    /** The maximal non-attacking rook placements on an {@code m × n} board. */
    public static Facets facets(int m, int n) {
        if (m < 1 || n < 1 || m > MAX_SIDE || n > MAX_SIDE) {
            throw new IllegalArgumentException("sides must be in 1.." + MAX_SIDE + ", got " + m + " × " + n);
        }
        List<List<String>> out = new ArrayList<>();
        place(m, n, 1, new boolean[Math.max(m, n) + 1], new ArrayList<>(), out);
        return Facets.ofLabels(out);
    }

    /** Gives each line of the shorter side, in order, a distinct line of the longer side. */
    private static void place(int m, int n, int line, boolean[] taken, List<String> rooks, List<List<String>> out) {
        int shorter = Math.min(m, n);
        int longer = Math.max(m, n);
        if (line > shorter) {
            out.add(List.copyOf(rooks));
            return;
        }
        for (int other = 1; other <= longer; other++) {
            if (!taken[other]) {
                taken[other] = true;
                rooks.add(m <= n ? "r" + line + "c" + other : "r" + other + "c" + line);
                place(m, n, line + 1, taken, rooks, out);
                rooks.remove(rooks.size() - 1);
                taken[other] = false;
            }
        }
    }
}
