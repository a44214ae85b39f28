package org.littoral.scenarios.sensitivity;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.littoral.scenarios.report.ClockTime;
import org.littoral.scenarios.report.HtmlReport;
import org.littoral.scenarios.report.Table;
import org.littoral.scenarios.sweep.KeyPath;
import org.littoral.scenarios.sweep.Member;
import org.littoral.scenarios.sweep.MemberStore;
import org.littoral.scenarios.sweep.SweepSpec;
import org.littoral.scenarios.timing.DaySpec;
import org.littoral.scenarios.timing.TimingInputs;

/**
 * "Which conditions would explain these timings": the inverse fit of {@link ConditionsFit} built from a check-timing
 * ensemble (its members' drawn ambient direction, speed and heating, and their arrivals at the sites) and fitted to the
 * observed sea-breeze passages. Used by {@code littoral check-timing} for a section of its report.
 */
public final class TimingExplanation {
    static final String FROM = "ambient_wind.from_deg";
    static final String SPEED = "ambient_wind.speed_m_per_s";
    static final List<String> HEATING = List.of("heating.peak_flux_difference_W_per_m2", "heating.amplitude_K_per_h");

    private TimingExplanation() {
    }

    /**
     * The fit, or a {@link ConditionsFit.Fit} whose note says why there is none. {@code arrivalH.get(j)[s]} is member j's
     * arrival at site s (sites in the day's order; NaN none) for the members whose record is ok.
     */
    public static ConditionsFit.Fit explain(DaySpec spec, List<Member> members, MemberStore store,
                                            List<TimingInputs.ObservedPassage> passages) throws IOException {
        SweepSpec.Ensemble e = spec.ensemble().ensemble();
        List<ConditionsFit.Parameter> params = new ArrayList<>();
        List<Integer> which = new ArrayList<>();
        double[] fixed = new double[3];
        String[] paths = {FROM, SPEED, heatingPath(spec)};
        for (int c = 0; c < 3; c++) {
            if (paths[c] == null) {
                continue;
            }
            JsonNode base = KeyPath.parse(paths[c]).get(spec.ensemble().base());
            fixed[c] = base != null && base.isNumber() ? base.asDouble() : 0;
            for (SweepSpec.Draw d : e.draws()) {
                if (d.path().toString().equals(paths[c]) && !(d.distribution() instanceof org.littoral.scenarios.sweep.Distribution.Choice)) {
                    double[] ms = InputQuantiles.meanSd(d.distribution());
                    params.add(new ConditionsFit.Parameter(InfluenceStudy.readerName(paths[c]), paths[c], unit(paths[c]),
                            c == 0, ms[0], Math.max(ms[1], 1e-6), Double.NaN, Double.NaN));
                    which.add(c);
                }
            }
        }
        List<String> siteNames = new ArrayList<>();
        spec.sites().forEach(s -> siteNames.add(s.name()));
        if (params.isEmpty()) {
            return none(spec, "the ensemble draws none of ambient direction, ambient speed and heating");
        }
        List<ConditionsFit.Sample> samples = new ArrayList<>();
        double[] lo = new double[params.size()];
        double[] hi = new double[params.size()];
        java.util.Arrays.fill(lo, Double.POSITIVE_INFINITY);
        java.util.Arrays.fill(hi, Double.NEGATIVE_INFINITY);
        for (Member m : members) {
            ObjectNode rec = store.read(m.id());
            if (!MemberStore.STATUS_OK.equals(rec.path("status").asText())) {
                continue;
            }
            double[] c = fixed.clone();
            for (SweepSpec.Setting s : m.settings()) {
                for (int i = 0; i < params.size(); i++) {
                    if (s.path().toString().equals(params.get(i).keyPath()) && s.value().value().isNumber()) {
                        c[which.get(i)] = s.value().value().asDouble();
                    }
                }
            }
            for (int i = 0; i < params.size(); i++) {
                lo[i] = Math.min(lo[i], c[which.get(i)]);
                hi[i] = Math.max(hi[i], c[which.get(i)]);
            }
            double[] a = new double[siteNames.size()];
            for (int s = 0; s < a.length; s++) {
                JsonNode v = rec.path("result").path("arrival_h").path(s);
                a[s] = v.isNumber() ? v.asDouble() : Double.NaN;
            }
            samples.add(new ConditionsFit.Sample(c[0], c[1], c[2], a));
        }
        List<ConditionsFit.Parameter> bounded = new ArrayList<>();
        for (int i = 0; i < params.size(); i++) {
            ConditionsFit.Parameter p = params.get(i);
            bounded.add(new ConditionsFit.Parameter(p.name(), p.keyPath(), p.unit(), p.direction(), p.priorMean(), p.priorSd(),
                    lo[i], hi[i]));
        }
        int[] w = which.stream().mapToInt(Integer::intValue).toArray();
        ConditionsFit fit = new ConditionsFit(bounded, w, fixed, siteNames, samples);
        List<ConditionsFit.Observation> obs = new ArrayList<>();
        for (TimingInputs.ObservedPassage p : passages) {
            if (p.label().equals("sea_breeze") && spec.date().equals(p.day())) {
                obs.add(new ConditionsFit.Observation(p.site(), p.timeHours(), Math.max(p.uncertaintyHours(), 1.0 / 60.0)));
            }
        }
        return fit.fit(obs);
    }

