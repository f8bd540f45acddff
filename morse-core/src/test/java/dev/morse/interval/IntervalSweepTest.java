package dev.morse.interval;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.morse.engine.Request;
import dev.morse.generate.BooleanLattice;
import dev.morse.generate.BruhatOrder;
import dev.morse.generate.CubeFaces;
import dev.morse.generate.PartitionLattice;
import dev.morse.generate.ProjectiveSpace;
import dev.morse.generate.SimplexFaces;
import dev.morse.generate.SubspaceLattice;
import dev.morse.homology.Coefficients;
import dev.morse.poset.Poset;
import dev.morse.poset.PosetBuilder;
import java.math.BigInteger;
import java.util.Optional;
import org.junit.jupiter.api.Test;

class IntervalSweepTest {
    private static SweepReport sweep(Poset p, Coefficients ring) {
        PosetWithBounds hat = PosetWithBounds.of(p);
        return IntervalSweep.run(hat, "test", SweepOptions.of(Request.defaults().withHomology(ring, true)));
    }

    private static BigInteger mu(SweepReport report, Poset p, String lower, String upper) {
        int n = p.size();
        int x = lower == null ? n : p.find(lower).orElseThrow();
        int y = upper == null ? n + 1 : p.find(upper).orElseThrow();
        return report.mobius().value(x, y);
    }

    @Test
    void partitionLatticeIsCohenMacaulayWithTheKnownMobiusValue() {
        // Π_n is a geometric lattice, so Cohen–Macaulay (Folkman 1966; Björner 1980);
        // μ(Π_n) = (-1)^(n-1) (n-1)! (Stanley, Enumerative Combinatorics I, Example 3.10.4, from memory)
        Poset p = PartitionLattice.properPart(5);
        SweepReport r = sweep(p, Coefficients.INTEGERS);
        assertTrue(r.pure());
        assertEquals(4, r.rank());
        assertTrue(r.cohenMacaulay());
        assertEquals(Optional.empty(), r.witness());
        assertEquals(Optional.of(true), r.spherical());
        assertEquals(BigInteger.valueOf(24), mu(r, p, null, null));
        assertFalse(r.eulerian(), "mu(Pi_5) = 24 is not (-1)^4");
        assertFalse(r.gorensteinStar());
        assertEquals(r.intervals(), r.swept());
    }

    @Test
    void partitionLatticeTopIntervalIsAWedgeOfSpheres() {
        // Björner 1980: the proper part of Π_4 is a wedge of 3! = 6 spheres S^1
        Poset p = PartitionLattice.properPart(4);
        SweepReport r = sweep(p, Coefficients.INTEGERS);
        IntervalResult whole = r.results().get(r.results().size() - 1);
        assertEquals(new IntervalTask(p.size(), p.size() + 1), whole.task());
        assertEquals(1, whole.dimension());
        assertEquals(IntervalHomology.free(0, 6), whole.homology());
        assertEquals(BigInteger.valueOf(-6), mu(r, p, null, null));
    }

    @Test
    void subspaceLatticeIsCohenMacaulay() {
        // the lattice of subspaces of F_q^n is geometric, so Cohen–Macaulay (Folkman 1966); its proper part
        // is a wedge of q^(n(n-1)/2) spheres S^(n-2) (Solomon 1969), so μ = (-1)^n q^(n(n-1)/2)
        // (Stanley, EC I, Example 3.10.2, from memory)
        Poset p = SubspaceLattice.properPart(2, 3);
        SweepReport r = sweep(p, Coefficients.INTEGERS);
        assertTrue(r.cohenMacaulay());
        assertEquals(BigInteger.valueOf(-8), mu(r, p, null, null));
        IntervalResult whole = r.results().get(r.results().size() - 1);
        assertEquals(IntervalHomology.free(0, 8), whole.homology());
    }

    @Test
    void booleanLatticeIntervalsHaveMobiusMinusOneToTheLength() {
        // every interval [S, T] of B_n has μ = (-1)^|T - S| (Stanley, EC I, Example 3.8.3, from memory); B_n is
        // Eulerian; it is the face lattice of a simplex, a sphere, so Gorenstein*
        Poset p = BooleanLattice.properPart(5);
        SweepReport r = sweep(p, Coefficients.RATIONALS);
        PosetWithBounds hat = PosetWithBounds.of(p);
        for (IntervalTask t : r.allIntervals()) {
            int k = hat.height(t.upper()) - hat.height(t.lower());
            assertEquals(BigInteger.valueOf(k % 2 == 0 ? 1 : -1), r.mobius().value(t.lower(), t.upper()), t.toString());
        }
        // pairs S ⊆ T of subsets of a 5-set: 3^5 (each element outside T, in T only, or in S); less the 2^5 with S = T
        assertEquals(243 - 32, r.intervals());
        assertTrue(r.eulerian());
        assertTrue(r.cohenMacaulay());
        assertTrue(r.gorensteinStar());
    }

