package dev.morse.homology;

import java.util.ArrayList;
import java.util.List;

/**
 * Homology of a chain complex in dimensions {@code 0..top}, over given coefficients, unreduced or
 * reduced. Immutable.
 *
 * <p>The one exception to "from dimension 0" is the reduced homology of the empty complex, which is
 * the coefficient ring in dimension −1 and nothing else: the augmented chain complex of the empty
 * complex is the ring in degree −1 alone (common practice; e.g. Munkres, Elements of Algebraic
 * Topology, 1984, §7, and the convention that the empty set is the sphere S^{−1}, from memory).
 * It is then the single group listed, with dimension −1.
 */
public record Homology(Coefficients coefficients, boolean reduced, List<HomologyGroup> groups) {
    /**
     * Validates and copies: groups are listed by dimension from 0, or, for the reduced homology of
     * the empty complex, one free group of rank 1 in dimension −1.
     */
    public Homology {
        groups = List.copyOf(groups);
        int first = groups.isEmpty() ? 0 : groups.get(0).dimension();
        if (first == -1 && !(reduced && groups.size() == 1 && groups.get(0).equals(HomologyGroup.free(-1, 1)))) {
            throw new IllegalArgumentException("dimension -1 is only the reduced homology of the empty complex");
        }
        for (int i = 0; i < groups.size(); i++) {
            if (groups.get(i).dimension() != first + i || first < -1 || first > 0) {
                throw new IllegalArgumentException("groups must be listed by dimension from 0");
            }
            if (!coefficients.hasTorsion() && !groups.get(i).torsion().isEmpty()) {
                throw new IllegalArgumentException("torsion over a field");
            }
        }
    }

    /** The group in dimension {@code d}; trivial outside the computed range. */
    public HomologyGroup group(int d) {
        for (HomologyGroup g : groups) {
            if (g.dimension() == d) {
                return g;
            }
        }
        return HomologyGroup.free(d, 0);
    }

    /** Whether this is the reduced homology of the empty complex: the ring in dimension −1. */
    public boolean ofEmptyComplex() {
        return !groups.isEmpty() && groups.get(0).dimension() == -1;
    }

    /** Betti numbers by dimension, from the first group listed (dimension −1 only for {@link #ofEmptyComplex()}). */
    public int[] bettiNumbers() {
        return groups.stream().mapToInt(HomologyGroup::betti).toArray();
    }

    /**
     * The reduced homology: one less in dimension 0 when the complex is nonempty. Over a field or the
     * integers alike, H̃_0 is H_0 with one free summand fewer. The empty complex (no groups, or H_0 = 0,
     * which only the empty complex has) has H̃_{−1} = the ring and nothing else.
     */
    public Homology toReduced() {
        if (reduced) {
            return this;
        }
        if (groups.isEmpty() || groups.get(0).betti() == 0) {
            return new Homology(coefficients, true, List.of(HomologyGroup.free(-1, 1)));
        }
        List<HomologyGroup> g = new ArrayList<>(groups);
        HomologyGroup h0 = g.get(0);
        g.set(0, new HomologyGroup(0, h0.betti() - 1, h0.torsion()));
        return new Homology(coefficients, true, g);
    }

    /** The Euler characteristic Σ (-1)^d β_d (reduced when this homology is). */
    public long eulerCharacteristic() {
        long chi = 0;
        for (HomologyGroup g : groups) {
            chi += (g.dimension() % 2 == 0 ? 1 : -1) * (long) g.betti();
        }
        return chi;
    }

    /** One line per dimension, like {@code H1 = Z + Z/2}. */
    @Override
    public String toString() {
        StringBuilder s = new StringBuilder();
        for (HomologyGroup g : groups) {
            s.append(reduced ? "H~" : "H").append(g.dimension()).append(" = ").append(g).append('\n');
        }
        return s.toString();
    }
}
