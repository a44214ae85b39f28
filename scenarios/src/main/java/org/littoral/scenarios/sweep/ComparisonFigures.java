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
import org.knowm.xchart.BitmapEncoder;
import org.knowm.xchart.BoxChart;
import org.knowm.xchart.BoxChartBuilder;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;
import org.knowm.xchart.internal.chartpart.Chart;
import org.knowm.xchart.style.markers.SeriesMarkers;
import org.knowm.xchart.XYSeries.XYSeriesRenderStyle;

/**
 * The side-by-side figures of a sweep, drawn from the comparison table: front arrival at each site against the
 * ambient wind speed, maximum inland penetration against the ambient wind speed (one series per breeze type in
 * both), and the post-passage changes at each site by breeze type (box plots). Columns are found by name in the
 * flattened member summaries, so the figures follow whatever the run pipeline reports; a figure whose columns
 * are absent is skipped and said so.
 */
public final class ComparisonFigures {
    private static final int PANEL_W = 520;
    private static final int PANEL_H = 380;
    private static final int MAX_PANELS = 6;
    private static final Pattern ARRIVAL = Pattern.compile("(?i).*arrival.*_h$");
    private static final Pattern PENETRATION = Pattern.compile("(?i).*penetration.*km$");
    private static final Pattern POST_PASSAGE = Pattern.compile("(?i).*(post_passage|change|delta).*");
    private static final List<String> TYPE_ORDER = List.of("pure", "corkscrew", "backdoor", "synoptic", "undetermined");

    private static final Map<String, org.knowm.xchart.style.markers.Marker> MARKERS = Map.of(
            "pure", SeriesMarkers.CIRCLE, "corkscrew", SeriesMarkers.SQUARE, "backdoor", SeriesMarkers.CROSS,
            "synoptic", SeriesMarkers.TRIANGLE_UP, "undetermined", SeriesMarkers.DIAMOND);

    private ComparisonFigures() {
    }

    /** Writes the figures that the table has columns for; returns their paths. */
    public static List<Path> write(ComparisonTable t, Path outDir) throws IOException {
        List<Path> out = new ArrayList<>();
        figure(out, outDir.resolve("arrival-vs-ambient.png"), scatterPanels(t, columns(t, ARRIVAL), "front arrival, local h"));
        figure(out, outDir.resolve("penetration-vs-ambient.png"), scatterPanels(t, columns(t, PENETRATION), "km"));
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

    private static List<Chart<?, ?>> scatterPanels(ComparisonTable t, List<String> cols, String yTitle) {
        List<Chart<?, ?>> panels = new ArrayList<>();
        double[] speed = t.numbers("ambient_speed_m_per_s");
        List<String> type = t.texts("breeze_type");
        for (String c : cols) {
            double[] y = t.numbers(c);
            XYChart ch = new XYChartBuilder().width(PANEL_W).height(PANEL_H).title(shortName(c))
                    .xAxisTitle("ambient wind speed, m/s").yAxisTitle(yTitle).build();
            ch.getStyler().setDefaultSeriesRenderStyle(XYSeriesRenderStyle.Scatter);
            ch.getStyler().setMarkerSize(9);
            ch.getStyler().setChartBackgroundColor(Color.WHITE);
            boolean any = false;
            for (Map.Entry<String, double[][]> e : byType(speed, y, type).entrySet()) {
                // one shape per type, so that coinciding types (corkscrew and backdoor in the linear model) stay visible
                ch.addSeries(e.getKey(), e.getValue()[0], e.getValue()[1]).setMarker(MARKERS.getOrDefault(e.getKey(), SeriesMarkers.CIRCLE));
                any = true;
            }
            if (any) {
                panels.add(ch);
            }
        }
        return panels;
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

    private static List<Chart<?, ?>> boxPanels(ComparisonTable t, List<String> cols) {
        List<Chart<?, ?>> panels = new ArrayList<>();
        List<String> type = t.texts("breeze_type");
        for (String c : cols) {
            double[] y = t.numbers(c);
            BoxChart ch = new BoxChartBuilder().width(PANEL_W).height(PANEL_H).title(shortName(c)).yAxisTitle(c.replaceAll(".*\\.", "")).build();
            ch.getStyler().setChartBackgroundColor(Color.WHITE);
            boolean any = false;
            for (Map.Entry<String, double[][]> e : byType(y, y, type).entrySet()) {
                ch.addSeries(e.getKey() + " (" + e.getValue()[1].length + ")", e.getValue()[1]);
                any = true;
            }
            if (any) {
                panels.add(ch);
            }
        }
        return panels;
    }

    /** Drops the "diagnostics." prefix and trailing unit-less bookkeeping for panel titles. */
    static String shortName(String column) {
        return column.replaceFirst("^diagnostics\\.", "").replace(".time_local_h", "");
    }

    private static void figure(List<Path> written, Path file, List<Chart<?, ?>> panels) throws IOException {
        if (panels.isEmpty()) {
            return;
        }
        int cols = Math.min(3, panels.size());
        int rows = (panels.size() + cols - 1) / cols;
        BufferedImage img = new BufferedImage(cols * PANEL_W, rows * PANEL_H, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        g.setColor(Color.WHITE);
        g.fillRect(0, 0, img.getWidth(), img.getHeight());
        for (int k = 0; k < panels.size(); k++) {
            g.drawImage(BitmapEncoder.getBufferedImage(panels.get(k)), (k % cols) * PANEL_W, (k / cols) * PANEL_H, null);
        }
        g.dispose();
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        ImageIO.write(img, "png", bytes);
        MemberStore.writeAtomically(file, bytes.toByteArray());
        written.add(file);
    }
}
