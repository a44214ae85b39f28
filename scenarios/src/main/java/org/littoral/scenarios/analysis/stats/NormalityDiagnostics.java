package org.littoral.scenarios.analysis.stats;

import org.apache.commons.math3.distribution.ChiSquaredDistribution;

/**
 * Normality diagnostics of a sample: moment skewness b1 = m3 / m2^1.5 and kurtosis b2 = m4 / m2^2
 * (biased moment estimators), and the Jarque-Bera statistic JB = n/6 [b1^2 + (b2 - 3)^2 / 4], which is
 * asymptotically chi-squared with 2 degrees of freedom under normality (Jarque &amp; Bera 1987, Int.
 * Stat. Rev. 55, 163-172). The chi-squared approximation is poor for small n, so the choice of test
 * also uses the skewness directly (see {@link GroupComparisons}).
 */
public record NormalityDiagnostics(int n, double skewness, double excessKurtosis, double jarqueBera, double jarqueBeraP) {

    public static NormalityDiagnostics of(double[] x) {
        int n = x.length;
        if (n < 3) {
            return new NormalityDiagnostics(n, Double.NaN, Double.NaN, Double.NaN, Double.NaN);
        }
        double m = 0;
        for (double v : x) {
            m += v;
        }
        m /= n;
        double m2 = 0;
        double m3 = 0;
        double m4 = 0;
        for (double v : x) {
            double d = v - m;
            double d2 = d * d;
            m2 += d2;
            m3 += d2 * d;
            m4 += d2 * d2;
        }
        m2 /= n;
        m3 /= n;
        m4 /= n;
        if (!(m2 > 0)) {
            return new NormalityDiagnostics(n, Double.NaN, Double.NaN, Double.NaN, Double.NaN);
        }
        double b1 = m3 / Math.pow(m2, 1.5);
        double b2 = m4 / (m2 * m2);
        double jb = n / 6.0 * (b1 * b1 + (b2 - 3) * (b2 - 3) / 4.0);
        double p = 1.0 - new ChiSquaredDistribution(2).cumulativeProbability(jb);
        return new NormalityDiagnostics(n, b1, b2 - 3, jb, p);
    }
}
