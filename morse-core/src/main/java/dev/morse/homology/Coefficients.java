package dev.morse.homology;

import java.io.Serializable;
import java.math.BigInteger;

/**
 * The coefficient ring of homology: the integers, the rationals, or the field Z/p for a prime p.
 */
public record Coefficients(Ring ring, int prime) implements Serializable {
    private static final long serialVersionUID = 1L;

    /** The three kinds of ring offered. */
    public enum Ring { INTEGERS, RATIONALS, PRIME_FIELD }

    /** The integers. */
    public static final Coefficients INTEGERS = new Coefficients(Ring.INTEGERS, 0);
    /** The rationals. */
    public static final Coefficients RATIONALS = new Coefficients(Ring.RATIONALS, 0);

    /** Validates: a prime field needs a prime {@code p < 2^31}; the others take 0. */
    public Coefficients {
        if (ring == null) {
            throw new IllegalArgumentException("ring is required");
        }
        if (ring == Ring.PRIME_FIELD) {
            if (prime < 2 || !BigInteger.valueOf(prime).isProbablePrime(64)) {
                throw new IllegalArgumentException(prime + " is not a prime");
            }
        } else if (prime != 0) {
            throw new IllegalArgumentException("only a prime field takes a prime");
        }
    }

    /** The field with {@code p} elements. */
    public static Coefficients modulo(int p) {
        return new Coefficients(Ring.PRIME_FIELD, p);
    }

    /**
     * Parses {@code Z}, {@code Q} or a prime such as {@code 2}.
     *
     * @throws IllegalArgumentException with a message fit for users
     */
    public static Coefficients parse(String text) {
        String t = text.strip();
        if (t.equals("Z")) {
            return INTEGERS;
        }
        if (t.equals("Q")) {
            return RATIONALS;
        }
        BigInteger number;
        try {
            number = new BigInteger(t);
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("coefficients must be Z, Q or a prime, not '" + text + "'");
        }
        // the field's elements live in ints and their products in longs (ModularElimination)
        if (number.bitLength() > 31) {
            throw new IllegalArgumentException("prime coefficients must be below 2^31 (at most " + Integer.MAX_VALUE
                    + "), not " + t);
        }
        return modulo(number.intValueExact());
    }

    /** Whether torsion can appear (only over the integers). */
    public boolean hasTorsion() {
        return ring == Ring.INTEGERS;
    }

    /** {@code Z}, {@code Q} or the prime, as {@link #parse} reads it. */
    @Override
    public String toString() {
        return switch (ring) {
            case INTEGERS -> "Z";
            case RATIONALS -> "Q";
            case PRIME_FIELD -> Integer.toString(prime);
        };
    }
}
