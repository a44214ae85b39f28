package org.littoral.scenarios.observe;

import org.littoral.scenarios.report.CaptionedFigure;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;

import org.littoral.model.coast.Coast;
import org.littoral.model.sounding.Profile;
import org.littoral.scenarios.analysis.AnalysisResult;
import org.littoral.scenarios.analysis.AnalysisSettings;
import org.littoral.scenarios.analysis.Layer;
import org.littoral.scenarios.analysis.SiteDayResult;
import org.littoral.scenarios.analysis.Variable;
import org.littoral.scenarios.analysis.composite.CompositeRow;
import org.littoral.scenarios.analysis.composite.CompositeSpec;
import org.littoral.scenarios.analysis.detect.Passage;
import org.littoral.scenarios.analysis.metrics.PassageResponse;
import org.littoral.scenarios.report.BoxPlotFigure;
import org.littoral.scenarios.report.Figure;
import org.littoral.scenarios.report.FigureGrid;
import org.littoral.scenarios.report.HistogramFigure;
import org.littoral.scenarios.report.LineFigure;
import org.littoral.scenarios.report.Marker;
import org.littoral.scenarios.report.Palette;
import org.littoral.scenarios.report.ReaderText;
import org.littoral.scenarios.report.Series;

/**
 * The figures of an analysis (observed or synthetic profiles alike): wind direction per site and day
 * with the detected passages marked, passage-time distributions, box plots of the post-passage
 * changes by breeze type, and the composites around the passage. Each method returns a figure with
 * its caption, or nothing when the analysis has no data for it.
 */
public final class AnalysisFigures {
    private AnalysisFigures() {
    }


    /** Panels per row in the day-by-day small multiples. */
    static final int DAY_COLUMNS = 3;
    /** At most this many days in one small-multiples image (larger campaigns get several). */
    static final int DAYS_PER_GRID = 24;

    /** Fewer first onshore passages than this get a sentence instead of a histogram. */
    static final int MIN_FOR_HISTOGRAM = 5;
    /** Groups with fewer values than this get a sentence instead of a box. */
    static final int MIN_FOR_BOX = 3;

    /**
     * What the histogram and box plots leave out because the sample is too small, as sentences with the values
     * (a campaign of one or a few days): an empty histogram or a one-value box says nothing a sentence cannot.
     */
    public static List<String> smallSampleSentences(AnalysisResult r) {
        List<String> out = new ArrayList<>();
        List<String> firsts = new ArrayList<>();
        for (SiteDayResult d : r.siteDays()) {
            Passage p = d.firstOnshorePassage();
            if (p != null) {
                firsts.add(d.siteDay().site() + " on " + d.siteDay().day() + " at " + org.littoral.scenarios.report.ClockTime.hhmm(p.timeHours()));
            }
        }
        if (firsts.isEmpty()) {
            out.add("No site-day has a passage that turns the wind onshore, so there is no passage-time histogram.");
        } else if (firsts.size() < MIN_FOR_HISTOGRAM) {
            out.add("First onshore passage: " + String.join("; ", firsts) + " (too few for a histogram).");
        }
        Map<String, String> typeOf = new LinkedHashMap<>();
        for (SiteDayResult d : r.siteDays()) {
            typeOf.put(d.siteDay().key(), d.breezeType().name().toLowerCase(Locale.ROOT));
        }
        Layer layer = r.responses().isEmpty() ? null : r.responses().get(0).layer();
        for (Variable v : List.of(Variable.THETA, Variable.MIXING_RATIO, Variable.THETA_E)) {
            Map<String, List<Double>> groups = new TreeMap<>();
            for (PassageResponse pr : r.responses()) {
                if (pr.variable() == v && pr.layer().equals(layer) && pr.passage().turnsOnshore() && Double.isFinite(pr.change())) {
                    groups.computeIfAbsent(typeOf.getOrDefault(pr.passage().day() + "/" + pr.passage().site(), "?"),
                            k -> new ArrayList<>()).add(pr.change());
                }
            }
            for (Map.Entry<String, List<Double>> e : groups.entrySet()) {
                if (e.getValue().size() < MIN_FOR_BOX) {
                    List<String> vals = new ArrayList<>();
                    e.getValue().forEach(x -> vals.add(String.format(Locale.ROOT, "%+.2f", x)));
                    out.add(String.format(Locale.ROOT, "Change of %s (%s) across the onshore passage%s of %s days: %s %s "
                            + "(too few for a box plot).", label(v), ReaderText.layer(layer.label()), e.getValue().size() > 1 ? "es" : "",
                            e.getKey(), String.join(", ", vals), v.unit()));
                }
            }
        }
        return out;
    }

