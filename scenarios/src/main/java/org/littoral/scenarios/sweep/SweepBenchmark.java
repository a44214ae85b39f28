package org.littoral.scenarios.sweep;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.PrintStream;
import java.lang.management.ManagementFactory;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.stream.Stream;
import org.littoral.scenarios.bench.Benchmark;
import org.littoral.model.linear.LinearBreezeModel;
import org.littoral.scenarios.run.Solver;

/**
 * {@code littoral bench sweep} and {@code sweep-nonlinear}: a 24-member sweep (ambient direction x speed)
 * through the real scenario pipeline, on 1 thread and then on 2; prints both wall times and the speed-up
 * (target >= 1.8x on 2 cores, issue 3), and checks that both runs wrote byte-identical member files. The
 * first runs the linear model on the offshore-ambient coast, the second the nonlinear model on the
 * built-in 2 m/s offshore hypothesis run, coarsened.
 */
public final class SweepBenchmark implements Benchmark {
    // A coarser grid and output than the built-in scenario (512 x 41 points, 30 min output), so that the
    // benchmark costs a few CPU-minutes on a shared machine; the speed-up, not the absolute time, is the figure.
    static final String SWEEP = """
            base: offshore-ambient
            set:
              grid.points: 512
              grid.spacing_km: 4
              grid.levels: 41
              output.step_min: 30
            axes:
              ambient_wind.from_deg: [90, 0, 180, 270]
              ambient_wind.speed_m_per_s: [1, 2, 3, 4, 5, 6]
            """;

    // The nonlinear hypothesis run on half the points and half the levels (2 km, 32 layers to 5 km), 30 min
    // output: about a second of model time per member; offshore, onshore and both shore-parallel winds
    // (the invented coast faces 135 deg).
    static final String NONLINEAR_SWEEP = """
            base: nl-offshore-2ms
            set:
              grid.points: 200
              grid.spacing_km: 2
              grid.levels: 33
              grid.first_level_spacing_m: 40
              output.step_min: 30
            axes:
              ambient_wind.from_deg: [315, 45, 135, 225]
              ambient_wind.speed_m_per_s: [1, 2, 3, 4, 5, 6]
            """;

    private final String name;
    private final String sweep;
    private final boolean nonlinear;

    /** The linear-model sweep ({@code bench sweep}). */
    public SweepBenchmark() {
        this("sweep", SWEEP, false);
    }

    private SweepBenchmark(String name, String sweep, boolean nonlinear) {
        this.name = name;
        this.sweep = sweep;
        this.nonlinear = nonlinear;
    }

    /** The nonlinear-model sweep ({@code bench sweep-nonlinear}). */
    public static SweepBenchmark nonlinear() {
        return new SweepBenchmark("sweep-nonlinear", NONLINEAR_SWEEP, true);
    }

    @Override
    public String name() {
        return name;
    }

    @Override
    public String description() {
        return "24-member " + (nonlinear ? "nonlinear" : "linear")
                + "-model sweep through the run pipeline on 1 vs 2 threads: wall times, speed-up (target >= 1.8x)";
    }

    @Override
    public int run(PrintStream out, boolean quick) throws Exception {
        ObjectNode root = (ObjectNode) ScenarioSource.yaml().readTree(quick
                ? sweep.replace("[1, 2, 3, 4, 5, 6]", "[2]") : sweep);
        SweepSpec spec = SweepFile.parse("bench sweep", root, null, ScenarioMemberRunner.scenarioSource(), "bench-sweep");
        List<Member> members = MemberExpander.expand(spec);
        // The linear model called directly (as the run pipeline does for kind: linear), so the benchmark does not
        // depend on which models the run command has wired in this build.
        Solver model = nonlinear ? Solver.standard() : s -> LinearBreezeModel.solve(s.toLinearConfig());
        ScenarioMemberRunner runner = new ScenarioMemberRunner(spec.source(), null, model);
        runner.checkAll(members);
        String kind = spec.base().path("kind").asText();
        int cores = Runtime.getRuntime().availableProcessors();
        out.printf(Locale.ROOT, "%s benchmark: %d members of %s (%s model, %s x %s grid, 30 min output), %d cores, load average %.2f%n",
                name, members.size(), root.path("base").asText(), kind, members.get(0).document().path("grid").path("points").asText(),
                members.get(0).document().path("grid").path("levels").asText(),
                cores, ManagementFactory.getOperatingSystemMXBean().getSystemLoadAverage());
        Path tmp = Files.createTempDirectory("littoral-bench-sweep-");
        try {
            PrintStream quiet = new PrintStream(java.io.OutputStream.nullOutputStream());
            // untimed warm-up on two members, so that the 1-thread run does not also pay for compiling the code
            // and the speed-up is not flattered by it
            List<Member> warm = members.subList(0, Math.min(2, members.size()));
            SweepExecutor.run(spec, warm, tmp.resolve("warm"), runner,
                    new SweepExecutor.Options(2, false, quiet, false, Long.MAX_VALUE));
            SweepExecutor.Outcome one = SweepExecutor.run(spec, members, tmp.resolve("t1"), runner,
                    new SweepExecutor.Options(1, false, quiet, false, Long.MAX_VALUE));
            SweepExecutor.Outcome two = SweepExecutor.run(spec, members, tmp.resolve("t2"), runner,
                    new SweepExecutor.Options(2, false, quiet, false, Long.MAX_VALUE));
            if (one.failed() > 0 || two.failed() > 0) {
                String why = new MemberStore(tmp.resolve("t1")).read(members.get(0).id()).path("error").asText();
                out.println(name + " benchmark: " + one.failed() + " member(s) failed, so the timing means nothing; first error: " + why);
                return 1;
            }
            boolean same = true;
            for (Member m : members) {
                same &= Arrays.equals(Files.readAllBytes(tmp.resolve("t1/members/" + m.id() + ".json")),
                        Files.readAllBytes(tmp.resolve("t2/members/" + m.id() + ".json")));
            }
            double speedUp = one.wallSeconds() / two.wallSeconds();
            out.printf(Locale.ROOT, "  1 thread : %7.2f s wall (%.2f s per member)%n", one.wallSeconds(), one.wallSeconds() / members.size());
            out.printf(Locale.ROOT, "  2 threads: %7.2f s wall (%.2f s per member)%n", two.wallSeconds(), two.wallSeconds() / members.size());
            out.printf(Locale.ROOT, "  speed-up : %.2fx (target >= 1.8x on 2 free cores); member files identical: %s; load average after %.2f%n",
                    speedUp, same ? "yes" : "NO", ManagementFactory.getOperatingSystemMXBean().getSystemLoadAverage());
            return speedUp >= 1.8 && same ? 0 : 1;
        } finally {
            deleteTree(tmp);
        }
    }

    private static void deleteTree(Path dir) throws IOException {
        try (Stream<Path> s = Files.walk(dir)) {
            s.sorted(Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
        }
    }
}
