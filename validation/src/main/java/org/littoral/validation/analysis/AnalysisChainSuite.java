package org.littoral.validation.analysis;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Random;
import java.util.concurrent.TimeUnit;
import org.littoral.scenarios.analysis.detect.NormalMeanCost;
import org.littoral.scenarios.analysis.detect.OptimalPartitioning;
import org.littoral.scenarios.analysis.detect.Pelt;
import org.littoral.scenarios.analysis.detect.Penalty;
import org.littoral.scenarios.analysis.detect.Segmentation;
import org.littoral.scenarios.validate.ValidationCase;
import org.littoral.scenarios.validate.ValidationSuite;

/** The analysis chain's change-point search, tests and finite differences against published results and outside references. */
public final class AnalysisChainSuite implements ValidationSuite {
    static final String KILLICK = "Killick, Fearnhead & Eckley (2012), JASA 107, 1590-1598";
    static final double[] EXAMPLE = {1.0, 1.2, 0.8, 1.1, 0.9, 3.0, 3.2, 2.8, 3.1, 2.9};

    @Override
    public String title() {
        return "Analysis chain";
    }

    @Override
    public int order() {
        return 60;
    }

    @Override
    public List<ValidationCase> run() {
        List<ValidationCase> out = new ArrayList<>();
        peltWorkedExample(out);
        peltEqualsOptimalPartitioning(out);
        strucchange(out);
        return out;
    }

    static double sumSquares(double[] y, int a, int b) {
        double m = 0;
        for (int i = a; i < b; i++) {
            m += y[i];
        }
        m /= b - a;
        double s = 0;
        for (int i = a; i < b; i++) {
            s += (y[i] - m) * (y[i] - m);
        }
        return s;
    }

    static void peltWorkedExample(List<ValidationCase> out) {
        Segmentation s = Pelt.segment(new NormalMeanCost(new double[][] {EXAMPLE}), Penalty.bic(), 1);
        String src = KILLICK + "; REFERENCES.md section 8 worked example (C)";
        out.add(new ValidationCase("analysis.pelt-example-change", src, "change locations (after sample k)", "[5]", "exact",
                Arrays.toString(s.changeEnds()), Arrays.equals(s.changeEnds(), new int[] {5}), false,
                "y = [1.0 .. 2.9], sigma = 1, penalty 2 ln 10"));
        // Expected recomputed from the formula: Sum of squares in each segment + one penalty 2 ln n.
        double expected = sumSquares(EXAMPLE, 0, 5) + sumSquares(EXAMPLE, 5, 10) + 2 * Math.log(10);
        out.add(ValidationCase.absolute("analysis.pelt-example-cost", src, "optimal penalised cost (4.8052)", expected, 1e-9,
                s.totalCost(), false, "expected recomputed as SS(1..5) + SS(6..10) + 2 ln 10"));
        double none = sumSquares(EXAMPLE, 0, 10);
        out.add(ValidationCase.absolute("analysis.pelt-example-no-change-cost", src, "cost without a change (10.20)", none,
                1e-9, new NormalMeanCost(new double[][] {EXAMPLE}).cost(0, 10), false, "expected = SS(1..10)"));
    }

    static double[] steps(Random r, int n, int k) {
        double[] y = new double[n];
        int[] at = new int[k];
        for (int j = 0; j < k; j++) {
            at[j] = (int) ((j + 1.0) * n / (k + 1) + r.nextInt(5) - 2);
        }
        double level = 0;
        int j = 0;
        for (int i = 0; i < n; i++) {
            if (j < k && i == at[j]) {
                level += (r.nextBoolean() ? 1 : -1) * (2.0 + 2 * r.nextDouble());
                j++;
            }
            y[i] = level + r.nextGaussian();
        }
        return y;
    }

    static void peltEqualsOptimalPartitioning(List<ValidationCase> out) {
        Random r = new Random(20120101L);
        int trials = 200;
        int equal = 0;
        for (int t = 0; t < trials; t++) {
            int dims = 1 + r.nextInt(3);
            int n = 40 + r.nextInt(160);
            double[][] y = new double[dims][];
            for (int d = 0; d < dims; d++) {
                y[d] = steps(r, n, r.nextInt(5));
            }
            NormalMeanCost c = new NormalMeanCost(y);
            int minSeg = 1 + r.nextInt(5);
            Penalty p = t % 2 == 0 ? Penalty.bic() : Penalty.mbic();
            Segmentation a = Pelt.segment(c, p, minSeg);
            Segmentation b = OptimalPartitioning.segment(c, p, minSeg);
            if (Arrays.equals(a.changeEnds(), b.changeEnds()) && a.totalCost() == b.totalCost()) {
                equal++;
            }
        }
        out.add(new ValidationCase("analysis.pelt-equals-optimal-partitioning", KILLICK
                + " (PELT is exact); optimal partitioning of Jackson et al. (2005)", "seeded series (1-3 dims, BIC and MBIC, min segment 1-5) with identical optimum",
                trials + " of " + trials, "exact (same changes, same cost to the last bit)", equal + " of " + trials,
                equal == trials, false, "seed 20120101"));
    }

