package org.littoral.model.grid;

/**
 * Linear interpolation on an increasing set of levels or positions: the bracketing interval by bisection and the
 * weight of its upper end. Shared by the sounding sampler and the field sections so both read fields the same way.
 */
public final class Bracket {
    private Bracket() {
    }

    /** Index k with a[k] &lt;= v &lt;= a[k+1] for increasing a, clamped to [0, n-2]. */
    public static int index(double[] a, double v) {
        int lo = 0;
        int hi = a.length - 1;
        if (v <= a[0]) {
            return 0;
        }
        if (v >= a[hi]) {
            return hi - 1;
        }
        while (hi - lo > 1) {
            int mid = (lo + hi) >>> 1;
            if (a[mid] <= v) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return lo;
    }

    /** Linear weight of a[k+1] at v, clamped to [0, 1] (values outside take the nearer end). */
    public static double upperWeight(double[] a, int k, double v) {
        double w = (v - a[k]) / (a[k + 1] - a[k]);
        return Math.max(0.0, Math.min(1.0, w));
    }
}
