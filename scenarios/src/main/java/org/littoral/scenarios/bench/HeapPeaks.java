package org.littoral.scenarios.bench;

import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;

/** Peak heap use between a reset and a reading, summed over the heap memory pools (for benchmarks). */
public final class HeapPeaks {
    private HeapPeaks() {
    }

    /** Forgets earlier peaks (after a collection, so the next peak starts from live data). */
    public static void reset(boolean collectFirst) {
        if (collectFirst) {
            System.gc();
        }
        for (MemoryPoolMXBean p : ManagementFactory.getMemoryPoolMXBeans()) {
            if (p.getType() == MemoryType.HEAP) {
                p.resetPeakUsage();
            }
        }
    }

    /** Peak heap used since the last reset, MB. */
    public static double peakMb() {
        long peak = 0;
        for (MemoryPoolMXBean p : ManagementFactory.getMemoryPoolMXBeans()) {
            if (p.getType() == MemoryType.HEAP) {
                peak += p.getPeakUsage().getUsed();
            }
        }
        return peak / 1048576.0;
    }
}
