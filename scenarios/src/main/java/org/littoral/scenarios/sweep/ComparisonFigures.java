package org.littoral.scenarios.sweep;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Pattern;
import javax.imageio.ImageIO;
import org.littoral.scenarios.report.BoxPlotFigure;
import org.littoral.scenarios.report.Figure;
import org.littoral.scenarios.report.Marker;
import org.littoral.scenarios.report.ReaderText;
import org.littoral.scenarios.report.ScatterFigure;
import org.littoral.scenarios.report.Series;
import org.littoral.scenarios.scenario.JobModel;

/**
 * The side-by-side figures of a sweep, drawn from the comparison table: front arrival at each site against the
 * ambient wind speed, maximum inland penetration against the ambient wind speed (one series per breeze type in
 * both), and the post-passage changes at each site by breeze type (box plots). Columns are found by name in the
 * flattened member summaries, so the figures follow whatever the run pipeline reports; a figure whose columns
 * are absent is skipped. Panels are drawn with the report library and laid side by side, up to three a row.
 */
public final class ComparisonFigures {
    private static final int PANEL_W = 520;
    private static final int PANEL_H = 380;
    private static final int MAX_PANELS = 6;
    private static final Pattern ARRIVAL = Pattern.compile("(?i).*arrival.*_h$");
    private static final Pattern PENETRATION = Pattern.compile("(?i).*penetration.*km$");
    private static final Pattern POST_PASSAGE = Pattern.compile("(?i).*(post_passage|change|delta).*");
    private static final List<String> TYPE_ORDER = List.of("pure", "corkscrew", "backdoor", "synoptic", "undetermined");

    private ComparisonFigures() {
    }

    /** Writes the figures that the table has columns for; returns their paths. */
    public static List<Path> write(ComparisonTable t, Path outDir) throws IOException {
        List<Path> out = new ArrayList<>();
        String times = timesLabel(t);
        List<Figure> arrival = new ArrayList<>();
        for (String c : columns(t, ARRIVAL)) {
            boolean clock = c.endsWith("time_local_h");
            arrival.add(scatterPanel(t, c, null, siteTitle(t, c), clock ? times + ", local time" : ReaderText.words(c), "h",
                    "never arrives"));
        }
        figure(out, outDir.resolve("arrival-vs-ambient.png"), arrival);
        List<Figure> pen = new ArrayList<>();
        for (String c : columns(t, PENETRATION)) {
            if (c.contains("at_least")) {
                continue;
            }
            String atLeast = c.replaceFirst("km$", "at_least_km");
            pen.add(scatterPanel(t, c, t.columns().contains(atLeast) ? atLeast : null, "Maximum inland penetration",
                    "maximum inland penetration", "km", "no front"));
        }
        figure(out, outDir.resolve("penetration-vs-ambient.png"), pen);
        figure(out, outDir.resolve("post-passage-by-type.png"), boxPanels(t, columns(t, POST_PASSAGE)));
        return out;
    }

    /**
     * What the members' times are: "front arrival" (nonlinear), the linear model's "onset of onshore flow (linear theory
     * has no front)", or both names when a sweep mixes the models.
     */
    public static String timesLabel(ComparisonTable t) {
        boolean linear = false;
        boolean fronts = false;
        for (String m : t.columns().contains("model") ? t.texts("model") : List.<String>of()) {
            if (m == null || m.isEmpty()) {
                continue;
            }
            if (JobModel.isLinear(m)) {
                linear = true;
            } else {
                fronts = true;
            }
        }
        if (linear && fronts) {
            return "front arrival or onset of onshore flow";
        }
        return linear ? "onset of onshore flow (linear: no front)" : "front arrival";
    }

    /** "shore-3km (3 km inland)" from a site's arrival column. */
    static String siteTitle(ComparisonTable t, String column) {
        String prefix = "diagnostics.sites.";
        if (!column.startsWith(prefix)) {
            return ReaderText.words(column.replaceFirst("^diagnostics\\.", ""));
        }
        int end = column.indexOf(".onshore_arrival");
        if (end < 0) {
            return ReaderText.words(column.replaceFirst("^diagnostics\\.", ""));
        }
        String site = column.substring(prefix.length(), end);
        String km = prefix + site + ".inland_km";
        if (t.columns().contains(km)) {
            double[] v = t.numbers(km);
            for (double x : v) {
                if (!Double.isNaN(x)) {
                    return String.format(java.util.Locale.ROOT, "%s (%s km inland)", site,
                            x == Math.rint(x) ? String.valueOf((long) x) : String.valueOf(x));
                }
            }
        }
        return site;
    }

    static List<String> columns(ComparisonTable t, Pattern p) {
        List<String> out = new ArrayList<>();
        for (String c : t.columns()) {
            if (p.matcher(c).matches()) {
                out.add(c);
            }
        }
        return out.size() > MAX_PANELS ? out.subList(0, MAX_PANELS) : out;
    }

