package dev.morse.report;

import dev.morse.implicit.SearchStatistics;
import java.util.Objects;
import java.util.Optional;

/**
 * How the cells of the complex were produced: {@code explicit} (every cell stored, the usual way) or
 * {@code implicit} (order complex chains generated on demand and never stored), with the reason when
 * the choice was made automatically.
 *
 * @param name {@link #EXPLICIT} or {@link #IMPLICIT}
 * @param reason why this engine was chosen, empty when the user asked for it or there was no choice
 * @param implicit for the implicit engine: its element order and what its walk over maximal chains did
 */
public record ComplexEngine(String name, String reason, Optional<ImplicitRun> implicit) {
    /** Every cell stored. */
    public static final String EXPLICIT = "explicit";
    /** Chains generated on demand. */
    public static final String IMPLICIT = "implicit";
    /** The explicit engine, no choice made. */
    public static final ComplexEngine STORED = new ComplexEngine(EXPLICIT, "", Optional.empty());

    /** Validates. */
    public ComplexEngine {
        Objects.requireNonNull(reason, "reason");
        Objects.requireNonNull(implicit, "implicit");
        if (!(name.equals(EXPLICIT) && implicit.isEmpty()) && !(name.equals(IMPLICIT) && implicit.isPresent())) {
            throw new IllegalArgumentException("the implicit engine, and only it, describes its walk");
        }
    }

    /** The explicit engine, chosen for {@code reason}. */
    public static ComplexEngine explicit(String reason) {
        return new ComplexEngine(EXPLICIT, reason, Optional.empty());
    }

    /** The implicit engine, chosen for {@code reason}. */
    public static ComplexEngine implicit(String reason, ImplicitRun run) {
        return new ComplexEngine(IMPLICIT, reason, Optional.of(run));
    }

    /** Whether chains were generated on demand. */
    public boolean isImplicit() {
        return name.equals(IMPLICIT);
    }

    /**
     * What the implicit engine did.
     *
     * @param elementOrder the name of the element order that fixed its matching
     * @param search its walk over maximal chains
     */
    public record ImplicitRun(String elementOrder, SearchStatistics search) {
        /** Validates. */
        public ImplicitRun {
            Objects.requireNonNull(elementOrder, "elementOrder");
            Objects.requireNonNull(search, "search");
        }
    }
}
