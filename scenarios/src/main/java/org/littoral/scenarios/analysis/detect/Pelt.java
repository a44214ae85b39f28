package org.littoral.scenarios.analysis.detect;

/**
 * Pruned Exact Linear Time search for the segmentation minimising
 * Sum_segments [C(segment) + s(len)] + beta * (number of changes): Killick, Fearnhead &amp; Eckley
 * (2012), JASA 107, 1590-1598, Algorithm 2, with K = 0 (valid for {@link NormalMeanCost} and the
 * MBIC segment term, which are both super-additive under splitting).
 *
 * <p>Minimum segment length m: a candidate last change tau is admissible at time t only when
 * t - tau &gt;= m. To keep the search exact, a candidate that fails the pruning test at time t is
 * removed only once t + m has been reached (before that, t itself is not yet an admissible
 * alternative, so the domination argument of Killick et al., Theorem 3.1, does not apply).
 */
public final class Pelt {
    private Pelt() {
    }

    /** Runs PELT; allocates O(n) work arrays. */
    public static Segmentation segment(SegmentCost cost, Penalty penalty, int minSegmentLength) {
        int n = cost.length();
        int m = Math.max(1, minSegmentLength);
        double beta = penalty.perChange(Math.max(n, 2), cost.parametersPerChange());
        double[] f = new double[n + 1];
        int[] last = new int[n + 1];
        java.util.Arrays.fill(f, Double.POSITIVE_INFINITY);
        f[0] = -beta; // so that a segmentation with k changes carries k penalties
        int[] cand = new int[n + 1];
        int[] prunedAt = new int[n + 1];
        int nc = 0;
        cand[nc++] = 0;
        prunedAt[0] = Integer.MAX_VALUE;
        double[] value = new double[n + 1];
        for (int t = m; t <= n; t++) {
            double best = Double.POSITIVE_INFINITY;
            int arg = -1;
            for (int j = 0; j < nc; j++) {
                int tau = cand[j];
                if (t - tau < m) {
                    value[j] = Double.NaN;
                    continue;
                }
                double v = f[tau] + cost.cost(tau, t) + penalty.perSegment(t - tau, n) + beta;
                value[j] = v;
                if (v < best) {
                    best = v;
                    arg = tau;
                }
            }
            f[t] = best;
            last[t] = arg;
            // Mark dominated candidates; remove those marked at least m steps ago.
            int w = 0;
            for (int j = 0; j < nc; j++) {
                int tau = cand[j];
                if (!Double.isNaN(value[j]) && prunedAt[tau] == Integer.MAX_VALUE && value[j] - beta > best) {
                    prunedAt[tau] = t;
                }
                if (prunedAt[tau] != Integer.MAX_VALUE && t + 1 - prunedAt[tau] >= m) {
                    continue; // from t + 1 on, t' = prunedAt is an admissible, strictly better last change
                }
                cand[w++] = tau;
            }
            nc = w;
            if (Double.isFinite(best)) {
                cand[nc++] = t;
                prunedAt[t] = Integer.MAX_VALUE;
            }
        }
        return backtrack(f, last, n);
    }

    static Segmentation backtrack(double[] f, int[] last, int n) {
        if (!Double.isFinite(f[n])) {
            return new Segmentation(new int[0], Double.NaN);
        }
        int count = 0;
        for (int t = last[n]; t > 0; t = last[t]) {
            count++;
        }
        int[] ends = new int[count];
        int i = count - 1;
        for (int t = last[n]; t > 0; t = last[t]) {
            ends[i--] = t;
        }
        return new Segmentation(ends, f[n]);
    }
}
