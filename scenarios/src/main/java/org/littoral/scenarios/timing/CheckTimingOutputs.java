package org.littoral.scenarios.timing;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.awt.Color;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.littoral.scenarios.report.ClockTime;
import org.littoral.scenarios.report.FanChartFigure;
import org.littoral.scenarios.report.HtmlReport;
import org.littoral.scenarios.report.Marker;
import org.littoral.scenarios.report.Table;
import org.littoral.scenarios.report.TableWriter;
import org.littoral.scenarios.scenario.JobModel;
import org.littoral.scenarios.sweep.SweepExecutor;

/** Writes the outputs of a timing check (flags.csv, envelope.csv, summary.json, the fan chart, report.html), atomically. */
final class CheckTimingOutputs {
    static final String FIGURE = "arrival-vs-distance.png";

    private CheckTimingOutputs() {
    }

    record Inputs(DaySpec spec, Path passagesFile, PassageTable.Read observed, String model, double[] xM, List<double[]> arrivals,
                  List<Double> onsets, List<TimingInputs.ArrivalEnvelope> envelopes, TimingCheck.Result check, double[] speed,
                  List<String> notes, SweepExecutor.Outcome outcome, double wallSeconds,
                  org.littoral.scenarios.sensitivity.ConditionsFit.Fit explanation) {
    }

    static CheckTimingResult write(Path dir, Inputs in) throws IOException {
        DaySpec spec = in.spec();
        TimingCheck.Result check = in.check();
        Table flags = flagsTable(spec, check);
        Table envelope = envelopeTable(spec, in);
        Path flagsCsv = dir.resolve("flags.csv");
        Path envCsv = dir.resolve("envelope.csv");
        TableWriter.writeCsv(flags, flagsCsv);
        TableWriter.writeCsv(envelope, envCsv);
        FanChartFigure fig = figure(spec, in);
        String caption = caption(spec, in);
        Path png = dir.resolve(FIGURE);
        fig.writePng(png);
        Path summary = dir.resolve("summary.json");
        ObjectNode sj = summary(spec, in, flags, envelope);
        if (in.explanation() != null) {
            sj.set("conditions_fit", org.littoral.scenarios.sensitivity.TimingExplanation.json(in.explanation()));
            TableWriter.writeCsv(org.littoral.scenarios.sensitivity.TimingExplanation.table(in.explanation()),
                    dir.resolve("conditions-fit.csv"));
        }
        TableWriter.writeJsonValue(sj, summary);
        Path html = dir.resolve("report.html");
        Table flagsView = flagsView(spec, check);
        Table envelopeView = envelopeView(spec, in);
        String flagsCaption = flagsCaption(spec, in);
        report(spec, in, flagsView, envelopeView, flagsCaption, fig, caption).write(html);
        return new CheckTimingResult(dir, flagsCsv, envCsv, summary, png, html, check, fig, caption, flags, envelope,
                in.arrivals().size(), in.outcome().failed(), in.model(), in.wallSeconds(), flagsView, envelopeView, flagsCaption,
                envelopeCaption(in), in.notes());
    }

    /** What a reader of the flags sees: one row per flag, times as HH:MM. */
    static Table flagsView(DaySpec spec, TimingCheck.Result check) {
        Table t = Table.of("site", "km inland", "passage", "observed", "flag", "evidence favours", "reason");
        for (TimingFlag f : check.flags()) {
            DaySpec.Site s = spec.site(f.site());
            t.row(f.site(), s == null ? null : s.inlandKm(), f.label().replace('_', ' '), ClockTime.hhmm(f.observedHours()),
                    flagName(f.kind()), f.favoured().isEmpty() ? null : f.favoured() + " (" + ClockTime.hhmm(f.suggestedTimeHours())
                            + ")", f.reason());
        }
        return t.decimals("km inland", 1);
    }

    /** A flag kind as words ("outside the envelope"). */
    static String flagName(TimingFlag.Kind k) {
        return switch (k) {
            case EARLIER_THAN_ANY_PLAUSIBLE_ONSET -> "earlier than any plausible onset";
            case INLAND_BEFORE_COAST -> "inland before coast";
            case IMPLIED_SPEED_IMPLAUSIBLE -> "implied speed implausible";
            case ONE_CADENCE_OFF -> "one flight off";
            case OUTSIDE_ENVELOPE -> "outside the ensemble envelope";
        };
    }

