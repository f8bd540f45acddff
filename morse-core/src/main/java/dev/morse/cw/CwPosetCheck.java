package dev.morse.cw;

import dev.morse.complex.CellularComplex;
import dev.morse.parallel.Workers;
import dev.morse.poset.Poset;
import dev.morse.progress.Progress;
import java.util.Arrays;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.Optional;

/**
 * Decides whether a poset is a CW poset, the face poset of a regular CW complex (Björner,
 * "Posets, regular CW complexes and Bruhat order", European J. Combin. 5, 1984): after adjoining
 * a bottom element every open lower interval {@code (0̂, x)} is a sphere of dimension
 * {@code height(x) - 1}. Since spheres cannot be recognised in general, the last condition is
 * checked up to homology, as is enough for computing homology.
 *
 * <p>Elements are visited by increasing height (then id), and each must pass, in this order:
 * <ol>
 * <li>the poset is graded: every cover raises the height by one (checked first, for all);
 * <li>an element of height 1 covers exactly two elements;
 * <li>thinness: every interval {@code [z, x]} of length 2 has exactly two middle elements;
 * <li>for height 2, the edges below {@code x} form one circle; for height {@code h >= 3}, the
 *     cellular homology of the cells below {@code x} (with the signs already found) is that of the
 *     sphere of dimension {@code h - 1};
 * <li>incidence signs {@code ε(x, y) = ±1} exist on the covers of {@code x} with
 *     {@code ε(x,y)ε(y,z) + ε(x,y')ε(y',z) = 0} on every diamond {@code z ⋖ y, y' ⋖ x}; for height 1
 *     the two vertices get -1 (lower id) and +1.
 * </ol>
 * The signs are found by propagation through the diamonds below {@code x}, starting from +1 on its
 * first lower cover: thinness makes each diamond fix the sign of the other middle element.
 *
 * <p>Why homology of the lower set is the right test: by induction the cells below {@code x} form a
 * regular CW complex (up to homology), whose cellular homology equals that of its order complex;
 * that any sign function with the diamond property computes the cellular homology of a regular CW
 * complex is recalled from memory (it is how cellular incidence numbers of regular complexes are
 * usually described; Björner 1984 for CW posets). Each element's lower set is visited once, for
 * its own check, so face posets whose lower sets are small are checked in linear time.
 *
 * <p>How the homology of a lower set is found: since the cells below {@code x} already have their
 * signs, their cellular chain complex is at hand, and coreduction ({@link CoreductionSphereTest})
 * reduces it first; when it leaves just one vertex and one cell of dimension {@code h - 1} the
 * homology is that of the sphere with no further work, in time linear in the size of the lower
 * set. Otherwise the homology is computed in full by Smith normal form, so the criterion is
 * exactly the homology test above in every case, and so is every reason given. The test is a
 * homology test and stays one, neither weaker nor stronger than before: a lower set with the
 * homology of a sphere passes, as it always did, whether or not it is a sphere.
 *
 * <p>Elements of one height depend only on the signs of lower heights, so each height is checked
 * by all {@link Workers} at once; the verdict, the reason (always the first failure in the order
 * height, then id) and the signs do not depend on the number of threads.
 */
public final class CwPosetCheck {
    private CwPosetCheck() {
    }

    /**
     * The cellular chain complex of a CW poset, with the incidence signs the check found.
     *
     * @throws IllegalArgumentException with the {@link CwPosetVerdict#reason()} if {@code poset}
     *     is not a CW poset
     */
    public static CellularComplex cellularComplex(Poset poset) {
        CwStructure structure = analyse(poset);
        if (!structure.verdict().isCwPoset()) {
            throw new IllegalArgumentException(structure.verdict().reason());
        }
        return CellularComplex.withIncidences(poset, structure.coverSigns());
    }

    /**
     * Analyses the poset once and builds the cellular complex if it is a CW poset; builds no order
     * complex, so a caller can decide whether to store one.
     */
    public static CellularAttempt tryCellular(Poset poset) {
        CwStructure structure = analyse(poset);
        CwPosetVerdict verdict = structure.verdict();
        return new CellularAttempt(verdict, verdict.isCwPoset()
                ? Optional.of(CellularComplex.withIncidences(poset, structure.coverSigns()))
                : Optional.empty());
    }

    /** Whether {@code poset} is a CW poset, with the first failure's reason if not. */
    public static CwPosetVerdict check(Poset poset) {
        return analyse(poset).verdict();
    }

