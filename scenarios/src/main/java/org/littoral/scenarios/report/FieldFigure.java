package org.littoral.scenarios.report;

import java.awt.Color;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.Rectangle;
import java.awt.Shape;
import java.awt.geom.Line2D;
import java.awt.geom.Path2D;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * A pcolor-style section of a field on a rectilinear, possibly non-uniform grid: each value fills the
 * cell around its grid point (edges half-way between points), NaN cells are grey. A colour bar
 * with label and unit sits on the right. Optional contour lines (negative dashed, zero bold),
 * polylines (a front track), labelled vertical/horizontal marker lines (sites, passage times) and
 * arrows.
 *
 * <pre>
 * FieldFigure f = FieldFigure.builder()
 *     .title("Near-surface onshore wind")
 *     .x(distanceKm, "Distance inland", "km")
 *     .y(localTimeH, "Local time", "h")
 *     .values(u)                       // [ny][nx], NaN allowed
 *     .colorBar("Onshore wind u", "m/s")
 *     .diverging()                     // blue-white-red centred on zero
 *     .contours(-4, -2, 0, 2, 4)
 *     .verticalLine(12, "Site B")
 *     .build();
 * </pre>
 */
public final class FieldFigure extends Figure {
    private final double[] x;
    private final double[] y;
    private final double[][] v;
    private final AxisSpec xs;
    private final AxisSpec ys;
    private final String barTitle;
    private final ColorMap map;
    private final double vmin;
    private final double vmax;
    private final int colorSteps;
    private final double[] contourLevels;
    private final boolean contourLabels;
    private final List<Overlay> overlays;
    private final List<Marker_> markers;
    private final List<double[]> greyBands;
    private final List<String> greyLabels;
    private final Arrows arrows;
    private final String note;

    private FieldFigure(Builder b) {
        super(b.width, b.height, b.title);
        if (b.x == null || b.y == null || b.v == null) {
            throw new IllegalArgumentException("field figure needs x, y and values");
        }
        x = b.x;
        y = b.y;
        v = b.v;
        checkIncreasing(x, "x");
        checkIncreasing(y, "y");
        if (v.length != y.length) {
            throw new IllegalArgumentException("values has " + v.length + " rows but y has " + y.length
                    + " points: values must be [ny][nx]");
        }
        for (double[] row : v) {
            if (row.length != x.length) {
                throw new IllegalArgumentException("a values row has " + row.length + " columns but x has "
                        + x.length + " points: values must be [ny][nx]");
            }
        }
        xs = b.xs.copy();
        ys = b.ys.copy();
        barTitle = Theme.axisTitle(b.barLabel, b.barUnit);
        map = b.diverging ? ColorMap.diverging() : ColorMap.sequential();
        double[] r = colourRange(b);
        vmin = r[0];
        vmax = r[1];
        colorSteps = b.colorSteps;
        contourLevels = b.contourLevels;
        contourLabels = b.contourLabels;
        overlays = List.copyOf(b.overlays);
        markers = List.copyOf(b.markers);
        greyBands = List.copyOf(b.greyBands);
        greyLabels = new ArrayList<>(b.greyLabels);
        arrows = b.arrows;
        note = b.note;
    }

    public static Builder builder() {
        return new Builder();
    }

    /** The colour range actually used (after automatic choice), [min, max]. */
    public double[] colorRange() {
        return new double[] {vmin, vmax};
    }

    private double[] colourRange(Builder b) {
        if (Double.isFinite(b.vmin) && Double.isFinite(b.vmax)) {
            if (!(b.vmax > b.vmin)) {
                throw new IllegalArgumentException("colour range max must exceed min, got [" + b.vmin + ", "
                        + b.vmax + "]");
            }
            return new double[] {b.vmin, b.vmax};
        }
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (double[] row : v) {
            for (double a : row) {
                if (Double.isFinite(a)) {
                    lo = Math.min(lo, a);
                    hi = Math.max(hi, a);
                }
            }
        }
        if (lo > hi) {
            return new double[] {-1, 1};
        }
        if (b.diverging) {
            double m = Math.max(Math.abs(lo), Math.abs(hi));
            if (m == 0) {
                m = 1;
            }
            // symmetric about zero, each end on a nice tick
            double top = NiceTicks.roundOut(0, m, 4)[1];
            return new double[] {-top, top};
        }
        return NiceTicks.roundOut(lo, hi, 6);
    }

