package dev.morse.spark;

import dev.morse.interval.PosetWithBounds;

/**
 * The P̂ an executor sweeps, built once per executor from the broadcast poset and kept for the tasks of
 * the same sweep that follow (building it takes the down-sets of the whole poset, far more than one
 * task's work). One slot: a new sweep replaces the last.
 */
final class ExecutorPosets {
    private static String currentKey;
    private static PosetWithBounds current;

    private ExecutorPosets() {
    }

    /** P̂ of the shipment of the sweep with key {@code key}, built on first use. */
    static synchronized PosetWithBounds get(String key, PosetShipment shipment) {
        if (!key.equals(currentKey)) {
            current = PosetWithBounds.of(shipment.rebuild());
            currentKey = key;
        }
        return current;
    }
}
