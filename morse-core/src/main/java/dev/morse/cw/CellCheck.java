package dev.morse.cw;

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
 * The conditions {@link CwPosetCheck} puts on one element, given that every element of smaller
 * height passed and has its incidence signs: thinness, the sphere test of the cells below it, and
 * its own signs. One instance per thread; it writes only the signs of its element's own covers.
 *
 * <p>The cells strictly below an element get local numbers, so that all scratch arrays but two
 * are as long as the largest lower set, not the poset: 8 bytes per element per thread plus about
 * 40 bytes per cell and incidence of the largest lower set.
 */
final class CellCheck {
    private static final int LISTED_LABELS = 4;

    private final Poset poset;
    private final Adjacency lower;
    private final byte[] signs;
    /** Per element: the element whose lower set last numbered it, and its number there. */
    private final int[] owner;
    private final int[] local;
    private final CoreductionSphereTest sphereTest = new CoreductionSphereTest();
    private final KnownSpheres knownSpheres = new KnownSpheres();

    // the lower set of the element being checked, by local number
    private int size;
    private int[] cells = new int[16];
    private int[] dimension = new int[16];
    private int[] faceStart = new int[17];
    private int[] faces = new int[16];
    private int[] cofaceStart = new int[18];
    private int[] cofaces = new int[16];
    // intervals of length 2 and signs, by local number of the bottom or the middle element
    private int[] middleMark = new int[16];
    private int[] middleCount = new int[16];
    private int[] middleFirst = new int[16];
    private int[] middleSecond = new int[16];
    private int[] signMark = new int[16];
    private byte[] localSign = new byte[16];
    private final IntArrayList bottoms = new IntArrayList();
    private final IntArrayList queue = new IntArrayList();

    CellCheck(Poset poset, byte[] signs) {
        this.poset = poset;
        this.lower = poset.lowerCovers();
        this.signs = signs;
        this.owner = new int[poset.size()];
        this.local = new int[poset.size()];
        Arrays.fill(owner, -1);
        // marks hold element ids, so a fresh array must not claim to belong to element 0
        Arrays.fill(middleMark, -1);
        Arrays.fill(signMark, -1);
    }

    /** Why the poset is not graded (every cover raising the height by one), or null. */
    static String gradedFailure(Poset poset) {
        Adjacency lower = poset.lowerCovers();
        for (int x = 0; x < poset.size(); x++) {
            for (int i = lower.start(x); i < lower.end(x); i++) {
                int y = lower.target(i);
                if (poset.height(y) != poset.height(x) - 1) {
                    return "not graded: " + q(poset, x) + " (height " + poset.height(x) + ") covers " + q(poset, y)
                            + " (height " + poset.height(y) + "), but in a CW poset every cover raises the height by one";
                }
            }
        }
        return null;
    }

