package org.littoral.scenarios.report;

import java.awt.Color;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.Rectangle;
import java.awt.geom.Line2D;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.List;

/**
 * Tukey box-and-whisker plot of several groups side by side: box from the lower to the upper
 * quartile ({@link BoxStats.Method}, Tukey hinges by default), median bar, whiskers to the most
 * extreme values within 1.5 IQR, outliers as open circles, optional mean as a diamond; the group
 * size n is printed under each label.
 *
 * <pre>
 * BoxPlotFigure f = BoxPlotFigure.builder()
 *     .title("Cooling in the 2 h after passage")
 *     .y("\u0394T", "K").x("Breeze type")
 *     .group("pure", dT1).group("corkscrew", dT2)
 *     .build();
 * </pre>
 */
public final class BoxPlotFigure extends Figure {
    private final AxisSpec ys;
    private final String xTitle;
    private final List<String> labels;
    private final List<BoxStats> stats;
    private final boolean showMean;
    private final String note;

    private BoxPlotFigure(Builder b) {
        super(b.width, b.height, b.title);
        if (b.labels.isEmpty()) {
            throw new IllegalArgumentException("box plot needs at least one group");
        }
        ys = b.ys.copy();
        xTitle = b.xTitle;
        labels = List.copyOf(b.labels);
        stats = new ArrayList<>();
        for (double[] v : b.values) {
            stats.add(BoxStats.of(v, b.method));
        }
        showMean = b.showMean;
        note = b.note != null ? b.note : "Box: quartiles (" + (b.method == BoxStats.Method.TUKEY_HINGES
                ? "Tukey hinges" : "Hyndman-Fan type 7") + "); whiskers: most extreme values within 1.5 IQR; "
                + "circles: outliers" + (b.showMean ? "; diamond: mean" : "") + ".";
    }

    public static Builder builder() {
        return new Builder();
    }

    /** The statistics drawn, in group order. */
    public List<BoxStats> stats() {
        return List.copyOf(stats);
    }

    @Override
    protected void paint(Graphics2D g) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (BoxStats s : stats) {
            if (s.n() > 0) {
                lo = Math.min(lo, s.min());
                hi = Math.max(hi, s.max());
            }
        }
        if (lo > hi) {
            lo = 0;
            hi = 1;
        }
        FontMetrics fm = g.getFontMetrics(Theme.TICK);
        // the note wraps to the figure's width, so it is never cut off
        FontMetrics nm = g.getFontMetrics(Theme.NOTE);
        List<String> noteLines = Draw.wrap(nm, note, widthPx - 2.0 * Theme.PAD);
        int noteH = noteLines.size() * nm.getHeight() + 4;
        AxisSpec xs = new AxisSpec();
        xs.label = xTitle;
        xs.min = 0.5;
        xs.max = labels.size() + 0.5;
        PlotFrame f = PlotFrame.layout(g, widthPx, heightPx, title, xs, new double[] {0.5, labels.size() + 0.5},
                false, ys, new double[] {lo, hi}, true, 0, fm.getHeight() + noteH);
        String[] cats = labels.toArray(new String[0]);
        String[] ns = new String[cats.length];
        for (int i = 0; i < ns.length; i++) {
            ns[i] = "n = " + stats.get(i).n();
        }
        double slot = f.plot.width / (double) cats.length;
        g.setFont(Theme.TICK);
        for (int i = 0; i < cats.length; i++) {
            cats[i] = fit(g, cats[i], slot - 6);
        }
        f.xCategories = cats;
        f.xCategoriesSecondRow = ns;
        f.drawGrid(g);
        Rectangle p = f.plot;
        double boxW = Math.min(70, slot * 0.5);
        for (int i = 0; i < stats.size(); i++) {
            BoxStats s = stats.get(i);
            if (s.n() == 0) {
                continue;
            }
            Color c = Theme.qualitative(i);
            double cx = f.x.px(i + 1);
            double yq1 = f.y.px(s.q1());
            double yq3 = f.y.px(s.q3());
            g.setStroke(Theme.solid(1.2f));
            g.setColor(new Color(0x333333));
            double yl = f.y.px(s.lowerWhisker());
            double yu = f.y.px(s.upperWhisker());
            g.draw(new Line2D.Double(cx, yq1, cx, yl));
            g.draw(new Line2D.Double(cx, yq3, cx, yu));
            g.draw(new Line2D.Double(cx - boxW / 4, yl, cx + boxW / 4, yl));
            g.draw(new Line2D.Double(cx - boxW / 4, yu, cx + boxW / 4, yu));
            Rectangle2D box = new Rectangle2D.Double(cx - boxW / 2, yq3, boxW, Math.max(yq1 - yq3, 1));
            g.setColor(Theme.withAlpha(c, 0.35));
            g.fill(box);
            g.setColor(c.darker());
            g.draw(box);
            g.setStroke(Theme.solid(2.6f));
            double ym = f.y.px(s.median());
            g.draw(new Line2D.Double(cx - boxW / 2, ym, cx + boxW / 2, ym));
            for (double o : s.outliers()) {
                Draw.marker(g, Marker.CIRCLE, cx, f.y.px(o), 7, c.darker(), false);
            }
            if (showMean) {
                Draw.marker(g, Marker.DIAMOND, cx, f.y.px(s.mean()), 8, Color.BLACK, false);
            }
        }
        f.drawAxes(g);
        g.setFont(Theme.NOTE);
        g.setColor(new Color(0x555555));
        for (int i = 0; i < noteLines.size(); i++) {
            Draw.text(g, noteLines.get(i), Theme.PAD, heightPx - Theme.PAD / 2.0 - (noteLines.size() - 1 - i) * nm.getHeight(), 0, 1);
        }
    }

    /** Shortens a label with an ellipsis until it fits the slot. */
    private static String fit(Graphics2D g, String s, double widthPx) {
        FontMetrics fm = g.getFontMetrics();
        if (fm.stringWidth(s) <= widthPx) {
            return s;
        }
        String t = s;
        while (t.length() > 1 && fm.stringWidth(t + "\u2026") > widthPx) {
            t = t.substring(0, t.length() - 1);
        }
        return t + "\u2026";
    }

    /** Builder: 900 x 600 px, Tukey hinges, means shown. */
    public static final class Builder extends FigureBuilder<Builder> {
        private final AxisSpec ys = new AxisSpec();
        private String xTitle = "";
        private final List<String> labels = new ArrayList<>();
        private final List<double[]> values = new ArrayList<>();
        private BoxStats.Method method = BoxStats.Method.TUKEY_HINGES;
        private boolean showMean = true;
        private String note;

        private Builder() {
        }

        public Builder y(String label, String unit) {
            ys.label = label;
            ys.unit = unit;
            return this;
        }

        public Builder yRange(double min, double max) {
            ys.min = min;
            ys.max = max;
            return this;
        }

        /** Title of the category axis. */
        public Builder x(String label) {
            xTitle = label;
            return this;
        }

        public Builder group(String label, double[] groupValues) {
            labels.add(label);
            values.add(groupValues.clone());
            return this;
        }

        public Builder method(BoxStats.Method m) {
            method = m;
            return this;
        }

        public Builder showMean(boolean on) {
            showMean = on;
            return this;
        }

        /** Replaces the default note that states how the boxes were computed. */
        public Builder note(String text) {
            note = text;
            return this;
        }

        public BoxPlotFigure build() {
            return new BoxPlotFigure(this);
        }
    }
}
