package org.littoral.scenarios.analysis.stats;

import org.apache.commons.math3.distribution.NormalDistribution;
import org.apache.commons.math3.stat.inference.MannWhitneyUTest;
import org.apache.commons.math3.stat.inference.TTest;

/** Two-sample location tests, two-sided. */
public final class TwoSampleTests {
    private TwoSampleTests() {
    }

    /** A test outcome: statistic, degrees of freedom (NaN when not applicable), two-sided p-value. */
    public record Outcome(double statistic, double degreesOfFreedom, double pValue) {
    }

    /**
     * Large-sample two-sample z-test with the sample variances: z = (m1 - m2) / sqrt(s1^2/n1 + s2^2/n2),
     * p = 2 (1 - Phi(|z|)) (e.g. Wackerly, Mendenhall &amp; Scheaffer, Mathematical Statistics with
     * Applications, large-sample tests; common practice).
     */
    public static Outcome zTest(double[] a, double[] b) {
        double ma = mean(a);
        double mb = mean(b);
        double se = Math.sqrt(var(a, ma) / a.length + var(b, mb) / b.length);
        double z = (ma - mb) / se;
        double p = 2.0 * (1.0 - new NormalDistribution().cumulativeProbability(Math.abs(z)));
        return new Outcome(z, Double.NaN, p);
    }

    /**
     * Welch (1947) t-test: statistic and p-value from Commons Math {@link TTest} (unequal variances);
     * degrees of freedom by Welch-Satterthwaite, reported.
     */
    public static Outcome welch(double[] a, double[] b) {
        TTest t = new TTest();
        double va = var(a, mean(a)) / a.length;
        double vb = var(b, mean(b)) / b.length;
        double df = (va + vb) * (va + vb) / (va * va / (a.length - 1) + vb * vb / (b.length - 1));
        return new Outcome(t.t(a, b), df, t.tTest(a, b));
    }

    /**
     * Mann-Whitney U (Mann &amp; Whitney 1947): U of the first sample, U1 = R1 - n1 (n1 + 1) / 2 with
     * average ranks for ties; p-value from Commons Math {@link MannWhitneyUTest} (normal approximation
     * without tie or continuity correction).
     */
    public static Outcome mannWhitney(double[] a, double[] b) {
        double r1 = 0;
        for (double x : a) {
            double less = 0;
            double eq = 0;
            for (double y : a) {
                less += y < x ? 1 : 0;
                eq += y == x ? 1 : 0;
            }
            for (double y : b) {
                less += y < x ? 1 : 0;
                eq += y == x ? 1 : 0;
            }
            r1 += less + (eq + 1) / 2.0; // average rank of the tie block
        }
        double u1 = r1 - a.length * (a.length + 1) / 2.0;
        return new Outcome(u1, Double.NaN, new MannWhitneyUTest().mannWhitneyUTest(a, b));
    }

    static double mean(double[] x) {
        double s = 0;
        for (double v : x) {
            s += v;
        }
        return s / x.length;
    }

    static double var(double[] x, double m) {
        double s = 0;
        for (double v : x) {
            s += (v - m) * (v - m);
        }
        return s / (x.length - 1);
    }
}
