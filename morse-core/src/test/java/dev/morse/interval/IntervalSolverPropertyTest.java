package dev.morse.interval;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.morse.engine.Engines;
import dev.morse.engine.Request;
import dev.morse.generate.AllPosets;
import dev.morse.generate.RandomPoset;
import dev.morse.homology.Coefficients;
import dev.morse.input.PosetInput;
import dev.morse.poset.Poset;
import dev.morse.poset.PosetBuilder;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The shortcuts of {@link IntervalSolver} (Euler's formula for graphs, cones) against the engine's own
 * reduced homology of each open interval, built here independently by testing every element against
 * both ends; on every poset of at most 5 elements (all 88 of them up to isomorphism) and on random posets.
 */
class IntervalSolverPropertyTest {
    @Test
    void everyIntervalOfEverySmallPosetAgreesWithTheEngine() {
        for (int n = 0; n <= 5; n++) {
            for (Poset p : AllPosets.of(n)) {
                checkEveryInterval(p);
            }
        }
    }

    @Test
    void everyIntervalOfRandomPosetsAgreesWithTheEngine() {
        for (long seed = 1; seed <= 30; seed++) {
            checkEveryInterval(RandomPoset.of(12, 0.25, seed));
        }
    }

    private static void checkEveryInterval(Poset p) {
        PosetWithBounds hat = PosetWithBounds.of(p);
        Request request = Request.defaults().withHomology(Coefficients.INTEGERS, true);
        IntervalSolver solver = new IntervalSolver(hat, request, "test");
        int ids = p.size() + 2;
        for (int x = 0; x < ids; x++) {
            for (int y = 0; y < ids; y++) {
                if (!hat.isBelow(x, y)) {
                    continue;
                }
                IntervalResult r = solver.solve(new IntervalTask(x, y));
                assertEquals(expected(hat, x, y, request), r.homology(), "interval (" + x + ", " + y + ") of a poset of "
                        + p.size() + " elements, " + r.how());
            }
        }
    }

    /** The engine's reduced homology of the open interval, the empty complex when it is empty. */
    private static IntervalHomology expected(PosetWithBounds hat, int x, int y, Request request) {
        List<Integer> inside = new ArrayList<>();
        for (int z = 0; z < hat.size(); z++) {
            if (hat.isBelow(x, z) && hat.isBelow(z, y)) {
                inside.add(z);
            }
        }
        if (inside.isEmpty()) {
            return IntervalHomology.emptyComplex();
        }
        PosetBuilder b = new PosetBuilder();
        for (int z : inside) {
            b.element(hat.label(z));
        }
        for (int i = 0; i < inside.size(); i++) {
            for (int j = 0; j < inside.size(); j++) {
                if (hat.isBelow(inside.get(i), inside.get(j))) {
                    b.relate(i, j, 0);
                }
            }
        }
        return IntervalHomology.of(Engines.compute(new PosetInput("interval", b.buildKnownAcyclic(), 0),
                request.withMatching(Request.NO_MATCHING, 1, 1)).homology());
    }
}
