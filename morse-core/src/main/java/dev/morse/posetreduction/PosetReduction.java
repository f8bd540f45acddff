package dev.morse.posetreduction;

import dev.morse.poset.Poset;
import dev.morse.progress.Progress;
import it.unimi.dsi.fastutil.ints.IntArrayList;

/**
 * Shrinks a poset without changing the integral homology of its order complex, by two rules.
 *
 * <p><b>Beat points</b> (Stong, "Finite topological spaces", 1966): an element that covers exactly
 * one element, or is covered by exactly one, can be removed without changing the homotopy type of
 * the order complex. They are removed until none is left, which leaves the core.
 *
 * <p><b>Acyclic links</b>: if the open lower set {@code P_<x} or the open upper set
 * {@code P_>x} has an order complex with zero reduced integral homology, then removing x keeps
 * the homology of Δ(P). For Δ(P) is the union of Δ(P - x) and the cone x * L with
 * {@code L = Δ(P_<x) * Δ(P_>x)}, meeting in L; one factor of the join L being acyclic, L is acyclic
 * by the join formula for reduced homology, and the Mayer–Vietoris sequence gives
 * {@code H̃(Δ(P)) ≅ H̃(Δ(P - x))}. (Weak points, Barmak and Minian 2008, are the homotopy version,
 * with contractible links.) When the poset has a single maximal element every other element has it
 * above as a greatest element of its upper link, so a bounded poset reduces to one point.
 *
 * <p>The beat points go first, being free; then the elements are swept bottom up for acyclic links,
 * each removal followed by the beat points it creates, for up to {@link ReductionLimits#passes()}
 * sweeps. Links above the limits, and all links once the work budget is spent, are left alone.
 * Memory: that of {@link HasseWorkspace}, about 40 bytes per element and 16 per cover.
 */
public final class PosetReduction {
    private PosetReduction() {
    }

    /** Reduces with {@link ReductionLimits#DEFAULT}. */
    public static ReductionResult reduce(Poset poset) {
        return reduce(poset, ReductionLimits.DEFAULT);
    }

    /** Reduces {@code poset}; the result's order complex has the same integral homology. */
    public static ReductionResult reduce(Poset poset, ReductionLimits limits) {
        long start = System.nanoTime();
        HasseWorkspace hasse = new HasseWorkspace(poset);
        Run run = new Run(hasse, new LinkTest(hasse, limits, limits.budget(poset.size(), poset.coverCount())));
        for (int x = 0; x < poset.size(); x++) {
            run.queue(x);
        }
        run.removeBeatPoints();
        int[] bottomUp = poset.linearExtension();
        Progress progress = Progress.current();
        progress.begin("poset reduction", "elements", (long) limits.passes() * poset.size());
        for (int pass = 0; pass < limits.passes(); pass++) {
            progress.reached((long) pass * poset.size());
            if (run.sweep(bottomUp) == 0) {
                break;
            }
        }
        Poset reduced = hasse.aliveCount() == poset.size() ? poset : hasse.toPoset();
        ReductionStats stats = new ReductionStats(poset.size(), reduced.size(), run.beatPoints, run.acyclicLinks,
                run.skipped, Math.max(0, System.nanoTime() - start) / 1e6);
        return new ReductionResult(reduced, stats);
    }

    /** The state of one reduction: the workspace, the queue of elements to look at, the counts. */
    private static final class Run {
        private final HasseWorkspace hasse;
        private final LinkTest links;
        private final IntArrayList queue = new IntArrayList();
        private final boolean[] queued;
        private int beatPoints;
        private int acyclicLinks;
        private int skipped;

        Run(HasseWorkspace hasse, LinkTest links) {
            this.hasse = hasse;
            this.links = links;
            this.queued = new boolean[hasse.size()];
        }

        void queue(int x) {
            if (!queued[x] && hasse.isAlive(x)) {
                queued[x] = true;
                queue.add(x);
            }
        }

        void removeBeatPoints() {
            while (!queue.isEmpty()) {
                int x = queue.popInt();
                queued[x] = false;
                if (hasse.isAlive(x) && hasse.aliveCount() > 1 && hasse.isBeatPoint(x)) {
                    hasse.remove(x, this::queue);
                    beatPoints++;
                }
            }
        }

        /** One bottom-up sweep for acyclic links; returns the number of elements removed. */
        int sweep(int[] bottomUp) {
            int before = hasse.aliveCount();
            for (int x : bottomUp) {
                if (!hasse.isAlive(x) || hasse.aliveCount() == 1) {
                    continue;
                }
                if (hasse.isBeatPoint(x)) {
                    hasse.remove(x, this::queue);
                    beatPoints++;
                } else if (hasAcyclicLink(x)) {
                    hasse.remove(x, this::queue);
                    acyclicLinks++;
                } else {
                    continue;
                }
                removeBeatPoints();
            }
            return before - hasse.aliveCount();
        }

        private boolean hasAcyclicLink(int x) {
            if ((hasse.maximalCount() == 1 && hasse.upperCount(x) > 0)
                    || (hasse.minimalCount() == 1 && hasse.lowerCount(x) > 0)) {
                return true; // the only maximal (minimal) element lies above (below) x
            }
            boolean wasSkipped = false;
            for (boolean down : new boolean[] {true, false}) {
                LinkTest.Verdict verdict = links.test(x, down);
                if (verdict == LinkTest.Verdict.ACYCLIC) {
                    return true;
                }
                wasSkipped |= verdict == LinkTest.Verdict.SKIPPED;
            }
            if (wasSkipped) {
                skipped++;
            }
            return false;
        }
    }
}
