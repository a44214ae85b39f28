package org.littoral.scenarios.compare;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.littoral.scenarios.compare.Comparison.MetricRow;
import org.littoral.scenarios.compare.Comparison.PassageError;
import org.littoral.scenarios.compare.Comparison.PassageSummary;
import org.littoral.scenarios.compare.Comparison.Section;
import org.littoral.scenarios.report.ClockTime;
import org.littoral.scenarios.report.FieldFigure;
import org.littoral.scenarios.report.ReaderText;
import org.littoral.scenarios.scenario.JobModel;
import org.littoral.scenarios.report.Figure;
import org.littoral.scenarios.report.FigureGrid;
import org.littoral.scenarios.report.HtmlReport;
import org.littoral.scenarios.report.PngWriter;
import org.littoral.scenarios.report.ScatterFigure;
import org.littoral.scenarios.report.Table;
import org.littoral.scenarios.report.TableWriter;
import org.littoral.scenarios.report.TimeHeightPanel;
import org.littoral.scenarios.run.ScenarioRun;

/** Writes a {@link Comparison.Result}: tables (CSV and JSON), time-height section figures (PNG) and report.html, each atomically. */
public final class CompareOutputs {
    private CompareOutputs() {
    }

    /**
     * What was written: every file; the time-height section PNGs (one per site, in site order); the
     * passage-time figure (null when no site-day has both an observed and a model passage); the report.
     */
    public record Written(List<Path> files, List<Path> figures, Path passageFigure, Path report) {
    }

    public static Written write(Path out, Comparison.Result r, String scenarioRef, String observedLabel) throws IOException {
        List<Path> files = new ArrayList<>();
        Table metrics = metricsTable(r.metrics());
        files.add(csv(out.resolve("metrics.csv"), metrics));
        Table byDay = dayMetricsTable(r.dayMetrics());
        files.add(csv(out.resolve("metrics-by-day.csv"), byDay));
        Table passages = passageTable(r.passages());
        files.add(csv(out.resolve("passage-errors.csv"), passages));
        Table summary = passageSummaryTable(r.passageSummaries());
        files.add(csv(out.resolve("passage-summary.csv"), summary));
        Path json = out.resolve("metrics.json");
        TableWriter.writeJsonValue(summaryJson(r, scenarioRef, observedLabel, metrics, summary), json);
        files.add(json);

        List<Path> figures = new ArrayList<>();
        List<Figure> figs = new ArrayList<>();
        for (Section s : r.sections()) {
            Figure f = sectionFigure(s, r.modelName());
            Path p = out.resolve("section-" + safe(s.site()) + ".png");
            PngWriter.write(f, p);
            figures.add(p);
            figs.add(f);
        }
        files.addAll(figures);
        Figure timing = passageFigure(r.passages(), r.modelName());
        Path timingPath = null;
        if (timing != null) {
            timingPath = out.resolve("passage-times.png");
            PngWriter.write(timing, timingPath);
            files.add(timingPath);
        }
        Path report = out.resolve("report.html");
        report(r, scenarioRef, observedLabel, metricsView(r.metrics()), passageView(r.passages(), r.modelName()),
                passageSummaryView(r.passageSummaries(), r.modelName()), figs, timing).write(report);
        files.add(report);
        return new Written(files, figures, timingPath, report);
    }

    static String safe(String s) {
        return org.littoral.scenarios.output.SafeNames.fileName(s);
    }

    private static Path csv(Path p, Table t) throws IOException {
        TableWriter.writeCsv(t, p);
        return p;
    }

    public static Table metricsTable(List<MetricRow> rows) {
        Table t = Table.of("site", "layer", "variable", "n", "bias", "rmse", "mean_observed", "mean_model", "unit");
        for (MetricRow m : rows) {
            t.row(m.site(), m.layer(), m.variable(), m.n(), m.bias(), m.rmse(), m.meanObserved(), m.meanModel(), m.unit());
        }
        return t.decimals("bias", 2).decimals("rmse", 2).decimals("mean_observed", 2).decimals("mean_model", 2);
    }

    /** What a reader of the metrics sees: variables in words, layers with a spaced unit. */
    public static Table metricsView(List<MetricRow> rows) {
        Table t = Table.of("site", "layer", "variable", "unit", "pairs", "bias", "RMSE", "mean observed", "mean model");
        for (MetricRow m : rows) {
            t.row(m.site(), ReaderText.layer(m.layer()), ReaderText.words(m.variable()), m.unit(), m.n(), m.bias(), m.rmse(),
                    m.meanObserved(), m.meanModel());
        }
        return t.decimals("bias", 2).decimals("RMSE", 2).decimals("mean observed", 2).decimals("mean model", 2);
    }

