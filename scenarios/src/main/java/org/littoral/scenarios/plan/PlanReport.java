package org.littoral.scenarios.plan;

import org.littoral.scenarios.report.CaptionedFigure;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.stream.Collectors;

import org.littoral.scenarios.report.FanChartFigure;
import org.littoral.scenarios.report.Figure;
import org.littoral.scenarios.report.HtmlReport;
import org.littoral.scenarios.report.LineFigure;
import org.littoral.scenarios.report.Marker;
import org.littoral.scenarios.report.Series;
import org.littoral.scenarios.report.Table;
import org.littoral.scenarios.scenario.JobModel;

/**
 * The plan's self-contained HTML report: recommendations, the fan chart of arrival time against inland
 * distance, capture probability by distance and cadence, dense-cadence windows, cautions. The figures
 * are also written as PNG files; {@link #addSections} puts the same content into a larger report.
 */
public final class PlanReport {
    private PlanReport() {
    }


    static void write(Path dir, PlanSpec plan, String model, PlanResult r, DenseWindow[][] windows) throws IOException {
        List<CaptionedFigure> figs = figures(plan, r);
        for (CaptionedFigure c : figs) {
            c.figure().writePng(dir.resolve(c.fileName()));
        }
        HtmlReport rep = HtmlReport.create("littoral site and cadence plan: " + plan.ensemble().name());
        rep.meta("base scenario", plan.ensemble().baseLabel());
        rep.meta("model", model);
        rep.meta("members", r.members + (r.failedMembers > 0 ? " (" + r.failedMembers + " failed)" : ""));
        rep.caution("Planning advice, not a forecast.", PlanOutputs.CAUTION);
        rep.caution("Altitude ceiling and convection.", PlanOutputs.ceilingCaution(plan.ceilingM()));
        addSections(rep, plan, r, windows, figs, false);
        rep.cautions();
        rep.write(dir.resolve("report.html"));
    }

    /** The figures of a plan, in reading order. */
    public static List<CaptionedFigure> figures(PlanSpec plan, PlanResult r) {
        List<CaptionedFigure> out = new ArrayList<>();
        if (!r.fan.isEmpty()) {
            int n = r.fan.size();
            double[] x = new double[n];
            double[][] p = new double[5][n];
            for (int i = 0; i < n; i++) {
                PlanResult.FanRow f = r.fan.get(i);
                x[i] = f.distanceKm();
                p[0][i] = f.p5();
                p[1][i] = f.p25();
                p[2][i] = f.p50();
                p[3][i] = f.p75();
                p[4][i] = f.p95();
            }
            boolean linear = JobModel.isLinear(r.model);
            FanChartFigure fan = FanChartFigure.builder().size(900, 560)
                    .title((linear ? "Onset of onshore flow (linear: no front)" : "Front arrival") + " against inland distance")
                    .x(x, "inland distance", "km").y(linear ? "onset of onshore flow, local time" : "front arrival, local time", "h")
                    .percentiles(p[0], p[1], p[2], p[3], p[4]).build();
            out.add(new CaptionedFigure("arrival-fan.png", fan, String.format(Locale.ROOT, "%s at each candidate distance over "
                    + "the %d ensemble members (%s model; definition: docs/fronts.md): median (line), 25-75 %% (dark) and 5-95 %% "
                    + "(light) ranges, over the members in which it reaches that distance during operating hours (their share is "
                    + "in the table below).", linear ? "The " + JobModel.LINEAR_TIMES : "The model front's arrival", r.members,
                    r.model)));
        }
        Map<String, List<PlanResult.SiteRow>> byCadence = new LinkedHashMap<>();
        for (PlanResult.SiteRow s : r.sites) {
            byCadence.computeIfAbsent(s.cadence(), k -> new ArrayList<>()).add(s);
        }
        if (!byCadence.isEmpty()) {
            LineFigure.Builder b = LineFigure.builder().size(900, 520).title("Probability that one site captures the passage")
                    .x("inland distance", "km").y("P(captured)", "").yRange(0, 1.05);
            int m = 0;
            for (Map.Entry<String, List<PlanResult.SiteRow>> e : byCadence.entrySet()) {
                List<PlanResult.SiteRow> rows = e.getValue();
                double[] x = new double[rows.size()];
                double[] y = new double[rows.size()];
                double[] err = new double[rows.size()];
                for (int i = 0; i < x.length; i++) {
                    Proportion c = rows.get(i).captured();
                    x[i] = rows.get(i).distanceKm();
                    y[i] = c == null ? Double.NaN : c.estimate();
                    err[i] = c == null ? Double.NaN : 0.5 * (c.upper() - c.lower());
                }
                b.series(Series.of(e.getKey(), x, y).marker(Marker.cycle(m++)).errorBars(null, err));
            }
            out.add(new CaptionedFigure("capture-by-distance.png", b.build(), String.format(Locale.ROOT, "Probability that a site at "
                    + "each distance captures the passage (detected by the analysis chain within %.0f min of the model's "
                    + (JobModel.isLinear(r.model) ? "onset of onshore flow" : "front arrival") + ", "
                    + "with at least %d profiles before and %d after it inside operating hours), per cadence option; bars: "
                    + "half-width of the 95 %% Wilson interval.", plan.criteria().timingToleranceH() * 60,
                    plan.criteria().minProfilesBefore(), plan.criteria().minProfilesAfter())));
        }
        return out;
    }