    private static void checkIncreasing(double[] a, String name) {
        if (a.length < 1) {
            throw new IllegalArgumentException(name + " must have at least one point");
        }
        for (int i = 0; i < a.length; i++) {
            if (!Double.isFinite(a[i]) || (i > 0 && !(a[i] > a[i - 1]))) {
                throw new IllegalArgumentException(name + " coordinates must be finite and strictly increasing; "
                        + name + "[" + i + "] = " + a[i]);
            }
        }
    }

    /** Cell edges half-way between points, extrapolated by half a spacing at the ends. */
    static double[] edges(double[] c) {
        int n = c.length;
        double[] e = new double[n + 1];
        if (n == 1) {
            e[0] = c[0] - 0.5;
            e[1] = c[0] + 0.5;
            return e;
        }
        for (int i = 1; i < n; i++) {
            e[i] = 0.5 * (c[i - 1] + c[i]);
        }
        e[0] = c[0] - 0.5 * (c[1] - c[0]);
        e[n] = c[n - 1] + 0.5 * (c[n - 1] - c[n - 2]);
        return e;
    }

    @Override
    protected void paint(Graphics2D g) {
        double[] ex = edges(x);
        double[] ey = edges(y);
        FontMetrics tfm = g.getFontMetrics(Theme.TICK);
        FontMetrics afm = g.getFontMetrics(Theme.AXIS);
        // colour bar ticks depend on the plot height; estimate with the figure height, fixed below
        NiceTicks barTicksGuess = NiceTicks.within(vmin, vmax, 8);
        int barLabelW = 0;
        for (int i = 0; i < barTicksGuess.count(); i++) {
            barLabelW = Math.max(barLabelW, tfm.stringWidth(barTicksGuess.label(i)));
        }
        int barGap = 18;
        int barW = 18;
        int rightExtra = barGap + barW + Theme.TICK_LEN + 4 + barLabelW + 10 + afm.getHeight();
        int bottomExtra = note == null ? 0 : g.getFontMetrics(Theme.NOTE).getHeight() + 4;
        PlotFrame f = PlotFrame.layout(g, widthPx, heightPx, title, xs, new double[] {ex[0], ex[ex.length - 1]},
                false, ys, new double[] {ey[0], ey[ey.length - 1]}, false, rightExtra, bottomExtra);
        Rectangle p = f.plot;

        paintCells(g, f, ex, ey);
        Shape savedClip = g.getClip();
        g.clip(f.clip());
        paintGreyBands(g, f);
        if (contourLevels != null) {
            paintContours(g, f);
        }
        List<Draw.LegendEntry> legend = new ArrayList<>();
        List<double[]> avoid = new ArrayList<>();
        for (Overlay o : overlays) {
            Path2D path = Draw.polyline(f.x, f.y, o.x, o.y);
            g.setStroke(Theme.solid(o.width + 2.5f));
            g.setColor(new Color(255, 255, 255, 190));
            g.draw(path);
            g.setStroke(o.style.stroke(o.width));
            g.setColor(o.color);
            g.draw(path);
            for (int i = 0; i < o.x.length; i++) {
                if (o.marker != Marker.NONE && Double.isFinite(o.x[i]) && Double.isFinite(o.y[i])) {
                    Draw.marker(g, o.marker, f.x.px(o.x[i]), f.y.px(o.y[i]), 8, o.color, true);
                }
            }
            Draw.collect(avoid, f.x, f.y, o.x, o.y);
            if (o.name != null && !o.name.isEmpty()) {
                legend.add(Draw.LegendEntry.line(o.name, o.color, o.style.stroke(o.width), o.marker));
            }
        }
        if (arrows != null) {
            paintArrows(g, f);
        }
        paintMarkerLines(g, f);
        g.setClip(savedClip);
        Draw.legendInside(g, legend, p, avoid);
        f.drawAxes(g);
        paintColorBar(g, p, barGap, barW);
        if (note != null) {
            g.setFont(Theme.NOTE);
            g.setColor(new Color(0x555555));
            Draw.text(g, note, p.x, heightPx - Theme.PAD / 2.0, 0, 1);
        }
    }