    /**
     * One panel of a member value against the ambient wind speed, one marker per breeze type. Members without a value
     * are not dropped: a lower bound ({@code atLeastColumn}) is drawn as an open triangle at its value, and a member with
     * neither value as an open grey circle on the top frame (times: it never arrives) or the bottom frame (penetration:
     * no front), named in the legend.
     */
    static Figure scatterPanel(ComparisonTable t, String column, String atLeastColumn, String title, String yTitle, String yUnit,
                               String missingName) {
        double[] speed = t.numbers("ambient_speed_m_per_s");
        List<String> type = t.texts("breeze_type");
        double[] y = t.numbers(column);
        double[] atLeast = atLeastColumn == null ? new double[y.length] : t.numbers(atLeastColumn);
        if (atLeastColumn == null) {
            java.util.Arrays.fill(atLeast, Double.NaN);
        }
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < y.length; i++) {
            for (double v : new double[] {y[i], atLeast[i]}) {
                if (!Double.isNaN(v)) {
                    lo = Math.min(lo, v);
                    hi = Math.max(hi, v);
                }
            }
        }
        if (lo > hi) {
            lo = 0;
            hi = 1;
        }
        double pad = Math.max(0.05 * (hi - lo), "h".equals(yUnit) ? 0.25 : 1.0);
        boolean top = "h".equals(yUnit);
        double yMin = lo - pad;
        double yMax = hi + pad;
        double frame = top ? yMax : yMin;
        ScatterFigure.Builder b = ScatterFigure.builder().size(PANEL_W, PANEL_H).title(title)
                .x("ambient wind speed", "m/s").y(yTitle, yUnit).yRange(yMin, yMax);
        double[] span = paddedRange(speed);
        if (span != null) {
            b.xRange(span[0], span[1]);
        }
        // every breeze type gets its own marker and colour, so coinciding types (corkscrew and backdoor in
        // the linear model) stay visible as overlapping shapes
        for (Map.Entry<String, double[][]> e : byType(speed, y, type).entrySet()) {
            b.points(e.getKey(), e.getValue()[0], e.getValue()[1]);
        }
        List<double[]> bound = new ArrayList<>();
        List<double[]> missing = new ArrayList<>();
        for (int i = 0; i < y.length; i++) {
            if (Double.isNaN(speed[i]) || !Double.isNaN(y[i])) {
                continue;
            }
            if (!Double.isNaN(atLeast[i])) {
                bound.add(new double[] {speed[i], atLeast[i]});
            } else {
                missing.add(new double[] {speed[i], frame});
            }
        }
        if (!bound.isEmpty()) {
            b.series(Series.of("at least (limit of the search)", col(bound, 0), col(bound, 1)).noLine().marker(Marker.TRIANGLE)
                    .openMarkers().color(new Color(0x555555)));
        }
        if (!missing.isEmpty()) {
            b.series(Series.of(missingName + " (" + missing.size() + ", on the " + (top ? "top" : "bottom") + " frame)",
                    col(missing, 0), col(missing, 1)).noLine().marker(Marker.CIRCLE).openMarkers().color(new Color(0x777777)));
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

    /** The speeds' range widened by 10 % (at least 0.5 m/s) each side, so no point sits on the frame; null without data. */
    static double[] paddedRange(double[] v) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (double x : v) {
            if (!Double.isNaN(x)) {
                lo = Math.min(lo, x);
                hi = Math.max(hi, x);
            }
        }
        if (lo > hi) {
            return null;
        }
        double pad = Math.max(0.5, 0.1 * (hi - lo));
        return new double[] {Math.max(0, lo - pad), hi + pad};
    }

    private static Map<String, double[][]> byType(double[] x, double[] y, List<String> type) {
        Map<String, double[][]> m = new LinkedHashMap<>();
        for (String ty : TYPE_ORDER) {
            int n = 0;
            for (int i = 0; i < y.length; i++) {
                if (ty.equals(type.get(i)) && !Double.isNaN(x[i]) && !Double.isNaN(y[i])) {
                    n++;
                }
            }
            if (n == 0) {
                continue;
            }
            double[][] xy = new double[2][n];
            int k = 0;
            for (int i = 0; i < y.length; i++) {
                if (ty.equals(type.get(i)) && !Double.isNaN(x[i]) && !Double.isNaN(y[i])) {
                    xy[0][k] = x[i];
                    xy[1][k] = y[i];
                    k++;
                }
            }
            m.put(ty, xy);
        }
        return m;
    }

    private static List<Figure> boxPanels(ComparisonTable t, List<String> cols) {
        List<Figure> panels = new ArrayList<>();
        List<String> type = t.texts("breeze_type");
        for (String c : cols) {
            double[] y = t.numbers(c);
            Map<String, double[][]> groups = byType(y, y, type);
            if (groups.isEmpty()) {
                continue;
            }
            BoxPlotFigure.Builder b = BoxPlotFigure.builder().size(PANEL_W, PANEL_H).title(shortName(c))
                    .y(ReaderText.words(c.replaceAll(".*\\.", "")), ReaderText.unitOf(c)).x("breeze type");
            for (Map.Entry<String, double[][]> e : groups.entrySet()) {
                b.group(e.getKey(), e.getValue()[1]);
            }
            panels.add(b.build());
        }
        return panels;
    }

    /** A column key as a panel title, in words with its unit: never the raw key. */
    static String shortName(String column) {
        String s = column.replaceFirst("^diagnostics\\.", "").replace(".time_local_h", "").replaceFirst("^sites\\.", "");
        s = s.replaceFirst("\\.onshore_arrival$", ": arrival");
        return ReaderText.label(s);
    }

    private static void figure(List<Path> written, Path file, List<Figure> panels) throws IOException {
        if (panels.isEmpty()) {
            return;
        }
        org.littoral.scenarios.report.FigureGrid.of("", panels, Math.min(3, panels.size())).writePng(file);
        written.add(file);
    }
}
