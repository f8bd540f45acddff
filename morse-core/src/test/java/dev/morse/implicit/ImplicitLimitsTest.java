package dev.morse.implicit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import dev.morse.generate.PartitionLattice;
import dev.morse.homology.Coefficients;
import dev.morse.poset.Poset;
import dev.morse.testing.RandomInputs;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/** Beyond its limits the engine stops with a message fit for users, never by running out of memory. */
class ImplicitLimitsTest {
    @Test
    void tooManyCriticalChainsIsAClearMessage() {
        // Π_5's proper part needs 25 critical chains (Björner 1980: 4! spheres, plus one vertex)
        Poset poset = PartitionLattice.properPart(5);
        IllegalStateException e = assertThrows(IllegalStateException.class, () -> ImplicitHomology.run(poset,
                new ImplicitHomology.Options(ElementOrder.DOWN_SETS, Coefficients.INTEGERS, 10, 1000)));
        assertEquals("the matching leaves more than 10 critical chains, more than the implicit engine keeps;"
                + " try another element order", e.getMessage());
    }

    @Test
    void aSweepVisitingTooManyChainsIsAClearMessage() {
        // find a random poset whose Morse boundary needs a gradient path through more than one face
        SplittableRandom random = new SplittableRandom(41);
        for (int i = 0; i < 200; i++) {
            Poset poset = RandomInputs.poset(random, 8, 0.4);
            try {
                ImplicitHomology.run(poset, new ImplicitHomology.Options(ElementOrder.IDS, Coefficients.INTEGERS, 1000, 1));
            } catch (IllegalStateException e) {
                assertEquals("following the gradient paths from one critical chain of dimension 1 visits more than 1"
                        + " chains", e.getMessage());
                return;
            }
        }
        throw new AssertionError("no random poset needed a sweep");
    }

    @Test
    void elementOrdersParseByTheirNames() {
        for (ElementOrder order : ElementOrder.values()) {
            assertEquals(order, ElementOrder.parse(order.optionName()));
        }
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> ElementOrder.parse("atoms"));
        assertEquals("the element order must be one of down-sets, ids, not 'atoms'", e.getMessage());
    }
}