    /** x ranges that are not results (sponges, periodic images): greyed over the cells, labelled at the top. */
    private void paintGreyBands(Graphics2D g, PlotFrame f) {
        Rectangle p = f.plot;
        for (int b = 0; b < greyBands.size(); b++) {
            double[] r = greyBands.get(b);
            int a = (int) Math.round(Math.min(f.x.px(r[0]), f.x.px(r[1])));
            int e = (int) Math.round(Math.max(f.x.px(r[0]), f.x.px(r[1])));
            a = Math.max(a, p.x);
            e = Math.min(e, p.x + p.width);
            if (e <= a) {
                continue;
            }
            g.setColor(new Color(150, 150, 150, 205));
            g.fillRect(a, p.y, e - a, p.height);
            String label = greyLabels.get(b);
            g.setFont(Theme.NOTE);
            FontMetrics fm = g.getFontMetrics();
            if (label != null && fm.stringWidth(label) + 8 <= e - a) {
                g.setColor(new Color(0x333333));
                Draw.text(g, label, (a + e) / 2.0, p.y + 6 + fm.getAscent(), 0.5, 0);
            }
        }
    }

    private int rgbOf(double a) {
        if (!Double.isFinite(a)) {
            return Theme.NO_DATA.getRGB() & 0xffffff;
        }
        double t = (a - vmin) / (vmax - vmin);
        if (colorSteps > 0) {
            t = Math.min(colorSteps - 1, Math.max(0, Math.floor(t * colorSteps)));
            t = (t + 0.5) / colorSteps;
        }
        return map.rgb(t);
    }

    private void paintCells(Graphics2D g, PlotFrame f, double[] ex, double[] ey) {
        Rectangle p = f.plot;
        int[] col = new int[p.width];
        int[] row = new int[p.height];
        for (int c = 0; c < p.width; c++) {
            col[c] = cellOf(ex, f.x.value(p.x + c + 0.5));
        }
        for (int r = 0; r < p.height; r++) {
            row[r] = cellOf(ey, f.y.value(p.y + r + 0.5));
        }
        BufferedImage img = new BufferedImage(p.width, p.height, BufferedImage.TYPE_INT_RGB);
        int[] line = new int[p.width];
        for (int r = 0; r < p.height; r++) {
            int k = row[r];
            for (int c = 0; c < p.width; c++) {
                int i = col[c];
                line[c] = (k < 0 || i < 0) ? 0xffffff : rgbOf(v[k][i]);
            }
            img.setRGB(0, r, p.width, 1, line, 0, p.width);
        }
        g.drawImage(img, p.x, p.y, null);
    }

    private static int cellOf(double[] e, double val) {
        if (!(val >= e[0]) || !(val <= e[e.length - 1])) {
            return -1;
        }
        int i = Arrays.binarySearch(e, val);
        if (i < 0) {
            i = -i - 2;
        }
        return Math.min(Math.max(i, 0), e.length - 2);
    }

    private void paintContours(Graphics2D g, PlotFrame f) {
        double spacing = Double.POSITIVE_INFINITY;
        for (int i = 1; i < contourLevels.length; i++) {
            spacing = Math.min(spacing, Math.abs(contourLevels[i] - contourLevels[i - 1]));
        }
        int digits = Double.isFinite(spacing) && spacing > 0
                ? Math.max(0, -(int) Math.floor(Math.log10(spacing) + 1e-9)) : 1;
        List<Rectangle2D> placed = new ArrayList<>();
        g.setFont(Theme.NOTE);
        Color ink = new Color(0x202020);
        for (double level : contourLevels) {
            List<Contours.Line> lines = Contours.trace(x, y, v, level);
            float w = level == 0 ? 1.6f : 0.9f;
            g.setStroke(level < 0 ? Theme.dashed(w) : Theme.solid(w));
            g.setColor(ink);
            for (Contours.Line l : lines) {
                Path2D path = Draw.polyline(f.x, f.y, l.x, l.y);
                g.draw(path);
            }
            if (!contourLabels) {
                continue;
            }
            String text = NiceTicks.format(level, digits);
            for (Contours.Line l : lines) {
                labelContour(g, f, l, text, placed);
            }
        }
    }

