package dev.morse.posetreduction;

/**
 * What a poset reduction did.
 *
 * @param elementsBefore elements of the poset given
 * @param elementsAfter elements left
 * @param beatPointsRemoved elements removed as beat points
 * @param acyclicLinksRemoved elements removed because a link of theirs is acyclic
 * @param linksSkipped elements kept only because a link of theirs exceeded the limits or the work budget ran out,
 *     so that it was not tested
 * @param milliseconds wall-clock time of the reduction
 */
public record ReductionStats(int elementsBefore, int elementsAfter, int beatPointsRemoved, int acyclicLinksRemoved,
        int linksSkipped, double milliseconds) {
    /** Validates. */
    public ReductionStats {
        if (elementsAfter < 0 || elementsAfter > elementsBefore
                || beatPointsRemoved + acyclicLinksRemoved != elementsBefore - elementsAfter) {
            throw new IllegalArgumentException("the removals must account for the elements removed");
        }
        if (linksSkipped < 0 || !(milliseconds >= 0)) {
            throw new IllegalArgumentException("negative count or time");
        }
    }

    /** Elements removed in all. */
    public int removed() {
        return elementsBefore - elementsAfter;
    }
}
