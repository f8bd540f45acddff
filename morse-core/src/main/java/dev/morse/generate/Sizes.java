package dev.morse.generate;

/** The one check of a generator's size parameter, so that every family says the same thing when it refuses. */
final class Sizes {
    private Sizes() {
    }

    /**
     * Returns {@code value} if it lies in {@code min..max}.
     *
     * @throws IllegalArgumentException saying which parameter, its range and the value given
     */
    static int inRange(String parameter, int value, int min, int max) {
        if (value < min || value > max) {
            throw new IllegalArgumentException(parameter + " must be in " + min + ".." + max + ", got " + value);
        }
        return value;
    }
}