    /** The verdict and, if it passed, the incidence signs. */
    static CwStructure analyse(Poset poset) {
        return analyse(poset, Workers.threads());
    }

    /**
     * The verdict and signs with {@code threads} workers; the result does not depend on their number.
     * Elements of one height depend only on lower heights, so each height is checked in parallel
     * and the failure reported is always the first in the order (height, id).
     */
    static CwStructure analyse(Poset poset, int threads) {
        String failure = CellCheck.gradedFailure(poset);
        if (failure != null) {
            return CwStructure.failed(failure);
        }
        int n = poset.size();
        byte[] signs = new byte[poset.coverCount()];
        int[] order = byHeight(poset);
        int top = poset.maxHeight();
        int[] levelEnd = new int[top + 1];
        for (int k = 0; k < n; k++) {
            levelEnd[poset.height(order[k])] = k + 1;
        }
        CellCheck[] checks = new CellCheck[Math.max(1, threads)];
        Progress progress = Progress.current();
        progress.begin("cw check", "elements", n);
        int levelStart = 0;
        for (int h = 0; h <= top; h++) {
            int from = levelStart;
            int to = levelEnd[h];
            levelStart = to;
            // lower sets grow with the height, so a few high cells may be worth sharing out
            int chunk = Math.max(1, Math.min(MAX_CHUNK, (to - from) / (4 * checks.length)));
            boolean worthSharing = h >= 3 ? to - from >= 2 : to - from >= 2 * MAX_CHUNK;
            failure = checks.length == 1 || !worthSharing
                    ? sequentialFailure(poset, signs, checks, order, from, to, progress)
                    : parallelFailure(poset, signs, checks, order, from, to, checks.length, chunk);
            if (failure != null) {
                return CwStructure.failed(failure);
            }
            progress.reached(to);
        }
        return CwStructure.passed(signs);
    }

    /** Most elements handed to a worker at a time. */
    private static final int MAX_CHUNK = 512;

    private static String sequentialFailure(Poset poset, byte[] signs, CellCheck[] checks, int[] order,
            int from, int to, Progress progress) {
        CellCheck check = checks[0] != null ? checks[0] : (checks[0] = new CellCheck(poset, signs));
        for (int k = from; k < to; k++) {
            String failure = check.failure(order[k]);
            if (failure != null) {
                return failure;
            }
            if ((k & 0x3FF) == 0) {
                progress.reached(k);
            }
        }
        return null;
    }

    private static String parallelFailure(Poset poset, byte[] signs, CellCheck[] checks, int[] order,
            int from, int to, int workers, int chunk) {
        AtomicInteger nextChunk = new AtomicInteger(from);
        AtomicInteger firstFailed = new AtomicInteger(Integer.MAX_VALUE);
        String[] reasons = new String[workers];
        int[] failedAt = new int[workers];
        Arrays.fill(failedAt, Integer.MAX_VALUE);
        Workers.share(workers, w -> {
            CellCheck check = checks[w] != null ? checks[w] : (checks[w] = new CellCheck(poset, signs));
            for (int start = nextChunk.getAndAdd(chunk); start < to; start = nextChunk.getAndAdd(chunk)) {
                int end = Math.min(to, start + chunk);
                for (int k = start; k < end && k < firstFailed.get(); k++) {
                    String failure = check.failure(order[k]);
                    if (failure != null) {
                        reasons[w] = failure;
                        failedAt[w] = k;
                        firstFailed.accumulateAndGet(k, Math::min);
                        break;
                    }
                }
            }
        });
        int best = -1;
        for (int w = 0; w < workers; w++) {
            if (failedAt[w] != Integer.MAX_VALUE && (best < 0 || failedAt[w] < failedAt[best])) {
                best = w;
            }
        }
        return best < 0 ? null : reasons[best];
    }

    /** Element ids sorted by height, then id. */
    private static int[] byHeight(Poset poset) {
        int n = poset.size();
        int top = poset.maxHeight();
        int[] start = new int[top + 2];
        for (int x = 0; x < n; x++) {
            start[poset.height(x) + 1]++;
        }
        for (int h = 0; h <= top; h++) {
            start[h + 1] += start[h];
        }
        int[] order = new int[n];
        for (int x = 0; x < n; x++) {
            order[start[poset.height(x)]++] = x;
        }
        return order;
    }
}
