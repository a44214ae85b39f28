package org.littoral.scenarios.report;

import java.awt.Color;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.geom.Line2D;
import java.awt.geom.Rectangle2D;
import java.util.List;

/**
 * Horizontal bars of variance-based sensitivity indices for one output: per input a filled bar for the first-order
 * index and an outlined bar for the total index, each with its confidence interval as a whisker. The axis runs
 * from 0 to 1 (estimates below 0 or above 1, which sampling error allows, are drawn at the frame and their
 * whiskers show it).
 */
public final class IndexBarFigure extends Figure {
    private final List<String> inputs;
    private final double[][] first;
    private final double[][] total;
    private final String note;

    /**
     * @param first per input {estimate, low, high}
     * @param total per input {estimate, low, high}
     * @param note one line under the plot (e.g. the rows used), or null
     */
    public IndexBarFigure(int widthPx, int heightPx, String title, List<String> inputs, double[][] first, double[][] total,
                          String note) {
        super(widthPx, heightPx, title);
        if (inputs.isEmpty() || first.length != inputs.size() || total.length != inputs.size()) {
            throw new IllegalArgumentException("one first-order and one total index per input");
        }
        this.inputs = List.copyOf(inputs);
        this.first = first;
        this.total = total;
        this.note = note;
    }

    @Override
    protected void paint(Graphics2D g) {
        g.setFont(Theme.LEGEND);
        FontMetrics fm = g.getFontMetrics();
        int labelW = 0;
        for (String s : inputs) {
            labelW = Math.max(labelW, fm.stringWidth(s));
        }
        int left = Theme.PAD + labelW + 10;
        int right = widthPx - Theme.PAD - 10;
        int top = 34 + 22; // title, legend
        int noteH = note == null ? 0 : 18;
        int bottom = heightPx - 44 - noteH;
        g.setColor(Theme.INK);
        g.setFont(Theme.TITLE);
        FontMetrics tf = g.getFontMetrics();
        String t = title;
        while (tf.stringWidth(t) > widthPx - 8 && t.length() > 4) {
            t = t.substring(0, t.length() - 2);
        }
        if (!t.equals(title)) {
            t = t.substring(0, t.length() - 1) + "\u2026";
        }
        g.drawString(t, Math.max(4, (widthPx - tf.stringWidth(t)) / 2), 22);
        // legend
        g.setFont(Theme.LEGEND);
        Color c = Theme.qualitative(0);
        int lx = left;
        g.setColor(c);
        g.fill(new Rectangle2D.Double(lx, 38, 22, 10));
        g.setColor(Theme.INK);
        g.drawString("first-order S_i", lx + 28, 48);
        lx += 28 + fm.stringWidth("first-order S_i") + 24;
        g.setColor(Theme.withAlpha(Theme.qualitative(1), 0.25));
        g.fill(new Rectangle2D.Double(lx, 38, 22, 10));
        g.setColor(Theme.qualitative(1));
        g.draw(new Rectangle2D.Double(lx, 38, 22, 10));
        g.setColor(Theme.INK);
        g.drawString("total S_Ti", lx + 28, 48);
        lx += 28 + fm.stringWidth("total S_Ti") + 24;
        g.drawString("whiskers: 95 % bootstrap interval", lx, 48);
        // grid and x axis
        g.setFont(Theme.TICK);
        FontMetrics km = g.getFontMetrics();
        for (int i = 0; i <= 5; i++) {
            double v = i / 5.0;
            int x = (int) Math.round(left + v * (right - left));
            g.setColor(Theme.GRID);
            g.drawLine(x, top, x, bottom);
            g.setColor(Theme.INK);
            g.drawLine(x, bottom, x, bottom + Theme.TICK_LEN);
            String s = String.format(java.util.Locale.ROOT, "%.1f", v);
            g.drawString(s, x - km.stringWidth(s) / 2, bottom + Theme.TICK_LEN + km.getAscent() + 2);
        }
        g.setFont(Theme.AXIS);
        String ax = "Sobol' index (fraction of the output's variance)";
        g.drawString(ax, (left + right - g.getFontMetrics().stringWidth(ax)) / 2, bottom + 38);
        g.setColor(Theme.INK);
        g.drawLine(left, top, left, bottom);
        g.drawLine(left, bottom, right, bottom);
        int n = inputs.size();
        double slot = (double) (bottom - top) / n;
        double barH = Math.min(16, slot * 0.34);
        g.setFont(Theme.LEGEND);
        for (int i = 0; i < n; i++) {
            double yc = top + (i + 0.5) * slot;
            g.setColor(Theme.INK);
            g.drawString(inputs.get(i), left - 8 - fm.stringWidth(inputs.get(i)), (int) Math.round(yc + fm.getAscent() / 2.0 - 2));
            bar(g, first[i], yc - barH - 1, barH, left, right, Theme.qualitative(0), true);
            bar(g, total[i], yc + 1, barH, left, right, Theme.qualitative(1), false);
        }
        if (note != null) {
            g.setFont(Theme.NOTE);
            g.setColor(Theme.INK);
            g.drawString(note, Theme.PAD, heightPx - 8);
        }
    }

    private static void bar(Graphics2D g, double[] e, double y, double h, int left, int right, Color col, boolean filled) {
        if (!Double.isFinite(e[0])) {
            g.setColor(Theme.NO_DATA);
            g.drawString("n/a", left + 4, (float) (y + h));
            return;
        }
        double w = right - left;
        double x1 = left + clamp(e[0]) * w;
        Rectangle2D r = new Rectangle2D.Double(left, y, Math.max(0, x1 - left), h);
        if (filled) {
            g.setColor(col);
            g.fill(r);
        } else {
            g.setColor(Theme.withAlpha(col, 0.25));
            g.fill(r);
            g.setColor(col);
            g.setStroke(Theme.solid(1.5f));
            g.draw(r);
        }
        if (Double.isFinite(e[1]) && Double.isFinite(e[2])) {
            double a = left + clamp(e[1]) * w;
            double b = left + clamp(e[2]) * w;
            double ym = y + h / 2;
            g.setColor(Theme.INK);
            g.setStroke(Theme.solid(1.2f));
            g.draw(new Line2D.Double(a, ym, b, ym));
            g.draw(new Line2D.Double(a, ym - 3, a, ym + 3));
            g.draw(new Line2D.Double(b, ym - 3, b, ym + 3));
        }
        g.setStroke(Theme.solid(1f));
    }

    private static double clamp(double v) {
        return Math.min(1, Math.max(0, v));
    }
}
