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
import org.littoral.scenarios.analysis.metrics.CentredDifference;
import org.littoral.scenarios.analysis.stats.TwoSampleTests;
import org.apache.commons.math3.distribution.NormalDistribution;
import org.apache.commons.math3.distribution.TDistribution;
import org.apache.commons.math3.stat.inference.MannWhitneyUTest;
import org.apache.commons.math3.stat.inference.TTest;
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
        twoSampleTests(out);
        rTwoSampleTests(out);
        centredDifferences(out);
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
        String src = KILLICK + "; docs/references.md section 8 worked example (C)";
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

    // Welch worked example: an R session published on Cross Validated (t.test(ts1, ts2), Welch by default):
    // t = -1.8325, df = 17.9, p-value = 0.08356.
    static final double[] TS1 = {11, 9, 10, 11, 10, 12, 9, 11, 12, 9};
    static final double[] TS2 = {11, 13, 10, 13, 12, 9, 11, 12, 12, 11};
    static final String WELCH_SRC = "Welch (1947), Biometrika 34, 28-35; worked example: R t.test(ts1, ts2) session on Cross Validated";
    static final String MW_SRC = "Mann & Whitney (1947), Ann. Math. Stat. 18, 50-60; worked example: Wikipedia 'Mann-Whitney U test', tortoise and hare illustration";

    static void twoSampleTests(List<ValidationCase> out) {
        TwoSampleTests.Outcome w = TwoSampleTests.welch(TS1, TS2);
        out.add(ValidationCase.absolute("analysis.welch-example-t", WELCH_SRC, "Welch t", -1.8325, 5e-5, w.statistic(), false,
                "ts1 = 11 9 10 11 10 12 9 11 12 9; ts2 = 11 13 10 13 12 9 11 12 12 11"));
        out.add(ValidationCase.absolute("analysis.welch-example-df", WELCH_SRC, "Welch-Satterthwaite df", 17.9, 0.05,
                w.degreesOfFreedom(), false, "R prints df to 3 significant figures"));
        out.add(ValidationCase.absolute("analysis.welch-example-p", WELCH_SRC, "two-sided p", 0.08356, 5e-6, w.pValue(), false, ""));
        // Independent by-hand Welch against littoral (which calls Commons Math TTest).
        double ma = mean(TS1);
        double mb = mean(TS2);
        double va = var(TS1) / TS1.length;
        double vb = var(TS2) / TS2.length;
        double t = (ma - mb) / Math.sqrt(va + vb);
        double df = (va + vb) * (va + vb) / (va * va / (TS1.length - 1) + vb * vb / (TS2.length - 1));
        double p = 2 * new TDistribution(df).cumulativeProbability(-Math.abs(t));
        out.add(ValidationCase.absolute("analysis.welch-vs-formula", "Welch (1947) statistic and Welch-Satterthwaite df by hand, "
                + "t distribution from Commons Math", "two-sided p", p, 1e-10, w.pValue(), false, "same data"));
        // The large-sample z statistic equals the Welch statistic of Commons Math TTest.t for the same data.
        Random r = new Random(1947);
        double[] a = new double[60];
        double[] b = new double[45];
        for (int i = 0; i < a.length; i++) {
            a[i] = 1.0 + 2.0 * r.nextGaussian();
        }
        for (int i = 0; i < b.length; i++) {
            b[i] = 0.2 + 1.0 * r.nextGaussian();
        }
        TwoSampleTests.Outcome z = TwoSampleTests.zTest(a, b);
        out.add(ValidationCase.absolute("analysis.z-statistic-vs-commons-math", "Commons Math 3.6.1 TTest.t (same unpooled standard error)",
                "z statistic", new TTest().t(a, b), 1e-12, z.statistic(), false, "seeded normal samples n = 60, 45"));
        double zp = 2 * (1 - new NormalDistribution().cumulativeProbability(Math.abs(new TTest().t(a, b))));
        out.add(ValidationCase.absolute("analysis.z-p-value", "two-sided normal p = 2 (1 - Phi(|z|)) (large-sample z-test, common practice)",
                "p", zp, 1e-12, z.pValue(), false, "Phi from Commons Math NormalDistribution"));
        // Mann-Whitney: the tortoise and hare example, ranking the first animal home 12.
        double[] tortoises = {12, 6, 5, 4, 3, 2};
        double[] hares = {11, 10, 9, 8, 7, 1};
        out.add(ValidationCase.absolute("analysis.mann-whitney-example-U", MW_SRC, "U of the tortoises", 11, 0,
                TwoSampleTests.mannWhitney(tortoises, hares).statistic(), false, "order T H H H H H T T T T T H; U_H = 25"));
        double[] c = new double[40];
        double[] d = new double[33];
        for (int i = 0; i < c.length; i++) {
            c[i] = Math.exp(r.nextGaussian());
        }
        for (int i = 0; i < d.length; i++) {
            d[i] = Math.exp(0.4 + r.nextGaussian());
        }
        TwoSampleTests.Outcome mw = TwoSampleTests.mannWhitney(c, d);
        double u = mw.statistic();
        out.add(ValidationCase.absolute("analysis.mann-whitney-U-vs-commons-math", "Commons Math 3.6.1 MannWhitneyUTest.mannWhitneyU (max of U1, U2)",
                "max(U, n1 n2 - U)", new MannWhitneyUTest().mannWhitneyU(c, d), 0, Math.max(u, c.length * d.length - u), false,
                "seeded lognormal samples n = 40, 33; littoral ranks by its own code"));
        double zu = (Math.min(u, c.length * d.length - u) - c.length * d.length / 2.0)
                / Math.sqrt(c.length * d.length * (c.length + d.length + 1) / 12.0);
        out.add(ValidationCase.absolute("analysis.mann-whitney-p-vs-formula", "normal approximation of U, Mann & Whitney (1947)",
                "two-sided p", 2 * new NormalDistribution().cumulativeProbability(zu), 1e-12, mw.pValue(), false,
                "no ties; no continuity correction"));
    }

    /** Live R: t.test (Welch) and wilcox.test (normal approximation, no continuity correction) on the same seeded samples. */
    static void rTwoSampleTests(List<ValidationCase> out) {
        String src = "R stats t.test / wilcox.test(exact = FALSE, correct = FALSE), run live through Rscript";
        Random r = new Random(77);
        double[] a = new double[25];
        double[] b = new double[18];
        for (int i = 0; i < a.length; i++) {
            a[i] = r.nextGaussian() * 1.3 + 0.5;
        }
        for (int i = 0; i < b.length; i++) {
            b[i] = r.nextGaussian() * 0.7;
        }
        String script = "a <- c(" + join(a) + "); b <- c(" + join(b) + ")\n"
                + "cat(sprintf('%.15g %.15g %.15g', t.test(a, b)$statistic, t.test(a, b)$p.value, "
                + "wilcox.test(a, b, exact = FALSE, correct = FALSE)$p.value), '\\n')\n";
        String text;
        try {
            Path f = Files.createTempFile("littoral-tests", ".R");
            Files.writeString(f, script, StandardCharsets.UTF_8);
            Process p = new ProcessBuilder("Rscript", "--vanilla", f.toString()).redirectErrorStream(true).start();
            text = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8).strip();
            if (!p.waitFor(60, TimeUnit.SECONDS) || p.exitValue() != 0) {
                throw new IOException("Rscript failed: " + text);
            }
        } catch (IOException | InterruptedException e) {
            out.add(new ValidationCase("analysis.welch-vs-r", src, "Welch t, p; Mann-Whitney p", "same as R", "1e-9", "not run",
                    false, false, "Rscript not available or failed (install r-base-core; .ci/run does): " + e.getMessage()));
            return;
        }
        String[] f = text.split("\\s+");
        TwoSampleTests.Outcome w = TwoSampleTests.welch(a, b);
        TwoSampleTests.Outcome m = TwoSampleTests.mannWhitney(a, b);
        out.add(ValidationCase.absolute("analysis.welch-t-vs-r", src, "Welch t", Double.parseDouble(f[0]), 1e-9, w.statistic(), false,
                "seeded samples n = 25, 18"));
        out.add(ValidationCase.absolute("analysis.welch-p-vs-r", src, "Welch two-sided p", Double.parseDouble(f[1]), 1e-9,
                w.pValue(), false, ""));
        out.add(ValidationCase.absolute("analysis.mann-whitney-p-vs-r", src, "Mann-Whitney two-sided p", Double.parseDouble(f[2]),
                1e-9, m.pValue(), false, "continuous data, no ties"));
    }

    static void centredDifferences(List<ValidationCase> out) {
        Random r = new Random(1988);
        int n = 25;
        double[] x = new double[n];
        double[] y = new double[n];
        double xi = 0;
        for (int i = 0; i < n; i++) {
            xi += 0.05 + r.nextDouble();
            x[i] = xi;
            y[i] = 0.7 * xi * xi - 3.1 * xi + 2.0;
        }
        double[] d = CentredDifference.derivative(x, y);
        double worst = 0;
        for (int i = 0; i < n; i++) {
            worst = Math.max(worst, Math.abs(d[i] - (1.4 * x[i] - 3.1)));
        }
        out.add(ValidationCase.absolute("analysis.centred-difference-quadratic", "Fornberg (1988), Math. Comp. 51, 699-706: "
                + "three-point weights on an uneven grid are exact for quadratics", "max |f' error| on f = 0.7 x^2 - 3.1 x + 2",
                0.0, 1e-10, worst, false, "25 seeded uneven points, ends included"));
    }

    static String join(double[] v) {
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < v.length; i++) {
            sb.append(i > 0 ? "," : "").append(String.format(Locale.ROOT, "%.17g", v[i]));
        }
        return sb.toString();
    }

    static double mean(double[] x) {
        double s = 0;
        for (double v : x) {
            s += v;
        }
        return s / x.length;
    }

    static double var(double[] x) {
        double m = mean(x);
        double s = 0;
        for (double v : x) {
            s += (v - m) * (v - m);
        }
        return s / (x.length - 1);
    }
}
