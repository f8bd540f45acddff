package dev.morse.progress;

import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.lang.management.MemoryUsage;

/**
 * Approximate peak heap use over a stretch of a run, from the JVM's memory pools: their peaks are
 * reset at the start, and the sum of the heap pools' peaks is read at the end. The pools peak at
 * different moments, so the sum overstates the true peak a little; and garbage not yet collected
 * counts, which a collection requested before the reset keeps small. Meant for comparisons, not
 * for exact accounting.
 */
public final class HeapPeaks {
    private HeapPeaks() {
    }

    /** Asks for a collection and resets the heap pools' peaks to their current use. */
    public static void reset() {
        System.gc();
        for (MemoryPoolMXBean pool : ManagementFactory.getMemoryPoolMXBeans()) {
            if (pool.getType() == MemoryType.HEAP && pool.isValid()) {
                pool.resetPeakUsage();
            }
        }
    }

    /** The sum of the heap pools' peaks since the last reset, or -1 if no pool reports one. */
    public static long peakBytes() {
        long sum = 0;
        boolean any = false;
        for (MemoryPoolMXBean pool : ManagementFactory.getMemoryPoolMXBeans()) {
            if (pool.getType() != MemoryType.HEAP || !pool.isValid()) {
                continue;
            }
            MemoryUsage peak = pool.getPeakUsage();
            if (peak != null) {
                sum += peak.getUsed();
                any = true;
            }
        }
        return any ? sum : -1;
    }
}
