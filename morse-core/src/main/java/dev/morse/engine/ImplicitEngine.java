package dev.morse.engine;

import dev.morse.implicit.ImplicitHomology;
import dev.morse.input.Input;
import dev.morse.io.InputException;
import java.util.List;
import java.util.Locale;

/**
 * The engine for order complexes too large to store: {@link ImplicitHomology} with the request's
 * element order and coefficients, its limits turned into one-line messages. Its matching is its own,
 * so the request's matching, seed and trials do not apply. Stateless.
 */
public final class ImplicitEngine implements ComputationEngine {
    /** The one instance. */
    public static final ImplicitEngine INSTANCE = new ImplicitEngine();
    /** Its name in reports. */
    public static final String NAME = "implicit";

    private ImplicitEngine() {
    }

    @Override
    public String name() {
        return NAME;
    }

    @Override
    public Computation run(Input input, ComplexPlan plan, Request request) {
        if (plan.implicitPoset().isEmpty()) {
            throw new IllegalArgumentException("the implicit engine needs a poset");
        }
        ImplicitHomology.Options options = new ImplicitHomology.Options(request.elementOrder(), request.coefficients());
        ImplicitHomology.Outcome outcome;
        try {
            long[] counted = plan.chainsPerDimension();
            outcome = counted.length > 0
                    ? ImplicitHomology.run(plan.implicitPoset().get(), options, counted)
                    : ImplicitHomology.run(plan.implicitPoset().get(), options);
        } catch (IllegalStateException e) {
            throw new InputException(input.source(), InputException.NO_LINE, "too large to compute: " + e.getMessage());
        } catch (OutOfMemoryError e) {
            throw new InputException(input.source(), InputException.NO_LINE, String.format(Locale.ROOT,
                    "too large to compute: the implicit engine ran out of its %,d MiB of heap (raise it with"
                            + " JAVA_OPTS=-Xmx...)", Runtime.getRuntime().maxMemory() >> 20));
        }
        return Computation.of(input, plan, request, outcome, List.of(), List.of());
    }
}