    /**
     * The caption of the flags, computed from them so that it can never contradict the table: how many passages were
     * checked, how many flags were raised and of which kinds, and what the envelope may flag.
     */
    static String flagsCaption(DaySpec spec, Inputs in) {
        TimingCheck.Result check = in.check();
        int n = check.passages().size();
        String evidence = JobModel.isLinear(in.model())
                ? "the density-current speed between the sites and the flight times (the linear envelope is the "
                        + JobModel.LINEAR_TIMES + " and never flags a passage on its own)"
                : "the " + in.model() + " ensemble's front arrivals, the density-current speed between the sites and the flight times";
        if (check.flags().isEmpty()) {
            return String.format(Locale.ROOT, "No flag: each of the %d passage(s) checked on %s is consistent with %s.", n,
                    spec.date(), evidence);
        }
        java.util.Map<String, Integer> kinds = new java.util.LinkedHashMap<>();
        java.util.Set<String> passages = new java.util.LinkedHashSet<>();
        for (TimingFlag f : check.flags()) {
            kinds.merge(flagName(f.kind()), 1, Integer::sum);
            passages.add(f.site() + " " + f.label());
        }
        List<String> parts = new ArrayList<>();
        kinds.forEach((k, c) -> parts.add(c + " " + k));
        return String.format(Locale.ROOT, "%d flag(s) on %d of the %d passage(s) checked on %s (%s), against %s. A flag is "
                + "advice: the observed times are never changed.", check.flags().size(), passages.size(), n, spec.date(),
                String.join(", ", parts), evidence);
    }

    static String envelopeCaption(Inputs in) {
        String what = JobModel.isLinear(in.model()) ? "the onset of onshore flow; linear theory has no front"
                : "the model front's arrival";
        return "Where each observed sea-breeze passage falls among the ensemble members' times (" + what + ") at its site: "
                + "percentiles of the members (local time; a member that never arrives counts as later than any time, and a "
                + "percentile among those reads 'never'), the observed time with its uncertainty, and its percentile (mid-rank).";
    }

    /** What a reader of the envelope sees: percentiles as HH:MM. */
    static Table envelopeView(DaySpec spec, Inputs in) {
        Table t = Table.of("site", "km inland", "members", "members arriving", "5 %", "25 %", "median", "75 %", "95 %",
                "observed", "percentile", "flags");
        for (int s = 0; s < spec.sites().size(); s++) {
            DaySpec.Site site = spec.sites().get(s);
            double[] e = in.envelopes().get(s).arrivalHours();
            int arrived = 0;
            for (double v : e) {
                arrived += Double.isNaN(v) ? 0 : 1;
            }
            // the passage the envelope is compared with: the first at the site (TimingCheck.envelopeFor)
            TimingCheck.PassageAssessment pa = null;
            for (TimingCheck.PassageAssessment a : in.check().passages()) {
                if (a.passage().site().equals(site.name()) && a.envelopeMembers() > 0) {
                    pa = a;
                }
            }
            String paLabel = pa == null ? "sea_breeze" : pa.passage().label();
            List<String> kinds = new ArrayList<>();
            for (TimingFlag f : in.check().flags()) {
                if (f.site().equals(site.name()) && f.label().equals(paLabel)) {
                    kinds.add(flagName(f.kind()));
                }
            }
            t.row(site.name(), site.inlandKm(), e.length, arrived, qc(e, 5), qc(e, 25), qc(e, 50), qc(e, 75), qc(e, 95),
                    pa == null ? null : ClockTime.hhmmWithin(pa.passage().timeHours(), pa.passage().uncertaintyHours()),
                    pa == null || Double.isNaN(pa.envelopePercentile()) ? null : round(pa.envelopePercentile()),
                    kinds.isEmpty() ? null : String.join(", ", kinds));
        }
        return t.decimals("km inland", 1).decimals("percentile", 0);
    }

    private static String qc(double[] e, double pct) {
        return ClockTime.hhmm(TimingCheck.quantile(e, pct));
    }

    static Table flagsTable(DaySpec spec, TimingCheck.Result check) {
        Table t = Table.of("date", "site", "inland_km", "label", "observed_local", "observed_local_h", "flag", "value",
                "favoured", "suggested_local_h", "reason");
        for (TimingFlag f : check.flags()) {
            DaySpec.Site s = spec.site(f.site());
            t.row(f.day(), f.site(), s == null ? null : s.inlandKm(), f.label(), TimingCheck.clock(f.observedHours()),
                    round(f.observedHours()), f.kind().name(), round(f.value()), f.favoured().isEmpty() ? null : f.favoured(),
                    round(f.suggestedTimeHours()), f.reason());
        }
        return t.decimals("observed_local_h", 3).decimals("value", 2).decimals("suggested_local_h", 3);
    }

