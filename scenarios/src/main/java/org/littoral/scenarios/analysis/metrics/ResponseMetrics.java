package org.littoral.scenarios.analysis.metrics;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.littoral.model.coast.Coast;
import org.littoral.scenarios.analysis.Layer;
import org.littoral.scenarios.analysis.SiteDay;
import org.littoral.scenarios.analysis.Variable;
import org.littoral.scenarios.analysis.detect.Passage;

/** Changes, tendencies and anomalies of layer means after each passage, and their distributions. */
public final class ResponseMetrics {
    private ResponseMetrics() {
    }

    /** Responses of every passage of a site-day, for every layer and variable (standardised later by {@link #standardise}). */
    public static List<PassageResponse> responses(SiteDay sd, List<Passage> passages, Coast coast, MetricSettings s) {
        List<PassageResponse> out = new ArrayList<>();
        if (passages.isEmpty()) {
            return out;
        }
        double[] t = sd.timeHours();
        for (Layer layer : s.layers) {
            for (Variable v : s.variables) {
                double[] y = sd.series(v, layer, coast, s.minValidFraction);
                double[] dydt = CentredDifference.derivative(t, y);
                double daily = mean(y, t, Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY, true, true);
                for (Passage p : passages) {
                    double tp = p.timeHours();
                    double pre = mean(y, t, tp - s.preWindowHours, tp, true, false);
                    double post = mean(y, t, tp, tp + s.postWindowHours, false, true);
                    int nPre = count(y, t, tp - s.preWindowHours, tp, true, false);
                    int nPost = count(y, t, tp, tp + s.postWindowHours, false, true);
                    double tend = mean(dydt, t, tp, tp + s.postWindowHours, false, true);
                    double ref = s.reference == MetricSettings.Reference.PRE_PASSAGE ? pre : daily;
                    out.add(new PassageResponse(p, layer, v, nPre, nPost, pre, post, post - pre, tend, ref, post - ref,
                            Double.NaN));
                }
            }
        }
        return out;
    }

    /** Adds standardised changes (over all passages with the same layer and variable). Allocates a new list. */
    public static List<PassageResponse> standardise(List<PassageResponse> rows) {
        Map<String, List<Integer>> groups = new LinkedHashMap<>();
        for (int i = 0; i < rows.size(); i++) {
            groups.computeIfAbsent(rows.get(i).layer().label() + "|" + rows.get(i).variable(), k -> new ArrayList<>()).add(i);
        }
        List<PassageResponse> out = new ArrayList<>(rows);
        for (List<Integer> g : groups.values()) {
            double[] x = new double[g.size()];
            for (int j = 0; j < x.length; j++) {
                x[j] = rows.get(g.get(j)).change();
            }
            Moments m = Moments.of(x);
            for (int j = 0; j < x.length; j++) {
                out.set(g.get(j), rows.get(g.get(j)).withStandardised(m.standardise(x[j])));
            }
        }
        return out;
    }

    /** Mean, spread and skewness over passages of change, tendency and anomaly, per layer and variable. */
    public static List<DistributionRow> distributions(List<PassageResponse> rows, MetricSettings s) {
        List<DistributionRow> out = new ArrayList<>();
        for (Layer layer : s.layers) {
            for (Variable v : s.variables) {
                List<PassageResponse> sel = new ArrayList<>();
                for (PassageResponse r : rows) {
                    if (r.layer().equals(layer) && r.variable() == v) {
                        sel.add(r);
                    }
                }
                double[] ch = new double[sel.size()];
                double[] te = new double[sel.size()];
                double[] an = new double[sel.size()];
                for (int i = 0; i < ch.length; i++) {
                    ch[i] = sel.get(i).change();
                    te[i] = sel.get(i).tendencyPerHour();
                    an[i] = sel.get(i).anomaly();
                }
                out.add(new DistributionRow(layer, v, "change", Moments.of(ch)));
                out.add(new DistributionRow(layer, v, "tendency_per_h", Moments.of(te)));
                out.add(new DistributionRow(layer, v, "anomaly", Moments.of(an)));
            }
        }
        return out;
    }

    /** Mean of y over samples with a &lt;(=) t &lt;(=) b, NaN when none. */
    static double mean(double[] y, double[] t, double a, double b, boolean closedLeft, boolean closedRight) {
        double s = 0;
        int c = 0;
        for (int i = 0; i < y.length; i++) {
            if (in(t[i], a, b, closedLeft, closedRight) && !Double.isNaN(y[i])) {
                s += y[i];
                c++;
            }
        }
        return c == 0 ? Double.NaN : s / c;
    }

    static int count(double[] y, double[] t, double a, double b, boolean closedLeft, boolean closedRight) {
        int c = 0;
        for (int i = 0; i < y.length; i++) {
            if (in(t[i], a, b, closedLeft, closedRight) && !Double.isNaN(y[i])) {
                c++;
            }
        }
        return c;
    }

    private static boolean in(double t, double a, double b, boolean cl, boolean cr) {
        return (cl ? t >= a : t > a) && (cr ? t <= b : t < b);
    }
}
