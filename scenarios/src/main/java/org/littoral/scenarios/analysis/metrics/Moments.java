package org.littoral.scenarios.analysis.metrics;

import org.apache.commons.math3.stat.descriptive.moment.Kurtosis;
import org.apache.commons.math3.stat.descriptive.moment.Skewness;

/**
 * Distribution summary of a sample: n, mean, standard deviation (n - 1), bias-corrected sample
 * skewness G1 and excess kurtosis G2 (Joanes &amp; Gill 1998, The Statistician 47, 183-189; as
 * computed by Commons Math Skewness/Kurtosis). NaN values are ignored.
 */
public record Moments(int n, double mean, double sd, double skewness, double excessKurtosis) {

    public static Moments of(double[] values) {
        double[] x = finite(values);
        int n = x.length;
        if (n == 0) {
            return new Moments(0, Double.NaN, Double.NaN, Double.NaN, Double.NaN);
        }
        double m = 0;
        for (double v : x) {
            m += v;
        }
        m /= n;
        double s = 0;
        for (double v : x) {
            s += (v - m) * (v - m);
        }
        double sd = n > 1 ? Math.sqrt(s / (n - 1)) : Double.NaN;
        double sk = n > 2 ? new Skewness().evaluate(x) : Double.NaN;
        double ku = n > 3 ? new Kurtosis().evaluate(x) : Double.NaN;
        return new Moments(n, m, sd, sk, ku);
    }

    /** (x - mean) / sd, NaN when sd is not positive. */
    public double standardise(double x) {
        return sd > 0 ? (x - mean) / sd : Double.NaN;
    }

    /** The finite values of a sample. Allocates. */
    public static double[] finite(double[] values) {
        int c = 0;
        for (double v : values) {
            if (Double.isFinite(v)) {
                c++;
            }
        }
        double[] x = new double[c];
        int i = 0;
        for (double v : values) {
            if (Double.isFinite(v)) {
                x[i++] = v;
            }
        }
        return x;
    }
}