    /** All figures, in reading order. */
    public static List<CaptionedFigure> all(AnalysisResult r, AnalysisSettings s, Coast coast) {
        List<CaptionedFigure> out = new ArrayList<>(dayPanels(r, s, coast));
        passageTimes(r).ifPresent(out::add);
        out.addAll(responseBoxes(r, s));
        out.addAll(composites(r));
        out.addAll(FlightFigures.all(r, coast));
        return out;
    }

    /**
     * Wind direction in the detector's layer against local time, one panel per day, one line per site,
     * with each detected passage as a dashed vertical line labelled by site and onshore ('on') or not.
     */
    static List<CaptionedFigure> dayPanels(AnalysisResult r, AnalysisSettings s, Coast coast) {
        Map<String, List<SiteDayResult>> byDay = new TreeMap<>();
        for (SiteDayResult d : r.siteDays()) {
            byDay.computeIfAbsent(d.siteDay().day(), k -> new ArrayList<>()).add(d);
        }
        List<String> sites = new ArrayList<>();
        for (SiteDayResult d : r.siteDays()) {
            if (!sites.contains(d.siteDay().site())) {
                sites.add(d.siteDay().site());
            }
        }
        Layer layer = s.detection.windLayer;
        double onshoreFrom = coast.bearingLandToSeaDeg();
        List<Figure> panels = new ArrayList<>();
        for (Map.Entry<String, List<SiteDayResult>> e : byDay.entrySet()) {
            LineFigure.Builder b = LineFigure.builder().size(420, 280).title(e.getKey() + " (" + breezeType(e.getValue()) + ")")
                    .x("local time", "h").y("wind from", "deg").yRange(0, 360).xRange(6, 20);
            b.reference(onshoreFrom, "onshore");
            for (SiteDayResult d : e.getValue()) {
                double[] t = d.siteDay().timeHours();
                double[] dir = directionSeries(d.siteDay().profiles(), layer, coast, s.metrics.minValidFraction);
                int colour = sites.indexOf(d.siteDay().site());
                double[][] xy = breakWraps(t, dir);
                Series line = Series.of(d.siteDay().site(), xy[0], xy[1]).marker(Marker.CIRCLE).width(1.5f)
                        .color(Palette.qualitative(colour));
                b.series(panels.size() % DAYS_PER_GRID == 0 ? line : line.hideInLegend());
                for (Passage p : d.passages()) {
                    // label only the breeze passages (onshore turns); other changes are unlabelled dashed lines
                    b.event(p.timeHours(), p.turnsOnshore() ? d.siteDay().site() : "");
                }
            }
            panels.add(b.build());
        }
        List<CaptionedFigure> out = new ArrayList<>();
        if (panels.isEmpty()) {
            return out;
        }
        for (int from = 0, part = 1; from < panels.size(); from += DAYS_PER_GRID, part++) {
            List<Figure> chunk = panels.subList(from, Math.min(panels.size(), from + DAYS_PER_GRID));
            String suffix = panels.size() > DAYS_PER_GRID ? " (part " + part + ")" : "";
            out.add(new CaptionedFigure("wind-direction-days" + (panels.size() > DAYS_PER_GRID ? "-" + part : "") + ".png",
                    FigureGrid.of("Wind direction " + ReaderText.layer(layer.label()) + " by day" + suffix, chunk, DAY_COLUMNS),
                    String.format(Locale.ROOT, "Wind direction (where the wind blows from) averaged over %s above ground against "
                            + "local time, one panel per day%s, one colour per site (%s). Dashed vertical lines: detected passages; "
                            + "those that turn the wind into the onshore sector (breeze fronts) are labelled by site. Dashed horizontal "
                            + "line: the onshore direction (from the sea, %.0f deg). Panel titles give the day's breeze type.",
                            ReaderText.layer(layer.label()), suffix, String.join(", ", sites), onshoreFrom)));
        }
        return out;
    }

    private static String breezeType(List<SiteDayResult> ds) {
        return ds.isEmpty() ? "" : ds.get(0).breezeType().name().toLowerCase(Locale.ROOT);
    }

    /** A group as a reader sees it: breeze types in lower case, as everywhere else; other groups as they are. */
    static String groupName(String g) {
        for (org.littoral.scenarios.analysis.stats.BreezeType t : org.littoral.scenarios.analysis.stats.BreezeType.values()) {
            if (t.name().equals(g)) {
                return ReaderText.breezeType(g);
            }
        }
        return g;
    }