    static String heatingPath(DaySpec spec) {
        for (SweepSpec.Draw d : spec.ensemble().ensemble().draws()) {
            if (HEATING.contains(d.path().toString())) {
                return d.path().toString();
            }
        }
        return null;
    }

    static String unit(String path) {
        return path.endsWith("_deg") ? "deg" : path.endsWith("m_per_s") ? "m/s" : path.endsWith("W_per_m2") ? "W/m2" : "K/h";
    }

    /** A fit that was not made, with the reason. */
    public static ConditionsFit.Fit failed(String why) {
        return none(null, why);
    }

    private static ConditionsFit.Fit none(DaySpec spec, String why) {
        return new ConditionsFit.Fit(List.of(), null, null, null, null, List.of(), Double.NaN, List.of(), null, Double.NaN,
                List.of(), why);
    }

    /** The table of fitted conditions (one row per parameter). */
    public static Table table(ConditionsFit.Fit f) {
        Table t = Table.of("condition", "unit", "prior_mean", "prior_sd", "fitted", "sd", "low_95", "high_95", "sd_over_prior_sd",
                "at_bound");
        if (!f.done()) {
            return t;
        }
        for (int i = 0; i < f.parameters().size(); i++) {
            ConditionsFit.Parameter p = f.parameters().get(i);
            double lo = f.estimate()[i] - 1.96 * f.sd()[i];
            double hi = f.estimate()[i] + 1.96 * f.sd()[i];
            if (p.direction()) {
                lo = ((lo % 360) + 360) % 360;
                hi = ((hi % 360) + 360) % 360;
            }
            t.row(p.name(), p.unit(), p.priorMean(), p.priorSd(), f.estimate()[i], f.sd()[i], lo, hi, f.sd()[i] / p.priorSd(),
                    f.atBound()[i].isEmpty() ? null : f.atBound()[i]);
        }
        for (String c : List.of("prior_mean", "prior_sd", "fitted", "sd", "low_95", "high_95", "sd_over_prior_sd")) {
            t.decimals(c, 2);
        }
        return t;
    }

    /** JSON form for summary.json. */
    public static ObjectNode json(ConditionsFit.Fit f) {
        ObjectNode o = JsonNodeFactory.instance.objectNode();
        if (!f.done()) {
            o.put("note", f.note());
            return o;
        }
        o.put("method", METHOD);
        ArrayNode ps = o.putArray("conditions");
        for (int i = 0; i < f.parameters().size(); i++) {
            ps.addObject().put("name", f.parameters().get(i).name()).put("key_path", f.parameters().get(i).keyPath())
                    .put("fitted", f.estimate()[i]).put("sd", f.sd()[i]).put("prior_mean", f.parameters().get(i).priorMean())
                    .put("prior_sd", f.parameters().get(i).priorSd()).put("at_bound", f.atBound()[i]);
        }
        ArrayNode ss = o.putArray("surrogates");
        for (ConditionsFit.SiteSurrogate s : f.surrogates()) {
            ObjectNode x = ss.addObject().put("site", s.site()).put("members", s.members()).put("form", s.form());
            if (Double.isFinite(s.cvRmsH())) {
                x.put("cv_rms_min", s.cvRmsH() * 60);
            }
        }
        o.put("condition_number", Double.isFinite(f.condition()) ? f.condition() : null);
        ArrayNode flat = o.putArray("flat_directions");
        f.flatDirections().forEach(flat::add);
        o.put("chi_square", f.chiSquare());
        o.put("observed_sites", f.used().size());
        return o;
    }

