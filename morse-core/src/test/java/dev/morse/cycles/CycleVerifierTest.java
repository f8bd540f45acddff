package dev.morse.cycles;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import dev.morse.engine.Computation;
import dev.morse.engine.Engines;
import dev.morse.engine.Request;
import dev.morse.generate.Triangulations;
import dev.morse.homology.Coefficients;
import dev.morse.input.FacetInput;
import it.unimi.dsi.fastutil.ints.Int2ObjectOpenHashMap;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;
import java.util.function.UnaryOperator;
import org.junit.jupiter.api.Test;

/**
 * The verifier rejects wrong cycles: each test spoils one certificate of a correct answer and
 * expects the check that should catch it. The groups are those of REFERENCES.md: the torus has
 * H_1 = Z^2 and RP^2 has H_1 = Z/2 (Hatcher, Algebraic Topology, 2002).
 */
class CycleVerifierTest {
    private static Computation run(dev.morse.complex.Facets facets) {
        return Engines.compute(new FacetInput("x", facets, 0), Request.defaults().withMatching("coreduction", 1L, 1));
    }

    private static List<Certificate> certificates(Computation run) {
        return RepresentativeCycles.certificates(run);
    }

    private static void assertRejected(Computation run, int index, UnaryOperator<Certificate> spoil, String message) {
        List<Certificate> all = new ArrayList<>(certificates(run));
        CycleVerifier.verify(run.complex().orElseThrow(), run.coefficients(), run.homology(), all); // correct as found
        all.set(index, spoil.apply(all.get(index)));
        IllegalStateException e = assertThrows(IllegalStateException.class, () -> CycleVerifier.verify(
                run.complex().orElseThrow(), run.coefficients(), run.homology(), all));
        assertEquals("representative cycles failed their check: " + message, e.getMessage());
    }

    private static int first(List<Certificate> all, int dimension) {
        for (int i = 0; i < all.size(); i++) {
            if (all.get(i).dimension() == dimension) {
                return i;
            }
        }
        throw new AssertionError("no generator of dimension " + dimension);
    }

    private static Int2ObjectOpenHashMap<BigInteger> times(Int2ObjectOpenHashMap<BigInteger> chain, long factor) {
        Int2ObjectOpenHashMap<BigInteger> out = new Int2ObjectOpenHashMap<>();
        chain.int2ObjectEntrySet().forEach(e -> out.put(e.getIntKey(), e.getValue().multiply(BigInteger.valueOf(factor))));
        return out;
    }

    @Test
    void aChainWithATermLeftOutIsNotACycle() {
        Computation torus = run(Triangulations.torus7());
        int i = first(certificates(torus), 1);
        assertRejected(torus, i, c -> {
            Int2ObjectOpenHashMap<BigInteger> z = new Int2ObjectOpenHashMap<>(c.chain());
            z.remove(z.keySet().iterator().nextInt());
            return new Certificate(c.dimension(), c.order(), z, c.preimage(), c.cocycle(), c.lifted());
        }, "the boundary of a 1-cycle is not zero");
    }

    @Test
    void twiceAGeneratorDoesNotGenerate() {
        // 2z and the other generator span a subgroup of index 2 in H_1 = Z^2: the pairing has determinant 2
        Computation torus = run(Triangulations.torus7());
        int i = first(certificates(torus), 1);
        assertRejected(torus, i, c -> new Certificate(1, c.order(), times(c.chain(), 2), null, c.cocycle(), c.lifted()),
                "the free cycles of dimension 1 are not independent (pairing determinant 2)");
    }

    @Test
    void aCochainThatIsNoCocycleIsNoCertificate() {
        Computation torus = run(Triangulations.torus7());
        int i = first(certificates(torus), 1);
        assertRejected(torus, i, c -> {
            Int2ObjectOpenHashMap<BigInteger> phi = new Int2ObjectOpenHashMap<>(c.cocycle());
            int edge = c.chain().keySet().iterator().nextInt();
            phi.merge(edge, BigInteger.ONE, BigInteger::add);
            return new Certificate(1, c.order(), c.chain(), null, phi, c.lifted());
        }, "the cochain certifying a 1-cycle is not a cocycle");
    }

    @Test
    void aTorsionCycleMustBoundItsOrderTimesOver() {
        Computation rp2 = run(Triangulations.projectivePlane6());
        int i = first(certificates(rp2), 1);
        assertRejected(rp2, i, c -> new Certificate(1, c.order(), c.chain(), times(c.preimage(), 2), c.cocycle(),
                c.lifted()), "t·z is not the boundary of the chain given for a torsion 1-cycle of order 2");
    }

    @Test
    void aBoundaryClaimedAsTorsionIsCaughtByItsCocycle() {
        // twice the Z/2 generator bounds, but is zero in H_1: its cocycle pairs to 2 ≡ 0 (mod 2)
        Computation rp2 = run(Triangulations.projectivePlane6());
        int i = first(certificates(rp2), 1);
        assertRejected(rp2, i, c -> new Certificate(1, c.order(), times(c.chain(), 2), times(c.preimage(), 2),
                c.cocycle(), c.lifted()), "the torsion cycles of dimension 1 are not independent of the orders claimed");
    }

    @Test
    void everyGeneratorNeedsACycle() {
        Computation torus = run(Triangulations.torus7());
        List<Certificate> all = new ArrayList<>(certificates(torus));
        all.remove(first(all, 1));
        IllegalStateException e = assertThrows(IllegalStateException.class, () -> CycleVerifier.verify(
                torus.complex().orElseThrow(), Coefficients.INTEGERS, torus.homology(), all));
        assertEquals("representative cycles failed their check: H_1 has rank 2 but 1 free cycles were found",
                e.getMessage());
    }
}
