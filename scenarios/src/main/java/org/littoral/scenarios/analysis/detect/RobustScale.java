package org.littoral.scenarios.analysis.detect;

import java.util.Arrays;

/** Scale estimates used to standardise series before the unit-variance change-point cost. */
public final class RobustScale {
    private RobustScale() {
    }

    /**
     * Noise standard deviation from first differences: MAD(diff) / (0.6745 sqrt 2). A mean shift
     * touches one difference only, so the estimate is robust to the changes themselves (Hampel 1974
     * MAD; the difference-based form as used for change points, e.g. Fryzlewicz 2014, Ann. Stat. 42,
     * 2243-2281). Returns NaN for fewer than 3 values.
     */
    public static double noiseSdFromDifferences(double[] y) {
        int n = y.length;
        if (n < 3) {
            return Double.NaN;
        }
        double[] d = new double[n - 1];
        for (int i = 1; i < n; i++) {
            d[i - 1] = y[i] - y[i - 1];
        }
        double med = median(d);
        for (int i = 0; i < d.length; i++) {
            d[i] = Math.abs(d[i] - med);
        }
        return median(d) / (0.6744897501960817 * Math.sqrt(2.0));
    }

    /** Sample standard deviation (n - 1). */
    public static double sd(double[] y) {
        int n = y.length;
        if (n < 2) {
            return Double.NaN;
        }
        double m = 0;
        for (double v : y) {
            m += v;
        }
        m /= n;
        double s = 0;
        for (double v : y) {
            s += (v - m) * (v - m);
        }
        return Math.sqrt(s / (n - 1));
    }

    /** Median; sorts a copy. */
    public static double median(double[] a) {
        double[] c = a.clone();
        Arrays.sort(c);
        int n = c.length;
        return n % 2 == 1 ? c[n / 2] : 0.5 * (c[n / 2 - 1] + c[n / 2]);
    }
}
