package org.littoral.scenarios.report;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;

/**
 * Line plot, drawn by XChart in the report's look ({@link XChartStyle}): several series (optionally with markers and error bars), shaded bands (uncertainty,
 * ensemble envelope), labelled vertical event lines, horizontal and sloped reference lines, and a
 * legend placed in the corner that hides the least data.
 *
 * <pre>
 * LineFigure f = LineFigure.builder()
 *     .title("Temperature at 2 m, Site A")
 *     .x("Local time", "h").y("Temperature", "\u00b0C")
 *     .band("Ensemble 5\u201395 %", t, lo, hi)
 *     .series(Series.of("Model", t, temp))
 *     .series(Series.of("Observed", tObs, tempObs).noLine())
 *     .event(13.25, "Front passage")
 *     .build();
 * </pre>
 */
public class LineFigure extends Figure {
    private final AxisSpec xs;
    private final AxisSpec ys;
    private final boolean xLooseDefault;
    private final List<Series> series;
    private final List<Band> bands;
    private final List<Ref> refs;
    private final String note;

    LineFigure(Builder b) {
        super(b.width, b.height, b.title);
        xs = b.xs.copy();
        ys = b.ys.copy();
        xLooseDefault = b.xLoose;
        series = new ArrayList<>(b.series);
        bands = new ArrayList<>(b.bands);
        refs = new ArrayList<>(b.refs);
        note = b.note;
        assignStyles();
    }

    public static Builder builder() {
        return new Builder();
    }

    private void assignStyles() {
        Map<String, Integer> groupColor = new LinkedHashMap<>();
        Map<String, Integer> groupCount = new LinkedHashMap<>();
        int next = 0;
        for (Series s : series) {
            String key = s.group != null ? s.group : "\u0000" + System.identityHashCode(s);
            if (!groupColor.containsKey(key)) {
                groupColor.put(key, next++);
                groupCount.put(key, 0);
            }
            int within = groupCount.merge(key, 1, Integer::sum) - 1;
            if (s.color == null) {
                s.color = Theme.qualitative(groupColor.get(key));
            }
            if (s.group != null && s.style == LineStyle.SOLID) {
                s.style = LineStyle.cycle(within);
            }
        }
        for (int i = 0; i < bands.size(); i++) {
            Band band = bands.get(i);
            if (band.color == null) {
                band.color = new Color(0x7f9fbf);
            }
        }
    }

