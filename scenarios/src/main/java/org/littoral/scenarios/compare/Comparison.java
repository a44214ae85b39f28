package org.littoral.scenarios.compare;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;
import org.littoral.model.coast.Coast;
import org.littoral.model.sounding.Profile;
import org.littoral.model.sounding.VirtualSite;
import org.littoral.scenarios.analysis.AnalysisChain;
import org.littoral.scenarios.analysis.AnalysisResult;
import org.littoral.scenarios.analysis.AnalysisSettings;
import org.littoral.scenarios.analysis.Layer;
import org.littoral.scenarios.analysis.SiteDay;
import org.littoral.scenarios.analysis.SiteDayResult;
import org.littoral.scenarios.analysis.Variable;
import org.littoral.scenarios.analysis.detect.Passage;
import org.littoral.scenarios.analysis.stats.BreezeType;
import org.littoral.scenarios.input.UserInputException;
import org.littoral.model.front.BreezeDiagnostics;
import org.littoral.scenarios.run.ScenarioRun;
import org.littoral.scenarios.scenario.Scenario;

/**
 * Model against observations, like with like: the scenario's synthetic soundings and the observed
 * profiles both go through {@link AnalysisChain#run} with the same settings; then, per site and layer,
 * the layer means of each observed profile are paired with the model's layer means at the same local
 * clock time (linear in time between the model's flights; never extrapolated), and the passages the
 * chain finds in each are compared. The model's own front arrival ({@link BreezeDiagnostics}) is
 * compared as well. No I/O: {@link CompareOutputs} writes the files. Design and reasons: docs/compare.md.
 */
public final class Comparison {
    /** The variables compared, in the units people read. */
    public enum Quantity {
        TEMPERATURE("temperature_K", "K"),
        MIXING_RATIO("mixing_ratio_g_per_kg", "g/kg"),
        WIND_SPEED("wind_speed_m_per_s", "m/s"),
        WIND_DIRECTION("wind_direction_deg", "deg");

        private final String column;
        private final String unit;

        Quantity(String column, String unit) {
            this.column = column;
            this.unit = unit;
        }

        public String column() {
            return column;
        }

        public String unit() {
            return unit;
        }
    }

    /** Pooled over every selected day: one row per site, layer and quantity. Means of directions are vector means. */
    public record MetricRow(String site, String layer, String variable, String unit, int n, double bias, double rmse,
                            double meanObserved, double meanModel) {
    }

    /** The same for one observed day. */
    public record DayMetricRow(String day, String site, String layer, String variable, String unit, int n, double bias,
                               double rmse) {
    }

    /**
     * Passage timing at one site on one observed day, local clock hours; errors are model minus observed, h.
     * NaN where a passage is missing (the note says which).
     */
    public record PassageError(String day, String site, double inlandKm, double observedH, double modelChainH,
                               double modelArrivalH, double chainMinusObservedH, double arrivalMinusObservedH,
                               double chainMinusArrivalH, double observedUncertaintyH, String note) {
    }

    /** Per site: how many days had both passages, and the mean and RMSE of the errors, h. */
    public record PassageSummary(String site, int days, int daysWithObservedPassage, int nChain, double meanChainErrorH,
                                 double rmseChainErrorH, int nArrival, double meanArrivalErrorH, double rmseArrivalErrorH,
                                 double modelChainH, double modelArrivalH) {
    }

    /**
     * A time-height section of one site: the observed composite (each selected day interpolated linearly in
     * time onto the model's flight times, then averaged over the days) beside the model, on the model's
     * flight times and height bins. Values are [height][time] (rows = y, as {@code FieldFigure} takes them).
     */
    public record Section(String site, double[] timeH, double[] heightM, double[][] observedCrossShore,
                          double[][] modelCrossShore, double[][] observedTheta, double[][] modelTheta,
                          List<Double> observedPassagesH, double modelChainH, double modelArrivalH, int days) {
    }

    /** Everything compared. */
    public record Result(String scenarioName, String modelName, String selection, BreezeType scenarioType,
                         List<String> days, List<String> sites, List<String> excludedDays, List<Layer> layers,
                         List<MetricRow> metrics, List<DayMetricRow> dayMetrics, List<PassageError> passages,
                         List<PassageSummary> passageSummaries, List<Section> sections, int pairs, int unpaired,
                         AnalysisResult observedAnalysis, AnalysisResult modelAnalysis, List<String> notes) {
    }

