package dev.morse.complex;

import java.util.Locale;

/** Which chain complex to build on a poset. */
public enum ComplexChoice {
    /**
     * The cellular complex when the poset is a CW poset, else the order complex: stored when its
     * chains are few enough, else generated on demand.
     */
    AUTO,
    /** Always the order complex, every chain stored. */
    ORDER,
    /** Always the cellular complex; fails on a poset that is not a CW poset. */
    CELLULAR,
    /** Always the order complex with chains generated on demand and never stored (dev.morse.implicit). */
    IMPLICIT;

    /** The lower-case name users type. */
    public String optionName() {
        return name().toLowerCase(Locale.ROOT);
    }

    /**
     * Parses {@code auto}, {@code order}, {@code cellular} or {@code implicit}.
     *
     * @throws IllegalArgumentException with a message fit for users
     */
    public static ComplexChoice parse(String text) {
        for (ComplexChoice choice : values()) {
            if (choice.optionName().equals(text.strip())) {
                return choice;
            }
        }
        throw new IllegalArgumentException("the complex must be auto, order, cellular or implicit, not '" + text + "'");
    }
}
