package dev.morse;

import dev.morse.cw.CwPosetCheck;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.morse.complex.ChainComplex;
import dev.morse.complex.OrderComplex;
import dev.morse.complex.SimplicialComplex;
import dev.morse.generate.CorpusCase;
import dev.morse.generate.CorpusManifest;
import dev.morse.homology.Coefficients;
import dev.morse.homology.HomologyCalculator;
import dev.morse.homology.HomologyGroup;
import dev.morse.homology.OjalgoRationalRank;
import dev.morse.homology.SparseIntegerMatrix;
import dev.morse.io.PosetReader;
import dev.morse.io.SimplicialReader;
import dev.morse.poset.Poset;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * An independent cross-check: rational Betti numbers from the ranks that ojalgo's exact rational LU
 * decomposition gives to each boundary matrix (certified in {@link OjalgoRationalRank}), against our
 * own rank over Q and the Betti numbers of the corpus manifest, on every corpus case small enough
 * for ojalgo's dense arithmetic.
 */
class OjalgoCorpusCrossCheckTest {
    /** Largest side of a boundary matrix handed to ojalgo's dense decomposition. */
    private static final int DENSE_LIMIT = 120;

    @Test
    void rationalBettiNumbersAgreeWithOjalgoOnTwentyOrMoreCorpusCases() throws IOException {
        Path corpus = Path.of(System.getProperty("morse.corpus", "../corpus"));
        List<String> checked = new ArrayList<>();
        for (CorpusCase c : CorpusManifest.readDirectory(corpus)) {
            ChainComplex complex = smallestComplex(c, corpus);
            if (!fitsDense(complex)) {
                continue;
            }
            int[] ojalgoBetti = bettiFromOjalgoRanks(complex);
            int[] ours = HomologyCalculator.compute(complex, Coefficients.RATIONALS).bettiNumbers();
            int[] manifest = c.expected().stream().mapToInt(HomologyGroup::betti).toArray();
            assertArrayEquals(manifest, ojalgoBetti, c.name() + ": ojalgo against the manifest");
            assertArrayEquals(ours, ojalgoBetti, c.name() + ": ojalgo against our rank over Q");
            checked.add(c.name());
        }
        assertTrue(checked.size() >= 20, "only " + checked.size() + " cases were small enough: " + checked);
    }

    private static ChainComplex smallestComplex(CorpusCase c, Path corpus) throws IOException {
        if (!c.isPoset()) {
            return SimplicialComplex.of(SimplicialReader.read(c.path(corpus)));
        }
        Poset poset = PosetReader.read(c.path(corpus));
        return c.cwPoset() ? CwPosetCheck.cellularComplex(poset) : OrderComplex.of(poset);
    }

    private static boolean fitsDense(ChainComplex complex) {
        for (int d = 0; d <= complex.dimension(); d++) {
            if (complex.cellCount(d) > DENSE_LIMIT) {
                return false;
            }
        }
        return true;
    }

    /** β_d = f_d − rank ∂_d − rank ∂_(d+1) (common practice), ranks from ojalgo. */
    private static int[] bettiFromOjalgoRanks(ChainComplex complex) {
        int top = complex.dimension();
        int[] rank = new int[top + 2];
        for (int d = 1; d <= top; d++) {
            rank[d] = OjalgoRationalRank.rank(SparseIntegerMatrix.boundaryOf(complex, d));
        }
        int[] betti = new int[top + 1];
        for (int d = 0; d <= top; d++) {
            betti[d] = complex.cellCount(d) - rank[d] - rank[d + 1];
        }
        return betti;
    }
}