    private static void labelContour(Graphics2D g, PlotFrame f, Contours.Line l, String text,
            List<Rectangle2D> placed) {
        int n = l.x.length;
        double[] px = new double[n];
        double[] py = new double[n];
        double total = 0;
        for (int i = 0; i < n; i++) {
            px[i] = f.x.px(l.x[i]);
            py[i] = f.y.px(l.y[i]);
            if (i > 0) {
                total += Math.hypot(px[i] - px[i - 1], py[i] - py[i - 1]);
            }
        }
        if (total < 140) {
            return;
        }
        double target = total / 2;
        double run = 0;
        for (int i = 1; i < n; i++) {
            double d = Math.hypot(px[i] - px[i - 1], py[i] - py[i - 1]);
            if (run + d >= target) {
                double t = d == 0 ? 0 : (target - run) / d;
                double cx = px[i - 1] + t * (px[i] - px[i - 1]);
                double cy = py[i - 1] + t * (py[i] - py[i - 1]);
                Rectangle2D b = Draw.bounds(g, text, cx, cy, 0.5, 0.5);
                Rectangle2D grown = new Rectangle2D.Double(b.getX() - 6, b.getY() - 6, b.getWidth() + 12,
                        b.getHeight() + 12);
                for (Rectangle2D r : placed) {
                    if (r.intersects(grown)) {
                        return;
                    }
                }
                if (!f.plot.contains(b)) {
                    return;
                }
                placed.add(grown);
                g.setColor(new Color(0x202020));
                Draw.haloText(g, text, cx, cy, 0.5, 0.5);
                return;
            }
            run += d;
        }
    }

    private void paintMarkerLines(Graphics2D g, PlotFrame f) {
        Rectangle p = f.plot;
        g.setFont(Theme.NOTE);
        List<Rectangle2D> placed = new ArrayList<>();
        for (Marker_ m : markers) {
            g.setColor(m.color);
            g.setStroke(Theme.dashed(1.3f));
            if (m.vertical) {
                double px = f.x.px(m.at);
                g.draw(new Line2D.Double(px, p.y, px, p.y + p.height));
            } else {
                double py = f.y.px(m.at);
                g.draw(new Line2D.Double(p.x, py, p.x + p.width, py));
            }
        }
        FontMetrics fm = g.getFontMetrics();
        for (Marker_ m : markers) {
            if (m.label == null || m.label.isEmpty()) {
                continue;
            }
            g.setColor(m.color);
            if (m.vertical) {
                double px = f.x.px(m.at);
                double ty = p.y + 4;
                Rectangle2D b = Draw.bounds(g, m.label, px + 3, ty, 0, 0);
                boolean flip = b.getMaxX() > p.x + p.width - 2;
                if (flip) {
                    b = Draw.bounds(g, m.label, px - 3, ty, 1, 0);
                }
                while (overlaps(b, placed) && ty < p.y + p.height - 2 * fm.getHeight()) {
                    ty += fm.getHeight() + 1;
                    b = Draw.bounds(g, m.label, flip ? px - 3 : px + 3, ty, flip ? 1 : 0, 0);
                }
                placed.add(b);
                Draw.haloText(g, m.label, flip ? px - 3 : px + 3, ty, flip ? 1 : 0, 0);
            } else {
                double py = f.y.px(m.at);
                Rectangle2D b = Draw.bounds(g, m.label, p.x + p.width - 4, py - 2, 1, 1);
                placed.add(b);
                Draw.haloText(g, m.label, p.x + p.width - 4, py - 2, 1, 1);
            }
        }
    }