    static final String METHOD = "quadratic response surface per site of the ensemble's arrivals in (speed sin dir, speed cos dir, "
            + "heating), leave-one-out cross-validated; weighted least squares (Levenberg-Marquardt) with the timing "
            + "uncertainty and the surrogate's CV error as weights and the ensemble distributions as a Gaussian prior; "
            + "covariance (J^T J)^-1 at the optimum";

    /** The report section "Which conditions would explain these timings". */
    public static void addSection(HtmlReport h, ConditionsFit.Fit f) {
        h.section("Which conditions would explain these timings");
        if (!f.done()) {
            h.paragraph("No fit: " + f.note() + ".");
            return;
        }
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < f.parameters().size(); i++) {
            ConditionsFit.Parameter p = f.parameters().get(i);
            sb.append(i == 0 ? "" : "; ").append(p.name()).append(' ').append(ConditionsFit.fmt(f.estimate()[i])).append(" +/- ")
                    .append(ConditionsFit.fmt(1.96 * f.sd()[i])).append(' ').append(p.unit());
        }
        h.paragraph("The observed sea-breeze passages at " + f.used().size() + " site(s) are best explained by: " + sb
                + " (95 % intervals). A condition whose interval is nearly as wide as its prior (sd / prior sd near 1) is "
                + "not told by these timings; it stays at what the day file assumed.");
        h.table("Fitted conditions, with the day file's ensemble distribution as the prior (also in conditions-fit.csv).", table(f));
        Table s = Table.of("site", "observed", "fitted", "members arriving", "surrogate", "surrogate CV error (min)");
        for (int d = 0; d < f.used().size(); d++) {
            ConditionsFit.Observation o = f.used().get(d);
            ConditionsFit.SiteSurrogate sur = f.surrogates().stream().filter(x -> x.site().equals(o.site())).findFirst().orElseThrow();
            s.row(o.site(), ClockTime.hhmm(o.timeH()), ClockTime.hhmm(f.fittedH()[d]), sur.members(), sur.form(), sur.cvRmsH() * 60);
        }
        h.table("Observed passages and the surrogate's arrival at the fitted conditions; the surrogate's leave-one-out "
                + "cross-validated error is added to each timing uncertainty.", s.decimals("surrogate CV error (min)", 1));
        List<String> ill = new ArrayList<>();
        ill.add(String.format(Locale.ROOT, "condition number of the data's normal matrix (in prior-sd units): %s",
                Double.isFinite(f.condition()) ? String.format(Locale.ROOT, "%.3g", f.condition()) : "infinite (a direction is wholly unconstrained)"));
        ill.addAll(f.flatDirections());
        for (int i = 0; i < f.parameters().size(); i++) {
            if (!f.atBound()[i].isEmpty()) {
                ill.add(f.parameters().get(i).name() + " is " + f.atBound()[i] + ": the surrogate would have to extrapolate; widen "
                        + "that input's ensemble distribution in the day file");
            }
        }
        if (f.used().size() < f.parameters().size()) {
            ill.add(f.used().size() + " observed site(s) for " + f.parameters().size() + " conditions: the timings alone cannot "
                    + "fix them all; the prior holds the rest");
        }
        ill.add(String.format(Locale.ROOT, "chi-square of the timings at the fit: %.2f for %d site(s)", f.chiSquare(), f.used().size()));
        h.subsection("Where the fit is ill-posed");
        h.bullets(ill);
        h.paragraph("Method: " + METHOD + " (Box & Draper 1987; Stone 1974; Levenberg 1944; Marquardt 1963; Tarantola 2005). "
                + "Stratification, SST and the mixed-layer depth are not fitted: their spread is part of the surrogate's error.");
    }
}
