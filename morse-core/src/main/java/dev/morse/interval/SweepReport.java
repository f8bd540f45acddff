package dev.morse.interval;

import dev.morse.homology.Coefficients;
import java.math.BigInteger;
import java.util.List;
import java.util.Optional;

/**
 * What a sweep over the intervals of P̂ found, and the verdicts built on it. Immutable.
 *
 * <ul>
 * <li><b>pure</b>: all maximal chains of P̂ have the same length;
 * <li><b>Cohen–Macaulay</b> over the coefficients: P̂ is pure and every open interval {@code (x, y)}
 *     has {@code H̃_i(Δ(x, y)) = 0} for {@code i < dim Δ(x, y) = r(y) - r(x) - 2} (Munkres 1984;
 *     Baclawski 1980); the witness is the first interval in sweep order that is not graded or has
 *     homology below its dimension;
 * <li><b>spherical</b>: the reduced homology of Δ(P), the interval (0̂, 1̂), lies only in its top
 *     dimension; unknown when a sweep stopped at a failure before reaching (0̂, 1̂);
 * <li><b>Eulerian</b>: P̂ is pure and {@code μ(x, y) = (-1)^(r(y) - r(x))} on every interval
 *     (Stanley, Enumerative Combinatorics I, §3.16, from memory);
 * <li><b>Gorenstein*</b>: Cohen–Macaulay, and every open interval a homology sphere, its top reduced
 *     homology of rank one (Stanley, Combinatorics and Commutative Algebra, 1996, Ch. II §5, from memory).
 * </ul>
 *
 * @param source the input's name
 * @param coefficients the coefficients of the homology and of the verdicts
 * @param hat P̂, whose labels name the intervals
 * @param intervals the number of intervals {@code x < y} of P̂
 * @param pure whether P̂ is pure
 * @param rank the rank of 1̂ (the length of P̂) when pure, else -1
 * @param results the swept intervals, in sweep order: all of them, or up to the first failure
 * @param cohenMacaulay the Cohen–Macaulay verdict
 * @param witness the first interval that fails the Cohen–Macaulay condition, if any
 * @param spherical the spherical verdict, empty when (0̂, 1̂) was not swept
 * @param eulerian the Eulerian verdict
 * @param gorensteinStar the Gorenstein* verdict
 * @param mobius μ on every interval of P̂
 * @param allIntervals every interval of P̂, in sweep order
 */
public record SweepReport(String source, Coefficients coefficients, PosetWithBounds hat, long intervals, boolean pure,
        int rank, List<IntervalResult> results, boolean cohenMacaulay, Optional<IntervalResult> witness,
        Optional<Boolean> spherical, boolean eulerian, boolean gorensteinStar, MobiusTable mobius,
        List<IntervalTask> allIntervals) {
    /** Copies the lists. */
    public SweepReport {
        results = List.copyOf(results);
        allIntervals = List.copyOf(allIntervals);
    }

    static SweepReport of(PosetWithBounds hat, String source, Coefficients coefficients, List<IntervalResult> results,
            MobiusTable mobius, List<IntervalTask> all) {
        IntervalResult witness = null;
        IntervalResult whole = null;
        boolean spheres = true;
        for (IntervalResult r : results) {
            if (witness == null && !r.cohenMacaulay()) {
                witness = r;
            }
            spheres &= r.homologySphere();
            if (r.task().lower() == hat.bottom() && r.task().upper() == hat.top()) {
                whole = r;
            }
        }
        boolean pure = hat.isPure();
        boolean cm = pure && witness == null && results.size() == all.size();
        Optional<Boolean> spherical = whole == null ? Optional.empty()
                : Optional.of(whole.homology().vanishesBelow(whole.dimension()));
        boolean eulerian = pure;
        for (int i = 0; eulerian && i < all.size(); i++) {
            IntervalTask t = all.get(i);
            int length = hat.height(t.upper()) - hat.height(t.lower());
            eulerian = mobius.value(t.lower(), t.upper()).equals(BigInteger.valueOf(length % 2 == 0 ? 1 : -1));
        }
        return new SweepReport(source, coefficients, hat, hat.intervalCount(), pure,
                pure ? hat.height(hat.top()) : -1, results, cm, Optional.ofNullable(witness), spherical, eulerian,
                cm && spheres, mobius, all);
    }

    /** The label of an element of P, or {@code null} for 0̂ and 1̂. */
    public String label(int id) {
        return hat.label(id);
    }

    /** μ(x, y) of an interval. */
    public BigInteger mobius(IntervalTask task) {
        return mobius.value(task.lower(), task.upper());
    }

    /** How many intervals were swept. */
    public int swept() {
        return results.size();
    }

    /** How many swept intervals were solved in the given way. */
    public long count(IntervalResult.How how) {
        return results.stream().filter(r -> r.how() == how).count();
    }

    /** How many swept intervals went to the homology engine. */
    public long computed() {
        return count(IntervalResult.How.COMPUTED);
    }

    /** How many swept intervals needed no engine: graphs and cones. */
    public long skipped() {
        return swept() - computed();
    }

    /** Whether the sweep stopped at a failure before the end. */
    public boolean stoppedEarly() {
        return results.size() < allIntervals.size();
    }
}
