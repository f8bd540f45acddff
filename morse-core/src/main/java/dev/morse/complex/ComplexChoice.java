package dev.morse.complex;

/** Which chain complex to build from a poset. */
public enum ComplexChoice {
    /** The cellular complex when the poset is a CW poset, the order complex otherwise. */
    AUTO,
    /** Always the order complex. */
    ORDER,
    /** The cellular complex; the poset must be a CW poset. */
    CELLULAR;
}