    private static boolean overlaps(Rectangle2D b, List<Rectangle2D> placed) {
        for (Rectangle2D r : placed) {
            if (r.intersects(b)) {
                return true;
            }
        }
        return false;
    }

    private void paintArrows(Graphics2D g, PlotFrame f) {
        Arrows a = arrows;
        g.setColor(new Color(0x111111));
        g.setStroke(Theme.solid(1.1f));
        for (int i = 0; i < a.x.length; i++) {
            if (!Double.isFinite(a.u[i]) || !Double.isFinite(a.w[i])) {
                continue;
            }
            double x0 = f.x.px(a.x[i]);
            double y0 = f.y.px(a.y[i]);
            arrow(g, x0, y0, a.u[i] / a.reference * a.referencePx, -a.w[i] / a.reference * a.referencePx);
        }
        // reference arrow key, bottom right inside the plot
        g.setFont(Theme.NOTE);
        Rectangle p = f.plot;
        String key = a.referenceLabel;
        FontMetrics fm = g.getFontMetrics();
        double kw = a.referencePx + 8 + fm.stringWidth(key);
        double kx = p.x + p.width - kw - 10;
        double ky = p.y + p.height - 12;
        g.setColor(new Color(255, 255, 255, 215));
        g.fill(new Rectangle2D.Double(kx - 5, ky - fm.getHeight() / 2.0 - 3, kw + 10, fm.getHeight() + 6));
        g.setColor(new Color(0x111111));
        arrow(g, kx, ky, a.referencePx, 0);
        Draw.text(g, key, kx + a.referencePx + 8, ky, 0, 0.5);
    }

    private static void arrow(Graphics2D g, double x0, double y0, double dx, double dy) {
        double len = Math.hypot(dx, dy);
        if (len < 0.5) {
            return;
        }
        g.draw(new Line2D.Double(x0, y0, x0 + dx, y0 + dy));
        double head = Math.min(6, 0.4 * len);
        double ux = dx / len;
        double uy = dy / len;
        Path2D h = new Path2D.Double();
        h.moveTo(x0 + dx, y0 + dy);
        h.lineTo(x0 + dx - head * ux - 0.5 * head * uy, y0 + dy - head * uy + 0.5 * head * ux);
        h.lineTo(x0 + dx - head * ux + 0.5 * head * uy, y0 + dy - head * uy - 0.5 * head * ux);
        h.closePath();
        g.fill(h);
    }

    private void paintColorBar(Graphics2D g, Rectangle p, int gap, int barW) {
        int bx = p.x + p.width + gap;
        int by = p.y;
        int bh = p.height;
        for (int r = 0; r < bh; r++) {
            double val = vmax - (r + 0.5) / bh * (vmax - vmin);
            g.setColor(new Color(rgbOf(val)));
            g.fillRect(bx, by + r, barW, 1);
        }
        g.setColor(Theme.INK);
        g.setStroke(Theme.solid(1f));
        g.drawRect(bx, by, barW, bh);
        FontMetrics fm = g.getFontMetrics(Theme.TICK);
        NiceTicks t = Axis.chooseTicks(vmin, vmax, false, bh, false, fm);
        g.setFont(Theme.TICK);
        int labelW = 0;
        for (int i = 0; i < t.count(); i++) {
            double py = by + (vmax - t.value(i)) / (vmax - vmin) * bh;
            g.draw(new Line2D.Double(bx + barW, py, bx + barW + Theme.TICK_LEN, py));
            Draw.text(g, t.label(i), bx + barW + Theme.TICK_LEN + 4, py, 0, 0.5);
            labelW = Math.max(labelW, fm.stringWidth(t.label(i)));
        }
        g.setFont(Theme.AXIS);
        FontMetrics afm = g.getFontMetrics();
        double tx = bx + barW + Theme.TICK_LEN + 4 + labelW + 8 + afm.getAscent();
        Draw.verticalText(g, barTitle, tx, by + bh / 2.0);
    }

