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
import org.littoral.scenarios.report.FanChartFigure;
import org.littoral.scenarios.report.HtmlReport;
import org.littoral.scenarios.report.Marker;
import org.littoral.scenarios.report.Table;
import org.littoral.scenarios.report.TableWriter;
import org.littoral.scenarios.sweep.SweepExecutor;

/** Writes the outputs of a timing check (flags.csv, envelope.csv, summary.json, the fan chart, report.html), atomically. */
final class CheckTimingOutputs {
    static final String FIGURE = "arrival-vs-distance.png";

    private CheckTimingOutputs() {
    }

    record Inputs(DaySpec spec, Path passagesFile, PassageTable.Read observed, String model, double[] xM, List<double[]> arrivals,
                  List<Double> onsets, List<TimingInputs.ArrivalEnvelope> envelopes, TimingCheck.Result check, double[] speed,
                  List<String> notes, SweepExecutor.Outcome outcome, double wallSeconds) {
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
        TableWriter.writeJsonValue(summary(spec, in, flags, envelope), summary);
        Path html = dir.resolve("report.html");
        report(spec, in, flags, envelope, fig, caption).write(html);
        return new CheckTimingResult(dir, flagsCsv, envCsv, summary, png, html, check, fig, caption, flags, envelope,
                in.arrivals().size(), in.outcome().failed(), in.model(), in.wallSeconds());
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
            TimingCheck.PassageAssessment pa = null;
            for (TimingCheck.PassageAssessment a : in.check().passages()) {
                if (a.passage().site().equals(site.name()) && a.passage().label().equals("sea_breeze")) {
                    pa = a;
                }
            }
            List<String> kinds = new ArrayList<>();
            for (TimingFlag f : in.check().flags()) {
                if (f.site().equals(site.name()) && f.label().equals("sea_breeze")) {
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
        FanChartFigure.Builder b = FanChartFigure.builder()
                .title("Front arrival against distance inland, " + spec.date())
                .x(xKm, "Distance inland", "km").y("Arrival (local clock time)", "h")
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
        return String.format(Locale.ROOT, "Model front arrival (near-surface wind entering the onshore sector) against distance "
                + "inland for %s: median, 25-75 %% and 5-95 %% bands of %d %s-model ensemble members (uncertain inputs drawn "
                + "as listed in the report), with the observed passage times and their uncertainty (error bars); flagged "
                + "passages are drawn separately. Vertical lines mark the sites.", spec.date(), in.arrivals().size(), in.model());
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

    private static HtmlReport report(DaySpec spec, Inputs in, Table flags, Table envelope, FanChartFigure fig, String caption) {
        HtmlReport h = HtmlReport.create("Timing check " + spec.date());
        h.meta("Day file", spec.source()).meta("Passages", in.passagesFile() + " (" + in.observed().format() + ")")
                .meta("Model", in.model() + ", " + in.arrivals().size() + " ensemble members")
                .meta("Generated by", "littoral check-timing");
        h.cautions();
        h.caution("Flags are advice.", "A flag says why a passage time looks doubtful; the observed times are never changed. "
                + "Check the profiles before changing anything in the data.");
        h.section("Flags");
        if (in.check().flags().isEmpty()) {
            h.paragraph("No passage time on " + spec.date() + " is flagged: every checked time is consistent with the ensemble "
                    + "envelope, the density-current speed between sites and the flight times.");
        } else {
            h.paragraph(in.check().flags().size() + " flag(s) on " + spec.date() + ".");
            h.table("Flags with their reasons (value: hours early for EARLIER_THAN_ANY_PLAUSIBLE_ONSET and INLAND_BEFORE_COAST, "
                    + "ratio to the nominal density-current speed for IMPLIED_SPEED_IMPLAUSIBLE, hours of the shift for "
                    + "ONE_CADENCE_OFF, envelope percentile for OUTSIDE_ENVELOPE).", flags);
        }
        h.section("Ensemble envelope");
        if (in.model().startsWith("linear")) {
            h.caution("Linear model: a quick look.", "The envelope comes from the linear model, whose onshore flow follows the "
                    + "heating closely and has no front dynamics; on the invented demo campaign its arrival near the coast is "
                    + "often hours earlier than the prescribed fronts (docs/timing-checks.md). An OUTSIDE_ENVELOPE flag from a "
                    + "linear ensemble alone is weak evidence; run the ensemble with --model nonlinear for the real answer.");
        }
        h.figure(fig, caption);
        h.table("Ensemble arrival percentiles per site (local clock hours; a member whose front never arrives counts as later "
                + "than any time, and a percentile that falls among those is left empty) with the observed sea-breeze passage "
                + "and its percentile in the envelope (mid-rank).", envelope);
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
            Table pt = Table.of("label", "from_site", "to_site", "implied_m_per_s", "implied_min_m_per_s", "implied_max_m_per_s");
            for (TimingCheck.PairAssessment p : in.check().pairs()) {
                pt.row(p.label(), p.coastalSite(), p.inlandSite(), p.impliedSpeedMPerS(), p.impliedMinMPerS(),
                        Double.isFinite(p.impliedMaxMPerS()) ? p.impliedMaxMPerS() : null);
            }
            h.table("Speed implied by the observed passages between neighbouring sites, with its range from the timing "
                    + "uncertainties.", pt);
        }
        if (!in.notes().isEmpty()) {
            h.section("Notes");
            h.bullets(in.notes());
        }
        return h;
    }
}
