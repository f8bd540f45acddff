package dev.morse.implicit;

import java.util.Arrays;

/**
 * One maximal chain {@code 0̂ = x_0 ⋖ x_1 ⋖ ... ⋖ x_m = 1̂} of P̂ and, for each step, how far it stays
 * greedy: {@code reach(i)} is the largest {@code b} such that {@code x_(i+1)} is the first cover of
 * {@code x_i} (in the element order) below {@code x_b}. Greediness only gets harder as the target
 * rises, so the steps from {@code x_a} to {@code x_b} are the greedy chain of {@code [x_a, x_b]}
 * exactly when {@code reach(i) ≥ b} for {@code a ≤ i < b}: the gap is <em>allowed</em>.
 *
 * <p>A subchain G of F (its interior elements, as positions {@code 1..m-1}) has F as its
 * lexicographically first maximal chain exactly when every gap between consecutive elements of
 * {@code G ∪ {0̂, 1̂}} is allowed; those G form the <em>fibre</em> of F. The position p belongs to
 * every member of the fibre when {@code reach(p-1) = p} (its <em>restriction</em>), since then no
 * gap can jump over it. With j the lowest position outside the restriction, the fibre is matched
 * perfectly by adding or removing {@code x_j} when {@code reach(j-1)} is at least the farthest end
 * of an allowed gap starting at j (the fibre is <em>resolved</em>); otherwise {@link DefectiveFibre}
 * matches it.
 */
final class FacetReach {
    /** No such position. */
    static final int NONE = -1;

    private final int[] elements;
    private final int[] reach;

    private FacetReach(int[] elements, int[] reach) {
        this.elements = elements;
        this.reach = reach;
    }

    /** Measures the facet {@code elements[0..length)}, from 0̂ to 1̂. Takes ownership of nothing. */
    static FacetReach of(BoundedPoset poset, int[] elements, int length) {
        int m = length - 1;
        int[] reach = new int[m];
        for (int i = 0; i < m; i++) {
            int k = poset.coverIndex(elements[i], elements[i + 1]);
            if (k < 0) {
                throw new IllegalArgumentException("not a maximal chain: a step is not a cover");
            }
            reach[i] = m;
            for (int b = i + 2; b <= m && k > 0; b++) {
                if (poset.earlierCoverBelow(elements[i], k, elements[b])) {
                    reach[i] = b - 1;
                    break;
                }
            }
        }
        return new FacetReach(Arrays.copyOf(elements, length), reach);
    }

    /** A facet whose reaches are already known; {@code reach[i]} for {@code i < m}. */
    static FacetReach known(int[] elements, int length, int[] reach) {
        return new FacetReach(Arrays.copyOf(elements, length), Arrays.copyOf(reach, length - 1));
    }

    /** The index m of 1̂. */
    int top() {
        return elements.length - 1;
    }

    /** The element at position {@code p}. */
    int element(int p) {
        return elements[p];
    }

    /** {@code reach(i)} for {@code 0 ≤ i < m}. */
    int reach(int i) {
        return reach[i];
    }

    /** Whether the interior position {@code p} lies in every member of the fibre. */
    boolean inRestriction(int p) {
        return reach[p - 1] == p;
    }

    /** The lowest interior position outside the restriction, or {@link #NONE} for a falling chain. */
    int lowestFree() {
        for (int p = 1; p < top(); p++) {
            if (!inRestriction(p)) {
                return p;
            }
        }
        return NONE;
    }

    /** Whether the gap from position a to position b > a is allowed. */
    boolean allowed(int a, int b) {
        for (int i = a; i < b; i++) {
            if (reach[i] < b) {
                return false;
            }
        }
        return true;
    }

    /** The farthest b such that the gap from j to b is allowed. */
    int farthestGap(int j) {
        int least = Integer.MAX_VALUE;
        int b = j;
        while (b < top()) {
            least = Math.min(least, reach[b]);
            if (least < b + 1) {
                break;
            }
            b++;
        }
        return b;
    }

    /** Whether adding or removing {@code x_j}, j the lowest free position, matches the whole fibre. */
    boolean resolvedAt(int j) {
        return reach[j - 1] >= farthestGap(j);
    }
}
