package dev.morse.batch;

import dev.morse.engine.Computation;
import java.util.Objects;
import java.util.Optional;

/** What became of one input of a batch: its computation, or the one-line reason it failed. */
public sealed interface BatchOutcome permits BatchOutcome.Done, BatchOutcome.Failed {
    /** The input. */
    BatchItem item();

    /**
     * The input was computed.
     *
     * @param item the input
     * @param computation its homology run
     * @param cohenMacaulay the Cohen–Macaulay verdict when asked for and the input has one (posets and
     *     simplicial complexes); empty otherwise
     */
    record Done(BatchItem item, Computation computation, Optional<Boolean> cohenMacaulay) implements BatchOutcome {
        /** Validates. */
        public Done {
            Objects.requireNonNull(item, "item");
            Objects.requireNonNull(computation, "computation");
            Objects.requireNonNull(cohenMacaulay, "cohenMacaulay");
        }
    }

    /**
     * The input failed.
     *
     * @param item the input
     * @param message one line, {@code FILE:LINE: problem} for bad input
     */
    record Failed(BatchItem item, String message) implements BatchOutcome {
        /** Validates. */
        public Failed {
            Objects.requireNonNull(item, "item");
            Objects.requireNonNull(message, "message");
        }
    }
}