    /** Why {@code x} fails, or null after setting the signs of its covers. */
    String failure(int x) {
        int h = poset.height(x);
        if (h == 0) {
            return null;
        }
        if (h == 1) {
            return edgeFailure(x);
        }
        collectLowerSet(x);
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

    /** Numbers the elements strictly below x in the order a breadth-first search down meets them. */
    private void collectLowerSet(int x) {
        size = 0;
        owner[x] = x;
        local[x] = -1;
        int incidences = 0;
        addCell(x);
        for (int head = 0; head < size; head++) {
            int y = cells[head];
            for (int j = lower.start(y); j < lower.end(y); j++) {
                int z = lower.target(j);
                if (owner[z] != x) {
                    owner[z] = x;
                    local[z] = size;
                    addCell(z);
                }
            }
            if (head > 0) {
                incidences += lower.degree(y);
            }
        }
        // drop x itself from the front: local numbers count from its first lower cover
        System.arraycopy(cells, 1, cells, 0, size - 1);
        size--;
        for (int c = 0; c < size; c++) {
            local[cells[c]]--;
        }
        growLocal(size, incidences);
    }

    private void addCell(int y) {
        if (size == cells.length) {
            cells = Arrays.copyOf(cells, 2 * size);
        }
        cells[size++] = y;
    }

    private void growLocal(int cellCount, int incidences) {
        if (dimension.length < cellCount) {
            int length = Math.max(cellCount, 2 * dimension.length);
            dimension = new int[length];
            faceStart = new int[length + 1];
            cofaceStart = new int[length + 2];
            middleMark = new int[length];
            middleCount = new int[length];
            middleFirst = new int[length];
            middleSecond = new int[length];
            signMark = new int[length];
            localSign = new byte[length];
            Arrays.fill(middleMark, -1);
            Arrays.fill(signMark, -1);
        }
        if (faces.length < incidences) {
            int length = Math.max(incidences, 2 * faces.length);
            faces = new int[length];
            cofaces = new int[length];
        }
    }

    /** Counts the middle elements of every interval [z, x] of length 2 and keeps the first two. */
    private String thinFailure(int x) {
        bottoms.clear();
        for (int i = lower.start(x); i < lower.end(x); i++) {
            int y = lower.target(i);
            for (int j = lower.start(y); j < lower.end(y); j++) {
                int z = lower.target(j);
                int lz = local[z];
                if (middleMark[lz] != x) {
                    middleMark[lz] = x;
                    middleCount[lz] = 1;
                    middleFirst[lz] = y;
                    bottoms.add(z);
                } else if (++middleCount[lz] == 2) {
                    middleSecond[lz] = y;
                }
            }
        }
        for (int k = 0; k < bottoms.size(); k++) {
            int z = bottoms.getInt(k);
            int count = middleCount[local[z]];
            if (count != 2) {
                return "not thin: the interval from " + q(z) + " to " + q(x) + " has "
                        + (count == 1 ? "only one middle element, " + q(middleFirst[local[z]])
                                : count + " middle elements (" + listed(middles(z, x)) + ")")
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
     * The cells below x must have the homology of the sphere of dimension h - 1. Coreduction on
     * their cellular complex settles the usual case in time linear in its size; whenever it leaves
     * more than the two critical cells of a perfect sphere the homology is computed in full, so the
     * verdict is exactly the homology test, however good or bad the matching. A lower set whose
     * boundary lists equal, entry for entry, those of one proven before is the same complex and
     * needs no second proof ({@link KnownSpheres}).
     */
    private String sphereFailure(int x) {
        int h = poset.height(x);
        int e = 0;
        for (int c = 0; c < size; c++) {
            int y = cells[c];
            faceStart[c] = e;
            for (int j = lower.start(y); j < lower.end(y); j++) {
                faces[e++] = local[lower.target(j)];
            }
        }
        faceStart[size] = e;
        long shape = KnownSpheres.hash(size, h - 1, faceStart, faces);
        if (knownSpheres.contains(shape, size, h - 1, faceStart, faces)) {
            return null;
        }
        Arrays.fill(cofaceStart, 0, size + 2, 0);
        for (int c = 0; c < size; c++) {
            dimension[c] = poset.height(cells[c]);
            for (int i = faceStart[c]; i < faceStart[c + 1]; i++) {
                cofaceStart[faces[i] + 2]++;
            }
        }
        for (int c = 0; c < size; c++) {
            cofaceStart[c + 2] += cofaceStart[c + 1];
        }
        for (int c = 0; c < size; c++) {
            for (int i = faceStart[c]; i < faceStart[c + 1]; i++) {
                cofaces[cofaceStart[faces[i] + 1]++] = c;
            }
        }
        if (sphereTest.perfectSphere(size, dimension, faceStart, faces, cofaceStart, cofaces, h - 1)) {
            knownSpheres.add(shape, size, h - 1, faceStart, faces);
            return null;
        }
        return homologySphereFailure(x);
    }

    /** The cellular homology of the cells strictly below x by Smith normal form, which must be that of a sphere. */
    private String homologySphereFailure(int x) {
        int h = poset.height(x);
        int[] below = sortedLowerSet();
        int[] counts = new int[h];
        for (int y : below) {
            counts[poset.height(y)]++;
        }
        int[] position = new int[size];
        for (int c = 0; c < below.length; c++) {
            position[local[below[c]]] = c;
        }
        int[] offsets = new int[below.length + 1];
        int entries = 0;
        for (int y : below) {
            entries += lower.degree(y);
        }
        int[] targets = new int[entries];
        int[] coefficients = new int[entries];
        int e = 0;
        for (int c = 0; c < below.length; c++) {
            int y = below[c];
            for (int j = lower.start(y); j < lower.end(y); j++) {
                targets[e] = position[local[lower.target(j)]];
                coefficients[e] = signs[j];
                e++;
            }
            offsets[c + 1] = e;
        }
        ChainComplex complex = new ListedComplex(ComplexKind.CELLULAR, new GradedCells(counts),
                new Boundary(offsets, targets, coefficients), c -> poset.label(below[c]));
        Homology homology;
        // the homology of one lower set is part of this check, not a phase of its own
        try (ProgressScope quiet = Progress.use(Progress.SILENT)) {
            homology = HomologyCalculator.compute(complex, Coefficients.INTEGERS);
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

    /** The elements strictly below the current element, sorted by height and then id. */
    private int[] sortedLowerSet() {
        long[] keys = new long[size];
        for (int c = 0; c < size; c++) {
            keys[c] = ((long) poset.height(cells[c]) << 32) | cells[c];
        }
        Arrays.sort(keys);
        int[] sorted = new int[size];
        for (int c = 0; c < size; c++) {
            sorted[c] = (int) keys[c];
        }
        return sorted;
    }

    private static String describe(Homology homology) {
        StringBuilder s = new StringBuilder();
        for (HomologyGroup g : homology.groups()) {
            s.append(s.length() > 0 ? ", " : "").append('H').append(g.dimension()).append(" = ").append(g);
        }
        return s.toString();
    }

    /**
     * Propagates signs over the lower covers of {@code x} through the diamonds below it; needs the
     * middle elements from {@link #thinFailure}. Fails on a contradiction or when the diamonds do
     * not connect all lower covers.
     */
    private String signFailure(int x) {
        int first = lower.target(lower.start(x));
        signMark[local[first]] = x;
        localSign[local[first]] = 1;
        queue.clear();
        queue.add(first);
        for (int head = 0; head < queue.size(); head++) {
            int y = queue.getInt(head);
            int ySign = localSign[local[y]];
            for (int j = lower.start(y); j < lower.end(y); j++) {
                int z = lower.target(j);
                int lz = local[z];
                int other = middleFirst[lz] == y ? middleSecond[lz] : middleFirst[lz];
                int wanted = -ySign * signs[j] * signs[coverIndex(other, z)];
                int lo = local[other];
                if (signMark[lo] != x) {
                    signMark[lo] = x;
                    localSign[lo] = (byte) wanted;
                    queue.add(other);
                } else if (localSign[lo] != wanted) {
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
            signs[i] = localSign[local[lower.target(i)]];
        }
        return null;
    }

    /** The lower covers of x split into classes joined through shared faces: count them. */
    private String disconnectedReason(int x) {
        int pieces = 0;
        int mark = -2 - x; // distinct from every mark used by signFailure
        for (int i = lower.start(x); i < lower.end(x); i++) {
            int start = lower.target(i);
            if (signMark[local[start]] == mark) {
                continue;
            }
            pieces++;
            queue.clear();
            queue.add(start);
            signMark[local[start]] = mark;
            for (int head = 0; head < queue.size(); head++) {
                int y = queue.getInt(head);
                for (int j = lower.start(y); j < lower.end(y); j++) {
                    int lz = local[lower.target(j)];
                    int other = middleFirst[lz] == y ? middleSecond[lz] : middleFirst[lz];
                    if (signMark[local[other]] != mark) {
                        signMark[local[other]] = mark;
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

    private String q(int x) {
        return q(poset, x);
    }

    private static String q(Poset poset, int x) {
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