    /** "model front arrival" or, for the linear model, "model onset of onshore flow". */
    static String modelTimeName(String modelName) {
        return JobModel.isLinear(modelName) ? "model onset of onshore flow" : "model front arrival";
    }

    /** What a reader of the passage summary sees: times as HH:MM, errors in minutes. */
    public static Table passageSummaryView(List<PassageSummary> rows, String modelName) {
        String arrival = modelTimeName(modelName);
        Table t = Table.of("site", "days", "days with an observed passage", "chain passage in the model soundings", arrival,
                "days with both (chain)", "mean error, chain", "RMSE, chain", "days with both (" + arrival + ")",
                "mean error, " + arrival, "RMSE, " + arrival);
        for (PassageSummary s : rows) {
            t.row(s.site(), s.days(), s.daysWithObservedPassage(), ClockTime.hhmm(s.modelChainH()), ClockTime.hhmm(s.modelArrivalH()),
                    s.nChain(), ClockTime.minutes(s.meanChainErrorH()), ClockTime.minutes(s.rmseChainErrorH()), s.nArrival(),
                    ClockTime.minutes(s.meanArrivalErrorH()), ClockTime.minutes(s.rmseArrivalErrorH()));
        }
        return t;
    }

    /** What a reader of the per-day passages sees. */
    static Table passageView(List<PassageError> rows, String modelName) {
        String arrival = modelTimeName(modelName);
        Table t = Table.of("day", "site", "observed passage", "chain on the model soundings", arrival, "chain minus observed",
                arrival + " minus observed", "note");
        for (PassageError p : rows) {
            t.row(p.day(), p.site(), ClockTime.hhmmWithin(p.observedH(), p.observedUncertaintyH()), ClockTime.hhmm(p.modelChainH()),
                    ClockTime.hhmm(p.modelArrivalH()), ClockTime.minutes(p.chainMinusObservedH()),
                    ClockTime.minutes(p.arrivalMinusObservedH()), p.note() == null || p.note().isEmpty() ? null : p.note());
        }
        return t;
    }

    static Table dayMetricsTable(List<Comparison.DayMetricRow> rows) {
        Table t = Table.of("day", "site", "layer", "variable", "n", "bias", "rmse", "unit");
        for (Comparison.DayMetricRow m : rows) {
            t.row(m.day(), m.site(), m.layer(), m.variable(), m.n(), m.bias(), m.rmse(), m.unit());
        }
        return t;
    }

    public static Table passageTable(List<PassageError> rows) {
        Table t = Table.of("day", "site", "inland_km", "observed_passage_local_h", "observed_uncertainty_h",
                "model_chain_passage_local_h", "model_front_arrival_local_h", "chain_minus_observed_h",
                "arrival_minus_observed_h", "chain_minus_arrival_h", "note");
        for (PassageError p : rows) {
            t.row(p.day(), p.site(), p.inlandKm(), p.observedH(), p.observedUncertaintyH(), p.modelChainH(), p.modelArrivalH(),
                    p.chainMinusObservedH(), p.arrivalMinusObservedH(), p.chainMinusArrivalH(), p.note());
        }
        for (String c : List.of("observed_passage_local_h", "observed_uncertainty_h", "model_chain_passage_local_h",
                "model_front_arrival_local_h", "chain_minus_observed_h", "arrival_minus_observed_h", "chain_minus_arrival_h")) {
            t.decimals(c, 2);
        }
        return t;
    }

    public static Table passageSummaryTable(List<PassageSummary> rows) {
        Table t = Table.of("site", "days", "days_with_observed_passage", "model_chain_passage_local_h",
                "model_front_arrival_local_h", "n_chain", "mean_chain_error_h", "rmse_chain_error_h", "n_arrival",
                "mean_arrival_error_h", "rmse_arrival_error_h");
        for (PassageSummary s : rows) {
            t.row(s.site(), s.days(), s.daysWithObservedPassage(), s.modelChainH(), s.modelArrivalH(), s.nChain(),
                    s.meanChainErrorH(), s.rmseChainErrorH(), s.nArrival(), s.meanArrivalErrorH(), s.rmseArrivalErrorH());
        }
        for (String c : List.of("model_chain_passage_local_h", "model_front_arrival_local_h", "mean_chain_error_h",
                "rmse_chain_error_h", "mean_arrival_error_h", "rmse_arrival_error_h")) {
            t.decimals(c, 2);
        }
        return t;
    }

