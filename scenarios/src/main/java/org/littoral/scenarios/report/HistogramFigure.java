package org.littoral.scenarios.report;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.Rectangle;
import java.awt.geom.Path2D;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Histogram of one or more groups on common bins. Bins: given edges, a given width, or by default the
 * Freedman and Diaconis (1981) width 2 IQR n^(-1/3) (Z. Wahrscheinlichkeitstheorie 57, 453-476),
 * rounded to a nice number. Bins are [a, b), the last one closed. Several groups are drawn as
 * translucent steps so they can be compared.
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
        int bottomExtra = note == null ? 0 : g.getFontMetrics(Theme.NOTE).getHeight() + 4;
        PlotFrame f = PlotFrame.layout(g, widthPx, heightPx, title, xs, new double[] {edges[0], edges[edges.length - 1]},
                false, ys, new double[] {0, top > 0 ? top : 1}, true, 0, bottomExtra);
        Rectangle p = f.plot;
        f.drawGrid(g);
        List<Draw.LegendEntry> legend = new ArrayList<>();
        List<double[]> avoid = new ArrayList<>();
        boolean single = heights.length == 1;
        List<Path2D> steps = new ArrayList<>();
        for (int gi = 0; gi < heights.length; gi++) {
            Color c = Theme.qualitative(gi);
            double[] h = heights[gi];
            Path2D step = new Path2D.Double();
            step.moveTo(f.x.px(edges[0]), f.y.px(0));
            for (int i = 0; i < h.length; i++) {
                double x0 = f.x.px(edges[i]);
                double x1 = f.x.px(edges[i + 1]);
                double y = f.y.px(h[i]);
                step.lineTo(x0, y);
                step.lineTo(x1, y);
                for (double t = 0.1; t < 1; t += 0.2) {
                    for (double yy = y; yy <= f.y.px(0); yy += 12) {
                        avoid.add(new double[] {x0 + t * (x1 - x0), yy});
                    }
                }
            }
            step.lineTo(f.x.px(edges[edges.length - 1]), f.y.px(0));
            steps.add(step);
            g.setColor(Theme.withAlpha(c, single ? 0.55 : 0.25));
            g.fill(step);
            long n = Arrays.stream(data.get(gi)).filter(Double::isFinite).count();
            legend.add(Draw.LegendEntry.patch(names.get(gi) + " (n = " + n + ")",
                    Theme.withAlpha(c, single ? 0.55 : 0.25), c));
        }
        // outlines after all fills, so no group hides another's edge
        for (int gi = 0; gi < heights.length; gi++) {
            Color c = Theme.qualitative(gi);
            double[] h = heights[gi];
            if (single) {
                g.setColor(c.darker());
                g.setStroke(Theme.solid(1f));
                for (int i = 0; i < h.length; i++) {
                    if (h[i] > 0) {
                        double x0 = f.x.px(edges[i]);
                        double x1 = f.x.px(edges[i + 1]);
                        g.draw(new Rectangle2D.Double(x0, f.y.px(h[i]), x1 - x0, f.y.px(0) - f.y.px(h[i])));
                    }
                }
            } else {
                g.setColor(c);
                g.setStroke(Theme.solid(2f));
                g.draw(steps.get(gi));
            }
        }
        if (!(single && names.get(0).isEmpty())) {
            Draw.legendInside(g, legend, p, avoid);
        }
        f.drawAxes(g);
        if (note != null) {
            g.setFont(Theme.NOTE);
            g.setColor(new Color(0x555555));
            Draw.text(g, note, p.x, heightPx - Theme.PAD / 2.0, 0, 1);
        }
    }

    /** Builder: 900 x 600 px, counts, Freedman-Diaconis bins. */
    public static final class Builder {
        private int width = 900;
        private int height = 600;
        private String title = "";
        private final AxisSpec xs = new AxisSpec();
        private final List<String> names = new ArrayList<>();
        private final List<double[]> data = new ArrayList<>();
        private double[] edges;
        private double binWidth = Double.NaN;
        private Mode mode = Mode.COUNT;
        private String note;

        private Builder() {
        }

        public Builder size(int widthPx, int heightPx) {
            width = widthPx;
            height = heightPx;
            return this;
        }

        public Builder title(String t) {
            title = t;
            return this;
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