    private static final class Overlay {
        final String name;
        final double[] x;
        final double[] y;
        final Color color;
        final LineStyle style;
        final float width;
        final Marker marker;

        Overlay(String name, double[] x, double[] y, Color color, LineStyle style, float width, Marker marker) {
            this.name = name;
            this.x = x;
            this.y = y;
            this.color = color;
            this.style = style;
            this.width = width;
            this.marker = marker;
        }
    }

    private static final class Marker_ {
        final boolean vertical;
        final double at;
        final String label;
        final Color color;

        Marker_(boolean vertical, double at, String label, Color color) {
            this.vertical = vertical;
            this.at = at;
            this.label = label;
            this.color = color;
        }
    }

    private static final class Arrows {
        final double[] x;
        final double[] y;
        final double[] u;
        final double[] w;
        final double reference;
        final String referenceLabel;
        final double referencePx;

        Arrows(double[] x, double[] y, double[] u, double[] w, double reference, String referenceLabel,
                double referencePx) {
            this.x = x;
            this.y = y;
            this.u = u;
            this.w = w;
            this.reference = reference;
            this.referenceLabel = referenceLabel;
            this.referencePx = referencePx;
        }
    }

    /** Builder with sensible defaults: 900 x 600 px, sequential colours, no contours. */
    public static final class Builder extends FigureBuilder<Builder> {
        private double[] x;
        private double[] y;
        private double[][] v;
        private final AxisSpec xs = new AxisSpec();
        private final AxisSpec ys = new AxisSpec();
        private String barLabel = "";
        private String barUnit = "";
        private boolean diverging;
        private double vmin = Double.NaN;
        private double vmax = Double.NaN;
        private int colorSteps;
        private double[] contourLevels;
        private boolean contourLabels = true;
        private final List<Overlay> overlays = new ArrayList<>();
        private final List<Marker_> markers = new ArrayList<>();
        private final List<double[]> greyBands = new ArrayList<>();
        private final List<String> greyLabels = new ArrayList<>();
        private Arrows arrows;
        private String note;

        private Builder() {
        }

        /** Grid-point x coordinates (strictly increasing, may be uneven), axis label and unit. */
        public Builder x(double[] coords, String label, String unit) {
            x = coords.clone();
            xs.label = label;
            xs.unit = unit;
            return this;
        }

        /** Grid-point y coordinates (strictly increasing, may be uneven), axis label and unit. */
        public Builder y(double[] coords, String label, String unit) {
            y = coords.clone();
            ys.label = label;
            ys.unit = unit;
            return this;
        }

        /** Shown x range (default: the cell edges). */
        public Builder xRange(double min, double max) {
            xs.min = min;
            xs.max = max;
            return this;
        }

        /** Shown y range (default: the cell edges), e.g. (0, 2000) for heights from the ground. */
        public Builder yRange(double min, double max) {
            ys.min = min;
            ys.max = max;
            return this;
        }

        /** Values [ny][nx]; NaN means no data (grey). */
        public Builder values(double[][] values) {
            v = new double[values.length][];
            for (int k = 0; k < values.length; k++) {
                v[k] = values[k].clone();
            }
            return this;
        }

        /** Values flattened as {@code a[k * nx + i]} (the {@code Snapshot} layout). */
        public Builder valuesFlat(double[] a, int nx, int ny) {
            if (a.length != nx * ny) {
                throw new IllegalArgumentException("flat values have " + a.length + " entries, expected nx*ny = "
                        + nx * ny);
            }
            v = new double[ny][nx];
            for (int k = 0; k < ny; k++) {
                System.arraycopy(a, k * nx, v[k], 0, nx);
            }
            return this;
        }

        public Builder colorBar(String label, String unit) {
            barLabel = label;
            barUnit = unit;
            return this;
        }

        /** Blue-white-red centred on zero (range symmetric unless {@link #colorRange} is given). */
        public Builder diverging() {
            diverging = true;
            return this;
        }

