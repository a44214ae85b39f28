package org.littoral.scenarios.report;

import java.awt.Color;
import java.awt.Graphics2D;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;

/**
 * Histogram of one or more groups on common bins. Bins: given edges, a given width, or by default the
 * Freedman and Diaconis (1981) width 2 IQR n^(-1/3) (Z. Wahrscheinlichkeitstheorie 57, 453-476),
 * rounded to a nice number. Bins are [a, b), the last one closed. Drawn by XChart in the report's look
 * ({@link XChartStyle}): several groups as translucent step areas so they can be compared, one group as
 * outlined bars.
 *
 * <pre>
 * HistogramFigure f = HistogramFigure.builder()
 *     .title("Front arrival at 10 km").x("Arrival", "h")
 *     .data("pure", a).data("corkscrew", b)
 *     .mode(HistogramFigure.Mode.PROBABILITY)
 *     .build();
 * </pre>
 */
public final class HistogramFigure extends Figure {
    /** What the bar height means. */
    public enum Mode {
        /** Number of values in the bin. */
        COUNT,
        /** Fraction of the group's values in the bin (sums to 1). */
        PROBABILITY,
        /** Probability per unit of x (integrates to 1). */
        DENSITY
    }

    private final AxisSpec xs;
    private final List<String> names;
    private final List<double[]> data;
    private final double[] edges;
    private final Mode mode;
    private final double[][] heights;
    private final String note;

    private HistogramFigure(Builder b) {
        super(b.width, b.height, b.title);
        if (b.names.isEmpty()) {
            throw new IllegalArgumentException("histogram needs at least one data group");
        }
        xs = b.xs.copy();
        names = List.copyOf(b.names);
        data = List.copyOf(b.data);
        mode = b.mode;
        edges = b.edges != null ? b.edges : autoEdges(data, b.binWidth);
        heights = new double[data.size()][];
        for (int gi = 0; gi < data.size(); gi++) {
            heights[gi] = heights(data.get(gi), edges, mode);
        }
        note = b.note;
    }

    public static Builder builder() {
        return new Builder();
    }

    /** The bin edges used (a copy). */
    public double[] edges() {
        return edges.clone();
    }

    /** Bar heights of group {@code i} in the figure's {@link Mode} (a copy). */
    public double[] heights(int i) {
        return heights[i].clone();
    }

    static double[] autoEdges(List<double[]> groups, double width) {
        double[] all = groups.stream().flatMapToDouble(Arrays::stream).filter(Double::isFinite).sorted().toArray();
        if (all.length == 0) {
            return new double[] {0, 1};
        }
        double lo = all[0];
        double hi = all[all.length - 1];
        double h = width;
        if (!(h > 0)) {
            // Freedman and Diaconis (1981): h = 2 IQR n^(-1/3)
            double iqr = BoxStats.quantileSorted(all, 0.75) - BoxStats.quantileSorted(all, 0.25);
            h = 2 * iqr * Math.pow(all.length, -1.0 / 3.0);
            if (!(h > 0)) {
                h = hi > lo ? (hi - lo) / 10 : 1;
            }
            h = NiceTicks.niceNumber(h, true);
            while ((hi - lo) / h > 100) {
                h = NiceTicks.niceNumber(h * 2, true);
            }
        }
        double first = Math.floor(lo / h + 1e-9) * h;
        int nb = Math.max(1, (int) Math.floor((hi - first) / h + 1e-9) + 1);
        if (nb > 1000) {
            throw new IllegalArgumentException("histogram bin width " + h + " gives " + nb + " bins; use a wider bin");
        }
        double[] e = new double[nb + 1];
        for (int i = 0; i <= nb; i++) {
            e[i] = first + i * h;
        }
        return e;
    }

    static double[] heights(double[] values, double[] edges, Mode mode) {
        int nb = edges.length - 1;
        double[] c = new double[nb];
        int n = 0;
        for (double v : values) {
            if (!Double.isFinite(v) || v < edges[0] || v > edges[nb]) {
                continue;
            }
            int i = Arrays.binarySearch(edges, v);
            if (i < 0) {
                i = -i - 2;
            }
            c[Math.min(i, nb - 1)]++;
            n++;
        }
        if (mode != Mode.COUNT && n > 0) {
            for (int i = 0; i < nb; i++) {
                c[i] /= n;
                if (mode == Mode.DENSITY) {
                    c[i] /= edges[i + 1] - edges[i];
                }
            }
        }
        return c;
    }

