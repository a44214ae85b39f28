package org.littoral.scenarios.report;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Box-and-whisker statistics after Tukey (1977), Exploratory Data Analysis, Addison-Wesley: box from
 * the lower to the upper quartile, whiskers to the most extreme values within 1.5 IQR of the box
 * (the inner fences), values beyond them listed as outliers. NaN values are dropped and counted.
 *
 * <p>Quartiles by a stated {@link Method}: Tukey's hinges (the default, as in R's {@code fivenum} and
 * {@code boxplot}) or Hyndman and Fan (1996) definition 7 (linear interpolation between order
 * statistics, R's {@code quantile} default).
 */
public final class BoxStats {
    /** How the quartiles are computed. */
    public enum Method {
        /**
         * Tukey (1977) hinges: medians of the lower and upper halves, each half including the median
         * when n is odd. Depth of the hinge (floor((n + 1) / 2) + 1) / 2.
         */
        TUKEY_HINGES,
        /**
         * Hyndman, R. J. and Fan, Y. (1996), Sample quantiles in statistical packages, Am. Stat. 50,
         * 361-365, definition 7: h = (n - 1) p + 1, Q = x[floor h] + (h - floor h)(x[floor h + 1] - x[floor h]).
         */
        HYNDMAN_FAN_7
    }

    /** Tukey's inner-fence multiplier. */
    public static final double FENCE_IQR = 1.5;

    private final Method method;
    private final int n;
    private final int nDropped;
    private final double min;
    private final double q1;
    private final double median;
    private final double q3;
    private final double max;
    private final double mean;
    private final double lowerWhisker;
    private final double upperWhisker;
    private final double[] outliers;

    private BoxStats(Method method, double[] sorted, int nDropped) {
        this.method = method;
        this.n = sorted.length;
        this.nDropped = nDropped;
        if (n == 0) {
            min = q1 = median = q3 = max = mean = lowerWhisker = upperWhisker = Double.NaN;
            outliers = new double[0];
            return;
        }
        min = sorted[0];
        max = sorted[n - 1];
        median = quantileSorted(sorted, 0.5);
        if (method == Method.TUKEY_HINGES) {
            double depth = (Math.floor((n + 1) / 2.0) + 1) / 2.0;
            q1 = atDepth(sorted, depth);
            q3 = atDepth(sorted, n + 1 - depth);
        } else {
            q1 = quantileSorted(sorted, 0.25);
            q3 = quantileSorted(sorted, 0.75);
        }
        double iqr = q3 - q1;
        double lo = q1 - FENCE_IQR * iqr;
        double hi = q3 + FENCE_IQR * iqr;
        double lw = Double.NaN;
        double uw = Double.NaN;
        double sum = 0;
        List<Double> out = new ArrayList<>();
        for (double v : sorted) {
            sum += v;
            if (v < lo || v > hi) {
                out.add(v);
            } else {
                if (Double.isNaN(lw)) {
                    lw = v;
                }
                uw = v;
            }
        }
        mean = sum / n;
        lowerWhisker = lw;
        upperWhisker = uw;
        outliers = out.stream().mapToDouble(Double::doubleValue).toArray();
    }

    /** Statistics of the finite values of {@code values} by Tukey's hinges. */
    public static BoxStats of(double[] values) {
        return of(values, Method.TUKEY_HINGES);
    }

    public static BoxStats of(double[] values, Method method) {
        double[] finite = Arrays.stream(values).filter(Double::isFinite).sorted().toArray();
        return new BoxStats(method, finite, values.length - finite.length);
    }

    /** 1-based depth; a half depth averages the two neighbours (Tukey 1977). */
    private static double atDepth(double[] sorted, double depth) {
        int lo = (int) Math.floor(depth) - 1;
        int hi = (int) Math.ceil(depth) - 1;
        return 0.5 * (sorted[lo] + sorted[hi]);
    }

    /** Hyndman and Fan (1996) definition 7 on sorted data; p in [0, 1]. */
    public static double quantileSorted(double[] sorted, double p) {
        if (!(p >= 0 && p <= 1)) {
            throw new IllegalArgumentException("quantile probability must be in [0, 1], got " + p);
        }
        int n = sorted.length;
        if (n == 0) {
            return Double.NaN;
        }
        double h = (n - 1) * p; // 0-based form of h = (n - 1) p + 1
        int j = (int) Math.floor(h);
        if (j >= n - 1) {
            return sorted[n - 1];
        }
        return sorted[j] + (h - j) * (sorted[j + 1] - sorted[j]);
    }

    /** Hyndman and Fan (1996) definition 7 quantile of the finite values (NaN if none). */
    public static double quantile(double[] values, double p) {
        return quantileSorted(Arrays.stream(values).filter(Double::isFinite).sorted().toArray(), p);
    }

    public Method method() {
        return method;
    }

    /** Number of finite values used. */
    public int n() {
        return n;
    }

    /** Number of NaN or infinite values dropped. */
    public int nDropped() {
        return nDropped;
    }

    public double min() {
        return min;
    }

    public double q1() {
        return q1;
    }

    public double median() {
        return median;
    }

    public double q3() {
        return q3;
    }

    public double max() {
        return max;
    }

    public double mean() {
        return mean;
    }

    public double iqr() {
        return q3 - q1;
    }

    public double lowerFence() {
        return q1 - FENCE_IQR * iqr();
    }

    public double upperFence() {
        return q3 + FENCE_IQR * iqr();
    }

    /** Smallest value at or above the lower fence. */
    public double lowerWhisker() {
        return lowerWhisker;
    }

    /** Largest value at or below the upper fence. */
    public double upperWhisker() {
        return upperWhisker;
    }

    /** Values beyond the fences, ascending (a copy). */
    public double[] outliers() {
        return outliers.clone();
    }
}
