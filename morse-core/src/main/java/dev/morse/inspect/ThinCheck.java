package dev.morse.inspect;

import dev.morse.poset.Adjacency;
import dev.morse.poset.Poset;
import java.util.Arrays;

/**
 * Whether a graded poset is thin: every interval {@code [z, x]} of length 2 has exactly two
 * elements strictly between z and x, that is four in all (Björner, "Posets, regular CW complexes
 * and Bruhat order", 1984; the face posets of regular CW complexes with a bottom element adjoined
 * are thin). Intervals of P itself are meant, with no bottom or top adjoined. The middle elements
 * of [z, x] are counted by walking two covers down from x; linear in the number of such walks,
 * with three ints of scratch per element.
 */
public final class ThinCheck {
    private ThinCheck() {
    }

    /** Empty when {@code poset} is graded and thin; otherwise why not, naming the first failure. */
    public static String failure(Poset poset) {
        if (!poset.isGraded()) {
            return "the poset is not graded, and thinness is defined for graded posets";
        }
        int n = poset.size();
        Adjacency lower = poset.lowerCovers();
        int[] stamp = new int[n];
        int[] count = new int[n];
        int[] firstMiddle = new int[n];
        Arrays.fill(stamp, -1);
        for (int x = 0; x < n; x++) {
            for (int i = lower.start(x); i < lower.end(x); i++) {
                int y = lower.target(i);
                for (int j = lower.start(y); j < lower.end(y); j++) {
                    int z = lower.target(j);
                    if (stamp[z] != x) {
                        stamp[z] = x;
                        count[z] = 0;
                        firstMiddle[z] = y;
                    }
                    count[z]++;
                }
            }
            for (int i = lower.start(x); i < lower.end(x); i++) {
                int y = lower.target(i);
                for (int j = lower.start(y); j < lower.end(y); j++) {
                    int z = lower.target(j);
                    if (count[z] != 2) {
                        return "the interval from '" + poset.label(z) + "' to '" + poset.label(x) + "' has "
                                + (count[z] == 1 ? "only one middle element, '" + poset.label(firstMiddle[z]) + "'"
                                        : count[z] + " middle elements")
                                + "; in a thin poset every interval of length 2 has exactly two";
                    }
                }
            }
        }
        return "";
    }
}
