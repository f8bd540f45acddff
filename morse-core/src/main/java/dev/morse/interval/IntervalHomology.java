package dev.morse.interval;

import dev.morse.homology.Homology;
import dev.morse.homology.HomologyGroup;
import java.io.Serializable;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;

/**
 * The reduced homology of the order complex of one open interval, in dimensions
 * {@code lowestDimension .. lowestDimension + betti.size() - 1}. The order complex of an empty
 * interval (a cover {@code x ⋖ y}) is the empty complex, whose only reduced homology is
 * {@code H̃_{-1} = Z} by the usual convention (e.g. Wachs, "Poset topology", 2007, §1.1, from
 * memory); it is the one value with {@code lowestDimension = -1}. Every other value starts at
 * dimension 0. A plain serialisable value.
 *
 * @param lowestDimension -1 for the empty interval, else 0
 * @param betti the Betti numbers, by dimension from {@code lowestDimension}
 * @param torsion the torsion invariant factors, by dimension from {@code lowestDimension}
 */
public record IntervalHomology(int lowestDimension, List<Integer> betti, List<List<BigInteger>> torsion)
        implements Serializable {
    private static final long serialVersionUID = 1L;

    private static final IntervalHomology EMPTY = new IntervalHomology(-1, List.of(1), List.of(List.of()));

    /** Validates and copies. */
    public IntervalHomology {
        if (lowestDimension != -1 && lowestDimension != 0) {
            throw new IllegalArgumentException("reduced homology starts in dimension -1 or 0");
        }
        betti = List.copyOf(betti);
        List<List<BigInteger>> copies = new ArrayList<>();
        for (List<BigInteger> factors : torsion) {
            copies.add(List.copyOf(factors));
        }
        torsion = List.copyOf(copies);
        if (betti.size() != torsion.size()) {
            throw new IllegalArgumentException("Betti numbers and torsion must cover the same dimensions");
        }
        if (lowestDimension == -1 && betti.size() != 1) {
            throw new IllegalArgumentException("only the empty complex has homology in dimension -1");
        }
    }

    /** The empty complex: {@code H̃_{-1} = Z}. */
    public static IntervalHomology emptyComplex() {
        return EMPTY;
    }

    /** The reduced homology computed by an engine, dimensions from 0. */
    public static IntervalHomology of(Homology reduced) {
        if (!reduced.reduced()) {
            throw new IllegalArgumentException("reduced homology expected");
        }
        List<Integer> b = new ArrayList<>();
        List<List<BigInteger>> t = new ArrayList<>();
        for (HomologyGroup g : reduced.groups()) {
            b.add(g.betti());
            t.add(g.torsion());
        }
        return new IntervalHomology(0, b, t);
    }

    /** Free groups of the given ranks in dimensions {@code 0, 1, ...}. */
    public static IntervalHomology free(int... ranks) {
        List<Integer> b = new ArrayList<>();
        List<List<BigInteger>> t = new ArrayList<>();
        for (int r : ranks) {
            b.add(r);
            t.add(List.of());
        }
        return new IntervalHomology(0, b, t);
    }

    /** The highest dimension listed. */
    public int topDimension() {
        return lowestDimension + betti.size() - 1;
    }

    /** The group in dimension {@code d}; trivial outside the listed range. */
    public HomologyGroup group(int d) {
        int i = d - lowestDimension;
        return i >= 0 && i < betti.size() ? new HomologyGroup(d, betti.get(i), torsion.get(i))
                : HomologyGroup.free(d, 0);
    }

    /** The listed groups, lowest dimension first. */
    public List<HomologyGroup> groups() {
        List<HomologyGroup> out = new ArrayList<>();
        for (int i = 0; i < betti.size(); i++) {
            out.add(new HomologyGroup(lowestDimension + i, betti.get(i), torsion.get(i)));
        }
        return out;
    }

    /** Whether every group in a dimension below {@code d} is zero. */
    public boolean vanishesBelow(int d) {
        for (int i = 0; i < betti.size() && lowestDimension + i < d; i++) {
            if (betti.get(i) != 0 || !torsion.get(i).isEmpty()) {
                return false;
            }
        }
        return true;
    }

    /**
     * The reduced Euler characteristic {@code Σ (-1)^d β̃_d}, the same over every field and over the
     * integers (torsion does not count).
     */
    public long reducedEulerCharacteristic() {
        long chi = 0;
        for (int i = 0; i < betti.size(); i++) {
            int d = lowestDimension + i;
            chi = Math.addExact(chi, (d % 2 == 0 ? 1L : -1L) * betti.get(i));
        }
        return chi;
    }
}
