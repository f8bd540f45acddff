package dev.morse.morsecomplex;

import dev.morse.cw.CwPosetCheck;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.morse.complex.ChainComplex;
import dev.morse.complex.ComplexChoice;
import dev.morse.engine.ComplexPolicy;
import dev.morse.complex.OrderComplex;
import dev.morse.complex.SimplicialComplex;
import dev.morse.generate.CrossPolytopeFaces;
import dev.morse.generate.FacePart;
import dev.morse.generate.CubeFaces;
import dev.morse.poset.PosetOperations;
import dev.morse.generate.SimplexFaces;
import dev.morse.homology.Coefficients;
import dev.morse.homology.Homology;
import dev.morse.matching.MatchingHeuristic;
import dev.morse.matching.MatchingHeuristics;
import dev.morse.matching.MatchingOptions;
import dev.morse.poset.Poset;
import dev.morse.testing.RandomInputs;
import java.util.List;
import java.util.SplittableRandom;
import java.util.function.Function;
import org.junit.jupiter.api.Test;

/**
 * Every reduction path must give exactly the homology of the full Smith normal form on every cell
 * (the oracle: heuristic {@code none}), and its critical cells must obey the Morse inequalities
 * m_k ≥ β_k + t_k + t_(k−1) (Forman, "Morse theory for cell complexes", 1998). Over Z, Q and Z/2.
 */
class MorseReductionPropertyTest {
    private static final List<MatchingHeuristic> HEURISTICS = MatchingHeuristics.all().values().stream()
            .filter(h -> !(h == MatchingHeuristics.NONE)).toList();

    @Test
    void randomOrderComplexesAgreeWithTheOracle() {
        checkMany(550, 11, random -> OrderComplex.of(RandomInputs.poset(random, 4 + random.nextInt(8), 0.15 + 0.4 * random.nextDouble())));
    }

    @Test
    void randomSimplicialComplexesAgreeWithTheOracle() {
        checkMany(550, 12, random -> SimplicialComplex.of(
                RandomInputs.simplicial(random, 4 + random.nextInt(6), 1 + random.nextInt(9), 1 + random.nextInt(4))));
    }

    @Test
    void randomCubicalComplexesAgreeWithTheOracle() {
        checkMany(450, 13, random -> {
            Poset p = RandomInputs.cubical(random, 1 + random.nextInt(3), 1 + random.nextInt(3), 1 + random.nextInt(3),
                    0.3 + 0.6 * random.nextDouble());
            return p.size() == 0 ? OrderComplex.of(p) : CwPosetCheck.cellularComplex(p);
        });
    }

    @Test
    void randomProductsOfFacePosetsAgreeWithTheOracle() {
        // a product of regular CW complexes is a regular CW complex, so these are CW posets (Walker 1988);
        // the factors are boundaries and closed faces of small simplices, cubes and cross-polytopes
        checkMany(200, 15, random -> {
            Poset p = PosetOperations.product(randomFacePoset(random), randomFacePoset(random));
            return random.nextInt(4) == 0 ? OrderComplex.of(p) : CwPosetCheck.cellularComplex(p);
        });
    }

    private static Poset randomFacePoset(SplittableRandom random) {
        int d = 1 + random.nextInt(2);
        boolean closed = random.nextBoolean();
        return switch (random.nextInt(3)) {
            case 0 -> closed ? SimplexFaces.closedFacePoset(d) : SimplexFaces.boundaryFacePoset(d);
            case 1 -> closed ? CubeFaces.closedFacePoset(d) : CubeFaces.boundaryFacePoset(d);
            default -> closed ? CrossPolytopeFaces.of(FacePart.CLOSED, d) : CrossPolytopeFaces.of(FacePart.BOUNDARY, d);
        };
    }

    @Test
    void randomPosetsThroughTheAutomaticChoiceAgreeWithTheOracle() {
        // the automatic choice takes the cellular complex on CW posets (cube complexes here) and the order complex otherwise
        checkMany(300, 14, random -> {
            Poset p = random.nextBoolean()
                    ? RandomInputs.cubical(random, 2, 2, 1, 0.7)
                    : RandomInputs.poset(random, 5 + random.nextInt(5), 0.4);
            return ComplexPolicy.storedComplex(p, ComplexChoice.AUTO);
        });
    }

    private static void checkMany(int count, long seed, Function<SplittableRandom, ChainComplex> inputs) {
        SplittableRandom random = new SplittableRandom(seed);
        for (int i = 0; i < count; i++) {
            ChainComplex complex = inputs.apply(random);
            for (Coefficients coefficients : List.of(Coefficients.INTEGERS, Coefficients.RATIONALS, Coefficients.modulo(2))) {
                Homology oracle = MorseReduction.run(complex, new MorseReduction.Request(MatchingHeuristics.NONE,
                        MatchingOptions.DEFAULT, coefficients, true)).homology();
                for (MatchingHeuristic h : HEURISTICS) {
                    MorseReduction.Outcome outcome = MorseReduction.run(complex,
                            new MorseReduction.Request(h, new MatchingOptions(seed * 1000 + i), coefficients, true));
                    String where = "case " + i + " of seed " + seed + ", " + h.name() + ", " + coefficients;
                    assertEquals(oracle, outcome.homology(), where);
                    assertTrue(outcome.excess() >= 0, where);
                    int[] m = outcome.critical();
                    for (int k = 0; k < m.length; k++) {
                        long bound = oracle.group(k).betti() + oracle.group(k).torsion().size()
                                + (k > 0 ? oracle.group(k - 1).torsion().size() : 0);
                        assertTrue(m[k] >= bound, where + ": Morse inequality in dimension " + k);
                    }
                }
            }
        }
    }
}
