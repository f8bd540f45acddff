package dev.morse.generate;

import dev.morse.poset.Poset;
import dev.morse.poset.PosetBuilder;
import java.util.SplittableRandom;

/**
 * A random poset on the elements {@code p0 .. p(n-1)}: each pair {@code i < j} is related,
 * {@code p_i < p_j}, with probability {@code density}, independently, and the order is the
 * transitive closure (the random graph order of Albert and Frieze, from memory). The same seed
 * gives the same poset.
 */
public final class RandomPoset {
    /** Largest number of elements accepted. */
    public static final int MAX_N = 20_000;
    /** Largest expected number of relations accepted. */
    public static final double MAX_RELATIONS = 2e7;

    private RandomPoset() {
    }

    /**
     * A random poset of {@code n} elements.
     *
     * @throws IllegalArgumentException for {@code n} outside {@code 0..MAX_N}, a density outside
     *     [0, 1], or too many expected relations
     */
    public static Poset of(int n, double density, long seed) {
        Sizes.inRange("n", n, 0, MAX_N);
        if (!(density >= 0 && density <= 1)) {
            throw new IllegalArgumentException("the density must be in [0, 1], got " + density);
        }
        if (density * n * (n - 1.0) / 2 > MAX_RELATIONS) {
            throw new IllegalArgumentException("about " + (long) (density * n * (n - 1.0) / 2)
                    + " relations expected, more than " + (long) MAX_RELATIONS);
        }
        SplittableRandom random = new SplittableRandom(seed);
        PosetBuilder b = new PosetBuilder();
        for (int i = 0; i < n; i++) {
            b.element("p" + i);
        }
        for (int i = 0; i < n; i++) {
            for (int j = i + 1; j < n; j++) {
                if (random.nextDouble() < density) {
                    b.relate(i, j, 0);
                }
            }
        }
        return b.buildKnownAcyclic();
    }
}
