package org.littoral.scenarios.analysis.stats;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;

/**
 * Compares two samples with the test that suits them and keeps the diagnostics behind the choice:
 * a sample is far from normal when it has at least minNForNormality values and a Jarque-Bera
 * p-value below normalityAlpha or |skewness| above skewnessLimit. Either sample far from normal:
 * Mann-Whitney. Otherwise both at least zTestMinN: two-sample z-test. Otherwise: Welch t-test.
 * Many comparisons: Holm (1979, Scand. J. Stat. 6, 65-70) step-down adjusted p-values.
 */
public final class GroupComparisons {
    private GroupComparisons() {
    }

    public static ComparisonRow compare(String metric, String attribute, String groupA, double[] a, String groupB, double[] b,
                                        StatsSettings s) {
        NormalityDiagnostics da = NormalityDiagnostics.of(a);
        NormalityDiagnostics db = NormalityDiagnostics.of(b);
        boolean farA = far(da, s);
        boolean farB = far(db, s);
        ComparisonRow.Test test;
        String why;
        if (farA || farB) {
            test = ComparisonRow.Test.MANN_WHITNEY;
            why = "far from normal: " + (farA ? groupA + " " + describe(da) : "") + (farA && farB ? "; " : "")
                    + (farB ? groupB + " " + describe(db) : "");
        } else if (a.length >= s.zTestMinN && b.length >= s.zTestMinN) {
            test = ComparisonRow.Test.Z_TEST;
            why = "both n >= " + s.zTestMinN + " and near normal (" + describe(da) + "; " + describe(db) + ")";
        } else {
            test = ComparisonRow.Test.WELCH_T;
            why = "near normal or too small to judge (" + describe(da) + "; " + describe(db) + "), n < " + s.zTestMinN;
        }
        TwoSampleTests.Outcome o = switch (test) {
            case Z_TEST -> TwoSampleTests.zTest(a, b);
            case WELCH_T -> TwoSampleTests.welch(a, b);
            case MANN_WHITNEY -> TwoSampleTests.mannWhitney(a, b);
        };
        double ma = TwoSampleTests.mean(a);
        double mb = TwoSampleTests.mean(b);
        return new ComparisonRow(metric, attribute, groupA, groupB, a.length, b.length, ma, mb, ma - mb, test, o.statistic(),
                o.degreesOfFreedom(), o.pValue(), Double.NaN, da, db, why);
    }

    static boolean far(NormalityDiagnostics d, StatsSettings s) {
        if (d.n() < s.minNForNormality || Double.isNaN(d.skewness())) {
            return false;
        }
        return d.jarqueBeraP() < s.normalityAlpha || Math.abs(d.skewness()) > s.skewnessLimit;
    }

    private static String describe(NormalityDiagnostics d) {
        if (Double.isNaN(d.skewness())) {
            return "n=" + d.n();
        }
        return String.format(Locale.ROOT, "n=%d skew=%.2f exkurt=%.2f JB p=%.3f", d.n(), d.skewness(), d.excessKurtosis(),
                d.jarqueBeraP());
    }

    /** Holm step-down adjusted p-values, in the order given. */
    public static double[] holm(double[] p) {
        int m = p.length;
        Integer[] order = new Integer[m];
        for (int i = 0; i < m; i++) {
            order[i] = i;
        }
        Arrays.sort(order, (x, y) -> Double.compare(p[x], p[y]));
        double[] adj = new double[m];
        double running = 0;
        for (int j = 0; j < m; j++) {
            double v = Math.min(1.0, (m - j) * p[order[j]]);
            running = Math.max(running, v);
            adj[order[j]] = running;
        }
        return adj;
    }

    /** Adds Holm-adjusted p-values to every row. Allocates a new list. */
    public static List<ComparisonRow> withHolm(List<ComparisonRow> rows) {
        double[] p = new double[rows.size()];
        for (int i = 0; i < p.length; i++) {
            p[i] = rows.get(i).pValue();
        }
        double[] adj = holm(p);
        List<ComparisonRow> out = new ArrayList<>();
        for (int i = 0; i < p.length; i++) {
            out.add(rows.get(i).withHolm(adj[i]));
        }
        return out;
    }

    /** The multiple-comparison note for a table of m rows. */
    public static String note(int m, double alpha) {
        if (m <= 1) {
            return m + " comparison: no multiple-comparison adjustment needed.";
        }
        return String.format(Locale.ROOT, "%d comparisons: at alpha = %.2f about %.1f unadjusted 'significant' results are "
                + "expected by chance alone; use the Holm (1979) adjusted p-values (p_holm), which hold the family-wise "
                + "error rate at %.2f.", m, alpha, m * alpha, alpha);
    }
}
