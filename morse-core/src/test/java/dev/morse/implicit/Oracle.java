package dev.morse.implicit;

import dev.morse.complex.OrderComplex;
import dev.morse.homology.Coefficients;
import dev.morse.homology.Homology;
import dev.morse.homology.HomologyCalculator;
import dev.morse.matching.Matching;
import dev.morse.poset.Poset;
import it.unimi.dsi.fastutil.ints.IntArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.Map;
import java.util.SplittableRandom;

/** The explicit order complex as the oracle: its full Smith normal form, and the implicit matching written out on it. */
final class Oracle {
    private Oracle() {
    }

    /** The homology of the stored order complex by the Smith normal form on every cell. */
    static Homology fullSmithNormalForm(Poset poset, Coefficients coefficients) {
        return HomologyCalculator.compute(OrderComplex.of(poset), coefficients);
    }

    /** The implicit matching as a partner array on the cells of the stored order complex. */
    static Matching explicitMatching(OrderComplex complex, BoundedPoset bounded) {
        Map<IntArrayList, Integer> cellOf = new HashMap<>();
        for (int c = 0; c < complex.cellCount(); c++) {
            cellOf.put(IntArrayList.wrap(complex.chain(c)), c);
        }
        ChainMatching matching = new ChainMatching(bounded);
        int[] mates = new int[complex.cellCount()];
        for (int c = 0; c < complex.cellCount(); c++) {
            int[] chain = internal(complex.chain(c), bounded);
            int p = matching.partner(chain, chain.length);
            if (p == ChainMatching.CRITICAL) {
                mates[c] = Matching.CRITICAL;
                continue;
            }
            IntArrayList partner = new IntArrayList();
            boolean removed = false;
            for (int x : chain) {
                if (x == p) {
                    removed = true;
                } else {
                    partner.add(x);
                }
            }
            if (!removed) {
                partner.add(p);
            }
            int[] sorted = partner.toIntArray();
            Arrays.sort(sorted);
            Integer mate = cellOf.get(IntArrayList.wrap(original(sorted, bounded)));
            if (mate == null) {
                throw new AssertionError("the partner of " + complex.cellName(c) + " is not a chain");
            }
            mates[c] = mate;
        }
        return Matching.of(mates);
    }

    /** A chain of P as internal ids, ascending. */
    static int[] internal(int[] chain, BoundedPoset bounded) {
        int[] out = new int[chain.length];
        for (int i = 0; i < chain.length; i++) {
            out[i] = bounded.internal(chain[i]);
        }
        Arrays.sort(out);
        return out;
    }

    /** Internal ids back to ids of P, in the same (chain) order. */
    static int[] original(int[] chain, BoundedPoset bounded) {
        int[] out = new int[chain.length];
        for (int i = 0; i < chain.length; i++) {
            out[i] = bounded.original(chain[i]);
        }
        return out;
    }

    /** A random total order of the elements, to try matchings no named order gives. */
    static BoundedPoset.Ranking randomRanking(long seed) {
        return poset -> {
            SplittableRandom random = new SplittableRandom(seed);
            long[] rank = new long[poset.size()];
            for (int x = 0; x < rank.length; x++) {
                rank[x] = ((long) random.nextInt(1 << 20) << 32) | x;
            }
            return rank;
        };
    }
}
