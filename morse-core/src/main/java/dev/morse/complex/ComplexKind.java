package dev.morse.complex;

/** Which construction produced a chain complex; the name is the one reports use. */
public enum ComplexKind {
    /** One cell per element of a CW poset, incidence numbers on covers. */
    CELLULAR("cellular"),
    /** The order complex: one simplex per nonempty chain of a poset. */
    ORDER("order"),
    /** All faces of listed faces. */
    SIMPLICIAL("simplicial"),
    /** The elementary cubes of a set of pixels or voxels. */
    CUBICAL("cubical"),
    /** A chain complex given outright by its boundary matrices: one cell per basis element. */
    GIVEN("given");

    private final String reportName;

    ComplexKind(String reportName) {
        this.reportName = reportName;
    }

    /** The lower-case name used in reports and JSON. */
    public String reportName() {
        return reportName;
    }
}
