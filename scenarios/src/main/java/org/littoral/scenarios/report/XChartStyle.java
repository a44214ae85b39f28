package org.littoral.scenarios.report;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import java.util.List;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.style.Styler;
import org.knowm.xchart.style.XYStyler;

/**
 * The report's look applied to XChart (the library draws line, scatter, fan and histogram charts): the same
 * fonts, ink, grid, frame, Okabe-Ito colours and marker shapes as the project's own renderer, which still
 * draws the field sections and the box plots.
 */
final class XChartStyle {
    static final Color FRAME = new Color(0x555555);
    static final Color LEGEND_EDGE = new Color(0xbbbbbb);
    /** Series names are XChart's keys and must be unique; the legend shows the label. */
    private static final String KEY = "\u0000s";

    private XChartStyle() {
    }

    /** A new XY chart of the given size and titles in the report's look. */
    static XYChart chart(int width, int height, String title, String xTitle, String yTitle) {
        XYChart c = new XYChart(width, height);
        c.setTitle(title == null ? "" : title);
        c.setXAxisTitle(xTitle == null ? "" : xTitle);
        c.setYAxisTitle(yTitle == null ? "" : yTitle);
        XYStyler s = c.getStyler();
        s.setChartBackgroundColor(Color.WHITE);
        s.setPlotBackgroundColor(Color.WHITE);
        s.setChartFontColor(Theme.INK);
        s.setChartTitleFont(Theme.TITLE);
        s.setChartTitleVisible(title != null && !title.isEmpty());
        s.setChartTitleBoxVisible(false);
        s.setChartTitlePadding(8);
        s.setChartPadding(Theme.PAD + 6); // room for half of the last x tick label
        s.setPlotBorderVisible(true);
        s.setPlotBorderColor(FRAME);
        s.setPlotMargin(0);
        s.setPlotContentSize(1.0);
        s.setPlotGridLinesVisible(true);
        s.setPlotGridLinesColor(Theme.GRID);
        s.setPlotGridLinesStroke(new BasicStroke(1f));
        s.setPlotTicksMarksVisible(false);
        s.setAxisTitleFont(Theme.AXIS);
        s.setAxisTitlePadding(6);
        s.setAxisTickLabelsFont(Theme.TICK);
        s.setAxisTickLabelsColor(Theme.INK);
        s.setAxisTickMarksColor(Theme.INK);
        s.setAxisTickMarkLength(Theme.TICK_LEN);
        s.setAxisTickPadding(4);
        s.setAxisTicksLineVisible(false);
        s.setXAxisTitleColor(Theme.INK);
        s.setYAxisTitleColor(Theme.INK);
        s.setLegendFont(Theme.LEGEND);
        s.setLegendBackgroundColor(new Color(255, 255, 255, 235));
        s.setLegendBorderColor(LEGEND_EDGE);
        s.setLegendPadding(8);
        s.setLegendSeriesLineLength(26);
        s.setSeriesColors(Theme.QUALITATIVE);
        s.setMarkerSize(8);
        s.setErrorBarsColorSeriesColor(true);
        s.setToolTipsEnabled(false);
        s.setAntiAlias(true);
        s.setLocale(java.util.Locale.ROOT);
        return c;
    }

    /**
     * XChart puts the x ticks on the data's own x values when all of them are equally spaced (composite bins at
     * -2.75, -2.25, ... h would get exactly those ticks); a hidden first series at both ends of the x range breaks
     * the even spacing, so the ticks fall on round numbers as on every other figure.
     */
    static void generalTicks(XYChart c, double[] xRange, int keyIndex) {
        org.knowm.xchart.XYSeries hidden = c.addSeries(key(keyIndex), new double[] {xRange[0], xRange[1]},
                new double[] {Double.NaN, Double.NaN});
        hidden.setXYSeriesRenderStyle(org.knowm.xchart.XYSeries.XYSeriesRenderStyle.Scatter);
        hidden.setMarker(org.knowm.xchart.style.markers.SeriesMarkers.NONE);
        hidden.setShowInLegend(false);
    }

    /** Estimated plot width inside a chart of this width (tick labels and titles on the left, padding). */
    static int plotWidthPx(int chartWidth) {
        return Math.max(50, chartWidth - 100);
    }

    /** Estimated plot height inside a chart of this height (title above, tick labels and axis title below). */
    static int plotHeightPx(int chartHeight, boolean titled) {
        return Math.max(50, chartHeight - (titled ? 100 : 70));
    }

