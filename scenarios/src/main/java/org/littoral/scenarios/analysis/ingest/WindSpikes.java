package org.littoral.scenarios.analysis.ingest;

/**
 * Spike test on a binned wind-speed profile, the same on every ingest path: a bin whose speed departs from
 * the median of its neighbours (up to {@code halfWindow} bins either side, itself excluded) by more than a
 * threshold is a spike. A median of neighbours is the usual despiking reference for profile data because
 * one bad bin cannot move it (common practice; cf. the median filters of Tukey 1977, Exploratory Data Analysis).
 */
public final class WindSpikes {
    private WindSpikes() {
    }

    /** Indices (into {@code speed}) of spikes; NaN speeds are skipped and never flagged. Allocates the result. */
    public static int[] find(double[] speed, int halfWindow, double thresholdMPerS) {
        int n = speed.length;
        int[] out = new int[n];
        int m = 0;
        double[] nb = new double[2 * halfWindow];
        for (int k = 0; k < n; k++) {
            if (Double.isNaN(speed[k])) {
                continue;
            }
            int c = 0;
            for (int j = Math.max(0, k - halfWindow); j <= Math.min(n - 1, k + halfWindow); j++) {
                if (j != k && !Double.isNaN(speed[j])) {
                    nb[c++] = speed[j];
                }
            }
            if (c < 2) {
                continue;
            }
            java.util.Arrays.sort(nb, 0, c);
            double med = c % 2 == 1 ? nb[c / 2] : 0.5 * (nb[c / 2 - 1] + nb[c / 2]);
            if (Math.abs(speed[k] - med) > thresholdMPerS) {
                out[m++] = k;
            }
        }
        return java.util.Arrays.copyOf(out, m);
    }
}
