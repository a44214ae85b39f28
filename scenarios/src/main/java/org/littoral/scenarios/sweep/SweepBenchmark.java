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
 * {@code littoral bench sweep}: a 24-member sweep (ambient direction x speed on the offshore-ambient coast)
 * through the real scenario pipeline, on 1 thread and then on 2; prints both wall times and the speed-up
 * (target >= 1.8x on 2 cores, issue 3), and checks that both runs wrote byte-identical member files.
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

    @Override
    public String name() {
        return "sweep";
    }

    @Override
    public String description() {
        return "24-member linear-model sweep through the run pipeline on 1 vs 2 threads: wall times, speed-up (target >= 1.8x)";
    }

    @Override
    public int run(PrintStream out, boolean quick) throws Exception {
        ObjectNode root = (ObjectNode) ScenarioSource.yaml().readTree(quick
                ? SWEEP.replace("[1, 2, 3, 4, 5, 6]", "[2]") : SWEEP);
        SweepSpec spec = SweepFile.parse("bench sweep", root, null, ScenarioMemberRunner.scenarioSource(), "bench-sweep");
        List<Member> members = MemberExpander.expand(spec);
        // The linear model called directly (as the run pipeline does for kind: linear), so the benchmark does not
        // depend on which models the run command has wired in this build.
        Solver linear = s -> LinearBreezeModel.solve(s.toLinearConfig());
        ScenarioMemberRunner runner = new ScenarioMemberRunner(spec.source(), null, linear);
        runner.checkAll(members);
        String model = spec.base().path("kind").asText();
        int cores = Runtime.getRuntime().availableProcessors();
        out.printf(Locale.ROOT, "sweep benchmark: %d members of offshore-ambient (%s model, %s x %s grid, 30 min output), %d cores, load average %.2f%n",
                members.size(), model, members.get(0).document().path("grid").path("points").asText(),
                members.get(0).document().path("grid").path("levels").asText(),
                cores, ManagementFactory.getOperatingSystemMXBean().getSystemLoadAverage());
        Path tmp = Files.createTempDirectory("littoral-bench-sweep-");
        try {
            PrintStream quiet = new PrintStream(java.io.OutputStream.nullOutputStream());
            SweepExecutor.Outcome one = SweepExecutor.run(spec, members, tmp.resolve("t1"), runner,
                    new SweepExecutor.Options(1, false, quiet, false, Long.MAX_VALUE));
            SweepExecutor.Outcome two = SweepExecutor.run(spec, members, tmp.resolve("t2"), runner,
                    new SweepExecutor.Options(2, false, quiet, false, Long.MAX_VALUE));
            if (one.failed() > 0 || two.failed() > 0) {
                String why = new MemberStore(tmp.resolve("t1")).read(members.get(0).id()).path("error").asText();
                out.println("sweep benchmark: " + one.failed() + " member(s) failed, so the timing means nothing; first error: " + why);
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