    @Test
    void faceLatticeOfTheCubeBoundaryIsEulerianAndGorensteinStar() {
        // the boundary of the 3-cube is a shellable sphere (Bruggesser–Mani 1971): Cohen–Macaulay; face posets
        // of spheres are Eulerian and Gorenstein* (Stanley, Combinatorics and Commutative Algebra, 1996, Ch. II, from memory)
        SweepReport r = sweep(CubeFaces.boundaryFacePoset(3), Coefficients.INTEGERS);
        assertTrue(r.cohenMacaulay());
        assertTrue(r.eulerian());
        assertTrue(r.gorensteinStar());
        assertEquals(Optional.of(true), r.spherical());
    }

    @Test
    void facesOfABallAreCohenMacaulayButNotGorensteinStar() {
        // a closed simplex and a closed cube are shellable balls: Cohen–Macaulay; Δ(P) of a ball is
        // contractible, so (0^, 1^) has no top homology: not Gorenstein*, and not Eulerian
        for (Poset p : new Poset[] {SimplexFaces.closedFacePoset(3), CubeFaces.closedFacePoset(3)}) {
            SweepReport r = sweep(p, Coefficients.INTEGERS);
            assertTrue(r.cohenMacaulay());
            assertFalse(r.gorensteinStar());
            assertFalse(r.eulerian());
            assertEquals(Optional.of(true), r.spherical(), "contractible: no homology at all");
        }
    }

    @Test
    void twoTrianglesSharingAVertexFailAtThatVertex() {
        // Reisner 1976: a pure complex is Cohen–Macaulay only if every link has homology only in its top
        // dimension; the link of the shared vertex c is two disjoint edges, so H~_0 = Z below dimension 1
        Poset p = twoTrianglesSharingAVertex();
        SweepReport r = sweep(p, Coefficients.RATIONALS);
        assertTrue(r.pure());
        assertFalse(r.cohenMacaulay());
        IntervalResult w = r.witness().orElseThrow();
        assertEquals(new IntervalTask(p.find("c").orElseThrow(), p.size() + 1), w.task());
        assertEquals(1, w.dimension());
        assertEquals(IntervalHomology.free(1, 0), w.homology());
        assertEquals(Optional.of(true), r.spherical(), "the two triangles form a contractible complex");
    }

    @Test
    void firstFailureStopsAtTheSameWitness() {
        Poset p = twoTrianglesSharingAVertex();
        PosetWithBounds hat = PosetWithBounds.of(p);
        Request request = Request.defaults();
        SweepReport whole = IntervalSweep.run(hat, "t", new SweepOptions(request, 1, false));
        SweepReport first = IntervalSweep.run(hat, "t", new SweepOptions(request, 2, true));
        assertEquals(whole.witness(), first.witness());
        assertTrue(first.stoppedEarly());
        assertEquals(first.results(), whole.results().subList(0, first.swept()));
        assertEquals(first.results().get(first.swept() - 1), first.witness().orElseThrow());
        assertEquals(Optional.empty(), first.spherical());
    }

    /** The face poset of the triangles abc and cde, glued at c. */
    static Poset twoTrianglesSharingAVertex() {
        PosetBuilder b = new PosetBuilder();
        String[][] faces = {{"a"}, {"b"}, {"c"}, {"d"}, {"e"}, {"ab", "a", "b"}, {"ac", "a", "c"}, {"bc", "b", "c"},
            {"cd", "c", "d"}, {"ce", "c", "e"}, {"de", "d", "e"}, {"abc", "ab", "ac", "bc"}, {"cde", "cd", "ce", "de"}};
        for (String[] f : faces) {
            int x = b.element(f[0]);
            for (int i = 1; i < f.length; i++) {
                b.relate(b.element(f[i]), x, 0);
            }
        }
        return b.buildKnownAcyclic();
    }

    @Test
    void bruhatOrderIsCohenMacaulayEulerianAndGorensteinStar() {
        // Björner–Wachs 1982: Bruhat intervals are shellable spheres, so S_n is Cohen–Macaulay and
        // Gorenstein*; μ(u, w) = (-1)^(l(w) - l(u)) (Verma 1971): Eulerian
        Poset p = BruhatOrder.properPart(4);
        SweepReport r = sweep(p, Coefficients.INTEGERS);
        assertTrue(r.pure());
        assertEquals(6, r.rank());
        assertTrue(r.cohenMacaulay());
        assertTrue(r.eulerian());
        assertTrue(r.gorensteinStar());
    }

