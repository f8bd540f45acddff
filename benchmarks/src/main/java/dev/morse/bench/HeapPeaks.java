package dev.morse.bench;

import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;

/**
 * The peak heap use of a run, as the sum of the heap pools' peaks since the last reset: an upper
 * bound on the live peak, close to it when the heap is tight and the collector serial.
 */
final class HeapPeaks {
    private HeapPeaks() {
    }

    /** Forgets the peaks so far. */
    static void reset() {
        for (MemoryPoolMXBean pool : ManagementFactory.getMemoryPoolMXBeans()) {
            if (pool.getType() == MemoryType.HEAP) {
                pool.resetPeakUsage();
            }
        }
    }

    /** Bytes: the sum over heap pools of their peak use since {@link #reset()}. */
    static long bytes() {
        long sum = 0;
        for (MemoryPoolMXBean pool : ManagementFactory.getMemoryPoolMXBeans()) {
            if (pool.getType() == MemoryType.HEAP) {
                sum += pool.getPeakUsage().getUsed();
            }
        }
        return sum;
    }
}
