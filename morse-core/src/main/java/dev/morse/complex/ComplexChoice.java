package dev.morse.complex;

import java.util.Locale;

/** Which chain complex to build on a poset. */
public enum ComplexChoice {
    /** The cellular complex when the poset is a CW poset, else the order complex. */
    AUTO,
    /** Always the order complex. */
    ORDER,
    /** Always the cellular complex; fails on a poset that is not a CW poset. */
    CELLULAR;

    /** The lower-case name users type. */
    public String optionName() {
        return name().toLowerCase(Locale.ROOT);
    }

    /**
     * Parses {@code auto}, {@code order} or {@code cellular}.
     *
     * @throws IllegalArgumentException with a message fit for users
     */
    public static ComplexChoice parse(String text) {
        for (ComplexChoice choice : values()) {
            if (choice.optionName().equals(text.strip())) {
                return choice;
            }
        }
        throw new IllegalArgumentException("the complex must be auto, order or cellular, not '" + text + "'");
    }
}
