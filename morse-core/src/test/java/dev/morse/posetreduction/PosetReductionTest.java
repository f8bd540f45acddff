package dev.morse.posetreduction;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.morse.complex.OrderComplex;
import dev.morse.generate.BooleanLattice;
import dev.morse.generate.CrossPolytopeFaces;
import dev.morse.generate.FacePart;
import dev.morse.generate.DivisorLattice;
import dev.morse.generate.NoncrossingPartitionLattice;
import dev.morse.generate.PartitionLattice;
import dev.morse.generate.SubspaceLattice;
import dev.morse.homology.Coefficients;
import dev.morse.homology.HomologyGroup;
import dev.morse.io.PosetReader;
import dev.morse.matching.MatchingHeuristics;
import dev.morse.matching.MatchingOptions;
import dev.morse.morsecomplex.MorseReduction;
import dev.morse.poset.OrderCycleException;
import dev.morse.poset.Poset;
import dev.morse.poset.PosetBuilder;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

class PosetReductionTest {
    /** Unreduced integral homology of Δ(P) by coreduction, listed up to dimension {@code top}. */
    static List<HomologyGroup> homology(Poset p, int top) {
        List<HomologyGroup> groups = new ArrayList<>(MorseReduction.run(OrderComplex.of(p), new MorseReduction.Request(
                MatchingHeuristics.byName("coreduction").orElseThrow(), MatchingOptions.DEFAULT, Coefficients.INTEGERS,
                true)).homology().groups());
        for (int d = groups.size(); d <= top; d++) {
            groups.add(HomologyGroup.free(d, 0));
        }
        return groups;
    }

    private static boolean hasBeatPoint(Poset p) {
        for (int x = 0; x < p.size(); x++) {
            if (p.lowerCovers().degree(x) == 1 || p.upperCovers().degree(x) == 1) {
                return true;
            }
        }
        return false;
    }

    @Test
    void elementOverASingleVertexIsABeatPoint() {
        // v < e: e covers only v (Stong 1966); what is left is one point
        ReductionResult r = PosetReduction.reduce(PosetReader.parse("morse-poset 1\nv\ne: v\n", "loop"));
        assertEquals(new ReductionStats(2, 1, 1, 0, 0, r.stats().milliseconds()), r.stats());
        assertEquals("v", r.poset().label(0));
    }

    @Test
    void minimalModelOfTheCircleIsItsOwnCore() {
        // a, b < c, d: the four-point circle has no beat points (Stong 1966; McCord 1966), and its
        // links are pairs of points, not acyclic
        Poset circle = PosetReader.parse("morse-poset 1\na\nb\nc: a b\nd: a b\n", "circle");
        ReductionResult r = PosetReduction.reduce(circle);
        assertEquals(4, r.poset().size());
        assertEquals(0, r.stats().removed());
    }

    @Test
    void contractibleDivisorIntervalShrinksToAPoint() {
        // (1, 12) = {2, 3, 4, 6} is contractible (N = 12 is not squarefree; standard)
        ReductionResult r = PosetReduction.reduce(DivisorLattice.openInterval(12));
        assertEquals(1, r.poset().size());
    }

