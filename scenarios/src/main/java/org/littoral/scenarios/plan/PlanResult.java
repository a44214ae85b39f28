package org.littoral.scenarios.plan;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.List;

/**
 * What the planner concludes, from the member records: per-site capture probabilities for every cadence,
 * ranked site sets, the arrival-time fan against distance, and the dense windows.
 */
public final class PlanResult {

    /** One candidate distance under one cadence option. */
    /**
     * @param outcomes members per {@link SiteOutcome.Result}, indexed by its ordinal: why the passage was or was not captured
     */
    public record SiteRow(double distanceKm, String cadence, Proportion frontArrives, double arrivalP10H, double arrivalMedianH,
                          double arrivalP90H, Proportion captured, double meanFlights, boolean feasible,
                          double denseStartH, double denseEndH, int[] outcomes) {
    }

    /** Percentiles of the model arrival time at one distance. */
    public record FanRow(double distanceKm, double fractionArriving, double p5, double p25, double p50, double p75, double p95) {
    }

    public final List<SiteRow> sites = new ArrayList<>();
    public final List<FanRow> fan = new ArrayList<>();
    public final List<SiteSetScore> ranked = new ArrayList<>();
    public final List<String> notes = new ArrayList<>();
    public int members;
    public int failedMembers;
    public boolean hasBay;
    /** The model the members ran: "linear" (times are the onset of onshore flow) or "nonlinear" (front arrival). */
    public String model = "nonlinear";

