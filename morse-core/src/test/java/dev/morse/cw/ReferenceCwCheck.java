package dev.morse.cw;

import dev.morse.complex.CellularComplex;

import dev.morse.complex.Boundary;
import dev.morse.complex.ChainComplex;
import dev.morse.complex.ComplexKind;
import dev.morse.complex.GradedCells;
import dev.morse.complex.ListedComplex;

import dev.morse.homology.Coefficients;
import dev.morse.homology.Homology;
import dev.morse.homology.HomologyCalculator;
import dev.morse.homology.HomologyGroup;
import dev.morse.poset.Adjacency;
import dev.morse.poset.Poset;
import dev.morse.progress.Progress;
import dev.morse.progress.ProgressScope;
import it.unimi.dsi.fastutil.ints.IntArrayList;
import java.util.Arrays;

/**
 * The CW poset check as it was before the coreduction sphere test and the parallel driver: the
 * homology of every lower set by a full Smith normal form, one element after another. Kept as the
 * oracle that the production check must agree with, verdict, reason and signs.
 */
final class ReferenceCwCheck {
    private ReferenceCwCheck() {
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

    /** Whether {@code poset} is a CW poset, with the first failure's reason if not. */
    public static CwPosetVerdict check(Poset poset) {
        return analyse(poset).verdict();
    }

    /** The verdict and, if it passed, the incidence signs. */
    static CwStructure analyse(Poset poset) {
        return new Run(poset).run();
    }

    /** One check of one poset, with scratch arrays indexed by element and reused through stamps. */
    private static final class Run {
        private static final int LISTED_LABELS = 4;

        private final Poset poset;
        private final Adjacency lower;
        private final int n;
        private final byte[] signs;
        private final int[] middleStamp;
        private final int[] middleCount;
        private final int[] middleFirst;
        private final int[] middleSecond;
        private final int[] signStamp;
        private final byte[] localSign;
        private final int[] belowStamp;
        private final int[] localIndex;
        private final IntArrayList bottoms = new IntArrayList();
        private final IntArrayList queue = new IntArrayList();

        Run(Poset poset) {
            this.poset = poset;
            this.lower = poset.lowerCovers();
            this.n = poset.size();
            this.signs = new byte[poset.coverCount()];
            this.middleStamp = filled(n);
            this.middleCount = new int[n];
            this.middleFirst = new int[n];
            this.middleSecond = new int[n];
            this.signStamp = filled(n);
            this.localSign = new byte[n];
            this.belowStamp = filled(n);
            this.localIndex = new int[n];
        }

        private static int[] filled(int length) {
            int[] a = new int[length];
            Arrays.fill(a, -1);
            return a;
        }

        CwStructure run() {
            String failure = gradedFailure();
            if (failure != null) {
                return CwStructure.failed(failure);
            }
            Progress progress = Progress.current();
            progress.begin("cw check", "elements", n);
            int checked = 0;
            for (int x : byHeight()) {
                failure = elementFailure(x);
                if (failure != null) {
                    return CwStructure.failed(failure);
                }
                if ((++checked & 0x3FF) == 0) {
                    progress.reached(checked);
                }
            }
            return CwStructure.passed(signs);
        }

        private String gradedFailure() {
            for (int x = 0; x < n; x++) {
                for (int i = lower.start(x); i < lower.end(x); i++) {
                    int y = lower.target(i);
                    if (poset.height(y) != poset.height(x) - 1) {
                        return "not graded: " + q(x) + " (height " + poset.height(x) + ") covers " + q(y)
                                + " (height " + poset.height(y) + "), but in a CW poset every cover raises the height by one";
                    }
                }
            }
            return null;
        }

        private int[] byHeight() {
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

        private String elementFailure(int x) {
            int h = poset.height(x);
            if (h == 0) {
                return null;
            }
            if (h == 1) {
                return edgeFailure(x);
            }
            String failure = thinFailure(x);
            if (failure == null && h >= 3) {
                failure = sphereFailure(x);
            }
            return failure != null ? failure : signFailure(x);
        }

        private String edgeFailure(int x) {
            int degree = lower.degree(x);
            if (degree != 2) {
                return q(x) + " has height 1 but covers " + (degree == 1 ? "only " + q(lower.target(lower.start(x)))
                        : degree + " elements (" + listed(lower.neighbours(x)) + ")")
                        + "; in a CW poset an element of height 1 covers exactly two";
            }
            signs[lower.start(x)] = -1;
            signs[lower.start(x) + 1] = 1;
            return null;
        }

        /** Counts the middle elements of every interval [z, x] of length 2 and keeps the first two. */
        private String thinFailure(int x) {
            bottoms.clear();
            for (int i = lower.start(x); i < lower.end(x); i++) {
                int y = lower.target(i);
                for (int j = lower.start(y); j < lower.end(y); j++) {
                    int z = lower.target(j);
                    if (middleStamp[z] != x) {
                        middleStamp[z] = x;
                        middleCount[z] = 1;
                        middleFirst[z] = y;
                        bottoms.add(z);
                    } else if (++middleCount[z] == 2) {
                        middleSecond[z] = y;
                    }
                }
            }
            for (int k = 0; k < bottoms.size(); k++) {
                int z = bottoms.getInt(k);
                if (middleCount[z] != 2) {
                    return "not thin: the interval from " + q(z) + " to " + q(x) + " has "
                            + (middleCount[z] == 1 ? "only one middle element, " + q(middleFirst[z])
                                    : middleCount[z] + " middle elements (" + listed(middles(z, x)) + ")")
                            + "; in a CW poset every interval of length 2 has exactly two";
                }
            }
            return null;
        }

        private int[] middles(int z, int x) {
            IntArrayList found = new IntArrayList();
            for (int i = lower.start(x); i < lower.end(x); i++) {
                if (lower.contains(lower.target(i), z)) {
                    found.add(lower.target(i));
                }
            }
            return found.toIntArray();
        }

        /**
         * Propagates signs over the lower covers of {@code x} through the diamonds below it; needs the
         * middle elements from {@link #thinFailure}. Fails on a contradiction or when the diamonds do
         * not connect all lower covers.
         */
        private String signFailure(int x) {
            int first = lower.target(lower.start(x));
            signStamp[first] = x;
            localSign[first] = 1;
            queue.clear();
            queue.add(first);
            for (int head = 0; head < queue.size(); head++) {
                int y = queue.getInt(head);
                for (int j = lower.start(y); j < lower.end(y); j++) {
                    int z = lower.target(j);
                    int other = middleFirst[z] == y ? middleSecond[z] : middleFirst[z];
                    int wanted = -localSign[y] * signs[j] * signs[coverIndex(other, z)];
                    if (signStamp[other] != x) {
                        signStamp[other] = x;
                        localSign[other] = (byte) wanted;
                        queue.add(other);
                    } else if (localSign[other] != wanted) {
                        return "no incidence signs fit the covers of " + q(x) + ": the diamond " + q(z) + " < "
                                + q(y) + ", " + q(other) + " < " + q(x) + " contradicts the others (the cells below "
                                + q(x) + " are not an orientable sphere)";
                    }
                }
            }
            if (queue.size() < lower.degree(x)) {
                return disconnectedReason(x);
            }
            for (int i = lower.start(x); i < lower.end(x); i++) {
                signs[i] = localSign[lower.target(i)];
            }
            return null;
        }

        /** The lower covers of x split into classes joined through shared faces: count them. */
        private String disconnectedReason(int x) {
            int pieces = 0;
            int mark = -2 - x; // distinct from every stamp used by signFailure
            for (int i = lower.start(x); i < lower.end(x); i++) {
                int start = lower.target(i);
                if (signStamp[start] == mark) {
                    continue;
                }
                pieces++;
                queue.clear();
                queue.add(start);
                signStamp[start] = mark;
                for (int head = 0; head < queue.size(); head++) {
                    int y = queue.getInt(head);
                    for (int j = lower.start(y); j < lower.end(y); j++) {
                        int z = lower.target(j);
                        int other = middleFirst[z] == y ? middleSecond[z] : middleFirst[z];
                        if (signStamp[other] != mark) {
                            signStamp[other] = mark;
                            queue.add(other);
                        }
                    }
                }
            }
            int h = poset.height(x);
            if (h == 2) {
                return "the edges below " + q(x) + " form " + pieces + " separate cycles, not one circle";
            }
            return "the cells of dimension " + (h - 1) + " below " + q(x) + " fall into " + pieces
                    + " pieces that share no cell of dimension " + (h - 2) + ", so they are not a sphere";
        }

        private int coverIndex(int y, int z) {
            int lo = lower.start(y);
            int hi = lower.end(y) - 1;
            while (lo <= hi) {
                int mid = (lo + hi) >>> 1;
                int t = lower.target(mid);
                if (t < z) {
                    lo = mid + 1;
                } else if (t > z) {
                    hi = mid - 1;
                } else {
                    return mid;
                }
            }
            throw new IllegalStateException(poset.label(z) + " is not covered by " + poset.label(y));
        }

        /** The cellular homology of the cells strictly below x, which must be that of a sphere. */
        private String sphereFailure(int x) {
            int h = poset.height(x);
            int[] below = lowerSet(x);
            int[] counts = new int[h];
            for (int y : below) {
                counts[poset.height(y)]++;
            }
            int[] offsets = new int[below.length + 1];
            int entries = 0;
            for (int c = 0; c < below.length; c++) {
                localIndex[below[c]] = c;
                entries += lower.degree(below[c]);
            }
            int[] targets = new int[entries];
            int[] coefficients = new int[entries];
            int e = 0;
            for (int c = 0; c < below.length; c++) {
                int y = below[c];
                for (int j = lower.start(y); j < lower.end(y); j++) {
                    targets[e] = localIndex[lower.target(j)];
                    coefficients[e] = signs[j];
                    e++;
                }
                offsets[c + 1] = e;
            }
            ChainComplex cells = new ListedComplex(ComplexKind.CELLULAR, new GradedCells(counts),
                    new Boundary(offsets, targets, coefficients), c -> poset.label(below[c]));
            Homology homology;
            // the homology of one lower set is part of this check, not a phase of its own
            try (ProgressScope quiet = Progress.use(Progress.SILENT)) {
                homology = HomologyCalculator.compute(cells, Coefficients.INTEGERS);
            }
            for (int d = 0; d < h; d++) {
                HomologyGroup group = homology.group(d);
                int betti = d == 0 || d == h - 1 ? 1 : 0;
                if (group.betti() != betti || !group.torsion().isEmpty()) {
                    return "the cells below " + q(x) + " (height " + h + ") are not a sphere of dimension " + (h - 1)
                            + ": their homology is " + describe(homology);
                }
            }
            return null;
        }

        private static String describe(Homology homology) {
            StringBuilder s = new StringBuilder();
            for (HomologyGroup g : homology.groups()) {
                s.append(s.length() > 0 ? ", " : "").append('H').append(g.dimension()).append(" = ").append(g);
            }
            return s.toString();
        }

        /** The elements strictly below x, sorted by height and then id. */
        private int[] lowerSet(int x) {
            IntArrayList found = new IntArrayList();
            queue.clear();
            queue.add(x);
            belowStamp[x] = x;
            for (int head = 0; head < queue.size(); head++) {
                int y = queue.getInt(head);
                for (int j = lower.start(y); j < lower.end(y); j++) {
                    int z = lower.target(j);
                    if (belowStamp[z] != x) {
                        belowStamp[z] = x;
                        queue.add(z);
                        found.add(z);
                    }
                }
            }
            long[] keys = new long[found.size()];
            for (int k = 0; k < keys.length; k++) {
                int y = found.getInt(k);
                keys[k] = ((long) poset.height(y) << 32) | y;
            }
            Arrays.sort(keys);
            int[] sorted = new int[keys.length];
            for (int k = 0; k < keys.length; k++) {
                sorted[k] = (int) keys[k];
            }
            return sorted;
        }

        private String q(int x) {
            return "'" + poset.label(x) + "'";
        }

        private String listed(int[] elements) {
            StringBuilder s = new StringBuilder();
            for (int k = 0; k < elements.length && k < LISTED_LABELS; k++) {
                s.append(k > 0 ? ", " : "").append(q(elements[k]));
            }
            if (elements.length > LISTED_LABELS) {
                s.append(", ...");
            }
            return s.toString();
        }
    }
}
