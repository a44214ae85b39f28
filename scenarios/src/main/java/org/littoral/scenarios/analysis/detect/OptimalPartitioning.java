package org.littoral.scenarios.analysis.detect;

/**
 * Optimal partitioning by dynamic programming without pruning, O(n^2): Jackson et al. (2005),
 * IEEE Signal Process. Lett. 12, 105-108; the exact reference that PELT must reproduce
 * (Killick et al. 2012, section 2.2). Kept for validation and for short series.
 */
public final class OptimalPartitioning {
    private OptimalPartitioning() {
    }

    public static Segmentation segment(SegmentCost cost, Penalty penalty, int minSegmentLength) {
        int n = cost.length();
        int m = Math.max(1, minSegmentLength);
        double beta = penalty.perChange(Math.max(n, 2), cost.parametersPerChange());
        double[] f = new double[n + 1];
        int[] last = new int[n + 1];
        java.util.Arrays.fill(f, Double.POSITIVE_INFINITY);
        f[0] = -beta;
        for (int t = m; t <= n; t++) {
            for (int tau = 0; tau <= t - m; tau++) {
                if (!Double.isFinite(f[tau])) {
                    continue;
                }
                double v = f[tau] + cost.cost(tau, t) + penalty.perSegment(t - tau, n) + beta;
                if (v < f[t]) {
                    f[t] = v;
                    last[t] = tau;
                }
            }
        }
        return Pelt.backtrack(f, last, n);
    }

    /**
     * Best segmentation with exactly k changes (segment neighbourhood, Auger &amp; Lawrence 1989,
     * Bull. Math. Biol. 51, 39-54), no penalty; totalCost is the sum of segment costs.
     * Returns null when no such segmentation exists. Allocates O(k n).
     */
    public static Segmentation segmentWithChanges(SegmentCost cost, int k, int minSegmentLength) {
        int n = cost.length();
        int m = Math.max(1, minSegmentLength);
        double[][] f = new double[k + 1][n + 1];
        int[][] arg = new int[k + 1][n + 1];
        for (double[] row : f) {
            java.util.Arrays.fill(row, Double.POSITIVE_INFINITY);
        }
        for (int t = m; t <= n; t++) {
            f[0][t] = cost.cost(0, t);
        }
        for (int j = 1; j <= k; j++) {
            for (int t = (j + 1) * m; t <= n; t++) {
                for (int tau = j * m; tau <= t - m; tau++) {
                    double v = f[j - 1][tau] + cost.cost(tau, t);
                    if (v < f[j][t]) {
                        f[j][t] = v;
                        arg[j][t] = tau;
                    }
                }
            }
        }
        if (!Double.isFinite(f[k][n])) {
            return null;
        }
        int[] ends = new int[k];
        int t = n;
        for (int j = k; j >= 1; j--) {
            t = arg[j][t];
            ends[j - 1] = t;
        }
        return new Segmentation(ends, f[k][n]);
    }
}