    static Table envelopeTable(DaySpec spec, Inputs in) {
        Table t = Table.of("site", "inland_km", "label", "members", "members_arrived", "p05_local_h", "p25_local_h",
                "p50_local_h", "p75_local_h", "p95_local_h", "earliest_local_h", "observed_local_h", "observed_uncertainty_h",
                "observed_percentile", "flags");
        for (int s = 0; s < spec.sites().size(); s++) {
            DaySpec.Site site = spec.sites().get(s);
            double[] e = in.envelopes().get(s).arrivalHours();
            int arrived = 0;
            double earliest = Double.NaN;
            for (double v : e) {
                if (!Double.isNaN(v)) {
                    arrived++;
                    earliest = Double.isNaN(earliest) ? v : Math.min(earliest, v);
                }
            }
            // the passage the envelope is compared with: the first at the site (TimingCheck.envelopeFor)
            TimingCheck.PassageAssessment pa = null;
            for (TimingCheck.PassageAssessment a : in.check().passages()) {
                if (a.passage().site().equals(site.name()) && a.envelopeMembers() > 0) {
                    pa = a;
                }
            }
            String paLabel = pa == null ? "sea_breeze" : pa.passage().label();
            List<String> kinds = new ArrayList<>();
            for (TimingFlag f : in.check().flags()) {
                if (f.site().equals(site.name()) && f.label().equals(paLabel)) {
                    kinds.add(f.kind().name());
                }
            }
            t.row(site.name(), site.inlandKm(), "sea_breeze", e.length, arrived, q(e, 5), q(e, 25), q(e, 50), q(e, 75), q(e, 95),
                    round(earliest), pa == null ? null : round(pa.passage().timeHours()),
                    pa == null ? null : round(pa.passage().uncertaintyHours()), pa == null ? null : round(pa.envelopePercentile()),
                    String.join(" ", kinds));
        }
        for (String c : List.of("p05_local_h", "p25_local_h", "p50_local_h", "p75_local_h", "p95_local_h", "earliest_local_h",
                "observed_local_h", "observed_uncertainty_h")) {
            t.decimals(c, 2);
        }
        return t.decimals("observed_percentile", 1);
    }

    /** Envelope quantile with "never arrived" as later than any time; infinite (the front never got there) is left empty. */
    private static Double q(double[] e, double pct) {
        double v = TimingCheck.quantile(e, pct);
        return Double.isFinite(v) ? round(v) : null;
    }

    private static Double round(double v) {
        return Double.isFinite(v) ? Math.round(v * 1e4) / 1e4 : null;
    }

    static FanChartFigure figure(DaySpec spec, Inputs in) {
        int ns = spec.sites().size();
        int nf = in.xM().length - ns;
        double[] xKm = new double[nf];
        double[][] samples = new double[nf][in.arrivals().size()];
        for (int i = 0; i < nf; i++) {
            xKm[i] = in.xM()[ns + i] / 1000.0;
            for (int k = 0; k < in.arrivals().size(); k++) {
                samples[i][k] = in.arrivals().get(k)[ns + i];
            }
        }
        List<double[]> ok = new ArrayList<>();
        List<double[]> flagged = new ArrayList<>();
        List<double[]> other = new ArrayList<>();
        for (TimingCheck.PassageAssessment a : in.check().passages()) {
            TimingInputs.ObservedPassage p = a.passage();
            double[] row = {p.inlandDistanceM() / 1000.0, p.timeHours(), p.uncertaintyHours()};
            boolean f = in.check().flags().stream().anyMatch(x -> x.site().equals(p.site()) && x.label().equals(p.label()));
            if (f) {
                flagged.add(row);
            } else if (p.label().equals("sea_breeze")) {
                ok.add(row);
            } else {
                other.add(row);
            }
        }
        boolean linear = JobModel.isLinear(in.model());
        FanChartFigure.Builder b = FanChartFigure.builder()
                .title((linear ? "Onset of onshore flow (linear: no front)" : "Front arrival") + " against distance inland, "
                        + spec.date())
                .x(xKm, "Distance inland", "km").y(linear ? "Onset of onshore flow, local time" : "Front arrival, local time", "h")
                .samples(samples);
        if (!ok.isEmpty()) {
            b.observed("Observed sea breeze, no flag", col(ok, 0), col(ok, 1), col(ok, 2), Marker.CIRCLE, new Color(0x1a1a1a));
        }
        if (!flagged.isEmpty()) {
            b.observed("Observed, FLAGGED (see flags.csv)", col(flagged, 0), col(flagged, 1), col(flagged, 2), Marker.DIAMOND,
                    new Color(0xd62728));
        }
        if (!other.isEmpty()) {
            b.observed("Observed, other onshore passage (not compared)", col(other, 0), col(other, 1), col(other, 2),
                    Marker.SQUARE, new Color(0x7f7f7f));
        }
        for (DaySpec.Site s : spec.sites()) {
            b.event(s.inlandKm(), s.name());
        }
        return b.build();
    }

