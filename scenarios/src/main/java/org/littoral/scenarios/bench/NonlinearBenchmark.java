package org.littoral.scenarios.bench;

import java.io.PrintStream;
import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.lang.management.ThreadMXBean;
import java.util.Locale;
import org.littoral.model.coast.Coast;
import org.littoral.model.coast.SurfaceMap;
import org.littoral.model.grid.HorizontalGrid;
import org.littoral.model.grid.VerticalGrid;
import org.littoral.model.nonlinear.Forcing;
import org.littoral.model.nonlinear.NonlinearConfig;
import org.littoral.model.nonlinear.NonlinearModel;
import org.littoral.model.nonlinear.NonlinearSolution;
import org.littoral.model.surface.SurfaceEnergyBalance;

/**
 * {@code littoral bench nonlinear}: one 18 h nonlinear run (06-24 solar h), 1 km spacing over a 400 km
 * periodic domain (50 km sponges at each end), 64 layers stretched to a 5 km lid, full physics
 * (surface energy balance, slab mixed layer, K-profile mixing), 10 min output. Target (issue 3): under
 * 15 s on one core and peak heap under 1 GB. One run only: the machine is shared.
 */
public final class NonlinearBenchmark implements Benchmark {
    static final double TARGET_S = 15.0;
    static final double TARGET_MB = 1024.0;

    @Override
    public String name() {
        return "nonlinear";
    }

    @Override
    public String description() {
        return "18 h nonlinear breeze run, 400 x 64 cells (1 km, stretched to 5 km): wall and CPU time, ns per point-step, peak heap";
    }

    @Override
    public int run(PrintStream out, boolean quick) {
        double hours = quick ? 2.0 : 18.0;
        NonlinearConfig cfg = NonlinearConfig.builder(new Coast(40.0, 0.0, 0.0, 270.0, 172),
                        SurfaceMap.simpleCoast(293.15, 0.2, 1.0, 0.1), HorizontalGrid.centred(400, 1000.0),
                        VerticalGrid.stretched(65, 5000.0, 20.0))
                .forcing(new Forcing.SurfaceEnergyBalance(0.0, SurfaceEnergyBalance.Partition.BOWEN_RATIO))
                .solarHours(6.0, 6.0 + hours).outputIntervalS(600.0).build();
        System.gc();
        for (MemoryPoolMXBean p : ManagementFactory.getMemoryPoolMXBeans()) {
            if (p.getType() == MemoryType.HEAP) {
                p.resetPeakUsage();
            }
        }
        double load = ManagementFactory.getOperatingSystemMXBean().getSystemLoadAverage();
        ThreadMXBean tb = ManagementFactory.getThreadMXBean();
        long c0 = tb.getCurrentThreadCpuTime();
        long t0 = System.nanoTime();
        NonlinearSolution s = NonlinearModel.run(cfg);
        double wall = (System.nanoTime() - t0) / 1e9;
        double cpu = (tb.getCurrentThreadCpuTime() - c0) / 1e9;
        long peak = 0;
        for (MemoryPoolMXBean p : ManagementFactory.getMemoryPoolMXBeans()) {
            if (p.getType() == MemoryType.HEAP) {
                peak += p.getPeakUsage().getUsed();
            }
        }
        double peakMb = peak / 1048576.0;
        int cells = s.xM().length * s.zM().length;
        out.printf(Locale.ROOT, "nonlinear: %.0f h run, %d x %d cells, %d steps (mean step %.1f s), %d snapshots%n", hours,
                s.xM().length, s.zM().length, s.stepsTaken(), hours * 3600 / s.stepsTaken(), s.snapshotCount());
        out.printf(Locale.ROOT, "  wall %.2f s, CPU (this thread) %.2f s; %.0f ns per grid-point-step (CPU)%n", wall, cpu,
                cpu * 1e9 / s.stepsTaken() / cells);
        out.printf(Locale.ROOT, "  peak heap %.0f MB (target %.0f MB); load average at start %.2f on %d cores%n", peakMb, TARGET_MB,
                load, Runtime.getRuntime().availableProcessors());
        boolean ok = cpu < TARGET_S && peakMb < TARGET_MB;
        out.printf(Locale.ROOT, "  target < %.0f s CPU and < %.0f MB: %s%s%n", TARGET_S, TARGET_MB, ok ? "met" : "NOT met",
                quick ? " (quick run: 2 h only)" : "");
        return ok ? 0 : 1;
    }
}
