package org.littoral.scenarios.sensitivity;

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
import org.littoral.scenarios.sweep.SweepExecutor;
import org.littoral.scenarios.timing.DayFile;
import org.littoral.scenarios.timing.DaySpec;

/**
 * {@code littoral bench sensitivity}: a variance-based sensitivity study of the check-timing benchmark's day (the built-in
 * sea-barrier-bay coast, the default uncertain inputs and distributions, the nonlinear model on the 200 x 2 km, 32-level
 * ensemble grid) with N = 32 Sobol'-sequence rows, end to end on all cores. Prints the wall time, the members and the
 * widest 95 % interval of the arrival indices; the target is intervals within +-0.1 (half-width at most 0.1), and when it
 * is missed the N that would meet it (half-widths shrink as 1/sqrt(N)). {@code --quick}: N = 4. {@code --keep DIR} is not
 * offered: the study's outputs go to a temporary folder, except with the system property littoral.bench.keep=DIR.
 */
public final class InfluenceBenchmark implements Benchmark {
    static final String DAY = """
            date: 2031-07-15
            coast: sea-barrier-bay
            ambient_wind: {from_deg: 90, speed_m_per_s: 2.0}
            flights: {interval_min: 30, first_h: 7, last_h: 18}
            """;

    @Override
    public String name() {
        return "sensitivity";
    }

    @Override
    public String description() {
        return "Sobol' study (N = 32 rows, default inputs) of a nonlinear day on the 200 x 2 km grid: wall time, members, widest "
                + "interval (target +-0.1)";
    }

    @Override
    public int run(PrintStream out, boolean quick) throws Exception {
        int rows = quick ? 4 : 32;
        int threads = Runtime.getRuntime().availableProcessors();
        DaySpec spec = DayFile.parse("bench sensitivity", DAY, null);
        String keep = System.getProperty("littoral.bench.keep");
        Path dir = keep != null ? Path.of(keep) : Files.createTempDirectory("littoral-bench-influence-");
        InfluenceStudy.Settings s = new InfluenceStudy.Settings(rows, SampleDesign.Points.SOBOL, 20261205L, 1000, 0.95);
        try {
            out.printf(Locale.ROOT, "sensitivity benchmark: N = %d rows, %d inputs, %d thread(s), load average %.2f%n", rows,
                    InfluenceStudy.inputs(spec).size(), threads, ManagementFactory.getOperatingSystemMXBean().getSystemLoadAverage());
            long t0 = System.nanoTime();
            InfluenceStudy.Result r = InfluenceStudy.run(spec, s, dir, new SweepExecutor.Options(threads, keep != null, out, false,
                    60_000), Solver.standard());
            InfluenceOutputs.write(dir, r, s);
            double wall = (System.nanoTime() - t0) / 1e9;
            double widest = 0;
            String where = "";
            for (InfluenceStudy.OutputIndices o : r.outputs()) {
                if (!o.key().startsWith("arrival:")) {
                    continue;
                }
                for (int i = 0; i < r.inputs().size(); i++) {
                    SobolIndices.Index x = o.indices().indices()[i];
                    double h = Math.max(0.5 * (x.firstHigh() - x.firstLow()), 0.5 * (x.totalHigh() - x.totalLow()));
                    if (h > widest) {
                        widest = h;
                        where = o.key() + " / " + r.inputs().get(i).name();
                    }
                }
                out.println("  " + o.key() + ": " + summary(r, o));
            }
            out.printf(Locale.ROOT, "  %d members, wall %.1f s (%.2f s per member), %d failed; load average after %.2f%n",
                    r.members().size(), wall, wall / Math.max(1, r.outcome().ran()), r.outcome().failed(),
                    ManagementFactory.getOperatingSystemMXBean().getSystemLoadAverage());
            boolean met = widest <= 0.1 && r.outcome().failed() == 0;
            out.printf(Locale.ROOT, "  widest 95 %% half-width of the arrival indices: %.3f (%s); target <= 0.1: %s%n", widest, where,
                    met ? "met" : "NOT met, N of about " + (int) Math.ceil(rows * (widest / 0.1) * (widest / 0.1)) + " would meet it");
            return met ? 0 : 1;
        } finally {
            if (keep == null) {
                try (Stream<Path> st = Files.walk(dir)) {
                    st.sorted(Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
                } catch (IOException e) {
                    // a temporary folder that cannot be removed is harmless
                }
            }
        }
    }

    private static String summary(InfluenceStudy.Result r, InfluenceStudy.OutputIndices o) {
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < r.inputs().size(); i++) {
            SobolIndices.Index x = o.indices().indices()[i];
            sb.append(String.format(Locale.ROOT, "%s%s S=%.2f [%.2f,%.2f] ST=%.2f [%.2f,%.2f]", i == 0 ? "" : "; ",
                    r.inputs().get(i).name(), x.first(), x.firstLow(), x.firstHigh(), x.total(), x.totalLow(), x.totalHigh()));
        }
        return sb.toString();
    }
}