    private static double[] col(List<double[]> rows, int j) {
        double[] c = new double[rows.size()];
        for (int i = 0; i < c.length; i++) {
            c[i] = rows.get(i)[j];
        }
        return c;
    }

    static String caption(DaySpec spec, Inputs in) {
        String what = JobModel.isLinear(in.model()) ? "The onset of onshore flow (linear theory has no front; docs/fronts.md)"
                : "Model front arrival (docs/fronts.md)";
        return String.format(Locale.ROOT, "%s against distance inland for %s: median, 25-75 %% and 5-95 %% bands of %d %s-model "
                + "ensemble members (uncertain inputs drawn as listed in the report), with the observed passage times and their "
                + "uncertainty (error bars); flagged passages are drawn separately. Vertical lines mark the sites.", what,
                spec.date(), in.arrivals().size(), in.model());
    }

    private static ObjectNode summary(DaySpec spec, Inputs in, Table flags, Table envelope) {
        JsonNodeFactory f = JsonNodeFactory.instance;
        ObjectNode r = f.objectNode();
        r.put("date", spec.date());
        r.put("day_file", spec.source());
        r.put("passages_file", in.passagesFile().toString());
        r.put("passages_format", in.observed().format());
        r.put("model", in.model());
        ObjectNode ens = r.putObject("ensemble");
        ens.put("members", in.outcome().members());
        ens.put("members_ok", in.arrivals().size());
        ens.put("members_failed", in.outcome().failed());
        ens.put("seed", spec.ensemble().ensemble().seed());
        ArrayNode d = ens.putArray("uncertain_inputs");
        spec.describedDraws().forEach(d::add);
        ens.put("wall_seconds", Math.round(in.wallSeconds() * 10) / 10.0);
        ObjectNode c = r.putObject("conditions");
        TimingInputs.DayConditions dc = spec.conditions();
        c.put("ambient_cross_shore_wind_m_per_s", dc.crossShoreWindMPerS());
        c.put("theta_v_contrast_K", dc.thetaVContrastK());
        c.put("theta_v_contrast_uncertainty_K", dc.contrastUncertaintyK());
        c.put("reference_theta_v_K", dc.thetaVK());
        c.put("breeze_depth_m", dc.breezeDepthM());
        c.put("breeze_depth_uncertainty_m", dc.depthUncertaintyM());
        if (Double.isFinite(dc.totalDepthM())) {
            c.put("layer_depth_m", dc.totalDepthM());
        } else {
            c.putNull("layer_depth_m");
        }
        ArrayNode given = c.putArray("given_in_day_file");
        spec.conditionsGiven().forEach(given::add);
        ObjectNode sp = r.putObject("density_current_speed_m_per_s");
        sp.put("plausible_min", in.speed()[0]);
        sp.put("nominal", in.speed()[1]);
        sp.put("plausible_max", in.speed()[2]);
        sp.put("sources", "Benjamin (1968) J. Fluid Mech. 31; Simpson & Britter (1980) QJRMS 106");
        r.set("flags", TableWriter.toJsonNode(flags));
        r.set("envelope", TableWriter.toJsonNode(envelope));
        ArrayNode pairs = r.putArray("pairs");
        for (TimingCheck.PairAssessment p : in.check().pairs()) {
            ObjectNode o = pairs.addObject();
            o.put("label", p.label());
            o.put("coastal_site", p.coastalSite());
            o.put("inland_site", p.inlandSite());
            o.put("implied_speed_m_per_s", p.impliedSpeedMPerS());
            o.put("implied_min_m_per_s", p.impliedMinMPerS());
            if (Double.isFinite(p.impliedMaxMPerS())) {
                o.put("implied_max_m_per_s", p.impliedMaxMPerS());
            } else {
                o.putNull("implied_max_m_per_s");
            }
        }
        ArrayNode passages = r.putArray("passages");
        for (TimingCheck.PassageAssessment a : in.check().passages()) {
            ObjectNode o = passages.addObject();
            o.put("site", a.passage().site());
            o.put("label", a.passage().label());
            o.put("observed_local_h", a.passage().timeHours());
            o.put("uncertainty_h", a.passage().uncertaintyHours());
            if (Double.isNaN(a.envelopePercentile())) {
                o.putNull("envelope_percentile");
            } else {
                o.put("envelope_percentile", a.envelopePercentile());
            }
        }
        ArrayNode notes = r.putArray("notes");
        in.notes().forEach(notes::add);
        r.put("advice_only", "Flags are advice; the observed passage times are never changed.");
        r.put("caution", HtmlReport.CAUTION_MODEL);
        ArrayNode files = r.putArray("files");
        for (String s : List.of("flags.csv", "envelope.csv", "summary.json", FIGURE, "report.html", "members/", "sweep.json")) {
            files.add(s);
        }
        return r;
    }

