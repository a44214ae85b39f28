package org.littoral.scenarios.bench;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.littoral.scenarios.run.ScenarioRun;
import org.littoral.scenarios.run.Solver;
import org.littoral.scenarios.run.WorkEstimate;
import org.littoral.scenarios.scenario.BuiltinScenarios;
import org.littoral.scenarios.scenario.Scenario;
import org.littoral.scenarios.scenario.ScenarioFile;

/**
 * {@code littoral bench memory-estimate}: the memory a run estimates for itself before it starts
 * ({@link WorkEstimate}) against the peak heap measured while it runs, for runs that stress each part of the
 * estimate (model grid and harmonics, output times, soundings, the nonlinear snapshots). The estimate must not be
 * below the measured peak (it refuses runs on it), and should not be far above it.
 */
public final class MemoryEstimateBenchmark implements Benchmark {

    @Override
    public String name() {
        return "memory-estimate";
    }

    @Override
    public String description() {
        return "A run's memory estimate (made before it starts) against its measured peak heap";
    }

    private record Case(String label, Scenario scenario) {
    }

    private static Scenario variant(String builtin, String label, String... keyValues) {
        ObjectNode doc = BuiltinScenarios.resolve(builtin).inputs().deepCopy();
        for (int i = 0; i < keyValues.length; i += 2) {
            String[] p = keyValues[i].split("\\.");
            ObjectNode o = doc;
            for (int k = 0; k < p.length - 1; k++) {
                o = o.with(p[k]);
            }
            String v = keyValues[i + 1];
            if (v.matches("-?[0-9.eE+-]+")) {
                o.put(p[p.length - 1], Double.parseDouble(v));
            } else {
                o.put(p[p.length - 1], v);
            }
        }
        return ScenarioFile.fromTree(label, doc);
    }

    static List<Case> cases(boolean quick) {
        List<Case> cases = new ArrayList<>();
        cases.add(new Case("classic-45N as built in", BuiltinScenarios.resolve("classic-45N")));
        cases.add(new Case("linear 2048 x 128, 48 harmonics", variant("classic-45N", "big linear", "grid.points", "2048",
                "grid.levels", "128", "physics.harmonics", "48")));
        cases.add(new Case("sea-barrier-bay (slab 2048 x 81), 96 harmonics", variant("sea-barrier-bay", "big slab",
                "physics.harmonics", "96")));
        cases.add(new Case("linear, output every minute", variant("classic-45N", "fine output", "output.step_min", "1")));
        cases.add(new Case("soundings: every 2 min, 1 m bins to 1.5 km", variant("classic-45N", "many soundings",
                "flights.cadence_min", "2", "flights.bin_m", "1", "flights.ceiling_m", "1500")));
        if (!quick) {
            cases.add(new Case("nonlinear nl-onshore-2ms as built in", BuiltinScenarios.resolve("nl-onshore-2ms")));
        }
        return cases;
    }

    /**
     * Runs case {@code args[0]} into folder {@code args[1]} and exits 0, or 3 when the heap (-Xmx) was too small:
     * the benchmark starts it in a fresh JVM at several heap limits to find the smallest one that works.
     */
    public static void main(String[] args) {
        try {
            Case c = cases(false).get(Integer.parseInt(args[0]));
            new ScenarioRun(c.scenario(), Solver.standard(), null).checkMemory(false).run(Path.of(args[1]));
            System.exit(0);
        } catch (OutOfMemoryError e) {
            System.exit(3);
        } catch (Exception e) {
            e.printStackTrace();
            System.exit(4);
        }
    }

    /** Whether case k completes within a heap of mb MB (in a fresh JVM). */
    private static int probe(int k, long mb, Path dir) throws Exception {
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        Process p = new ProcessBuilder(java, "-Xmx" + mb + "m", "-Xss8m", "-Djava.awt.headless=true", "-cp",
                System.getProperty("java.class.path"), MemoryEstimateBenchmark.class.getName(), Integer.toString(k),
                dir.toString()).redirectErrorStream(true).redirectOutput(ProcessBuilder.Redirect.DISCARD).start();
        int rc = p.waitFor();
        InputFuzz.deleteTree(dir);
        return rc;
    }

    @Override
    public int run(PrintStream out, boolean quick) throws Exception {
        List<Case> cases = cases(quick);
        out.println("memory-estimate: each run's estimate (made before it starts) against the smallest heap (-Xmx) it completes in,");
        out.println("found by running it in fresh JVMs (binary search to about 8 %); the estimate must not be below it");
        out.printf(Locale.ROOT, "%-44s %12s %12s %7s  %s%n", "run", "estimate MB", "needs MB", "ratio", "parts of the estimate");
        int rc = 0;
        Path dir = Files.createTempDirectory("littoral-memory-estimate-");
        try {
            for (int k = 0; k < cases.size(); k++) {
                Case c = cases.get(k);
                WorkEstimate w = WorkEstimate.of(c.scenario());
                long est = (w.bytes() + (1 << 20) - 1) >> 20;
                String need;
                double ratio;
                int atEstimate = probe(k, est, dir.resolve("r"));
                if (atEstimate != 0) {
                    need = atEstimate == 3 ? "> " + est : "failed (" + atEstimate + ")";
                    ratio = Double.NaN;
                    rc = 1;
                } else {
                    long lo = 16;
                    long hi = est;
                    while (hi - lo > Math.max(8, hi / 12)) {
                        long mid = (lo + hi) / 2;
                        if (probe(k, mid, dir.resolve("r")) == 0) {
                            hi = mid;
                        } else {
                            lo = mid;
                        }
                    }
                    need = Long.toString(hi);
                    ratio = (double) est / hi;
                }
                out.printf(Locale.ROOT, "%-44s %12d %12s %7.2f  %s%n", c.label(), est, need, ratio, w.describe());
            }
        } finally {
            InputFuzz.deleteTree(dir);
        }
        out.println(rc == 0 ? "every run completed within its estimate" : "A RUN DID NOT COMPLETE WITHIN ITS ESTIMATE");
        return rc;
    }
}
