package dev.morse.generate;

/**
 * Faces of the d-cube and the d-dimensional cross-polytope as words of length d over three letters,
 * numbered by reading the word in base 3, first letter least significant.
 */
final class TernaryWords {
    private TernaryWords() {
    }

    /** {@code 3^d}, the number of words of length d. */
    static int count(int d) {
        int words = 1;
        for (int i = 0; i < d; i++) {
            words *= 3;
        }
        return words;
    }

    /** The word of number {@code code}: digit k of {@code code} in base 3 is letter k of {@code letters}. */
    static String word(int code, int d, String letters) {
        char[] w = new char[d];
        for (int i = 0; i < d; i++) {
            w[i] = letters.charAt(code % 3);
            code /= 3;
        }
        return new String(w);
    }
}