    @Override
    protected void paint(Graphics2D g) {
        double top = 0;
        for (double[] h : heights) {
            for (double v : h) {
                top = Math.max(top, v);
            }
        }
        AxisSpec ys = new AxisSpec();
        ys.label = mode == Mode.COUNT ? "Count" : mode == Mode.PROBABILITY ? "Fraction of values" : "Probability density";
        ys.unit = mode == Mode.DENSITY && !xs.unit.isEmpty() ? "per " + xs.unit : "";
        int noteH = note == null ? 0 : g.getFontMetrics(Theme.NOTE).getHeight() + 4;
        int chartH = heightPx - noteH;
        int plotW = XChartStyle.plotWidthPx(widthPx);
        int plotH = XChartStyle.plotHeightPx(chartH, !title.isEmpty());
        NiceTicks xt = NiceTicks.within(edges[0], edges[edges.length - 1], plotW / 90 + 1);
        NiceTicks yt = NiceTicks.loose(0, top > 0 ? top : 1, plotH / 55 + 1);
        XYChart c = XChartStyle.chart(widthPx, chartH, title, xs.title(), ys.title());
        XChartStyle.axes(c, xt, plotW, yt, plotH);
        int k = 0;
        XChartStyle.generalTicks(c, new double[] {xt.graphMin(), xt.graphMax()}, k++);
        boolean single = heights.length == 1;
        List<String> labels = new ArrayList<>();
        List<double[]> occupied = new ArrayList<>();
        List<XYSeries> outlines = new ArrayList<>();
        for (int gi = 0; gi < heights.length; gi++) {
            Color col = Theme.qualitative(gi);
            double[] h = heights[gi];
            // the step outline: up from zero at the first edge, along each bin top, down to zero at the last edge;
            // XChart's step style holds each value until the next x
            int nb = h.length;
            double[] sx = new double[nb + 3];
            double[] sy = new double[nb + 3];
            sx[0] = edges[0];
            for (int i = 0; i < nb; i++) {
                sx[i + 1] = edges[i];
                sy[i + 1] = h[i];
            }
            sx[nb + 1] = edges[nb];
            sy[nb + 1] = h[nb - 1];
            sx[nb + 2] = edges[nb];
            XYSeries area = c.addSeries(XChartStyle.key(k++), sx, sy);
            area.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.StepArea);
            area.setFillColor(Theme.withAlpha(col, single ? 0.55 : 0.25));
            area.setLineColor(single ? col.darker() : col);
            area.setLineStyle(Theme.solid(single ? 1f : 2f));
            area.setMarker(XChartStyle.marker(Marker.NONE, true));
            long n = Arrays.stream(data.get(gi)).filter(Double::isFinite).count();
            String label = names.get(gi).isEmpty() && single ? "" : names.get(gi) + " (n = " + n + ")";
            area.setShowInLegend(!label.isEmpty());
            if (!label.isEmpty()) {
                area.setLabel(label);
                labels.add(label);
            }
            for (int i = 0; i < nb; i++) {
                for (double t = 0.1; t < 1; t += 0.2) {
                    for (int j = 0; j <= 8; j++) {
                        occupied.add(new double[] {(edges[i] + t * (edges[i + 1] - edges[i]) - xt.graphMin()) / (xt.graphMax() - xt.graphMin()),
                            h[i] * j / 8.0 / (yt.graphMax() - yt.graphMin())});
                    }
                }
            }
            if (single) {
                // one group: each bar outlined, as a bar chart reads
                outlines.add(barOutlines(c, XChartStyle.key(k++), h, col.darker()));
            }
        }
        if (labels.isEmpty()) {
            c.getStyler().setLegendVisible(false);
        } else {
            int[] size = XChartStyle.legendSize(labels);
            c.getStyler().setLegendPosition(XChartStyle.quietCorner(occupied, size[0], size[1], plotW, plotH));
        }
        c.paint(g, widthPx, chartH);
        if (note != null) {
            g.setFont(Theme.NOTE);
            g.setColor(new Color(0x555555));
            Draw.text(g, note, c.getScreenXFromChart(xt.graphMin()), heightPx - Theme.PAD / 2.0, 0, 1);
        }
    }

    /** The bars' edges as one NaN-separated line series (bins with values only). */
    private XYSeries barOutlines(XYChart c, String key, double[] h, Color col) {
        List<double[]> pts = new ArrayList<>();
        for (int i = 0; i < h.length; i++) {
            if (h[i] > 0) {
                pts.add(new double[] {edges[i], 0});
                pts.add(new double[] {edges[i], h[i]});
                pts.add(new double[] {edges[i + 1], h[i]});
                pts.add(new double[] {edges[i + 1], 0});
                pts.add(new double[] {Double.NaN, Double.NaN});
            }
        }
        double[] x = new double[Math.max(1, pts.size())];
        double[] y = new double[x.length];
        Arrays.fill(x, Double.NaN);
        Arrays.fill(y, Double.NaN);
        for (int i = 0; i < pts.size(); i++) {
            x[i] = pts.get(i)[0];
            y[i] = pts.get(i)[1];
        }
        XYSeries s = c.addSeries(key, x, y);
        s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Line);
        s.setLineColor(col);
        s.setLineStyle(Theme.solid(1f));
        s.setMarker(XChartStyle.marker(Marker.NONE, true));
        s.setShowInLegend(false);
        return s;
    }

    /** Builder: 900 x 600 px, counts, Freedman-Diaconis bins. */
    public static final class Builder extends FigureBuilder<Builder> {
        private final AxisSpec xs = new AxisSpec();
        private final List<String> names = new ArrayList<>();
        private final List<double[]> data = new ArrayList<>();
        private double[] edges;
        private double binWidth = Double.NaN;
        private Mode mode = Mode.COUNT;
        private String note;

        private Builder() {
        }

        public Builder x(String label, String unit) {
            xs.label = label;
            xs.unit = unit;
            return this;
        }

        public Builder data(String name, double[] values) {
            names.add(name == null ? "" : name);
            data.add(values.clone());
            return this;
        }

        /** Explicit bin edges, strictly increasing. */
        public Builder edges(double... binEdges) {
            for (int i = 1; i < binEdges.length; i++) {
                if (!(binEdges[i] > binEdges[i - 1])) {
                    throw new IllegalArgumentException("histogram edges must increase; edge " + i + " = " + binEdges[i]);
                }
            }
            if (binEdges.length < 2) {
                throw new IllegalArgumentException("histogram needs at least two edges");
            }
            edges = binEdges.clone();
            return this;
        }

        public Builder binWidth(double w) {
            if (!(w > 0)) {
                throw new IllegalArgumentException("histogram bin width must be positive, got " + w);
            }
            binWidth = w;
            return this;
        }

        public Builder mode(Mode m) {
            mode = m;
            return this;
        }

        public Builder note(String text) {
            note = text;
            return this;
        }

        public HistogramFigure build() {
            return new HistogramFigure(this);
        }
    }
}
