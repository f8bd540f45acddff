package dev.morse.cycles;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.morse.complex.ChainComplex;
import dev.morse.complex.ComplexChoice;
import dev.morse.engine.Computation;
import dev.morse.engine.Engines;
import dev.morse.engine.Request;
import dev.morse.homology.Coefficients;
import dev.morse.homology.DenseSmithOracle;
import dev.morse.homology.SmithInvariants;
import dev.morse.homology.SparseIntegerMatrix;
import dev.morse.image.LoadedImage;
import dev.morse.image.VoxelSet;
import dev.morse.input.FacetInput;
import dev.morse.input.Input;
import dev.morse.input.PosetInput;
import dev.morse.input.VoxelInput;
import dev.morse.matching.MatchingHeuristics;
import dev.morse.poset.Poset;
import dev.morse.testing.RandomInputs;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * Representative cycles on 1,200 random inputs (posets, simplicial complexes, CW posets, 2-D images
 * and 3-D volumes), every matching heuristic in turn, over Z, Q and Z/2, some in reduced homology:
 * the run's own verifier must pass, and then the dense Smith normal form oracle, which shares no
 * code with the cycles, confirms on the complex that they generate the group: over Z with
 * {@link RepresentativeCyclesTest#assertGenerates} (rank, saturation and orders), over a field by
 * ranks (the rank over F_p of an integer matrix is the number of its invariant factors prime to p,
 * the structure theorem; common practice): the boundaries and the cycles together span every cycle,
 * and the cycles are independent modulo the boundaries. A seed can be given with
 * {@code -Dmorse.cycles.seed=N}.
 */
class CyclesPropertyTest {
    private static final int INPUTS = 1_200;

    @Test
    void cyclesOfRandomInputsPassTheVerifierAndGenerateTheirGroups() {
        long seed = Long.getLong("morse.cycles.seed", 20_261_202L);
        SplittableRandom random = new SplittableRandom(seed);
        List<String> heuristics = new ArrayList<>(MatchingHeuristics.everyKnown().keySet());
        List<Coefficients> rings = List.of(Coefficients.INTEGERS, Coefficients.RATIONALS, Coefficients.modulo(2));
        int checked = 0;
        for (int i = 0; i < INPUTS; i++) {
            Input input = randomInput(random, i);
            String matching = heuristics.get(i % heuristics.size());
            Coefficients ring = rings.get((i / heuristics.size()) % rings.size());
            boolean reduced = i % 7 == 3;
            Request request = Request.defaults().withHomology(ring, reduced).withMatching(matching, i, 1);
            if (input instanceof PosetInput) {
                request = request.withComplex(i % 4 == 0 ? ComplexChoice.AUTO : ComplexChoice.ORDER);
            }
            String what = "input " + i + " (seed " + seed + ", " + input.source() + ", " + matching + ", " + ring
                    + (reduced ? ", reduced" : "") + ")";
            Computation run = Engines.compute(input, request);
            List<Cycle> cycles = RepresentativeCycles.of(run);
            ChainComplex complex = run.complex().orElseThrow();
            for (int d = 0; d <= complex.dimension(); d++) {
                int dimension = d;
                List<Cycle> here = cycles.stream().filter(c -> c.dimension() == dimension).toList();
                if (reduced && d == 0) {
                    assertEquals(run.homology().groups().get(0).betti(), here.size(), what);
                    continue;
                }
                if (ring.equals(Coefficients.INTEGERS)) {
                    RepresentativeCyclesTest.assertGenerates(complex, d, here);
                } else {
                    assertBasisOverField(complex, d, here, ring.equals(Coefficients.RATIONALS) ? 0 : 2, what);
                }
                checked++;
            }
        }
        assertTrue(checked >= INPUTS, "every input had at least one dimension checked");
    }

    /** Over Q (p = 0) or F_p: boundaries and cycles span every cycle, and the cycles are independent of the boundaries. */
    private static void assertBasisOverField(ChainComplex complex, int d, List<Cycle> cycles, int p, String what) {
        int rankBelow = d == 0 ? 0 : rank(DenseSmithOracle.compute(SparseIntegerMatrix.boundaryOf(complex, d)), p);
        int boundaries = rank(DenseSmithOracle.compute(RepresentativeCyclesTest.withColumns(complex, d + 1, List.of())), p);
        int spanned = rank(DenseSmithOracle.compute(RepresentativeCyclesTest.withColumns(complex, d + 1, cycles)), p);
        assertEquals(complex.cellCount(d) - rankBelow, spanned, "cycles and boundaries span Z_" + d + ": " + what);
        assertEquals(boundaries + cycles.size(), spanned, "cycles independent modulo boundaries in " + d + ": " + what);
    }

    private static int rank(SmithInvariants form, int p) {
        if (p == 0) {
            return form.rank();
        }
        BigInteger prime = BigInteger.valueOf(p);
        return form.rank() - (int) form.nonUnitFactors().stream().filter(f -> f.mod(prime).signum() == 0).count();
    }

    private static Input randomInput(SplittableRandom random, int i) {
        return switch (i % 5) {
            case 0 -> new FacetInput("simplicial", RandomInputs.simplicial(random, 3 + random.nextInt(6),
                    1 + random.nextInt(8), 2 + random.nextInt(3)), 0);
            case 1 -> new PosetInput("poset", RandomInputs.poset(random, 3 + random.nextInt(6), 0.3 + 0.4 * random.nextDouble()), 0);
            case 2 -> {
                Poset cw = RandomInputs.cubical(random, 2, 2, 1 + random.nextInt(2), 0.6);
                yield cw.size() == 0 ? new PosetInput("poset", RandomInputs.poset(random, 4, 0.5), 0)
                        : new PosetInput("cw poset", cw, 0);
            }
            case 3 -> image(random, new int[] {3 + random.nextInt(4), 3 + random.nextInt(4)}, "image");
            default -> image(random, new int[] {2 + random.nextInt(2), 2 + random.nextInt(2), 2 + random.nextInt(2)},
                    "volume");
        };
    }

    private static Input image(SplittableRandom random, int[] sizes, String name) {
        VoxelSet.Builder voxels = VoxelSet.builder(sizes);
        int positions = 1;
        for (int s : sizes) {
            positions *= s;
        }
        voxels.add(random.nextInt(positions)); // never empty
        for (int x = 0; x < positions; x++) {
            if (random.nextDouble() < 0.6) {
                voxels.add(x);
            }
        }
        return new VoxelInput(name, new LoadedImage(voxels.build(), 1, 1, false), 0);
    }
}