    /** Adds the plan sections (recommendations, figures, windows, arrival table) to {@code rep}. */
    /** @param compact true inside a larger report (the demo): the arrival table every 5 km, no per-distance table */
    public static void addSections(HtmlReport rep, PlanSpec plan, PlanResult r, DenseWindow[][] windows, List<CaptionedFigure> figs,
                                   boolean compact) {
        rep.section("Recommended site sets and cadences");
        rep.paragraph(String.format(Locale.ROOT, "%d ensemble members of %s; %d candidate distances (%s km), %d sites per set, "
                + "operating hours %s-%s, profiles to %.0f m. Ranking score: %s.", r.members, plan.ensemble().baseLabel(),
                plan.candidatesKm().length, range(plan.candidatesKm()), plan.sitesPerSet(), PlanOutputs.clock(plan.operatingStartH()),
                PlanOutputs.clock(plan.operatingEndH()), plan.ceilingM(), r.hasBay
                        ? "0.5 P(speed resolved) + 0.3 P(passage captured at one site or more) + 0.2 P(bay and sea breeze separated)"
                        : "0.6 P(speed resolved) + 0.4 P(passage captured at one site or more)"));
        rep.paragraph(String.format(Locale.ROOT, "Altitude ceiling %.0f m. ", plan.ceilingM()) + PlanOutputs.ceilingCaution(plan.ceilingM()));
        List<String> cols = new ArrayList<>(List.of("rank", "sites (km inland)", "cadence", "score", "P(capture)", "P(speed)"));
        if (r.hasBay) {
            cols.add("P(bay/sea)");
        }
        cols.add("flights/day");
        Table t = Table.of(cols);
        for (int i = 0; i < Math.min(plan.top(), r.ranked.size()); i++) {
            SiteSetScore s = r.ranked.get(i);
            List<Object> row = new ArrayList<>(List.of(i + 1, s.distancesKm().stream().map(d -> String.format(Locale.ROOT, "%.1f", d))
                    .collect(Collectors.joining(", ")), s.cadence(), s.score(), ci(s.anyCaptured()), ci(s.speedResolved())));
            if (r.hasBay) {
                row.add(ci(s.bayAndSeaSeparated()));
            }
            row.add(s.flightsPerDay());
            t.row(row.toArray());
        }
        t.decimals("score", 2);
        rep.table("Ranked recommendations with 95 % Wilson intervals in brackets (recommendations.csv lists every set).", t);
        if (!r.notes.isEmpty()) {
            rep.bullets(r.notes);
        }
        rep.section("Arrival times and capture by distance");
        for (CaptionedFigure c : figs) {
            rep.figure(c.figure(), c.caption());
        }
        for (String why : captureExplanation(plan, r)) {
            rep.paragraph(why);
        }
        Table f = Table.of("km", "members reaching it", "5 %", "25 %", "median", "75 %", "95 %");
        for (PlanResult.FanRow row : r.fan) {
            if (compact && Math.abs(row.distanceKm() / 5.0 - Math.rint(row.distanceKm() / 5.0)) > 1e-9 && row.distanceKm() != 1.0) {
                continue;
            }
            f.row(row.distanceKm(), String.format(Locale.ROOT, "%.0f %%", 100 * row.fractionArriving()), PlanOutputs.clock(row.p5()),
                    PlanOutputs.clock(row.p25()), PlanOutputs.clock(row.p50()), PlanOutputs.clock(row.p75()),
                    PlanOutputs.clock(row.p95()));
        }
        f.decimals("km", 1);
        rep.table("Percentiles of the " + (JobModel.isLinear(r.model) ? JobModel.LINEAR_TIMES : "model front's arrival")
                + " (local time) at " + (compact ? "candidate distances every 5 km "
                + "(arrival-fan.csv has them all)." : "each candidate distance."), f);
        if (compact) {
            return;
        }
        Table w = Table.of("cadence", "km", "dense window (local)", "P(front arrives)", "P(captured)", "flights/day", "feasible");
        for (PlanResult.SiteRow s : r.sites) {
            w.row(s.cadence(), s.distanceKm(), Double.isNaN(s.denseStartH()) ? "none"
                    : PlanOutputs.clock(s.denseStartH()) + "-" + PlanOutputs.clock(s.denseEndH()), ci(s.frontArrives()), ci(s.captured()),
                    s.meanFlights(), s.feasible() ? "yes" : "no (too many flights)");
        }
        w.decimals("km", 1).decimals("flights/day", 1);
        rep.table("Per distance and cadence option: the recommended window for the dense cadence (10th-90th percentile of the "
                + "ensemble arrival time widened by one base interval, clipped to operating hours), and the probabilities behind "
                + "the ranking.", w);
    }