    /**
     * Sets both axes from the project's nice ticks. The ranges are widened by a millionth of their span (XChart
     * leaves out a tick that falls exactly on an end through round-off). XChart picks its tick step from the
     * axis span times a spacing hint over the plot length, rounded to 1, 2, 5 or 10 times a power of ten with
     * switch points 1.5, 3.5 and 7.5; a hint of exactly (tick spacing x plot length / span) therefore gives the
     * project's spacing even when the plot length estimate is off by 25 %.
     */
    static void axes(XYChart c, NiceTicks x, int plotW, NiceTicks y, int plotH) {
        XYStyler s = c.getStyler();
        double xs = x.graphMax() - x.graphMin();
        double ys = y.graphMax() - y.graphMin();
        s.setXAxisMin(x.graphMin() - 1e-6 * xs).setXAxisMax(x.graphMax() + 1e-6 * xs);
        s.setYAxisMin(y.graphMin() - 1e-6 * ys).setYAxisMax(y.graphMax() + 1e-6 * ys);
        s.setXAxisTickMarkSpacingHint(Math.max(10, (int) Math.round(x.spacing() * plotW / xs)));
        s.setYAxisTickMarkSpacingHint(Math.max(10, (int) Math.round(y.spacing() * plotH / ys)));
        // every label with the digits the spacing needs (Heckbert 1990), as on the project's own figures
        s.setXAxisDecimalPattern(decimalPattern(x.fractionDigits()));
        s.setYAxisDecimalPattern(decimalPattern(y.fractionDigits()));
        // a time of day reads HH:MM (never decimal hours)
        if (x.clock()) {
            s.setxAxisTickLabelsFormattingFunction(ClockTime::hhmm);
        }
        if (y.clock()) {
            s.setyAxisTickLabelsFormattingFunction(ClockTime::hhmm);
        }
    }

    private static String decimalPattern(int fractionDigits) {
        return fractionDigits <= 0 ? "0" : "0." + "0".repeat(fractionDigits);
    }

    /** The i-th unique series key (the legend shows the series' label instead). */
    static String key(int i) {
        return KEY + i;
    }

    /** The project's marker shapes (filled with a darker edge, or open) as XChart markers. */
    static org.knowm.xchart.style.markers.Marker marker(Marker m, boolean filled) {
        if (m == Marker.NONE) {
            return org.knowm.xchart.style.markers.SeriesMarkers.NONE;
        }
        return new org.knowm.xchart.style.markers.Marker() {
            @Override
            public void paint(Graphics2D g, double xOffset, double yOffset, int markerSize) {
                // XChart sets the series' marker colour before painting its marker
                Draw.marker(g, m, xOffset, yOffset, markerSize, g.getColor(), filled);
            }
        };
    }

    /**
     * The inside corner of the plot that covers the fewest of the given points (fractions of the plot, 0..1 from
     * the lower left), for a legend of the given size in pixels on a plot about {@code plotW x plotH}.
     */
    static Styler.LegendPosition quietCorner(List<double[]> fractions, int legendW, int legendH, int plotW, int plotH) {
        double fw = Math.min(0.9, (legendW + 12.0) / Math.max(1, plotW));
        double fh = Math.min(0.9, (legendH + 12.0) / Math.max(1, plotH));
        Styler.LegendPosition[] corners = {Styler.LegendPosition.InsideNE, Styler.LegendPosition.InsideNW,
            Styler.LegendPosition.InsideSE, Styler.LegendPosition.InsideSW};
        int best = 0;
        int bestCount = Integer.MAX_VALUE;
        for (int c = 0; c < corners.length; c++) {
            boolean east = c == 0 || c == 2;
            boolean north = c < 2;
            int count = 0;
            for (double[] p : fractions) {
                boolean inX = east ? p[0] >= 1 - fw : p[0] <= fw;
                boolean inY = north ? p[1] >= 1 - fh : p[1] <= fh;
                if (inX && inY) {
                    count++;
                }
            }
            if (count < bestCount) {
                best = c;
                bestCount = count;
            }
        }
        return corners[best];
    }

    /** Approximate legend size in pixels for these labels (font metrics of the legend font). */
    static int[] legendSize(List<String> labels) {
        FontMetrics fm = metrics();
        int w = 0;
        for (String l : labels) {
            w = Math.max(w, fm.stringWidth(l));
        }
        // XChart's rows are the taller of the text and a patch box, with the padding between them
        return new int[] {w + 26 + 3 * 8, labels.size() * (Math.max(fm.getHeight(), 20) + 8) + 2 * 8};
    }

    private static FontMetrics metrics() {
        Graphics2D g = new BufferedImage(1, 1, BufferedImage.TYPE_INT_RGB).createGraphics();
        try {
            return g.getFontMetrics(Theme.LEGEND);
        } finally {
            g.dispose();
        }
    }
}
