package org.littoral.scenarios.analysis.composite;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.littoral.model.coast.Coast;
import org.littoral.scenarios.analysis.SiteDay;
import org.littoral.scenarios.analysis.SiteDayResult;
import org.littoral.scenarios.analysis.detect.Passage;

/**
 * Composites of layer means across site-days. Each site-day contributes at most one value per bin
 * (the mean of its profiles in that bin), so days with denser flights do not weigh more. On the
 * relative axis the anchor is the day's first onshore passage (days without one are left out and
 * counted); anomalies are against the day's pre-passage mean (relative axis) or daily mean (hour axis).
 */
public final class Composites {
    private Composites() {
    }

    /**
     * @param skipped receives one line per site-day left out (no onshore passage on a relative axis)
     */
    public static List<CompositeRow> compute(List<SiteDayResult> days, Coast coast, CompositeSpec spec,
                                             double preWindowHours, double minValidFraction, List<String> skipped) {
        int nb = spec.bins();
        Map<String, List<List<Double>>> byGroup = new TreeMap<>();
        for (SiteDayResult r : days) {
            SiteDay sd = r.siteDay();
            double[] t = sd.timeHours();
            double[] y = sd.series(spec.variable(), spec.layer(), coast, minValidFraction);
            double origin = 0.0;
            double ref = 0.0;
            if (spec.axis() == CompositeSpec.Axis.RELATIVE_TO_PASSAGE) {
                Passage p = r.firstOnshorePassage();
                if (p == null) {
                    skipped.add(spec.label() + ": " + sd.key() + " has no onshore passage");
                    continue;
                }
                origin = p.timeHours();
                if (spec.anomaly()) {
                    ref = mean(y, t, origin - preWindowHours, origin);
                }
            } else if (spec.anomaly()) {
                ref = mean(y, t, Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY);
            }
            if (Double.isNaN(ref)) {
                skipped.add(spec.label() + ": " + sd.key() + " has no reference value for the anomaly");
                continue;
            }
            double[] sum = new double[nb];
            int[] cnt = new int[nb];
            for (int i = 0; i < t.length; i++) {
                if (Double.isNaN(y[i])) {
                    continue;
                }
                double x = t[i] - origin;
                int b = (int) Math.floor((x - spec.fromHours()) / spec.binHours());
                if (b >= 0 && b < nb) {
                    sum[b] += y[i] - ref;
                    cnt[b]++;
                }
            }
            String g = r.attributes().getOrDefault(spec.groupBy(), "(none)");
            List<List<Double>> bins = byGroup.computeIfAbsent(g, k -> {
                List<List<Double>> l = new ArrayList<>();
                for (int b = 0; b < nb; b++) {
                    l.add(new ArrayList<>());
                }
                return l;
            });
            for (int b = 0; b < nb; b++) {
                if (cnt[b] > 0) {
                    bins.get(b).add(sum[b] / cnt[b]);
                }
            }
        }
        List<CompositeRow> out = new ArrayList<>();
        for (Map.Entry<String, List<List<Double>>> e : byGroup.entrySet()) {
            for (int b = 0; b < nb; b++) {
                List<Double> v = e.getValue().get(b);
                if (v.isEmpty()) {
                    continue;
                }
                double[] x = v.stream().mapToDouble(Double::doubleValue).toArray();
                out.add(new CompositeRow(spec, e.getKey(), spec.fromHours() + (b + 0.5) * spec.binHours(), BoxStats.of(x)));
            }
        }
        return out;
    }

    private static double mean(double[] y, double[] t, double a, double b) {
        double s = 0;
        int c = 0;
        for (int i = 0; i < y.length; i++) {
            if (t[i] >= a && t[i] < b && !Double.isNaN(y[i])) {
                s += y[i];
                c++;
            }
        }
        return c == 0 ? Double.NaN : s / c;
    }
}
