package org.littoral.scenarios.report;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.Rectangle;
import java.awt.Shape;
import java.awt.geom.Line2D;
import java.awt.geom.Path2D;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Line plot: several series (optionally with markers and error bars), shaded bands (uncertainty,
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
        double[] xr = Draw.finiteRange(xsData.toArray(new double[0][]));
        double[] yr = Draw.finiteRange(ysData.toArray(new double[0][]));
        int bottomExtra = note == null ? 0 : g.getFontMetrics(Theme.NOTE).getHeight() + 4;
        PlotFrame f = PlotFrame.layout(g, widthPx, heightPx, title, xs, xr, xLooseDefault, ys, yr, true, 0,
                bottomExtra);
        Rectangle p = f.plot;
        f.drawGrid(g);
        Shape saved = g.getClip();
        g.clip(f.clip());
        List<Draw.LegendEntry> legend = new ArrayList<>();
        List<double[]> avoid = new ArrayList<>();
        for (Band b : bands) {
            Path2D area = new Path2D.Double();
            boolean started = false;
            int n = b.x.length;
            // closed polygon: along lo, back along hi; NaNs are skipped (bands should be gap-free)
            for (int i = 0; i < n; i++) {
                if (finite(b.x[i], b.lo[i], b.hi[i])) {
                    if (!started) {
                        area.moveTo(f.x.px(b.x[i]), f.y.px(b.lo[i]));
                        started = true;
                    } else {
                        area.lineTo(f.x.px(b.x[i]), f.y.px(b.lo[i]));
                    }
                }
            }
            for (int i = n - 1; i >= 0; i--) {
                if (finite(b.x[i], b.lo[i], b.hi[i])) {
                    area.lineTo(f.x.px(b.x[i]), f.y.px(b.hi[i]));
                }
            }
            if (started) {
                area.closePath();
                g.setColor(Theme.withAlpha(b.color, b.alpha));
                g.fill(area);
            }
            Draw.collect(avoid, f.x, f.y, b.x, b.lo);
            Draw.collect(avoid, f.x, f.y, b.x, b.hi);
            if (b.name != null && !b.name.isEmpty()) {
                legend.add(Draw.LegendEntry.patch(b.name, Theme.withAlpha(b.color, b.alpha), null));
            }
        }
        for (Ref r : refs) {
            g.setColor(r.color);
            g.setStroke(r.kind == Ref.SLOPED ? Theme.solid(1.2f) : Theme.dashed(1.3f));
            if (r.kind == Ref.VERTICAL) {
                double px = f.x.px(r.a);
                g.draw(new Line2D.Double(px, p.y, px, p.y + p.height));
            } else if (r.kind == Ref.HORIZONTAL) {
                double py = f.y.px(r.a);
                g.draw(new Line2D.Double(p.x, py, p.x + p.width, py));
            } else {
                double x0 = f.x.min;
                double x1 = f.x.max;
                g.draw(new Line2D.Double(f.x.px(x0), f.y.px(r.b + r.a * x0), f.x.px(x1), f.y.px(r.b + r.a * x1)));
                if (r.label != null && !r.label.isEmpty()) {
                    legend.add(Draw.LegendEntry.line(r.label, r.color, Theme.solid(1.2f), Marker.NONE));
                }
            }
        }
        for (Series s : series) {
            g.setColor(s.color);
            g.setStroke(Theme.solid(1.1f));
            for (int i = 0; i < s.x.length; i++) {
                if (!finite(s.x[i], s.y[i], 0)) {
                    continue;
                }
                double px = f.x.px(s.x[i]);
                double py = f.y.px(s.y[i]);
                if (s.yErr != null && Double.isFinite(s.yErr[i])) {
                    double a = f.y.px(s.y[i] - s.yErr[i]);
                    double b = f.y.px(s.y[i] + s.yErr[i]);
                    g.draw(new Line2D.Double(px, a, px, b));
                    g.draw(new Line2D.Double(px - 3, a, px + 3, a));
                    g.draw(new Line2D.Double(px - 3, b, px + 3, b));
                }
                if (s.xErr != null && Double.isFinite(s.xErr[i])) {
                    double a = f.x.px(s.x[i] - s.xErr[i]);
                    double b = f.x.px(s.x[i] + s.xErr[i]);
                    g.draw(new Line2D.Double(a, py, b, py));
                    g.draw(new Line2D.Double(a, py - 3, a, py + 3));
                    g.draw(new Line2D.Double(b, py - 3, b, py + 3));
                }
            }
            if (s.line) {
                g.setStroke(s.style.stroke(s.width));
                g.draw(Draw.polyline(f.x, f.y, s.x, s.y));
            }
            if (s.marker != Marker.NONE) {
                for (int i = 0; i < s.x.length; i++) {
                    if (finite(s.x[i], s.y[i], 0)) {
                        Draw.marker(g, s.marker, f.x.px(s.x[i]), f.y.px(s.y[i]), 8, s.color, s.markerFilled);
                    }
                }
            }
            Draw.collect(avoid, f.x, f.y, s.x, s.y);
            if (s.inLegend && !s.name.isEmpty()) {
                legend.add(new Draw.LegendEntry(s.name, s.color, s.line ? s.style.stroke(s.width) : null, s.marker,
                        null, s.markerFilled));
            }
        }
        paintRefLabels(g, f);
        g.setClip(saved);
        Draw.legendInside(g, legend, p, avoid);
        f.drawAxes(g);
        if (note != null) {
            g.setFont(Theme.NOTE);
            g.setColor(new Color(0x555555));
            Draw.text(g, note, p.x, heightPx - Theme.PAD / 2.0, 0, 1);
        }
    }

    private void paintRefLabels(Graphics2D g, PlotFrame f) {
        Rectangle p = f.plot;
        g.setFont(Theme.NOTE);
        List<Rectangle2D> placed = new ArrayList<>();
        int lineH = g.getFontMetrics().getHeight();
        for (Ref r : refs) {
            if (r.label == null || r.label.isEmpty() || r.kind == Ref.SLOPED) {
                continue;
            }
            g.setColor(r.color);
            if (r.kind == Ref.VERTICAL) {
                double px = f.x.px(r.a);
                boolean flip = Draw.bounds(g, r.label, px + 3, 0, 0, 0).getMaxX() > p.x + p.width - 2;
                double ax = flip ? 1 : 0;
                double tx = flip ? px - 3 : px + 3;
                double ty = p.y + 4;
                Rectangle2D b = Draw.bounds(g, r.label, tx, ty, ax, 0);
                while (intersects(b, placed) && ty < p.y + p.height - 2 * lineH) {
                    ty += lineH + 1;
                    b = Draw.bounds(g, r.label, tx, ty, ax, 0);
                }
                placed.add(b);
                Draw.haloText(g, r.label, tx, ty, ax, 0);
            } else {
                double py = f.y.px(r.a);
                Draw.haloText(g, r.label, p.x + 6, py - 2, 0, 1);
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
    public static class Builder {
        int width = 900;
        int height = 600;
        String title = "";
        final AxisSpec xs = new AxisSpec();
        final AxisSpec ys = new AxisSpec();
        boolean xLoose = false;
        final List<Series> series = new ArrayList<>();
        final List<Band> bands = new ArrayList<>();
        final List<Ref> refs = new ArrayList<>();
        String note;

        Builder() {
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