    static ObjectNode summaryJson(Comparison.Result r, String scenarioRef, String observedLabel, Table metrics, Table summary) {
        JsonNodeFactory f = JsonNodeFactory.instance;
        ObjectNode root = f.objectNode();
        root.put("scenario", r.scenarioName());
        root.put("scenario_source", scenarioRef);
        root.put("model", r.modelName());
        root.put("observations", observedLabel);
        root.put("caution", ScenarioRun.CAUTION);
        root.put("selection", r.selection());
        root.put("scenario_breeze_type", r.scenarioType().name().toLowerCase(Locale.ROOT));
        ArrayNode days = root.putArray("days");
        r.days().forEach(days::add);
        ArrayNode sites = root.putArray("sites");
        r.sites().forEach(sites::add);
        ArrayNode ex = root.putArray("excluded_days");
        r.excludedDays().forEach(ex::add);
        root.put("paired_profiles", r.pairs());
        root.put("unpaired_profiles", r.unpaired());
        root.put("definitions", "differences are model minus observed; layer means of temperature, mixing ratio and wind "
                + "components; wind speed and direction of the layer-mean vector; direction differences wrapped to +-180 deg, "
                + "only where both winds are at least the chain's calm speed; times local clock");
        root.set("metrics", TableWriter.toJsonNode(metrics));
        root.set("passage_summary", TableWriter.toJsonNode(summary));
        ArrayNode notes = root.putArray("notes");
        r.notes().forEach(notes::add);
        return root;
    }

    /** Model passage times (chain and front arrival) against the observed ones, per site; null when there is nothing to plot. */
    public static Figure passageFigure(List<PassageError> rows, String modelName) {
        ScatterFigure.Builder b = ScatterFigure.builder().size(720, 520).title("Passage time: model against observed")
                .x("Observed passage, local time", "h").y("Model passage, local time", "h").identityLine();
        java.util.TreeSet<String> sites = new java.util.TreeSet<>();
        for (PassageError p : rows) {
            sites.add(p.site());
        }
        int series = 0;
        for (String site : sites) {
            for (int kind = 0; kind < 2; kind++) {
                List<double[]> pts = new ArrayList<>();
                for (PassageError p : rows) {
                    double m = kind == 0 ? p.modelArrivalH() : p.modelChainH();
                    if (p.site().equals(site) && Double.isFinite(p.observedH()) && Double.isFinite(m)) {
                        pts.add(new double[] {p.observedH(), m, Double.isFinite(p.observedUncertaintyH()) ? p.observedUncertaintyH() : 0});
                    }
                }
                if (pts.isEmpty()) {
                    continue;
                }
                double[] x = new double[pts.size()];
                double[] y = new double[pts.size()];
                double[] ex = new double[pts.size()];
                for (int i = 0; i < x.length; i++) {
                    x[i] = pts.get(i)[0];
                    y[i] = pts.get(i)[1];
                    ex[i] = pts.get(i)[2];
                }
                b.points(site + (kind == 0 ? ": " + modelTimeName(modelName) : ": chain on model soundings"), x, y, ex, null);
                series++;
            }
        }
        return series == 0 ? null : b.build();
    }

    /** Observed | model, cross-shore wind above, theta below, each pair on one colour scale. */
    public static Figure sectionFigure(Section s, String modelName) {
        double[] uRange = symmetric(s.observedCrossShore(), s.modelCrossShore());
        double[] thRange = range(s.observedTheta(), s.modelTheta());
        String obsTitle = String.format(Locale.ROOT, "%s: observed (mean of %d day%s)", s.site(), s.days(), s.days() == 1 ? "" : "s");
        String modTitle = s.site() + ": model";
        List<Figure> panels = new ArrayList<>();
        String arrival = JobModel.isLinear(modelName) ? "onset of onshore flow" : "front arrival";
        panels.add(panel(s, obsTitle, s.observedCrossShore(), "Cross-shore wind (onshore +)", "m/s", uRange, true, true, arrival));
        panels.add(panel(s, modTitle, s.modelCrossShore(), "Cross-shore wind (onshore +)", "m/s", uRange, true, false, arrival));
        panels.add(panel(s, obsTitle, s.observedTheta(), "Potential temperature \u03b8", "K", thRange, false, true, arrival));
        panels.add(panel(s, modTitle, s.modelTheta(), "Potential temperature \u03b8", "K", thRange, false, false, arrival));
        return FigureGrid.of("Time-height sections at " + s.site() + ": observed (left) and model (right)", panels, 2);
    }

