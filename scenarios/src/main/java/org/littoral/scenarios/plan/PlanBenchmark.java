package org.littoral.scenarios.plan;

import java.io.PrintStream;
import java.lang.management.ManagementFactory;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.Locale;
import java.util.stream.Stream;

import org.littoral.scenarios.bench.Benchmark;

/**
 * {@code littoral bench plan}: the planner on the invented coast's plan ({@code quillmarsh-plan}, 40
 * candidate distances, 2 cadence options), (a) as a linear-model quick look, target under 30 s on 2 cores,
 * and (b) with the nonlinear model on a 200-member ensemble, target under 15 minutes on 2 cores. Wall time
 * (the targets), process CPU time (the machine may be shared: CPU over wall shows how much of the 2 cores
 * the run got), per-member figures and peak heap. {@code --quick}: 8 nonlinear members, the 200-member
 * time extrapolated from them (stated as such).
 */
public final class PlanBenchmark implements Benchmark {
    static final double LINEAR_TARGET_S = 30.0;
    static final double NONLINEAR_TARGET_S = 15 * 60.0;
    static final int NONLINEAR_MEMBERS = 200;

    @Override
    public String name() {
        return "plan";
    }

    @Override
    public String description() {
        return "littoral plan on the invented coast, 40 candidate distances: linear quick look (< 30 s) and 200 nonlinear "
                + "members (< 15 min) on 2 cores";
    }

    /** The built-in plan's YAML with the member count, the model and (nonlinear) a planning grid set. */
    static String planText(int members, String model) {
        String text = PlanFile.builtinText("quillmarsh-plan");
        text = text.replaceFirst("(?m)^  members: \\d+", "  members: " + members);
        text = text.replaceFirst("(?m)^  model: \\w+", "  model: " + model);
        if (model.equals("nonlinear")) {
            // a planning grid for the nonlinear model, as the built-in 'hypotheses' sweep uses: 2 km over 400 km
            // (50 km sponges each side), 32 levels to 4 km; the run starts at 06 local (an hour before the first
            // launch) instead of the scenario's 04
            text = text.replaceFirst("(?m)^  grid.points: \\d+.*$", "  grid.points: 200")
                    .replaceFirst("(?m)^  grid.spacing_km: [0-9.]+.*$", "  grid.spacing_km: 2.0")
                    .replaceFirst("(?m)^  grid.levels: \\d+.*$", "  grid.levels: 32\n  output.start_h: 6")
                    .replaceFirst("(?m)^  physics.harmonics: \\d+.*$", "");
        }
        return text;
    }

    @Override
    public int run(PrintStream out, boolean quick) throws Exception {
        int threads = Math.min(2, Runtime.getRuntime().availableProcessors());
        out.printf(Locale.ROOT, "plan benchmark: %d thread(s), load average at start %.1f%n", threads,
                ManagementFactory.getOperatingSystemMXBean().getSystemLoadAverage());
        boolean ok = true;
        ok &= phase(out, "linear quick look", 40, "linear", threads, LINEAR_TARGET_S, 40);
        int nlMembers = quick ? 8 : NONLINEAR_MEMBERS;
        ok &= phase(out, "nonlinear", nlMembers, "nonlinear", threads, NONLINEAR_TARGET_S, NONLINEAR_MEMBERS);
        return ok ? 0 : 1;
    }

    private static boolean phase(PrintStream out, String label, int members, String model, int threads, double targetS,
                                 int targetMembers) throws Exception {
        PlanSpec plan = PlanFile.parse("bench:" + label, planText(members, model), null, "bench-" + model);
        Path dir = Files.createTempDirectory("littoral-bench-plan");
        try {
            org.littoral.scenarios.bench.HeapPeaks.reset(true);
            long cpu0 = processCpuNanos();
            long t0 = System.nanoTime();
            PlanRun.PlanOutcome o = PlanRun.run(plan, model, dir, threads, false, new PrintStream(
                    java.io.OutputStream.nullOutputStream(), false, StandardCharsets.UTF_8));
            double wall = (System.nanoTime() - t0) / 1e9;
            double cpu = (processCpuNanos() - cpu0) / 1e9;
            double peakMb = org.littoral.scenarios.bench.HeapPeaks.peakMb();
            double scaled = wall * targetMembers / members;
            out.printf(Locale.ROOT, "  %-18s %d members x %d candidates x %d cadences: wall %.1f s, CPU %.1f s (%.2f cores), "
                    + "%.2f s wall and %.2f s CPU per member, peak heap %.0f MB, %d failed%n", label, members,
                    plan.candidatesKm().length, plan.cadences().size(), wall, cpu, cpu / wall, wall / members, cpu / members,
                    peakMb, o.result().failedMembers);
            boolean met = scaled < targetS && o.result().failedMembers == 0;
            out.printf(Locale.ROOT, "  %-18s %s%d members: %.0f s, target < %.0f s: %s%n", "", members == targetMembers ? ""
                    : "extrapolated to ", targetMembers, scaled, targetS, met ? "met" : "NOT met");
            return met;
        } finally {
            try (Stream<Path> s = Files.walk(dir)) {
                s.sorted(Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
            }
        }
    }

    private static long processCpuNanos() {
        java.lang.management.OperatingSystemMXBean os = ManagementFactory.getOperatingSystemMXBean();
        if (os instanceof com.sun.management.OperatingSystemMXBean sun) {
            return sun.getProcessCpuTime();
        }
        return 0L;
    }


}