    @Test
    void projectivePlaneIsCohenMacaulayOverTheRationalsOnly() {
        // RP^2: H~_1 = Z/2 (Hatcher, Example 2.42), zero over Q and Z/2 over Z/2; its vertex links are circles.
        // Reisner's criterion: Cohen–Macaulay over Q, not over Z/2 nor over Z, failing at Δ(P) = (0^, 1^)
        Poset p = ProjectiveSpace.antipodalCubeQuotient(2);
        assertTrue(sweep(p, Coefficients.RATIONALS).cohenMacaulay());
        for (Coefficients ring : new Coefficients[] {Coefficients.modulo(2), Coefficients.INTEGERS}) {
            SweepReport r = sweep(p, ring);
            assertFalse(r.cohenMacaulay(), ring.toString());
            IntervalTask t = r.witness().orElseThrow().task();
            assertEquals(new IntervalTask(p.size(), p.size() + 1), t);
        }
    }

    @Test
    void aNonPurePosetFailsAtAnUngradedInterval() {
        // a chain a < b beside a point c: maximal chains of P^ of lengths 3 and 2
        PosetBuilder b = new PosetBuilder();
        b.relate(b.element("a"), b.element("b"), 0);
        b.element("c");
        SweepReport r = sweep(b.buildKnownAcyclic(), Coefficients.RATIONALS);
        assertFalse(r.pure());
        assertFalse(r.cohenMacaulay());
        IntervalResult w = r.witness().orElseThrow();
        assertFalse(w.graded());
        assertEquals(new IntervalTask(3, 4), w.task());
        assertEquals(-1, r.rank());
    }

    @Test
    void moreThreadsGiveTheSameResults() {
        Poset p = PartitionLattice.properPart(5);
        PosetWithBounds hat = PosetWithBounds.of(p);
        SweepReport one = IntervalSweep.run(hat, "t", new SweepOptions(Request.defaults(), 1, false));
        SweepReport three = IntervalSweep.run(hat, "t", new SweepOptions(Request.defaults(), 3, false));
        assertEquals(one.results(), three.results());
        assertEquals(one.witness(), three.witness());
    }

    @Test
    void resultsSolvedOutOfOrderAssembleToTheSameReport() {
        // the two triangles fail the Cohen–Macaulay condition (see above), so the cut at the first failure counts
        Poset p = twoTrianglesSharingAVertex();
        PosetWithBounds hat = PosetWithBounds.of(p);
        IntervalSolver solver = new IntervalSolver(hat, Request.defaults(), "t");
        java.util.Map<IntervalTask, IntervalResult> byTask = new java.util.HashMap<>();
        // by lower end, as work split among machines comes back
        for (int x = hat.size() + 1; x >= 0; x--) {
            for (int y : hat.uppers(x)) {
                IntervalTask t = new IntervalTask(x, y);
                byTask.put(t, solver.solve(t));
            }
        }
        java.util.List<IntervalTask> order = IntervalSweep.order(hat);
        assertEquals(hat.intervalCount(), byTask.size());
        assertEquals(hat.intervalCount(), order.size());
        java.util.List<IntervalResult> solved = order.stream().map(byTask::get).toList();
        for (boolean firstFailure : new boolean[] {false, true}) {
            SweepOptions options = new SweepOptions(Request.defaults(), 1, firstFailure);
            SweepReport here = IntervalSweep.run(hat, "t", options);
            SweepReport assembled = IntervalSweep.assemble(hat, "t", options, solved);
            assertEquals(here.results(), assembled.results());
            assertEquals(here.witness(), assembled.witness());
            assertEquals(here.spherical(), assembled.spherical());
            assertEquals(here.cohenMacaulay(), assembled.cohenMacaulay());
        }
    }

    @Test
    void unitsOfWorkSurviveJavaSerialisation() throws Exception {
        // the sweep's unit of work and its answer travel between machines as plain serialised values
        IntervalResult r = new IntervalResult(new IntervalTask(3, 7), 2, true, new IntervalHomology(0,
                java.util.List.of(0, 1, 2), java.util.List.of(java.util.List.of(), java.util.List.of(BigInteger.TWO),
                        java.util.List.of())), IntervalResult.How.COMPUTED);
        java.io.ByteArrayOutputStream bytes = new java.io.ByteArrayOutputStream();
        try (java.io.ObjectOutputStream out = new java.io.ObjectOutputStream(bytes)) {
            out.writeObject(r);
        }
        try (java.io.ObjectInputStream in = new java.io.ObjectInputStream(
                new java.io.ByteArrayInputStream(bytes.toByteArray()))) {
            assertEquals(r, in.readObject());
        }
    }

    @Test
    void emptyIntervalsAreTheMinusOneSphere() {
        // a cover x ⋖ y: the empty complex, H~_{-1} = Z, μ = -1 (Philip Hall: μ = reduced Euler characteristic)
        SweepReport r = sweep(SimplexFaces.boundaryFacePoset(2), Coefficients.INTEGERS);
        IntervalResult first = r.results().get(0);
        assertEquals(-1, first.dimension());
        assertEquals(IntervalHomology.emptyComplex(), first.homology());
        assertEquals(BigInteger.ONE.negate(), r.mobius().value(first.task().lower(), first.task().upper()));
    }
}