    /** Meteorological direction of the layer-mean wind vector, NaN where the layer has too few valid levels. */
    static double[] directionSeries(List<Profile> profiles, Layer layer, Coast coast, double minValid) {
        double[] out = new double[profiles.size()];
        for (int i = 0; i < out.length; i++) {
            double e = Variable.WIND_EAST.layerMean(profiles.get(i), layer, coast, minValid);
            double n = Variable.WIND_NORTH.layerMean(profiles.get(i), layer, coast, minValid);
            out[i] = Double.isNaN(e) || Double.isNaN(n) ? Double.NaN : Coast.directionFromDeg(e, n);
        }
        return out;
    }

    /**
     * Inserts a NaN (a line break) between consecutive points whose direction differs by more than
     * 180 deg, so a wind turning through north is not drawn as a line across the whole panel.
     * Returns {x, y}.
     */
    static double[][] breakWraps(double[] t, double[] dir) {
        List<Double> xs = new ArrayList<>();
        List<Double> ys = new ArrayList<>();
        double prev = Double.NaN;
        for (int i = 0; i < dir.length; i++) {
            if (!Double.isNaN(prev) && !Double.isNaN(dir[i]) && Math.abs(dir[i] - prev) > 180) {
                xs.add(0.5 * (t[i - 1] + t[i]));
                ys.add(Double.NaN);
            }
            xs.add(t[i]);
            ys.add(dir[i]);
            if (!Double.isNaN(dir[i])) {
                prev = dir[i];
            }
        }
        return new double[][] {toArray(xs), toArray(ys)};
    }

    /** Histogram of the first onshore passage time per site. */
    static java.util.Optional<CaptionedFigure> passageTimes(AnalysisResult r) {
        Map<String, List<Double>> bySite = new LinkedHashMap<>();
        for (SiteDayResult d : r.siteDays()) {
            Passage p = d.firstOnshorePassage();
            if (p != null) {
                bySite.computeIfAbsent(d.siteDay().site(), k -> new ArrayList<>()).add(p.timeHours());
            }
        }
        int total = bySite.values().stream().mapToInt(List::size).sum();
        if (total < MIN_FOR_HISTOGRAM) {
            return java.util.Optional.empty(); // said in a sentence instead (smallSampleSentences)
        }
        HistogramFigure.Builder b = HistogramFigure.builder().size(900, 500).title("First onshore passage time by site")
                .x("local time", "h").binWidth(0.5);
        int n = 0;
        for (Map.Entry<String, List<Double>> e : bySite.entrySet()) {
            b.data(e.getKey(), toArray(e.getValue()));
            n += e.getValue().size();
        }
        return java.util.Optional.of(new CaptionedFigure("passage-times.png", b.build(), "Distribution of the first passage that "
                + "turns the wind onshore, per site (" + n + " site-days with one), in 30-min bins of local time."));
    }

    /** Box plots of the change across the first onshore passage, by breeze type, for theta, mixing ratio and theta-e. */
    static List<CaptionedFigure> responseBoxes(AnalysisResult r, AnalysisSettings s) {
        Map<String, String> typeOf = new LinkedHashMap<>();
        for (SiteDayResult d : r.siteDays()) {
            typeOf.put(d.siteDay().key(), d.breezeType().name().toLowerCase(Locale.ROOT));
        }
        Layer layer = s.metrics.layers.get(0);
        List<Figure> panels = new ArrayList<>();
        for (Variable v : List.of(Variable.THETA, Variable.MIXING_RATIO, Variable.THETA_E)) {
            Map<String, List<Double>> groups = new TreeMap<>();
            for (PassageResponse pr : r.responses()) {
                if (pr.variable() == v && pr.layer().equals(layer) && pr.passage().turnsOnshore() && pr.passage().ordinal() >= 1
                        && Double.isFinite(pr.change())) {
                    String g = typeOf.getOrDefault(pr.passage().day() + "/" + pr.passage().site(), "?");
                    groups.computeIfAbsent(g, k -> new ArrayList<>()).add(pr.change());
                }
            }
            if (groups.isEmpty()) {
                continue;
            }
            BoxPlotFigure.Builder b = BoxPlotFigure.builder().size(480, 420).title("Change of " + label(v) + ", " + ReaderText.layer(layer.label()))
                    .y("change " + label(v), v.unit()).x("breeze type").showMean(true);
            int boxes = 0;
            for (Map.Entry<String, List<Double>> e : groups.entrySet()) {
                if (e.getValue().size() >= MIN_FOR_BOX) {
                    b.group(e.getKey(), toArray(e.getValue()));
                    boxes++;
                }
            }
            if (boxes > 0) {
                panels.add(b.build());
            }
        }
        List<CaptionedFigure> out = new ArrayList<>();
        if (!panels.isEmpty()) {
            out.add(new CaptionedFigure("response-boxes.png", FigureGrid.of("Post-passage changes by breeze type", panels, 3),
                    String.format(Locale.ROOT, "Change of the %s layer mean across each onshore passage (post-window mean minus "
                            + "pre-window mean; windows in the analysis settings), grouped by the day's breeze type (the number "
                            + "of passages under each box). Boxes: quartiles; whiskers: 1.5 IQR; diamond: mean.", ReaderText.layer(layer.label()))));
        }
        return out;
    }

