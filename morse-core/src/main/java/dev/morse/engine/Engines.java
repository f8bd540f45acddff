package dev.morse.engine;

import dev.morse.input.Input;

/**
 * The entry point every command uses: choose the complex and engine by {@link ComplexPolicy}, then
 * run that engine. Stateless.
 */
public final class Engines {
    private Engines() {
    }

    /**
     * Computes the homology of {@code input} as {@code request} asks.
     *
     * @throws dev.morse.io.InputException for a request that does not apply to the input, or an
     *     input beyond the limits of the chosen engine
     */
    public static Computation compute(Input input, Request request) {
        ComplexPlan plan = ComplexPolicy.plan(input, request);
        return plan.engine().run(input, plan, request);
    }
}