        /** Dark-to-light sequential colours for scalars (the default). */
        public Builder sequential() {
            diverging = false;
            return this;
        }

        public Builder colorRange(double min, double max) {
            vmin = min;
            vmax = max;
            return this;
        }

        /** Quantise colours into this many bands (0: continuous, the default). */
        public Builder colorSteps(int n) {
            if (n < 0 || n > 64) {
                throw new IllegalArgumentException("colour steps must be 0..64, got " + n);
            }
            colorSteps = n;
            return this;
        }

        /** Contour lines at these levels; negative levels dashed, zero bold. */
        public Builder contours(double... levels) {
            contourLevels = levels.clone();
            Arrays.sort(contourLevels);
            return this;
        }

        /** Contour lines at nice levels about {@code approxCount} apart within the data range. */
        public Builder contoursAuto(int approxCount) {
            double[] r = Draw.finiteRange(flatten());
            if (!(r[1] > r[0])) {
                return this;
            }
            contourLevels = NiceTicks.within(r[0], r[1], approxCount + 2).values();
            return this;
        }

        private double[] flatten() {
            if (v == null) {
                throw new IllegalStateException("set values before contoursAuto");
            }
            int n = 0;
            for (double[] row : v) {
                n += row.length;
            }
            double[] a = new double[n];
            int j = 0;
            for (double[] row : v) {
                System.arraycopy(row, 0, a, j, row.length);
                j += row.length;
            }
            return a;
        }

        public Builder contourLabels(boolean on) {
            contourLabels = on;
            return this;
        }

        /** A polyline overlay (e.g. the front track), black solid 2 px with a white halo. */
        public Builder polyline(String name, double[] px, double[] py) {
            return polyline(name, px, py, Color.BLACK, LineStyle.SOLID, Marker.NONE);
        }

        public Builder polyline(String name, double[] px, double[] py, Color color, LineStyle style, Marker marker) {
            if (px.length != py.length) {
                throw new IllegalArgumentException("polyline '" + name + "' has " + px.length + " x but "
                        + py.length + " y values");
            }
            overlays.add(new Overlay(name, px.clone(), py.clone(), color, style, 2f, marker));
            return this;
        }

        /**
         * Greys out the x range [from, to] (e.g. a far-field sponge or a periodic image of the coast: not results), with
         * a label at the top where it fits.
         */
        public Builder greyOutX(double from, double to, String label) {
            if (!(to > from)) {
                throw new IllegalArgumentException("grey band needs to > from; got " + from + " .. " + to);
            }
            greyBands.add(new double[] {from, to});
            greyLabels.add(label);
            return this;
        }

        /** A labelled dashed vertical line at x (e.g. a site position). */
        public Builder verticalLine(double at, String label) {
            markers.add(new Marker_(true, at, label, new Color(0x222222)));
            return this;
        }

        /** A labelled dashed horizontal line at y (e.g. a passage time, a layer top). */
        public Builder horizontalLine(double at, String label) {
            markers.add(new Marker_(false, at, label, new Color(0x222222)));
            return this;
        }

        /**
         * Arrows at (x, y) with components (u right, w up) in any one unit; an arrow of magnitude
         * {@code reference} is 30 px long and shown in a key labelled {@code referenceLabel}.
         */
        public Builder arrows(double[] ax, double[] ay, double[] u, double[] w, double reference,
                String referenceLabel) {
            int n = ax.length;
            if (ay.length != n || u.length != n || w.length != n) {
                throw new IllegalArgumentException("arrows need equal-length x, y, u, w arrays");
            }
            if (!(reference > 0)) {
                throw new IllegalArgumentException("arrow reference magnitude must be positive, got " + reference);
            }
            arrows = new Arrows(ax.clone(), ay.clone(), u.clone(), w.clone(), reference, referenceLabel, 30);
            return this;
        }

        /** A one-line note under the figure (e.g. "Idealised model output; invented coast"). */
        public Builder note(String text) {
            note = text;
            return this;
        }

        public FieldFigure build() {
            return new FieldFigure(this);
        }
    }
}
