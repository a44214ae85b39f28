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
import org.littoral.scenarios.report.ScatterFigure;

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
        figure(out, outDir.resolve("arrival-vs-ambient.png"), scatterPanels(t, columns(t, ARRIVAL), "onshore-flow arrival, local time", "h"));
        figure(out, outDir.resolve("penetration-vs-ambient.png"), scatterPanels(t, columns(t, PENETRATION), "maximum inland penetration", "km"));
        figure(out, outDir.resolve("post-passage-by-type.png"), boxPanels(t, columns(t, POST_PASSAGE)));
        return out;
    }

    static List<String> columns(ComparisonTable t, Pattern p) {
        List<String> out = new ArrayList<>();
        for (String c : t.columns()) {
            if (p.matcher(c).matches() && hasNumbers(t.numbers(c))) {
                out.add(c);
            }
        }
        return out.size() > MAX_PANELS ? out.subList(0, MAX_PANELS) : out;
    }

    private static boolean hasNumbers(double[] v) {
        for (double x : v) {
            if (!Double.isNaN(x)) {
                return true;
            }
        }
        return false;
    }

    private static List<Figure> scatterPanels(ComparisonTable t, List<String> cols, String yTitle, String yUnit) {
        List<Figure> panels = new ArrayList<>();
        double[] speed = t.numbers("ambient_speed_m_per_s");
        List<String> type = t.texts("breeze_type");
        for (String c : cols) {
            double[] y = t.numbers(c);
            Map<String, double[][]> groups = byType(speed, y, type);
            if (groups.isEmpty()) {
                continue;
            }
            ScatterFigure.Builder b = ScatterFigure.builder().size(PANEL_W, PANEL_H).title(shortName(c))
                    .x("ambient wind speed", "m/s").y(yTitle, yUnit);
            double[] span = paddedRange(speed);
            if (span != null) {
                b.xRange(span[0], span[1]);
            }
            // every breeze type gets its own marker and colour, so coinciding types (corkscrew and backdoor in
            // the linear model) stay visible as overlapping shapes
            for (Map.Entry<String, double[][]> e : groups.entrySet()) {
                b.points(e.getKey(), e.getValue()[0], e.getValue()[1]);
            }
            panels.add(b.build());
        }
        return panels;
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
                    .y(c.replaceAll(".*\\.", ""), "").x("breeze type");
            for (Map.Entry<String, double[][]> e : groups.entrySet()) {
                b.group(e.getKey(), e.getValue()[1]);
            }
            panels.add(b.build());
        }
        return panels;
    }

    /** Drops the "diagnostics." prefix and trailing unit-less bookkeeping for panel titles. */
    static String shortName(String column) {
        String s = column.replaceFirst("^diagnostics\\.", "").replace(".time_local_h", "").replaceFirst("^sites\\.", "site ");
        s = s.replaceFirst("\\.km$", "").replaceFirst("\\.onshore_arrival$", ": onshore arrival");
        return s.replace('_', ' ').replace('.', ' ');
    }

    private static void figure(List<Path> written, Path file, List<Figure> panels) throws IOException {
        if (panels.isEmpty()) {
            return;
        }
        org.littoral.scenarios.report.FigureGrid.of("", panels, Math.min(3, panels.size())).writePng(file);
        written.add(file);
    }
}