    /** Inputs besides the two profile sets. */
    public record Inputs(Scenario scenario, ScenarioRun.Outcome model, List<Profile> observed, Coast observedCoast,
                         AnalysisSettings settings, String breezeTypeSelection, String observedLabel,
                         Map<String, Double> observedSiteInlandM) {
    }

    /** Maximum difference between a site's inland distance in the coast file and in the scenario, m. */
    public static final double SITE_DISTANCE_TOLERANCE_M = 250.0;

    private Comparison() {
    }

    /** Runs the chain on both profile sets and compares them (allocates). */
    public static Result compute(Inputs in) {
        AnalysisSettings settings = in.settings().validate();
        Scenario sc = in.scenario();
        List<String> notes = new ArrayList<>();
        Map<String, VirtualSite> modelSites = matchSites(sc, in.observed(), in.observedLabel(), in.observedSiteInlandM(), notes);
        checkCoasts(sc.coast(), in.observedCoast(), in.observedLabel(), notes);

        AnalysisResult obs = AnalysisChain.run(in.observed(), in.observedCoast(), settings);
        AnalysisResult mod = AnalysisChain.run(in.model().profiles(), sc.coast(), settings);
        BreezeType scenarioType = settings.breezeTyping.classifyModel(sc.ambientWind().crossShoreMPerS(),
                sc.ambientWind().alongshoreMPerS(), sc.coast().southernHemisphere());
        String sel = in.breezeTypeSelection() == null ? "scenario" : in.breezeTypeSelection().trim().toLowerCase(Locale.ROOT);
        List<SiteDayResult> chosen = new ArrayList<>();
        List<String> excluded = new ArrayList<>();
        String selection = select(obs, sel, scenarioType, chosen, excluded, in.observedLabel());

        Map<String, SiteDayResult> modelBySite = new LinkedHashMap<>();
        for (SiteDayResult r : mod.siteDays()) {
            modelBySite.put(r.siteDay().site(), r);
        }
        Map<String, Double> arrival = new LinkedHashMap<>();
        for (BreezeDiagnostics.SiteTiming t : in.model().diagnostics().sites()) {
            arrival.put(t.name(), t.arrivalClockH() == null ? Double.NaN : t.arrivalClockH());
        }
        List<Layer> layers = settings.metrics.layers;
        double minValid = settings.metrics.minValidFraction;
        double calm = settings.detection.calmSpeedMPerS;
        Quantity[] qs = Quantity.values();

        TreeSet<String> siteNames = new TreeSet<>();
        TreeSet<String> dayNames = new TreeSet<>();
        Map<String, ErrorStats[][]> pooled = new TreeMap<>();
        List<DayMetricRow> dayRows = new ArrayList<>();
        List<PassageError> passageRows = new ArrayList<>();
        int pairs = 0;
        int unpaired = 0;
        double obsMin = Double.POSITIVE_INFINITY;
        double obsMax = Double.NEGATIVE_INFINITY;
        for (SiteDayResult od : chosen) {
            String site = od.siteDay().site();
            SiteDayResult md = modelBySite.get(site);
            if (md == null) {
                throw new IllegalStateException("model has no soundings for matched site " + site);
            }
            siteNames.add(site);
            dayNames.add(od.siteDay().day());
            ModelSeries ms = ModelSeries.of(md.siteDay(), layers, minValid);
            ErrorStats[][] pool = pooled.computeIfAbsent(site, k -> newStats(layers.size()));
            ErrorStats[][] day = newStats(layers.size());
            SiteDay sd = od.siteDay();
            for (int i = 0; i < sd.size(); i++) {
                Profile p = sd.profiles().get(i);
                double t = sd.timeHours()[i];
                obsMin = Math.min(obsMin, t);
                obsMax = Math.max(obsMax, t);
                if (!ms.covers(t)) {
                    unpaired++;
                    continue;
                }
                pairs++;
                for (int l = 0; l < layers.size(); l++) {
                    Layer layer = layers.get(l);
                    double oT = Variable.TEMPERATURE.layerMean(p, layer, in.observedCoast(), minValid);
                    double oR = Variable.MIXING_RATIO.layerMean(p, layer, in.observedCoast(), minValid);
                    double oE = Variable.WIND_EAST.layerMean(p, layer, in.observedCoast(), minValid);
                    double oN = Variable.WIND_NORTH.layerMean(p, layer, in.observedCoast(), minValid);
                    double mT = ms.at(l, 0, t);
                    double mR = ms.at(l, 1, t);
                    double mE = ms.at(l, 2, t);
                    double mN = ms.at(l, 3, t);
                    double oS = Math.hypot(oE, oN);
                    double mS = Math.hypot(mE, mN);
                    double oD = Coast.directionFromDeg(oE, oN);
                    double mD = Coast.directionFromDeg(mE, mN);
                    // a direction is only defined when the wind is not calm (the chain's own calm threshold)
                    double dD = oS >= calm && mS >= calm ? Angles.differenceDeg(mD, oD) : Double.NaN;
                    for (ErrorStats[][] s : List.of(pool, day)) {
                        s[l][0].add(mT, oT);
                        s[l][1].add(mR, oR);
                        s[l][2].add(mS, oS);
                        s[l][3].add(mD, oD, dD);
                    }
                }
            }
            for (int l = 0; l < layers.size(); l++) {
                for (int q = 0; q < qs.length; q++) {
                    ErrorStats s = day[l][q];
                    dayRows.add(new DayMetricRow(sd.day(), site, layers.get(l).label(), qs[q].column(), qs[q].unit(), s.n(),
                            s.bias(), s.rmse()));
                }
            }
            passageRows.add(passageError(od, md, arrival.getOrDefault(site, Double.NaN), modelSites.get(site)));
        }
        if (pairs == 0) {
            double[] span = modelSpan(modelBySite.values());
            throw new UserInputException(String.format(Locale.ROOT,
                    "%s: no observed profile lies within the model's flight times: observed %s to %s local, model %s to %s; "
                            + "widen the scenario's flights.start_h/end_h or compare other observations",
                    in.observedLabel(), ScenarioRun.clock(obsMin), ScenarioRun.clock(obsMax), ScenarioRun.clock(span[0]),
                    ScenarioRun.clock(span[1])));
        }
        if (unpaired > 0) {
            double[] span = modelSpan(modelBySite.values());
            notes.add(unpaired + " observed profiles lie outside the model's flight times (" + ScenarioRun.clock(span[0]) + " to "
                    + ScenarioRun.clock(span[1]) + " local) and are not paired");
        }
        List<MetricRow> rows = new ArrayList<>();
        for (Map.Entry<String, ErrorStats[][]> e : pooled.entrySet()) {
            for (int l = 0; l < layers.size(); l++) {
                for (int q = 0; q < qs.length; q++) {
                    ErrorStats s = e.getValue()[l][q];
                    rows.add(new MetricRow(e.getKey(), layers.get(l).label(), qs[q].column(), qs[q].unit(), s.n(), s.bias(),
                            s.rmse(), s.meanObserved(), s.meanModel()));
                }
            }
        }
        List<PassageSummary> summaries = new ArrayList<>();
        List<Section> sections = new ArrayList<>();
        for (String site : siteNames) {
            summaries.add(summarise(site, passageRows));
            List<SiteDayResult> days = new ArrayList<>();
            for (SiteDayResult od : chosen) {
                if (od.siteDay().site().equals(site)) {
                    days.add(od);
                }
            }
            sections.add(section(site, days, modelBySite.get(site), arrival.getOrDefault(site, Double.NaN),
                    in.observedCoast(), sc.coast()));
        }
        for (String s : modelSites.keySet()) {
            if (!siteNames.contains(s)) {
                notes.add("model site " + s + " has no selected observed day and is not compared");
            }
        }
        return new Result(sc.name(), in.model().solution().modelName(), selection, scenarioType, List.copyOf(dayNames),
                List.copyOf(siteNames), excluded, layers, rows, dayRows, passageRows, summaries, sections, pairs, unpaired, obs, mod,
                notes);
    }