    private static FieldFigure panel(Section s, String title, double[][] v, String label, String unit, double[] range,
                                     boolean diverging, boolean observed, String arrivalName) {
        List<TimeHeightPanel.Event> events = new ArrayList<>();
        if (observed) {
            List<Double> ps = new ArrayList<>(s.observedPassagesH());
            ps.sort(Double::compare);
            if (!ps.isEmpty()) {
                double med = ps.size() % 2 == 1 ? ps.get(ps.size() / 2) : 0.5 * (ps.get(ps.size() / 2 - 1) + ps.get(ps.size() / 2));
                events.add(new TimeHeightPanel.Event(med, "passage (median of " + ps.size() + ")"));
            }
        } else {
            events.add(new TimeHeightPanel.Event(s.modelChainH(), "chain passage"));
            events.add(new TimeHeightPanel.Event(s.modelArrivalH(), arrivalName));
        }
        return TimeHeightPanel.of(title, s.timeH(), s.heightM(), v, label, unit, range, diverging, events, 620, 380);
    }

    static double[] symmetric(double[][] a, double[][] b) {
        return TimeHeightPanel.symmetricRange(a, b);
    }

    static double[] range(double[][] a, double[][] b) {
        return TimeHeightPanel.range(a, b);
    }

    static HtmlReport report(Comparison.Result r, String scenarioRef, String observedLabel, Table metrics, Table passages,
                             Table summary, List<Figure> figs, Figure timing) {
        HtmlReport h = HtmlReport.create("Model against observations: " + r.scenarioName())
                .meta("scenario", scenarioRef).meta("model", r.modelName()).meta("observations", observedLabel)
                .meta("compared", r.selection());
        h.cautions();
        h.section("What was compared");
        Map<String, Object> kv = new LinkedHashMap<>();
        kv.put("sites", String.join(", ", r.sites()));
        kv.put("observed days", r.days().size() + (r.days().size() <= 12 ? " (" + String.join(", ", r.days()) + ")" : ""));
        kv.put("scenario breeze type (from its ambient wind)", r.scenarioType().name().toLowerCase(Locale.ROOT));
        kv.put("days left out (other breeze types)", r.excludedDays().size());
        kv.put("observed profiles paired with the model", r.pairs());
        kv.put("observed profiles outside the model's flight times", r.unpaired());
        kv.put("layers", r.layers().toString());
        h.keyValues(kv);
        h.paragraph("The scenario was run once (one diurnal cycle) and its synthetic soundings at the observed sites went "
                + "through the same analysis chain, with the same settings, as the observed profiles. Each observed profile "
                + "is paired with the model at the same local clock time (linear in time between the model's flights, never "
                + "extrapolated); every selected day is compared with the same model day, so the numbers mix model error with "
                + "the day-to-day variety of the observed days of that type. Differences are model minus observed. Wind speed "
                + "and direction are those of the layer-mean wind vector; direction differences are wrapped to +-180 deg and "
                + "left out where either wind is calm. Design and reasons: docs/compare.md.");
        h.section("Bias and RMSE per site and layer");
        h.table("Model minus observed, pooled over the selected days: n pairs, bias (mean difference), RMSE, and the means "
                + "(vector means for direction). Units in the last column.", metrics);
        h.section("Passage timing");
        boolean linear = JobModel.isLinear(r.modelName());
        h.paragraph("Passage = the first passage the analysis chain labels onshore at a site on a day. 'chain' is the chain's "
                + "passage in the model's synthetic soundings; " + (linear ? "'" + modelTimeName(r.modelName()) + "' is the "
                + "linear model's onset of onshore flow at the site (linear theory has no front)" : "'"
                + modelTimeName(r.modelName()) + "' is the model's own front arrival") + " (definition: docs/fronts.md). "
                + "Errors in minutes, model minus observed.");
        h.table("Passage-time errors per site (mean and RMSE over the days with both passages).", summary);
        if (timing != null) {
            h.figure(timing, "Model against observed passage time, one point per site and observed day with an onshore "
                    + "passage (horizontal bars: the observed passage's timing uncertainty). Points on the diagonal would be "
                    + "perfect timing; above it the model is late. The model has one day, so each site's model times form a row.");
        }
        h.table("Passage times (local time) and errors per site and day.", passages);
        h.section("Time-height sections");
        for (int i = 0; i < figs.size(); i++) {
            Section s = r.sections().get(i);
            h.figure(figs.get(i), "Time-height sections at " + s.site() + ": observed mean over the " + s.days()
                    + " selected day(s), each day interpolated in time onto the model's flight times (left) and the model's synthetic "
                    + "soundings (right); cross-shore wind (onshore positive) above, potential temperature "
                    + "below, each pair on one colour scale. Vertical lines: median observed passage; the chain's passage in "
                    + "the model soundings and the model's " + (JobModel.isLinear(r.modelName()) ? "onset of onshore flow" : "front arrival")
                    + ". Grey: no data.");
        }
        if (!r.notes().isEmpty()) {
            h.section("Notes");
            h.bullets(r.notes());
        }
        return h;
    }
}
