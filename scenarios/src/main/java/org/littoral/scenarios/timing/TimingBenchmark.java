package org.littoral.scenarios.timing;

import java.io.IOException;
import java.io.PrintStream;
import java.lang.management.ManagementFactory;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.Locale;
import java.util.stream.Stream;
import org.littoral.scenarios.bench.Benchmark;
import org.littoral.scenarios.run.Solver;

/**
 * {@code littoral bench check-timing}: the default check-timing ensemble (24 nonlinear-model members on the default
 * 200 x 2 km, 32-level ensemble grid) on the built-in sea-barrier-bay coast, on all cores, end to end
 * (members, envelope, flags, figure, report). Target: the quick look done within 90 s wall on 2 cores (our target:
 * a check a person waits for at the end of a flight day).
 */
public final class TimingBenchmark implements Benchmark {
    static final String DAY = """
            date: 2031-07-15
            coast: sea-barrier-bay
            ambient_wind: {from_deg: 90, speed_m_per_s: 2.0}
            front: {theta_v_contrast_K: 2.5, breeze_depth_m: 600}
            flights: {interval_min: 30, first_h: 7, last_h: 18}
            ensemble: {members: %d, seed: 1}
            """;

    @Override
    public String name() {
        return "check-timing";
    }

    @Override
    public String description() {
        return "default 24-member nonlinear check-timing ensemble end to end on all cores: wall time (target <= 90 s on 2 cores)";
    }

    @Override
    public int run(PrintStream out, boolean quick) throws Exception {
        int members = quick ? 4 : 24;
        int threads = Runtime.getRuntime().availableProcessors();
        DaySpec spec = DayFile.parse("bench check-timing", String.format(Locale.ROOT, DAY, members), null);
        Path tmp = Files.createTempDirectory("littoral-bench-timing-");
        try {
            Path passages = tmp.resolve("passages.csv");
            Files.writeString(passages, "site,date,passage_time_local\n" + spec.sites().get(0).name() + ",2031-07-15,12:00\n");
            out.printf(Locale.ROOT, "check-timing benchmark: %d members, %d thread(s), load average %.2f%n", members, threads,
                    ManagementFactory.getOperatingSystemMXBean().getSystemLoadAverage());
            long t0 = System.nanoTime();
            CheckTimingResult r = CheckTimingRun.run(spec, passages, tmp.resolve("out"),
                    new CheckTimingRun.Options(null, threads, false, new PrintStream(java.io.OutputStream.nullOutputStream()),
                            false), Solver.standard());
            double wall = (System.nanoTime() - t0) / 1e9;
            out.printf(Locale.ROOT, "  wall %.1f s (%.2f s per member), %d failed; load average after %.2f%n", wall,
                    wall / members, r.failedMembers(), ManagementFactory.getOperatingSystemMXBean().getSystemLoadAverage());
            double target = 90.0 * members / 24.0;
            out.printf(Locale.ROOT, "  target <= %.0f s: %s%n", target, wall <= target && r.failedMembers() == 0 ? "met" : "NOT met");
            return wall <= target && r.failedMembers() == 0 ? 0 : 1;
        } finally {
            try (Stream<Path> s = Files.walk(tmp)) {
                s.sorted(Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
            } catch (IOException e) {
                // a temporary folder that cannot be removed is harmless
            }
        }
    }
}
