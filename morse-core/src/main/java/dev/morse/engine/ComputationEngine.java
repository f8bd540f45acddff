package dev.morse.engine;

import dev.morse.input.Input;

/**
 * A way to compute homology on a chosen complex: match, reduce to the Morse complex, finish with
 * exact homology. The stored engine works on any stored complex with any matching; the implicit
 * engine on an order complex whose chains it never stores. Implementations keep no state.
 */
public interface ComputationEngine {
    /** The engine's name as reports show it: {@code explicit} or {@code implicit}. */
    String name();

    /**
     * Runs on {@code plan}, made for {@code input} by {@link ComplexPolicy}.
     *
     * @throws dev.morse.io.InputException when the request does not apply to this engine, or the
     *     complex is beyond the engine's limits
     */
    Computation run(Input input, ComplexPlan plan, Request request);
}