    /** Composite medians with inter-quartile bands around the passage, one panel per variable, one line per group. */
    static List<CaptionedFigure> composites(AnalysisResult r) {
        Map<CompositeSpec, Map<String, List<CompositeRow>>> bySpec = new LinkedHashMap<>();
        for (CompositeRow c : r.composites()) {
            bySpec.computeIfAbsent(c.spec(), k -> new LinkedHashMap<>()).computeIfAbsent(c.group(), k -> new ArrayList<>()).add(c);
        }
        List<Figure> relative = new ArrayList<>();
        List<Figure> hourly = new ArrayList<>();
        for (Map.Entry<CompositeSpec, Map<String, List<CompositeRow>>> e : bySpec.entrySet()) {
            CompositeSpec spec = e.getKey();
            boolean rel = spec.axis() == CompositeSpec.Axis.RELATIVE_TO_PASSAGE;
            LineFigure.Builder b = LineFigure.builder().size(600, 400)
                    .title(label(spec.variable()) + (spec.anomaly() ? " anomaly" : "") + ", " + ReaderText.layer(spec.layer().label()))
                    .x(rel ? "time after passage" : "local time", "h")
                    .y(label(spec.variable()) + (spec.anomaly() ? " anomaly" : ""), spec.variable().unit());
            int colour = 0;
            boolean any = false;
            for (Map.Entry<String, List<CompositeRow>> g : e.getValue().entrySet()) {
                List<CompositeRow> rows = g.getValue();
                List<Double> xs = new ArrayList<>();
                List<Double> lo = new ArrayList<>();
                List<Double> med = new ArrayList<>();
                List<Double> hi = new ArrayList<>();
                for (CompositeRow c : rows) {
                    if (c.box().n() >= 3) {
                        xs.add(c.binCentreHours());
                        lo.add(c.box().q1());
                        med.add(c.box().median());
                        hi.add(c.box().q3());
                    }
                }
                if (xs.size() < 2) {
                    continue;
                }
                any = true;
                java.awt.Color col = Palette.qualitative(colour++);
                b.band(null, toArray(xs), toArray(lo), toArray(hi), col, 0.18);
                b.series(Series.of(groupName(g.getKey()), toArray(xs), toArray(med)).color(col).marker(Marker.CIRCLE));
            }
            if (rel) {
                b.event(0, "passage");
            }
            if (any) {
                (rel ? relative : hourly).add(b.build());
            }
        }
        List<CaptionedFigure> out = new ArrayList<>();
        if (!relative.isEmpty()) {
            out.add(new CaptionedFigure("composites-relative.png", FigureGrid.of("Composites around the first onshore passage", relative, 2),
                    "Median (line) and inter-quartile range (band) over site-days of each variable's anomaly from its mean over the pre-passage "
                            + "window, against time after the first onshore passage, by breeze type; bins with fewer than 3 values are "
                            + "left out."));
        }
        if (!hourly.isEmpty()) {
            out.add(new CaptionedFigure("composites-hourly.png", FigureGrid.of("Composites by hour of day", hourly, 2),
                    "Median (line) and inter-quartile range (band) over site-days of each variable against local time, by breeze "
                            + "type; bins with fewer than 3 values are left out."));
        }
        return out;
    }

    private static String label(Variable v) {
        return switch (v) {
            case TEMPERATURE -> "T";
            case THETA -> "theta";
            case MIXING_RATIO -> "mixing ratio";
            case THETA_E -> "theta-e";
            case WIND_SPEED -> "wind speed";
            case CROSS_SHORE_WIND -> "onshore wind";
            case ALONGSHORE_WIND -> "alongshore wind";
            case WIND_EAST -> "eastward wind";
            case WIND_NORTH -> "northward wind";
        };
    }

    private static double[] toArray(List<Double> l) {
        double[] a = new double[l.size()];
        for (int i = 0; i < a.length; i++) {
            a[i] = l.get(i);
        }
        return a;
    }
}