    private static ErrorStats[][] newStats(int layers) {
        ErrorStats[][] s = new ErrorStats[layers][Quantity.values().length];
        for (int l = 0; l < layers; l++) {
            for (int q = 0; q < s[l].length; q++) {
                s[l][q] = new ErrorStats(Quantity.values()[q] == Quantity.WIND_DIRECTION);
            }
        }
        return s;
    }

    private static double[] modelSpan(Iterable<SiteDayResult> model) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (SiteDayResult r : model) {
            double[] t = r.siteDay().timeHours();
            lo = Math.min(lo, t[0]);
            hi = Math.max(hi, t[t.length - 1]);
        }
        return new double[] {lo, hi};
    }

    /**
     * Observed sites by name in the scenario's sites (one-line error listing both sets otherwise); inland
     * distances checked when the coast file lists them. Cheap: call it before running the model.
     *
     * @return the scenario sites that have observations, by name
     */
    public static Map<String, VirtualSite> matchSites(Scenario scenario, List<Profile> observedProfiles, String observedLabel,
                                                      Map<String, Double> observedSiteInlandM, List<String> notes) {
        Map<String, VirtualSite> bySite = new LinkedHashMap<>();
        for (VirtualSite v : scenario.sites()) {
            bySite.put(v.name(), v);
        }
        Set<String> observed = new TreeSet<>();
        for (Profile p : observedProfiles) {
            observed.add(p.site());
        }
        Set<String> missing = new TreeSet<>(observed);
        missing.removeAll(bySite.keySet());
        if (!missing.isEmpty()) {
            throw new UserInputException(observedLabel + ": observed site(s) " + missing + " are not sites of scenario "
                    + scenario.source() + "; observed sites " + observed + ", scenario sites " + bySite.keySet()
                    + "; give the scenario's sites: the observed names and inland_km");
        }
        for (Map.Entry<String, Double> e : observedSiteInlandM.entrySet()) {
            VirtualSite v = bySite.get(e.getKey());
            if (v != null && Math.abs(v.inlandDistanceM() - e.getValue()) > SITE_DISTANCE_TOLERANCE_M) {
                throw new UserInputException(String.format(Locale.ROOT,
                        "site %s is %.2f km inland in the coast file but %.2f km in scenario %s (tolerance %.2f km); "
                                + "make sites.inland_km agree", e.getKey(), e.getValue() / 1000.0, v.inlandDistanceM() / 1000.0,
                        scenario.source(), SITE_DISTANCE_TOLERANCE_M / 1000.0));
            }
        }
        Map<String, VirtualSite> out = new LinkedHashMap<>();
        for (Map.Entry<String, VirtualSite> e : bySite.entrySet()) {
            if (observed.contains(e.getKey())) {
                out.put(e.getKey(), e.getValue());
            } else {
                notes.add("scenario site " + e.getKey() + " has no observations");
            }
        }
        return out;
    }

    static void checkCoasts(Coast model, Coast obs, String label, List<String> notes) {
        double db = Math.abs(Angles.differenceDeg(model.bearingLandToSeaDeg(), obs.bearingLandToSeaDeg()));
        if (db > 1.0) {
            notes.add(String.format(Locale.ROOT, "coast bearings differ: scenario %.1f deg, observations (%s) %.1f deg: "
                    + "cross-shore components and onshore labels are taken on each one's own coast", model.bearingLandToSeaDeg(),
                    label, obs.bearingLandToSeaDeg()));
        }
        if (Math.abs(model.utcOffsetHours() - obs.utcOffsetHours()) > 1e-9) {
            notes.add(String.format(Locale.ROOT, "UTC offsets differ: scenario %+.1f h, observations %+.1f h; times are paired "
                    + "on each one's local clock", model.utcOffsetHours(), obs.utcOffsetHours()));
        }
    }

    /** Fills chosen/excluded and returns a description of the selection. */
    static String select(AnalysisResult obs, String sel, BreezeType scenarioType, List<SiteDayResult> chosen,
                         List<String> excluded, String label) {
        BreezeType want;
        if (sel.equals("all")) {
            chosen.addAll(obs.siteDays());
            return "every observed day";
        } else if (sel.equals("scenario")) {
            want = scenarioType;
        } else {
            try {
                want = BreezeType.valueOf(sel.toUpperCase(Locale.ROOT));
            } catch (IllegalArgumentException e) {
                throw new UserInputException("--breeze-type " + sel + ": not one of scenario, all, "
                        + java.util.Arrays.toString(BreezeType.values()).toLowerCase(Locale.ROOT));
            }
        }
        TreeMap<String, Integer> present = new TreeMap<>();
        Set<String> excludedDays = new TreeSet<>();
        for (SiteDayResult r : obs.siteDays()) {
            present.merge(r.breezeType().name().toLowerCase(Locale.ROOT), 1, Integer::sum);
            if (r.breezeType() == want) {
                chosen.add(r);
            } else {
                excludedDays.add(r.siteDay().day() + " (" + r.breezeType().name().toLowerCase(Locale.ROOT) + ")");
            }
        }
        excluded.addAll(excludedDays);
        String what = "observed days of breeze type " + want.name().toLowerCase(Locale.ROOT)
                + (sel.equals("scenario") ? " (the scenario's type, from its ambient wind)" : "");
        if (chosen.isEmpty()) {
            throw new UserInputException(label + ": no " + what + "; site-days by type " + present
                    + "; choose --breeze-type all or one of those");
        }
        return what;
    }

    private static PassageError passageError(SiteDayResult od, SiteDayResult md, double arrivalH, VirtualSite site) {
        Passage op = od.firstOnshorePassage();
        Passage mp = md.firstOnshorePassage();
        double o = op == null ? Double.NaN : op.timeHours();
        double m = mp == null ? Double.NaN : mp.timeHours();
        List<String> why = new ArrayList<>();
        if (op == null) {
            why.add("no onshore passage observed");
        }
        if (mp == null) {
            why.add("no onshore passage in the model soundings");
        }
        if (Double.isNaN(arrivalH)) {
            why.add("no model front arrival");
        }
        return new PassageError(od.siteDay().day(), od.siteDay().site(), site.inlandDistanceM() / 1000.0, o, m, arrivalH, m - o,
                arrivalH - o, m - arrivalH, op == null ? Double.NaN : op.uncertaintyHours(), String.join("; ", why));
    }

    private static PassageSummary summarise(String site, List<PassageError> rows) {
        ErrorStats chain = new ErrorStats();
        ErrorStats arr = new ErrorStats();
        int days = 0;
        int withObs = 0;
        double mc = Double.NaN;
        double ma = Double.NaN;
        for (PassageError p : rows) {
            if (!p.site().equals(site)) {
                continue;
            }
            days++;
            if (!Double.isNaN(p.observedH())) {
                withObs++;
            }
            mc = p.modelChainH();
            ma = p.modelArrivalH();
            chain.add(p.modelChainH(), p.observedH());
            arr.add(p.modelArrivalH(), p.observedH());
        }
        return new PassageSummary(site, days, withObs, chain.n(), chain.bias(), chain.rmse(), arr.n(), arr.bias(), arr.rmse(), mc, ma);
    }

    static Section section(String site, List<SiteDayResult> days, SiteDayResult model, double arrivalH, Coast obsCoast,
                           Coast modelCoast) {
        SiteDay msd = model.siteDay();
        double[] t = msd.timeHours();
        double[] z = msd.profiles().get(0).heightM();
        int nt = t.length;
        int nz = z.length;
        double[][] mu = new double[nz][nt];
        double[][] mth = new double[nz][nt];
        for (int j = 0; j < nt; j++) {
            Profile p = msd.profiles().get(j);
            for (int k = 0; k < nz; k++) {
                mu[k][j] = k < p.size() ? modelCoast.crossShore(p.windEastMPerS()[k], p.windNorthMPerS()[k]) : Double.NaN;
                mth[k][j] = k < p.size() ? p.thetaK()[k] : Double.NaN;
            }
        }
        double[][] su = new double[nz][nt];
        double[][] sth = new double[nz][nt];
        int[][] cu = new int[nz][nt];
        int[][] cth = new int[nz][nt];
        double halfBin = nz > 1 ? 0.5 * (z[1] - z[0]) : 2.5;
        List<Double> passages = new ArrayList<>();
        double[] u = new double[nz];
        double[] th = new double[nz];
        double[] uNext = new double[nz];
        double[] thNext = new double[nz];
        for (SiteDayResult od : days) {
            Passage op = od.firstOnshorePassage();
            if (op != null) {
                passages.add(op.timeHours());
            }
            // each day onto the model's flight times, linear in time between that day's own flights (no more than
            // MAX_GAP_H apart), so that every day counts at every time and no single dense-window flight makes a stripe
            SiteDay sd = od.siteDay();
            double[] ot = sd.timeHours();
            for (int j = 0; j < nt; j++) {
                int i = bracketIndex(ot, t[j]);
                if (i < 0) {
                    continue;
                }
                double w = ot[i + 1] == ot[i] ? 0 : (t[j] - ot[i]) / (ot[i + 1] - ot[i]);
                if (ot[i + 1] - ot[i] > MAX_GAP_H) {
                    continue;
                }
                onBins(sd.profiles().get(i), z, halfBin, obsCoast, u, th);
                onBins(sd.profiles().get(i + 1), z, halfBin, obsCoast, uNext, thNext);
                for (int k = 0; k < nz; k++) {
                    double a = (1 - w) * u[k] + w * uNext[k];
                    double b = (1 - w) * th[k] + w * thNext[k];
                    if (!Double.isNaN(a)) {
                        su[k][j] += a;
                        cu[k][j]++;
                    }
                    if (!Double.isNaN(b)) {
                        sth[k][j] += b;
                        cth[k][j]++;
                    }
                }
            }
        }
        for (int k = 0; k < nz; k++) {
            for (int j = 0; j < nt; j++) {
                su[k][j] = cu[k][j] == 0 ? Double.NaN : su[k][j] / cu[k][j];
                sth[k][j] = cth[k][j] == 0 ? Double.NaN : sth[k][j] / cth[k][j];
            }
        }
        Passage mp = model.firstOnshorePassage();
        return new Section(site, t.clone(), z.clone(), su, mu, sth, mth, passages, mp == null ? Double.NaN : mp.timeHours(),
                arrivalH, days.size());
    }

    /** Longest gap between two observed flights across which the sections interpolate, h. */
    static final double MAX_GAP_H = 1.0;

    /** i with t[i] <= v <= t[i+1] (i = n - 2 at the last time), or -1 outside [t[0], t[n-1]] or with fewer than two times. */
    static int bracketIndex(double[] t, double v) {
        int n = t.length;
        if (n < 2 || v < t[0] - 1e-9 || v > t[n - 1] + 1e-9) {
            return -1;
        }
        int i = 0;
        while (i < n - 2 && t[i + 1] < v) {
            i++;
        }
        return i;
    }

    /** Cross-shore wind and theta of a profile on the height bins z (the binning shared with observe's sections). */
    private static void onBins(Profile p, double[] z, double halfBin, Coast coast, double[] u, double[] th) {
        org.littoral.scenarios.analysis.TimeHeightGrid.onBins(p, z, halfBin, coast, u, th);
    }

    /** Layer means of the model soundings at one site, linear in time between flights. */
    static final class ModelSeries {
        final double[] t;
        /** [layer][quantity: T, r (g/kg), east, north][flight] */
        final double[][][] v;

        private ModelSeries(double[] t, double[][][] v) {
            this.t = t;
            this.v = v;
        }

        static ModelSeries of(SiteDay sd, List<Layer> layers, double minValid) {
            double[][][] v = new double[layers.size()][4][];
            Variable[] vars = {Variable.TEMPERATURE, Variable.MIXING_RATIO, Variable.WIND_EAST, Variable.WIND_NORTH};
            for (int l = 0; l < layers.size(); l++) {
                for (int q = 0; q < 4; q++) {
                    // the coast only matters for cross-shore variables, none of which are used here
                    v[l][q] = sd.series(vars[q], layers.get(l), null, minValid);
                }
            }
            return new ModelSeries(sd.timeHours(), v);
        }

        boolean covers(double time) {
            return time >= t[0] - 1e-9 && time <= t[t.length - 1] + 1e-9;
        }

        /** Linear interpolation in time (the model's fields vary smoothly between flights); exact at a flight time. */
        double at(int layer, int q, double time) {
            double[] a = v[layer][q];
            int n = t.length;
            if (n == 1) {
                return a[0];
            }
            int i = 0;
            while (i < n - 2 && t[i + 1] < time) {
                i++;
            }
            if (Math.abs(time - t[i]) < 1e-12) {
                return a[i];
            }
            if (Math.abs(time - t[i + 1]) < 1e-12) {
                return a[i + 1];
            }
            double w = (time - t[i]) / (t[i + 1] - t[i]);
            return (1 - w) * a[i] + w * a[i + 1];
        }
    }
}