    @Test
    void acyclicLinkRemovesWhatBeatPointsCannot() {
        // the octahedron's face poset with two new elements above the four triangles at one vertex
        // (a disc): no element covers or is covered by exactly one, but each new element sits on a
        // disc, an acyclic lower link. Δ is S^2 with two cones on a disc glued on: still S^2,
        // H = Z, 0, Z, 0 (common practice: coning off a contractible subcomplex keeps the homotopy type)
        Poset octahedron = CrossPolytopeFaces.of(FacePart.BOUNDARY, 3);
        PosetBuilder b = new PosetBuilder();
        for (int x = 0; x < octahedron.size(); x++) {
            b.element(octahedron.label(x));
        }
        for (int x = 0; x < octahedron.size(); x++) {
            for (int i = octahedron.lowerCovers().start(x); i < octahedron.lowerCovers().end(x); i++) {
                b.relate(octahedron.lowerCovers().target(i), x, 0);
            }
        }
        for (String apex : List.of("x1", "x2")) {
            int top = b.element(apex);
            for (String triangle : List.of("+++", "++-", "+-+", "+--")) {
                b.relate(octahedron.find(triangle).orElseThrow(), top, 0);
            }
        }
        Poset p = build(b);
        assertTrue(!hasBeatPoint(p), "no beat points to begin with");
        ReductionResult r = PosetReduction.reduce(p);
        assertTrue(r.stats().acyclicLinksRemoved() >= 1, r.stats().toString());
        assertEquals(List.of(HomologyGroup.free(0, 1), HomologyGroup.free(1, 0), HomologyGroup.free(2, 1),
                HomologyGroup.free(3, 0)), homology(r.poset(), p.maxHeight()));
        assertEquals(homology(p, p.maxHeight()), homology(r.poset(), p.maxHeight()));
    }

    @Test
    void eulerCharacteristicZeroIsNotEnough() {
        // below x and y lie a four-point circle and a point: reduced Euler characteristic
        // 1 - 1 = 0, yet H~_0 = H~_1 = Z, so the link is not acyclic and x, y must stay; nothing
        // else has an acyclic link or is a beat point either
        Poset p = PosetReader.parse("""
                morse-poset 1
                a
                b
                e
                c: a b
                d: a b
                x: c d e
                y: c d e
                """, "circle-and-point");
        ReductionResult r = PosetReduction.reduce(p);
        assertEquals(0, r.stats().removed(), r.stats().toString());
    }

    @Test
    void properPartsOfGeometricLatticesDoNotShrink() {
        // Rota 1964: on every interval of a geometric lattice the Möbius function is nonzero, so by
        // Philip Hall's theorem no link has reduced Euler characteristic 0, hence none is acyclic;
        // and no element of these proper parts covers, or is covered by, exactly one
        for (Poset p : List.of(PartitionLattice.properPart(4), PartitionLattice.properPart(5),
                SubspaceLattice.properPart(2, 3), SubspaceLattice.properPart(3, 3), BooleanLattice.properPart(5))) {
            ReductionResult r = PosetReduction.reduce(p);
            assertEquals(0, r.stats().removed(), r.stats().toString());
            assertEquals(p.size(), r.poset().size());
        }
    }

    @Test
    void boundedLatticesShrinkToOnePoint() {
        // a poset with a greatest element is a cone, so every other element has an acyclic upper link
        for (Poset p : List.of(PartitionLattice.lattice(5), SubspaceLattice.lattice(2, 4),
                NoncrossingPartitionLattice.lattice(5), BooleanLattice.lattice(5))) {
            ReductionResult r = PosetReduction.reduce(p);
            assertEquals(1, r.poset().size());
            assertEquals(p.size() - 1, r.stats().beatPointsRemoved() + r.stats().acyclicLinksRemoved());
        }
    }

    @Test
    void linksOverTheLimitsAreLeftAloneAndCounted() {
        // with links of at most two elements, the disc under x1 and x2 is too large to test
        Poset p = PosetReader.parse("""
                morse-poset 1
                a
                b
                c
                ab: a b
                bc: b c
                x: ab bc
                y: ab bc
                """, "path");
        ReductionResult tight = PosetReduction.reduce(p, new ReductionLimits(2, 2, 0, 1));
        ReductionResult loose = PosetReduction.reduce(p);
        // a and c are covered only by ab and bc: beat points either way; then ab, b, bc ... collapse
        assertEquals(1, loose.poset().size());
        assertTrue(tight.poset().size() >= loose.poset().size());
        assertEquals(homology(p, p.maxHeight()), homology(tight.poset(), p.maxHeight()));
    }

    private static Poset build(PosetBuilder b) {
        try {
            return b.build();
        } catch (OrderCycleException e) {
            throw new AssertionError(e);
        }
    }
}
