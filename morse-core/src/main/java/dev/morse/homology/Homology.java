package dev.morse.homology;

import java.util.ArrayList;
import java.util.List;

/**
 * Homology of a chain complex in dimensions {@code 0..top}, over given coefficients, unreduced or
 * reduced. Immutable.
 */
public record Homology(Coefficients coefficients, boolean reduced, List<HomologyGroup> groups) {
    /** Validates and copies: groups are listed by dimension from 0. */
    public Homology {
        groups = List.copyOf(groups);
        for (int d = 0; d < groups.size(); d++) {
            if (groups.get(d).dimension() != d) {
                throw new IllegalArgumentException("groups must be listed by dimension from 0");
            }
            if (!coefficients.hasTorsion() && !groups.get(d).torsion().isEmpty()) {
                throw new IllegalArgumentException("torsion over a field");
            }
        }
    }

    /** The group in dimension {@code d}; trivial outside the computed range. */
    public HomologyGroup group(int d) {
        return d >= 0 && d < groups.size() ? groups.get(d) : HomologyGroup.free(d, 0);
    }

    /** Betti numbers by dimension. */
    public int[] bettiNumbers() {
        return groups.stream().mapToInt(HomologyGroup::betti).toArray();
    }

    /**
     * The reduced homology: one less in dimension 0 when the complex is nonempty. Over a field or the
     * integers alike, H̃_0 is H_0 with one free summand fewer.
     */
    public Homology toReduced() {
        if (reduced || groups.isEmpty()) {
            return new Homology(coefficients, true, groups);
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