    private static HtmlReport report(DaySpec spec, Inputs in, Table flags, Table envelope, String flagsCaption,
                                     FanChartFigure fig, String caption) {
        HtmlReport h = HtmlReport.create("Timing check " + spec.date());
        h.meta("Day file", spec.source()).meta("Passages", in.passagesFile() + " (" + in.observed().format() + ")")
                .meta("Model", in.model() + ", " + in.arrivals().size() + " ensemble members")
                .meta("Generated by", "littoral check-timing");
        h.cautions();
        h.caution("Flags are advice.", "A flag says why a passage time looks doubtful; the observed times are never changed. "
                + "Check the profiles before changing anything in the data.");
        h.section("Flags");
        if (in.check().flags().isEmpty()) {
            h.paragraph(flagsCaption);
        } else {
            h.table(flagsCaption, flags);
        }
        h.section("Ensemble envelope");
        if (JobModel.isLinear(in.model())) {
            h.caution("Linear model: a quick look.", "Linear theory has no front: the envelope is the " + JobModel.LINEAR_TIMES
                    + ", which follows the heating closely and is often hours earlier than a front near the coast. It is shown "
                    + "for reference and never flags a passage on its own; run with --model nonlinear for the front.");
        }
        h.figure(fig, caption);
        h.table(envelopeCaption(in), envelope);
        h.subsection("Uncertain inputs");
        h.bullets(spec.describedDraws());
        h.section("Density-current speed");
        TimingInputs.DayConditions c = spec.conditions();
        Map<String, Object> kv = new LinkedHashMap<>();
        kv.put("ambient cross-shore wind (m/s, onshore +)", c.crossShoreWindMPerS());
        kv.put("theta-v contrast (K)", c.thetaVContrastK() + " +/- " + c.contrastUncertaintyK()
                + (spec.conditionsGiven().contains("theta_v_contrast_K") ? "" : " (default: not given in the day file)"));
        kv.put("breeze depth (m)", c.breezeDepthM() + " +/- " + c.depthUncertaintyM()
                + (spec.conditionsGiven().contains("breeze_depth_m") ? "" : " (default: not given in the day file)"));
        kv.put("plausible front speed (m/s)", String.format(Locale.ROOT, "%.2f to %.2f (nominal %.2f)", in.speed()[0],
                in.speed()[2], in.speed()[1]));
        h.keyValues(kv);
        h.paragraph("Plausible range from Simpson & Britter (1980, QJRMS 106) with both quoted coefficient pairs and "
                + "Benjamin's (1968, J. Fluid Mech. 31) energy-conserving current plus the ambient wind, over the contrast and "
                + "depth ranges; the lower end is multiplied by " + spec.settings().retardationMin + " for friction and mixing.");
        if (!in.check().pairs().isEmpty()) {
            Table pt = Table.of("passage", "from site", "to site", "implied speed (m/s)", "lowest (m/s)", "highest (m/s)");
            for (TimingCheck.PairAssessment p : in.check().pairs()) {
                pt.row(p.label().replace('_', ' '), p.coastalSite(), p.inlandSite(), p.impliedSpeedMPerS(), p.impliedMinMPerS(),
                        Double.isFinite(p.impliedMaxMPerS()) ? p.impliedMaxMPerS() : null);
            }
            h.table("Speed implied by the observed passages between neighbouring sites, with its range from the timing "
                    + "uncertainties (highest: empty when the time difference is within the uncertainties).",
                    pt.decimals("implied speed (m/s)", 2).decimals("lowest (m/s)", 2).decimals("highest (m/s)", 2));
        }
        if (in.explanation() != null) {
            org.littoral.scenarios.sensitivity.TimingExplanation.addSection(h, in.explanation());
        }
        if (!in.notes().isEmpty()) {
            h.section("Notes");
            h.bullets(in.notes());
        }
        return h;
    }
}