    /**
     * Builds the result.
     *
     * @param records the member records' {@code result} objects (failed members excluded)
     * @param windows windows[cadence][candidate]
     */
    public static PlanResult build(PlanSpec plan, List<JsonNode> records, int failed, DenseWindow[][] windows, boolean hasBay,
                                   double bayInlandShoreKm) {
        PlanResult r = new PlanResult();
        r.members = records.size();
        r.failedMembers = failed;
        r.hasBay = hasBay;
        double[] dKm = plan.candidatesKm();
        int nd = dKm.length;
        int nm = records.size();
        double[][] truth = new double[nm][nd];
        for (int m = 0; m < nm; m++) {
            truth[m] = doubles(records.get(m).get("truth_h"), nd);
        }
        for (int i = 0; i < nd; i++) {
            double[] col = new double[nm];
            for (int m = 0; m < nm; m++) {
                col[m] = truth[m][i];
            }
            double[] a = java.util.Arrays.stream(col).filter(v -> !Double.isNaN(v)).sorted().toArray();
            r.fan.add(a.length == 0 ? new FanRow(dKm[i], 0, Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN)
                    : new FanRow(dKm[i], (double) a.length / nm, DenseWindow.percentile(a, 5), DenseWindow.percentile(a, 25),
                    DenseWindow.percentile(a, 50), DenseWindow.percentile(a, 75), DenseWindow.percentile(a, 95)));
        }
        PlanCriteria crit = plan.criteria();
        List<SiteSetScore> all = new ArrayList<>();
        List<int[]> sets = PlanScorer.combinations(nd, plan.sitesPerSet());
        if (sets.size() > 50_000) {
            r.notes.add(sets.size() + " site sets is too many to score; scored the first 50000 in order (use fewer candidates)");
            sets = sets.subList(0, 50_000);
        }
        for (int c = 0; c < plan.cadences().size(); c++) {
            CadenceOption opt = plan.cadences().get(c);
            SiteOutcome[][] o = new SiteOutcome[nm][nd];
            double[] flights = new double[nd];
            for (int m = 0; m < nm; m++) {
                JsonNode cn = records.get(m).get("cadences").get(c);
                double[] det = doubles(cn.get("detected_h"), nd);
                double[] second = doubles(cn.get("second_onshore_h"), nd);
                int[] before = ints(cn.get("profiles_before"), nd);
                int[] after = ints(cn.get("profiles_after"), nd);
                int[] fl = ints(cn.get("flights"), nd);
                for (int i = 0; i < nd; i++) {
                    boolean sep = hasBay && dKm[i] > bayInlandShoreKm && !Double.isNaN(det[i]) && !Double.isNaN(second[i])
                            && !Double.isNaN(truth[m][i]) && Math.abs(det[i] - truth[m][i]) <= crit.timingToleranceH()
                            && second[i] - det[i] >= opt.intervalMin() / 60.0 - 1e-9;
                    o[m][i] = new SiteOutcome(truth[m][i], det[i], before[i], after[i], sep);
                    flights[i] += fl[i];
                }
            }
            boolean[] feasible = new boolean[nd];
            for (int i = 0; i < nd; i++) {
                flights[i] = nm == 0 ? 0 : flights[i] / nm;
                feasible[i] = flights[i] <= plan.maxFlightsPerSite() + 1e-9;
                int arrives = 0;
                int caught = 0;
                int[] outcomes = new int[SiteOutcome.Result.values().length];
                for (int m = 0; m < nm; m++) {
                    arrives += o[m][i].frontArrives() ? 1 : 0;
                    caught += o[m][i].captured(crit) ? 1 : 0;
                    outcomes[o[m][i].result(crit).ordinal()]++;
                }
                FanRow fr = r.fan.get(i);
                DenseWindow w = windows[c][i];
                r.sites.add(new SiteRow(dKm[i], opt.name(), Proportion.of(arrives, nm), pct(truth, i, 10),
                        fr.p50(), pct(truth, i, 90), Proportion.of(caught, nm), flights[i], feasible[i],
                        opt.hasDense() ? (opt.autoWindow() ? (w == null ? Double.NaN : w.startClockH()) : opt.denseStartH()) : Double.NaN,
                        opt.hasDense() ? (opt.autoWindow() ? (w == null ? Double.NaN : w.endClockH()) : opt.denseEndH()) : Double.NaN,
                        outcomes));
            }
            int infeasible = 0;
            for (int[] set : sets) {
                boolean ok = true;
                List<Double> dist = new ArrayList<>();
                int fl = 0;
                SiteOutcome[][] sub = new SiteOutcome[nm][set.length];
                for (int j = 0; j < set.length; j++) {
                    ok &= feasible[set[j]];
                    dist.add(dKm[set[j]]);
                    fl += (int) Math.round(flights[set[j]]);
                    for (int m = 0; m < nm; m++) {
                        sub[m][j] = o[m][set[j]];
                    }
                }
                if (!ok) {
                    infeasible++;
                    continue;
                }
                all.add(PlanScorer.score(sub, dist, opt.name(), hasBay, fl, crit));
            }
            if (infeasible > 0) {
                r.notes.add("cadence '" + opt.name() + "': " + infeasible + " site sets need more than "
                        + plan.maxFlightsPerSite() + " flights a day at a site and were not ranked");
            }
        }
        r.ranked.addAll(PlanScorer.rank(all));
        return r;
    }

    private static double pct(double[][] truth, int i, double p) {
        double[] a = java.util.Arrays.stream(truth).mapToDouble(row -> row[i]).filter(v -> !Double.isNaN(v)).sorted().toArray();
        return a.length == 0 ? Double.NaN : DenseWindow.percentile(a, p);
    }

    static double[] doubles(JsonNode arr, int n) {
        double[] out = new double[n];
        for (int i = 0; i < n; i++) {
            JsonNode v = arr == null ? null : arr.get(i);
            out[i] = v == null || v.isNull() ? Double.NaN : v.asDouble();
        }
        return out;
    }

    static int[] ints(JsonNode arr, int n) {
        int[] out = new int[n];
        for (int i = 0; i < n; i++) {
            JsonNode v = arr == null ? null : arr.get(i);
            out[i] = v == null || v.isNull() ? 0 : v.asInt();
        }
        return out;
    }
}