    /** Live comparison with R strucchange breakpoints() (Bai & Perron 2003) for the number of breaks PELT found. */
    static void strucchange(List<ValidationCase> out) {
        String id = "analysis.pelt-vs-strucchange";
        String src = "R package strucchange breakpoints(), Bai & Perron (2003), J. Appl. Econometrics 18, 1-22 (Debian r-cran-strucchange)";
        int series = 12;
        int minSeg = 3;
        Random r = new Random(2003L);
        List<double[]> ys = new ArrayList<>();
        List<int[]> ours = new ArrayList<>();
        StringBuilder csv = new StringBuilder("id,k,y\n");
        for (int s = 0; s < series; s++) {
            double[] y = steps(r, 60 + r.nextInt(90), 1 + r.nextInt(3));
            Segmentation seg = Pelt.segment(new NormalMeanCost(new double[][] {y}), Penalty.bic(), minSeg);
            ys.add(y);
            ours.add(seg.changeEnds());
            for (double v : y) {
                csv.append(s).append(',').append(seg.changes()).append(',').append(String.format(Locale.ROOT, "%.10f", v)).append('\n');
            }
        }
        String rscript = "suppressPackageStartupMessages(library(strucchange))\n"
                + "d <- read.csv(commandArgs(TRUE)[1])\n"
                + "for (i in sort(unique(d$id))) { y <- d$y[d$id == i]; k <- d$k[d$id == i][1]\n"
                + "  if (k == 0) { cat(i, '\\n'); next }\n"
                + "  bp <- breakpoints(y ~ 1, h = " + minSeg + ", breaks = k)\n"
                + "  cat(i, breakpoints(bp, breaks = k)$breakpoints, '\\n') }\n";
        try {
            Path dir = Files.createTempDirectory("littoral-strucchange");
            Path data = dir.resolve("series.csv");
            Path script = dir.resolve("bp.R");
            Files.writeString(data, csv.toString(), StandardCharsets.UTF_8);
            Files.writeString(script, rscript, StandardCharsets.UTF_8);
            Process p;
            try {
                p = new ProcessBuilder("Rscript", "--vanilla", script.toString(), data.toString()).redirectErrorStream(true).start();
            } catch (IOException e) {
                out.add(new ValidationCase(id, src, "change locations", "same as R", "exact", "not run", false, false,
                        "Rscript not found: install r-base-core and r-cran-strucchange (.ci/run does)"));
                return;
            }
            String text = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
            if (!p.waitFor(120, TimeUnit.SECONDS) || p.exitValue() != 0) {
                p.destroyForcibly();
                out.add(new ValidationCase(id, src, "change locations", "same as R", "exact", "R failed", false, false,
                        "Rscript failed (is r-cran-strucchange installed?): " + text.strip().replace('\n', ' ')));
                return;
            }
            int agree = 0;
            List<String> diffs = new ArrayList<>();
            String[] lines = text.strip().split("\n");
            for (String line : lines) {
                String[] f = line.trim().split("\\s+");
                int s = Integer.parseInt(f[0]);
                int[] theirs = new int[f.length - 1];
                for (int j = 1; j < f.length; j++) {
                    theirs[j - 1] = Integer.parseInt(f[j]); // R: last index (1-based) of each segment = our change end
                }
                if (Arrays.equals(theirs, ours.get(s))) {
                    agree++;
                } else {
                    diffs.add(s + ": ours " + Arrays.toString(ours.get(s)) + " R " + Arrays.toString(theirs));
                }
            }
            out.add(new ValidationCase(id, src, "change locations for PELT's number of breaks, " + series
                    + " seeded series, h = " + minSeg, series + " of " + series, "exact", agree + " of " + lines.length,
                    agree == series && lines.length == series, false,
                    diffs.isEmpty() ? "run live through Rscript; seed 2003" : "differences: " + String.join("; ", diffs)));
        } catch (IOException | InterruptedException | RuntimeException e) {
            out.add(new ValidationCase(id, src, "change locations", "same as R", "exact", "error", false, false,
                    "could not run the comparison: " + e));
        }
    }
}
