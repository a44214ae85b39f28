package org.littoral.scenarios.analysis.composite;

import java.util.Arrays;

/**
 * Box-and-whisker statistics of a sample (Tukey 1977, Exploratory Data Analysis): quartiles by
 * linear interpolation between order statistics (Hyndman &amp; Fan 1996, Am. Stat. 50, 361-365,
 * type 7, the R default); whiskers at the most extreme data within 1.5 IQR of the quartiles;
 * values beyond them are outliers.
 */
public record BoxStats(int n, double mean, double min, double q1, double median, double q3, double max,
                       double whiskerLow, double whiskerHigh, int outliers) {

    /** NaN values are ignored. Sorts a copy. */
    public static BoxStats of(double[] values) {
        double[] x = org.littoral.scenarios.analysis.metrics.Moments.finite(values);
        int n = x.length;
        if (n == 0) {
            return new BoxStats(0, Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN,
                    Double.NaN, 0);
        }
        Arrays.sort(x);
        double sum = 0;
        for (double v : x) {
            sum += v;
        }
        double q1 = quantile(x, 0.25);
        double q3 = quantile(x, 0.75);
        double iqr = q3 - q1;
        double lo = q1 - 1.5 * iqr;
        double hi = q3 + 1.5 * iqr;
        double wl = Double.NaN;
        double wh = Double.NaN;
        int out = 0;
        for (double v : x) {
            if (v < lo || v > hi) {
                out++;
            } else {
                if (Double.isNaN(wl)) {
                    wl = v;
                }
                wh = v;
            }
        }
        return new BoxStats(n, sum / n, x[0], q1, quantile(x, 0.5), q3, x[n - 1], wl, wh, out);
    }

    /** Hyndman &amp; Fan type 7 quantile of sorted data: h = (n - 1) p, linear interpolation. */
    public static double quantile(double[] sorted, double p) {
        int n = sorted.length;
        double h = (n - 1) * p;
        int lo = (int) Math.floor(h);
        int hi = Math.min(lo + 1, n - 1);
        return sorted[lo] + (h - lo) * (sorted[hi] - sorted[lo]);
    }
}