    /**
     * Why capture is what it is, per cadence, computed from the members' outcomes at the best distance: how many members'
     * fronts reach it during operating hours, how many of those the chain misses, finds off time or flanks with too few
     * profiles. Computed from the same counts as the figure, so the words cannot contradict it.
     */
    static List<String> captureExplanation(PlanSpec plan, PlanResult r) {
        List<String> out = new ArrayList<>();
        Map<String, PlanResult.SiteRow> best = new LinkedHashMap<>();
        for (PlanResult.SiteRow s : r.sites) {
            PlanResult.SiteRow b = best.get(s.cadence());
            if (s.captured() != null && (b == null || s.captured().estimate() > b.captured().estimate())) {
                best.put(s.cadence(), s);
            }
        }
        String front = JobModel.isLinear(r.model) ? "onshore flow" : "front";
        for (PlanResult.SiteRow s : best.values()) {
            int[] o = s.outcomes();
            int n = 0;
            for (int v : o) {
                n += v;
            }
            if (n == 0) {
                continue;
            }
            int reach = n - o[SiteOutcome.Result.NO_FRONT.ordinal()];
            List<String> lost = new ArrayList<>();
            String[] words = {null, "the chain finds no onshore passage in %d", "the chain's passage is more than %.0f min from "
                    + "the model's time in %d", "too few profiles flank the passage in %d"};
            for (SiteOutcome.Result k : List.of(SiteOutcome.Result.NOT_DETECTED, SiteOutcome.Result.OFF_TIME,
                    SiteOutcome.Result.TOO_FEW_PROFILES)) {
                int c = o[k.ordinal()];
                if (c == 0) {
                    continue;
                }
                lost.add(k == SiteOutcome.Result.OFF_TIME ? String.format(Locale.ROOT, words[2], plan.criteria().timingToleranceH() * 60, c)
                        : String.format(Locale.ROOT, words[k.ordinal()], c));
            }
            int largest = SiteOutcome.Result.NO_FRONT.ordinal();
            for (int k = 0; k < SiteOutcome.Result.CAPTURED.ordinal(); k++) {
                if (o[k] > o[largest]) {
                    largest = k;
                }
            }
            String limit = switch (SiteOutcome.Result.values()[largest]) {
                case NO_FRONT -> "the days on which the " + front + " never gets there during operating hours";
                case NOT_DETECTED -> "passages the chain does not detect in the soundings";
                case OFF_TIME -> "detections too far from the model's time";
                case TOO_FEW_PROFILES -> "too few profiles either side of the passage";
                case CAPTURED -> "";
            };
            out.add(String.format(Locale.ROOT, "Why capture is at most %.0f %% (%s, best distance %s km): of the %d members, the "
                    + "%s reaches %s km during operating hours in %d%s; %d are captured. The largest loss is %s.",
                    100.0 * o[SiteOutcome.Result.CAPTURED.ordinal()] / n, s.cadence(), km(s.distanceKm()), n, front,
                    km(s.distanceKm()), reach, lost.isEmpty() ? "" : "; of those, " + String.join(", ", lost),
                    o[SiteOutcome.Result.CAPTURED.ordinal()], limit));
        }
        return out;
    }

    private static String km(double d) {
        return d == Math.rint(d) ? String.format(Locale.ROOT, "%.0f", d) : String.format(Locale.ROOT, "%.1f", d);
    }

    private static String range(double[] km) {
        if (km.length == 0) {
            return "none";
        }
        return km.length == 1 ? String.format(Locale.ROOT, "%.1f", km[0])
                : String.format(Locale.ROOT, "%.1f to %.1f", km[0], km[km.length - 1]);
    }

    private static String ci(Proportion p) {
        if (p == null) {
            return "-";
        }
        return String.format(Locale.ROOT, "%.0f %% [%.0f-%.0f]", 100 * p.estimate(), 100 * p.lower(), 100 * p.upper());
    }
}