    @Override
    protected void paint(Graphics2D g) {
        List<double[]> xsData = new ArrayList<>();
        List<double[]> ysData = new ArrayList<>();
        for (Series s : series) {
            xsData.add(s.x);
            ysData.add(s.y);
            if (s.yErr != null) {
                ysData.add(plus(s.y, s.yErr, 1));
                ysData.add(plus(s.y, s.yErr, -1));
            }
            if (s.xErr != null) {
                xsData.add(plus(s.x, s.xErr, 1));
                xsData.add(plus(s.x, s.xErr, -1));
            }
        }
        for (Band b : bands) {
            xsData.add(b.x);
            ysData.add(b.lo);
            ysData.add(b.hi);
        }
        for (Ref r : refs) {
            if (r.kind == Ref.VERTICAL) {
                xsData.add(new double[] {r.a});
            } else if (r.kind == Ref.HORIZONTAL) {
                ysData.add(new double[] {r.a});
            }
        }
        int noteH = note == null ? 0 : g.getFontMetrics(Theme.NOTE).getHeight() + 4;
        int chartH = heightPx - noteH;
        int plotW = XChartStyle.plotWidthPx(widthPx);
        int plotH = XChartStyle.plotHeightPx(chartH, !title.isEmpty());
        NiceTicks xt = ticks(xs, Draw.finiteRange(xsData.toArray(new double[0][])), xLooseDefault, plotW / 90 + 1);
        NiceTicks yt = ticks(ys, Draw.finiteRange(ysData.toArray(new double[0][])), true, plotH / 55 + 1);
        double[] xr = {xt.graphMin(), xt.graphMax()};
        double[] yr = {yt.graphMin(), yt.graphMax()};
        XYChart c = XChartStyle.chart(widthPx, chartH, title, xs.title(), ys.title());
        XChartStyle.axes(c, xt, plotW, yt, plotH);
        int k = 0;
        XChartStyle.generalTicks(c, xr, k++);
        List<String> labels = new ArrayList<>();
        List<double[]> occupied = new ArrayList<>();
        for (Band b : bands) {
            double[][] poly = bandPolygon(b);
            if (poly[0].length < 3) {
                continue;
            }
            XYSeries xy = c.addSeries(XChartStyle.key(k++), poly[0], poly[1]);
            xy.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.PolygonArea);
            xy.setFillColor(Theme.withAlpha(b.color, b.alpha));
            xy.setLineColor(Theme.withAlpha(b.color, 0));
            xy.setMarker(XChartStyle.marker(Marker.NONE, true));
            label(xy, b.name, labels);
            for (int i = 0; i < b.x.length; i++) {
                // the band's inside counts, not only its edges
                occupy(occupied, new double[] {b.x[i], b.x[i]}, fill(new double[] {b.lo[i], b.hi[i]}, 8), xr, yr);
            }
        }
        for (Ref r : refs) {
            if (r.kind == Ref.SLOPED) {
                XYSeries xy = c.addSeries(XChartStyle.key(k++), new double[] {xr[0], xr[1]},
                        new double[] {r.b + r.a * xr[0], r.b + r.a * xr[1]});
                xy.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Line);
                xy.setLineColor(r.color);
                xy.setLineStyle(Theme.solid(1.2f));
                xy.setMarker(XChartStyle.marker(Marker.NONE, true));
                label(xy, r.label, labels);
            } else {
                // a dashed two-point series rather than an XChart annotation: annotations paint over the legend
                boolean vertical = r.kind == Ref.VERTICAL;
                double[] lx = vertical ? new double[] {r.a, r.a} : xr.clone();
                double[] ly = vertical ? yr.clone() : new double[] {r.a, r.a};
                XYSeries xy = c.addSeries(XChartStyle.key(k++), lx, ly);
                xy.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Line);
                xy.setLineColor(r.color);
                xy.setLineStyle(Theme.dashed(1.3f));
                xy.setMarker(XChartStyle.marker(Marker.NONE, true));
                xy.setShowInLegend(false);
                occupy(occupied, fill(lx, 12), fill(ly, 12), xr, yr);
            }
        }
        for (Series s : series) {
            if (s.xErr != null) {
                XYSeries bars = c.addSeries(XChartStyle.key(k++), xErrorBars(s, 3.0 * (yr[1] - yr[0]) / plotH, true),
                        xErrorBars(s, 3.0 * (yr[1] - yr[0]) / plotH, false));
                bars.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Line);
                bars.setLineColor(s.color);
                bars.setLineStyle(Theme.solid(1.1f));
                bars.setMarker(XChartStyle.marker(Marker.NONE, true));
                bars.setShowInLegend(false);
            }
            XYSeries xy = s.yErr != null ? c.addSeries(XChartStyle.key(k++), s.x, s.y, zeroWhereMissing(s.yErr))
                    : c.addSeries(XChartStyle.key(k++), s.x, s.y);
            xy.setXYSeriesRenderStyle(s.line ? XYSeries.XYSeriesRenderStyle.Line : XYSeries.XYSeriesRenderStyle.Scatter);
            xy.setLineColor(s.color);
            xy.setLineStyle(s.style.stroke(s.width));
            xy.setMarker(XChartStyle.marker(s.marker, s.markerFilled));
            xy.setMarkerColor(s.color);
            label(xy, s.inLegend ? s.name : null, labels);
            occupy(occupied, s.x, s.y, xr, yr);
        }
        if (labels.isEmpty()) {
            c.getStyler().setLegendVisible(false);
        } else {
            int[] size = XChartStyle.legendSize(labels);
            c.getStyler().setLegendPosition(XChartStyle.quietCorner(occupied, size[0], size[1], plotW, plotH));
        }
        c.paint(g, widthPx, chartH);
        paintRefLabels(g, c, yr);
        if (note != null) {
            g.setFont(Theme.NOTE);
            g.setColor(new Color(0x555555));
            Draw.text(g, note, c.getScreenXFromChart(xr[0]), heightPx - Theme.PAD / 2.0, 0, 1);
        }
    }

    /** Ticks of an axis: over its fixed range, or the data range (rounded out to whole ticks when loose). */
    private static NiceTicks ticks(AxisSpec a, double[] data, boolean looseDefault, int nTicks) {
        if (a.clock()) {
            // a time of day: ticks on clock divisions, labelled HH:MM
            double lo = a.fixed() || Double.isFinite(a.min) ? a.min : data[0];
            double hi = a.fixed() || Double.isFinite(a.max) ? a.max : data[1];
            if (!Double.isFinite(lo) || !Double.isFinite(hi)) {
                lo = 0;
                hi = 24;
            }
            boolean loose = !a.fixed() && (a.loose != null ? a.loose : looseDefault);
            return NiceTicks.clock(lo, hi, nTicks, loose);
        }
        if (a.fixed()) {
            return NiceTicks.within(a.min, a.max, nTicks);
        }
        double lo = Double.isFinite(a.min) ? a.min : data[0];
        double hi = Double.isFinite(a.max) ? a.max : data[1];
        if (!Double.isFinite(lo) || !Double.isFinite(hi)) {
            lo = 0;
            hi = 1;
        }
        boolean loose = a.loose != null ? a.loose : looseDefault;
        if (loose || !(hi > lo)) {
            NiceTicks t = NiceTicks.loose(lo, hi, nTicks);
            if (Double.isFinite(a.min) || Double.isFinite(a.max)) {
                return NiceTicks.within(Double.isFinite(a.min) ? a.min : t.graphMin(), Double.isFinite(a.max) ? a.max : t.graphMax(), nTicks);
            }
            return t;
        }
        return NiceTicks.within(lo, hi, nTicks);
    }

    /** A band as one closed polygon: along the lower edge, back along the upper (points with a NaN are skipped). */
    private static double[][] bandPolygon(Band b) {
        List<double[]> pts = new ArrayList<>();
        for (int i = 0; i < b.x.length; i++) {
            if (finite(b.x[i], b.lo[i], b.hi[i])) {
                pts.add(new double[] {b.x[i], b.lo[i]});
            }
        }
        for (int i = b.x.length - 1; i >= 0; i--) {
            if (finite(b.x[i], b.lo[i], b.hi[i])) {
                pts.add(new double[] {b.x[i], b.hi[i]});
            }
        }
        double[][] out = new double[2][pts.size()];
        for (int i = 0; i < pts.size(); i++) {
            out[0][i] = pts.get(i)[0];
            out[1][i] = pts.get(i)[1];
        }
        return out;
    }

    /**
     * Horizontal error bars as one NaN-separated line series (XChart draws vertical error bars only): the bar and
     * a cap of +-{@code capY} (data units) at each end, per point.
     */
    private static double[] xErrorBars(Series s, double capY, boolean xCoordinates) {
        List<Double> out = new ArrayList<>();
        for (int i = 0; i < s.x.length; i++) {
            double e = s.xErr[i];
            if (!finite(s.x[i], s.y[i], e)) {
                continue;
            }
            double a = s.x[i] - e;
            double b = s.x[i] + e;
            double[][] segs = {{a, s.y[i], b, s.y[i]}, {a, s.y[i] - capY, a, s.y[i] + capY}, {b, s.y[i] - capY, b, s.y[i] + capY}};
            for (double[] seg : segs) {
                out.add(xCoordinates ? seg[0] : seg[1]);
                out.add(xCoordinates ? seg[2] : seg[3]);
                out.add(Double.NaN);
            }
        }
        return out.stream().mapToDouble(Double::doubleValue).toArray();
    }

    private static double[] zeroWhereMissing(double[] e) {
        double[] r = e.clone();
        for (int i = 0; i < r.length; i++) {
            if (!Double.isFinite(r[i])) {
                r[i] = 0;
            }
        }
        return r;
    }

    private static void label(XYSeries xy, String label, List<String> labels) {
        boolean shown = label != null && !label.isEmpty();
        xy.setShowInLegend(shown);
        if (shown) {
            xy.setLabel(label);
            labels.add(label);
        }
    }

    /** Points evenly spaced from a[0] to a[1] (n of them); a two-element array of the ends. */
    private static double[] fill(double[] a, int n) {
        double[] r = new double[n];
        for (int i = 0; i < n; i++) {
            r[i] = a[0] + (a[1] - a[0]) * i / (n - 1.0);
        }
        return r;
    }

    /** Collects the points as fractions of the axis ranges (for the legend corner). */
    private static void occupy(List<double[]> out, double[] x, double[] y, double[] xr, double[] yr) {
        int n = Math.max(x.length, y.length);
        for (int i = 0; i < n; i++) {
            double xi = x[Math.min(i, x.length - 1)];
            double yi = y[Math.min(i, y.length - 1)];
            if (Double.isFinite(xi) && Double.isFinite(yi)) {
                out.add(new double[] {(xi - xr[0]) / (xr[1] - xr[0]), (yi - yr[0]) / (yr[1] - yr[0])});
            }
        }
    }

    /** Labels of events and horizontal references, placed by hand so they never overlap (XChart's do). */
    private void paintRefLabels(Graphics2D g, XYChart c, double[] yr) {
        double top = c.getScreenYFromChart(yr[1]);
        double bottom = c.getScreenYFromChart(yr[0]);
        double left = c.getScreenXFromChart(c.getStyler().getXAxisMin());
        double right = c.getScreenXFromChart(c.getStyler().getXAxisMax());
        g.setFont(Theme.NOTE);
        List<Rectangle2D> placed = new ArrayList<>();
        int lineH = g.getFontMetrics().getHeight();
        for (Ref r : refs) {
            if (r.label == null || r.label.isEmpty() || r.kind == Ref.SLOPED) {
                continue;
            }
            g.setColor(r.color);
            if (r.kind == Ref.VERTICAL) {
                double px = c.getScreenXFromChart(r.a);
                boolean flip = Draw.bounds(g, r.label, px + 3, 0, 0, 0).getMaxX() > right - 2;
                double ax = flip ? 1 : 0;
                double tx = flip ? px - 3 : px + 3;
                double ty = top + 4;
                Rectangle2D b = Draw.bounds(g, r.label, tx, ty, ax, 0);
                while (intersects(b, placed) && ty < bottom - 2 * lineH) {
                    ty += lineH + 1;
                    b = Draw.bounds(g, r.label, tx, ty, ax, 0);
                }
                placed.add(b);
                Draw.haloText(g, r.label, tx, ty, ax, 0);
            } else {
                Draw.haloText(g, r.label, left + 6, c.getScreenYFromChart(r.a) - 2, 0, 1);
            }
        }
    }

    private static boolean intersects(Rectangle2D b, List<Rectangle2D> placed) {
        for (Rectangle2D r : placed) {
            if (r.intersects(b)) {
                return true;
            }
        }
        return false;
    }

    private static boolean finite(double a, double b, double c) {
        return Double.isFinite(a) && Double.isFinite(b) && Double.isFinite(c);
    }

    private static double[] plus(double[] a, double[] d, int sign) {
        double[] r = new double[a.length];
        for (int i = 0; i < a.length; i++) {
            r[i] = a[i] + sign * d[i];
        }
        return r;
    }

    static final class Band {
        final String name;
        final double[] x;
        final double[] lo;
        final double[] hi;
        Color color;
        final double alpha;

        Band(String name, double[] x, double[] lo, double[] hi, Color color, double alpha) {
            if (x.length != lo.length || x.length != hi.length) {
                throw new IllegalArgumentException("band '" + name + "' needs equal-length x, lower and upper");
            }
            this.name = name;
            this.x = x.clone();
            this.lo = lo.clone();
            this.hi = hi.clone();
            this.color = color;
            this.alpha = alpha;
        }
    }

    static final class Ref {
        static final int VERTICAL = 0;
        static final int HORIZONTAL = 1;
        static final int SLOPED = 2;
        final int kind;
        final double a;
        final double b;
        final String label;
        final Color color;

        Ref(int kind, double a, double b, String label, Color color) {
            this.kind = kind;
            this.a = a;
            this.b = b;
            this.label = label;
            this.color = color;
        }
    }

    /** Builder: 900 x 600 px, x range tight to the data, y range rounded out to nice ticks. */
    public static class Builder extends FigureBuilder<Builder> {
        final AxisSpec xs = new AxisSpec();
        final AxisSpec ys = new AxisSpec();
        boolean xLoose = false;
        final List<Series> series = new ArrayList<>();
        final List<Band> bands = new ArrayList<>();
        final List<Ref> refs = new ArrayList<>();
        String note;

        Builder() {
        }

        public Builder x(String label, String unit) {
            xs.label = label;
            xs.unit = unit;
            return this;
        }

        public Builder y(String label, String unit) {
            ys.label = label;
            ys.unit = unit;
            return this;
        }

        public Builder xRange(double min, double max) {
            xs.min = min;
            xs.max = max;
            return this;
        }

        public Builder yRange(double min, double max) {
            ys.min = min;
            ys.max = max;
            return this;
        }

        /** Round the x range out to whole nice ticks too (default: tight to the data). */
        public Builder xLoose(boolean loose) {
            xLoose = loose;
            return this;
        }

        public Builder series(Series s) {
            series.add(s);
            return this;
        }

        /** Shorthand for a plain line series. */
        public Builder line(String name, double[] x, double[] y) {
            return series(Series.of(name, x, y));
        }

        /** A shaded band between lower and upper (grey-blue, 30 % opaque unless coloured). */
        public Builder band(String name, double[] x, double[] lower, double[] upper) {
            bands.add(new Band(name, x, lower, upper, null, 0.3));
            return this;
        }

        public Builder band(String name, double[] x, double[] lower, double[] upper, Color color, double alpha) {
            bands.add(new Band(name, x, lower, upper, color, alpha));
            return this;
        }

        /** A labelled dashed vertical line (an event: front passage, sunrise). */
        public Builder event(double x, String label) {
            refs.add(new Ref(Ref.VERTICAL, x, 0, label, new Color(0x333333)));
            return this;
        }

        /** A labelled dashed horizontal reference line. */
        public Builder reference(double y, String label) {
            refs.add(new Ref(Ref.HORIZONTAL, y, 0, label, new Color(0x555555)));
            return this;
        }

        /** A straight line y = intercept + slope x across the plot, listed in the legend. */
        public Builder referenceLine(double slope, double intercept, String label) {
            refs.add(new Ref(Ref.SLOPED, slope, intercept, label, new Color(0x777777)));
            return this;
        }

        public Builder note(String text) {
            note = text;
            return this;
        }

        public LineFigure build() {
            return new LineFigure(this);
        }
    }
}
