package org.littoral.scenarios.report;

import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.Rectangle;
import java.awt.Shape;
import java.awt.geom.Line2D;

/**
 * Lays out one plot panel (title, axes with nice ticks, room on the right for a colour bar or
 * legend) and draws its frame, ticks, tick labels and axis titles.
 */
final class PlotFrame {
    final Rectangle plot;
    final Axis x;
    final Axis y;
    final String title;
    /** When set, the x axis is categorical: label i sits at x = i + 1 (and an optional second row). */
    String[] xCategories;
    String[] xCategoriesSecondRow;

    private PlotFrame(Rectangle plot, Axis x, Axis y, String title) {
        this.plot = plot;
        this.x = x;
        this.y = y;
        this.title = title;
    }

    /**
     * @param xRange data range [min, max] used when the spec has no fixed range
     * @param rightExtraPx room reserved right of the plot (colour bar, outside legend)
     * @param bottomExtraPx room reserved below the x-axis title
     */
    static PlotFrame layout(Graphics2D g, int width, int height, String title, AxisSpec xs, double[] xRange,
            boolean xLooseDefault, AxisSpec ys, double[] yRange, boolean yLooseDefault, int rightExtraPx,
            int bottomExtraPx) {
        FontMetrics tick = g.getFontMetrics(Theme.TICK);
        FontMetrics axis = g.getFontMetrics(Theme.AXIS);
        FontMetrics head = g.getFontMetrics(Theme.TITLE);
        int top = Theme.PAD + (title.isEmpty() ? 4 : head.getHeight() + 10);
        int bottom = Theme.PAD + axis.getHeight() + 6 + tick.getHeight() + Theme.TICK_LEN + 4 + bottomExtraPx;
        int plotH = height - top - bottom;

        double[] yr = range(ys, yRange);
        boolean yLoose = ys.fixed() ? false : ys.loose != null ? ys.loose : yLooseDefault;
        NiceTicks yt = Axis.chooseTicks(yr[0], yr[1], yLoose, plotH, false, tick, ys.clock());
        double ymin = yLoose ? yt.graphMin() : yr[0];
        double ymax = yLoose ? yt.graphMax() : yr[1];
        int yLabelW = 0;
        for (int i = 0; i < yt.count(); i++) {
            yLabelW = Math.max(yLabelW, tick.stringWidth(yt.label(i)));
        }
        int left = Theme.PAD + axis.getHeight() + 8 + yLabelW + Theme.TICK_LEN + 4;
        int right = Theme.PAD + rightExtraPx;
        // the last x tick label may stick out half its width
        int plotW = width - left - right - 10;

        double[] xr = range(xs, xRange);
        boolean xLoose = xs.fixed() ? false : xs.loose != null ? xs.loose : xLooseDefault;
        NiceTicks xt = Axis.chooseTicks(xr[0], xr[1], xLoose, plotW, true, tick, xs.clock());
        double xmin = xLoose ? xt.graphMin() : xr[0];
        double xmax = xLoose ? xt.graphMax() : xr[1];

        Rectangle plot = new Rectangle(left, top, plotW, plotH);
        Axis xa = new Axis(xs.title(), xmin, xmax, left, left + plotW, xt);
        Axis ya = new Axis(ys.title(), ymin, ymax, top + plotH, top, yt);
        return new PlotFrame(plot, xa, ya, title);
    }

    private static double[] range(AxisSpec s, double[] data) {
        if (s.fixed()) {
            return new double[] {s.min, s.max};
        }
        double lo = Double.isFinite(s.min) ? s.min : data[0];
        double hi = Double.isFinite(s.max) ? s.max : data[1];
        if (!Double.isFinite(lo) || !Double.isFinite(hi)) {
            return new double[] {0, 1};
        }
        return new double[] {lo, hi};
    }

    /** Light grid lines at the ticks, drawn before the data. */
    void drawGrid(Graphics2D g) {
        g.setColor(Theme.GRID);
        g.setStroke(Theme.solid(1f));
        for (double v : xCategories != null ? new double[0] : x.ticks.values()) {
            if (x.contains(v)) {
                double p = x.px(v);
                g.draw(new Line2D.Double(p, plot.y, p, plot.y + plot.height));
            }
        }
        for (double v : y.ticks.values()) {
            if (y.contains(v)) {
                double p = y.px(v);
                g.draw(new Line2D.Double(plot.x, p, plot.x + plot.width, p));
            }
        }
    }

    Shape clip() {
        return new Rectangle(plot.x, plot.y, plot.width + 1, plot.height + 1);
    }

    /** Frame, outward ticks, tick labels, axis titles and the figure title, drawn after the data. */
    void drawAxes(Graphics2D g) {
        g.setColor(Theme.INK);
        g.setStroke(Theme.solid(1f));
        g.draw(new Rectangle(plot.x, plot.y, plot.width, plot.height));
        g.setFont(Theme.TICK);
        int bottomY = plot.y + plot.height;
        FontMetrics fm = g.getFontMetrics(Theme.TICK);
        int rows = 1;
        if (xCategories != null) {
            for (int i = 0; i < xCategories.length; i++) {
                double p = x.px(i + 1);
                g.draw(new Line2D.Double(p, bottomY, p, bottomY + Theme.TICK_LEN));
                Draw.text(g, xCategories[i], p, bottomY + Theme.TICK_LEN + 3, 0.5, 0);
                if (xCategoriesSecondRow != null) {
                    g.setColor(new java.awt.Color(0x555555));
                    g.setFont(Theme.NOTE);
                    Draw.text(g, xCategoriesSecondRow[i], p, bottomY + Theme.TICK_LEN + 3 + fm.getHeight(), 0.5, 0);
                    g.setFont(Theme.TICK);
                    g.setColor(Theme.INK);
                }
            }
            rows = xCategoriesSecondRow != null ? 2 : 1;
        } else {
            for (int i = 0; i < x.ticks.count(); i++) {
                double v = x.ticks.value(i);
                if (!x.contains(v)) {
                    continue;
                }
                double p = x.px(v);
                g.draw(new Line2D.Double(p, bottomY, p, bottomY + Theme.TICK_LEN));
                Draw.text(g, x.ticks.label(i), p, bottomY + Theme.TICK_LEN + 3, 0.5, 0);
            }
        }
        int tickW = 0;
        for (int i = 0; i < y.ticks.count(); i++) {
            double v = y.ticks.value(i);
            if (!y.contains(v)) {
                continue;
            }
            double p = y.px(v);
            g.draw(new Line2D.Double(plot.x - Theme.TICK_LEN, p, plot.x, p));
            Draw.text(g, y.ticks.label(i), plot.x - Theme.TICK_LEN - 4, p, 1, 0.5);
            tickW = Math.max(tickW, fm.stringWidth(y.ticks.label(i)));
        }
        g.setFont(Theme.AXIS);
        Draw.text(g, x.title, plot.x + plot.width / 2.0, bottomY + Theme.TICK_LEN + 3 + rows * fm.getHeight() + 6,
                0.5, 0);
        Draw.verticalText(g, y.title, plot.x - Theme.TICK_LEN - 4 - tickW - 8, plot.y + plot.height / 2.0);
        drawTitle(g);
    }

    void drawTitle(Graphics2D g) {
        if (!title.isEmpty()) {
            g.setFont(Theme.TITLE);
            g.setColor(Theme.INK);
            Draw.text(g, title, plot.x + plot.width / 2.0, Theme.PAD, 0.5, 0);
        }
    }
}
