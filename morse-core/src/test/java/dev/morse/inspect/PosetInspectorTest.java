package dev.morse.inspect;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.morse.generate.BooleanLattice;
import dev.morse.generate.PartitionLattice;
import dev.morse.generate.SmallPosets;
import dev.morse.io.PosetReader;
import dev.morse.poset.Poset;
import dev.morse.poset.PosetBuilder;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

class PosetInspectorTest {
    private static List<BigInteger> big(long... values) {
        List<BigInteger> out = new ArrayList<>();
        for (long v : values) {
            out.add(BigInteger.valueOf(v));
        }
        return out;
    }

    @Test
    void properPartOfBooleanLatticeB4IsTheBarycentricSubdivisionOfASphere() {
        // Δ of the proper part of B_4 is the barycentric subdivision of the boundary of the 3-simplex
        // (Wachs, Poset topology, 2007): faces 14, 36, 24, Euler characteristic 2 of S^2
        PosetSummary s = PosetInspector.inspect(BooleanLattice.properPart(4));
        assertEquals(14, s.elements());
        assertEquals(List.of(4, 6, 4), s.rankSizes());
        assertEquals(4, s.minimal());
        assertEquals(4, s.maximal());
        // covers: each 2-set covers 2 singletons, each 3-set covers 3 two-sets
        assertEquals(6 * 2 + 4 * 3, s.covers());
        assertTrue(s.graded());
        assertTrue(s.thin(), s.thinFailure());
        assertTrue(s.cwCheck().isCwPoset(), s.cwCheck().reason());
        assertEquals(big(14, 36, 24), s.chains());
        assertEquals(BigInteger.TWO, s.eulerCharacteristic());
        // μ(B_n) = (-1)^n (Stanley, Enumerative Combinatorics I, Example 3.8.3)
        assertEquals(BigInteger.ONE, s.mobius());
    }

    @Test
    void partitionLatticeMobiusIsSignedFactorial() {
        // μ(Π_n) = (-1)^(n-1) (n-1)! (Stanley, Enumerative Combinatorics I, Example 3.10.4)
        PosetSummary s = PosetInspector.inspect(PartitionLattice.properPart(5));
        assertEquals(BigInteger.valueOf(24), s.mobius());
        assertEquals(BigInteger.valueOf(24), s.reducedEulerCharacteristic());
        // the proper part of Π_5 has S(5,2) + S(5,3) + S(5,4) = 15 + 25 + 10 elements (Stirling numbers)
        assertEquals(List.of(10, 25, 15), s.rankSizes());
    }

    @Test
    void chainIsGradedButNotThinAndItsOrderComplexIsASimplex() {
        // a chain of 3 elements: Δ is the 2-simplex, all subsets: 3, 3, 1
        PosetSummary s = PosetInspector.inspect(SmallPosets.chain(3));
        assertEquals(big(3, 3, 1), s.chains());
        assertEquals(BigInteger.ONE, s.eulerCharacteristic());
        // a cone is contractible: reduced Euler characteristic 0, and μ of a chain of length 4 is 0
        assertEquals(BigInteger.ZERO, s.mobius());
        assertTrue(s.graded());
        assertFalse(s.thin());
        assertEquals("the interval from 'c1' to 'c3' has only one middle element, 'c2';"
                + " in a thin poset every interval of length 2 has exactly two", s.thinFailure());
        assertFalse(s.cwCheck().isCwPoset());
    }

    @Test
    void ungradedPosetIsNeitherGradedNorThin() {
        // a < b < c and a < c directly would be redundant; here d sits below c alone, so c has
        // height 2 but covers d of height 0
        Poset p = PosetReader.parse("morse-poset 1\na\nb: a\nc: b d\nd\n", "ungraded.poset");
        PosetSummary s = PosetInspector.inspect(p);
        assertFalse(s.graded());
        assertFalse(s.thin());
        assertEquals(List.of(2, 1, 1), s.rankSizes());
        // chains: 4 elements, pairs a<b, a<c, b<c, d<c, and the chain a<b<c
        assertEquals(big(4, 4, 1), s.chains());
        assertEquals(BigInteger.ONE, s.eulerCharacteristic());
        assertTrue(s.cwCheck().reason().startsWith("not graded:"), s.cwCheck().reason());
    }

    @Test
    void emptyPosetHasMobiusMinusOne() throws Exception {
        // P̂ = {0̂ < 1̂} has μ = -1, the reduced Euler characteristic of the empty complex
        PosetSummary s = PosetInspector.inspect(new PosetBuilder().build());
        assertEquals(List.of(), s.chains());
        assertEquals(BigInteger.valueOf(-1), s.mobius());
        assertEquals(BigInteger.valueOf(-1), s.reducedEulerCharacteristic());
    }

    @Test
    void chainCountsBeyondLongAreExact() throws Exception {
        // 12 levels of 100 elements, each element above every element of the levels below: a chain
        // picks d + 1 of the levels and one element in each, so f_d = C(12, d+1) 100^(d+1)
        // (common practice); the total, 101^12 - 1, is past 2^63
        int levels = 12;
        int width = 100;
        PosetBuilder b = new PosetBuilder();
        for (int k = 0; k < levels; k++) {
            for (int i = 0; i < width; i++) {
                int x = b.element(k + "." + i);
                if (k > 0) {
                    for (int j = 0; j < width; j++) {
                        b.relate(b.element((k - 1) + "." + j), x, 0);
                    }
                }
            }
        }
        PosetSummary s = PosetInspector.inspect(b.build());
        List<BigInteger> expected = new ArrayList<>();
        BigInteger binomial = BigInteger.ONE;
        for (int d = 0; d < levels; d++) {
            binomial = binomial.multiply(BigInteger.valueOf(levels - d)).divide(BigInteger.valueOf(d + 1));
            expected.add(binomial.multiply(BigInteger.valueOf(width).pow(d + 1)));
        }
        assertEquals(expected, s.chains());
        // reduced Euler characteristic -Σ_k C(12, k) (-100)^k = -(1 - 100)^12 = -99^12
        assertEquals(BigInteger.valueOf(99).pow(12).negate(), s.mobius());
    }

    @Test
    void chainsAreSkippedWithAReasonPastThePairLimit() {
        // B_4's proper part has 14 elements and 6·2 + 4·3 + 4·3 = 36 comparable pairs... over a limit of 10
        PosetSummary s = PosetInspector.inspect(BooleanLattice.properPart(4), 10);
        assertFalse(s.chainsCounted());
        assertNull(s.mobius());
        // the heights alone (4 atoms of height 0, 6 of height 1, 4 of height 2) give at least 14 pairs
        assertEquals("not counted: the poset has at least 14 comparable pairs (each element lies above at least its"
                + " height many), more than this inspection holds", s.chainsSkipped());
    }

    @Test
    void pairsBeyondTheHeightBoundAreFoundByTheDownSets() {
        // 36 comparable pairs (12 of each of the three kinds of rank pairs), over 20; the height bound 14 is not
        PosetSummary s = PosetInspector.inspect(BooleanLattice.properPart(4), 20);
        assertEquals("not counted: the poset has more than 20 comparable pairs, more than this inspection holds",
                s.chainsSkipped());
    }
}
