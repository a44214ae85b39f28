package org.littoral.scenarios.report;

import java.awt.Color;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.Rectangle;
import java.awt.Shape;
import java.awt.Stroke;
import java.awt.geom.AffineTransform;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Line2D;
import java.awt.geom.Path2D;
import java.awt.geom.Rectangle2D;
import java.util.List;

/** Small drawing helpers: aligned and rotated text, markers, legends. */
final class Draw {
    private Draw() {
    }

    /**
     * Draws text anchored at (x, y): {@code ax} is the fraction of the width left of the anchor (0 left
     * aligned, 0.5 centred, 1 right aligned), {@code ay} the fraction of the line height above it
     * (0: top at y, 0.5: centred, 1: bottom at y). Returns the bounds.
     */
    static Rectangle2D text(Graphics2D g, String s, double x, double y, double ax, double ay) {
        FontMetrics fm = g.getFontMetrics();
        double w = fm.stringWidth(s);
        double h = fm.getAscent() + fm.getDescent();
        double left = x - ax * w;
        double top = y - ay * h;
        g.drawString(s, (float) left, (float) (top + fm.getAscent()));
        return new Rectangle2D.Double(left, top, w, h);
    }

    static Rectangle2D bounds(Graphics2D g, String s, double x, double y, double ax, double ay) {
        FontMetrics fm = g.getFontMetrics();
        double w = fm.stringWidth(s);
        double h = fm.getAscent() + fm.getDescent();
        return new Rectangle2D.Double(x - ax * w, y - ay * h, w, h);
    }

    /** Text on a translucent white box so it stays readable over a field or lines. */
    static Rectangle2D haloText(Graphics2D g, String s, double x, double y, double ax, double ay) {
        Rectangle2D b = bounds(g, s, x, y, ax, ay);
        Color c = g.getColor();
        g.setColor(new Color(255, 255, 255, 205));
        g.fill(new Rectangle2D.Double(b.getX() - 2, b.getY() - 1, b.getWidth() + 4, b.getHeight() + 2));
        g.setColor(c);
        return text(g, s, x, y, ax, ay);
    }

    /** Text rotated to read bottom-to-top, centred on (x, y) horizontally, its top edge at x. */
    static void verticalText(Graphics2D g, String s, double x, double y) {
        AffineTransform saved = g.getTransform();
        g.translate(x, y);
        g.rotate(-Math.PI / 2);
        FontMetrics fm = g.getFontMetrics();
        g.drawString(s, (float) (-fm.stringWidth(s) / 2.0), (float) (-fm.getDescent()));
        g.setTransform(saved);
    }

    static Shape markerShape(Marker m, double x, double y, double size) {
        double r = size / 2;
        switch (m) {
            case SQUARE:
                return new Rectangle2D.Double(x - r * 0.9, y - r * 0.9, 1.8 * r, 1.8 * r);
            case TRIANGLE: {
                Path2D p = new Path2D.Double();
                p.moveTo(x, y - r * 1.15);
                p.lineTo(x + r, y + r * 0.75);
                p.lineTo(x - r, y + r * 0.75);
                p.closePath();
                return p;
            }
            case DIAMOND: {
                Path2D p = new Path2D.Double();
                p.moveTo(x, y - r * 1.2);
                p.lineTo(x + r, y);
                p.lineTo(x, y + r * 1.2);
                p.lineTo(x - r, y);
                p.closePath();
                return p;
            }
            case CROSS: {
                Path2D p = new Path2D.Double();
                p.moveTo(x - r, y - r);
                p.lineTo(x + r, y + r);
                p.moveTo(x - r, y + r);
                p.lineTo(x + r, y - r);
                return p;
            }
            case PLUS: {
                Path2D p = new Path2D.Double();
                p.moveTo(x - r * 1.2, y);
                p.lineTo(x + r * 1.2, y);
                p.moveTo(x, y - r * 1.2);
                p.lineTo(x, y + r * 1.2);
                return p;
            }
            default:
                return new Ellipse2D.Double(x - r, y - r, 2 * r, 2 * r);
        }
    }

    static void marker(Graphics2D g, Marker m, double x, double y, double size, Color color, boolean filled) {
        if (m == Marker.NONE) {
            return;
        }
        Shape s = markerShape(m, x, y, size);
        Stroke saved = g.getStroke();
        g.setStroke(Theme.solid(1.3f));
        if (m == Marker.CROSS || m == Marker.PLUS) {
            g.setColor(color);
            g.draw(s);
        } else {
            g.setColor(filled ? color : Color.WHITE);
            g.fill(s);
            g.setColor(filled ? color.darker() : color);
            g.draw(s);
        }
        g.setStroke(saved);
    }

    /** One legend row: a line sample, a marker, a filled patch, or a combination. */
    static final class LegendEntry {
        final String label;
        final Color color;
        final Stroke stroke; // null: no line
        final Marker marker;
        final Color patch; // null: no patch
        final boolean markerFilled;

        LegendEntry(String label, Color color, Stroke stroke, Marker marker, Color patch, boolean markerFilled) {
            this.label = label;
            this.color = color;
            this.stroke = stroke;
            this.marker = marker == null ? Marker.NONE : marker;
            this.patch = patch;
            this.markerFilled = markerFilled;
        }

        static LegendEntry line(String label, Color c, Stroke s, Marker m) {
            return new LegendEntry(label, c, s, m, null, true);
        }
    }

    static java.awt.Dimension legendSize(Graphics2D g, List<LegendEntry> entries) {
        FontMetrics fm = g.getFontMetrics(Theme.LEGEND);
        int w = 0;
        for (LegendEntry e : entries) {
            w = Math.max(w, fm.stringWidth(e.label));
        }
        int rowH = fm.getHeight() + 3;
        return new java.awt.Dimension(w + 30 + 8 + 16, entries.size() * rowH + 10);
    }

    /** Splits text into lines no wider than {@code widthPx} at spaces (a word longer than the width gets a line of its own). */
    static List<String> wrap(FontMetrics fm, String text, double widthPx) {
        List<String> lines = new java.util.ArrayList<>();
        StringBuilder line = new StringBuilder();
        for (String w : text.split(" ")) {
            String next = line.length() == 0 ? w : line + " " + w;
            if (line.length() > 0 && fm.stringWidth(next) > widthPx) {
                lines.add(line.toString());
                line.setLength(0);
                line.append(w);
            } else {
                line.setLength(0);
                line.append(next);
            }
        }
        if (line.length() > 0) {
            lines.add(line.toString());
        }
        return lines;
    }

    /**
     * Draws a legend in the plot corner that hides the fewest of the given pixel points (upper right,
     * upper left, lower right, lower left, in that order of preference).
     */
    static void legendInside(Graphics2D g, List<LegendEntry> entries, Rectangle plot, List<double[]> avoidPx) {
        if (entries.isEmpty()) {
            return;
        }
        java.awt.Dimension d = legendSize(g, entries);
        int m = 8;
        int[][] corners = {
            {plot.x + plot.width - d.width - m, plot.y + m},
            {plot.x + m, plot.y + m},
            {plot.x + plot.width - d.width - m, plot.y + plot.height - d.height - m},
            {plot.x + m, plot.y + plot.height - d.height - m},
        };
        int best = 0;
        long bestCount = Long.MAX_VALUE;
        for (int c = 0; c < corners.length; c++) {
            // a margin of a marker's size, so points drawn on the frame (members without a value) count too
            Rectangle r = new Rectangle(corners[c][0] - 12, corners[c][1] - 12, d.width + 24, d.height + 24);
            long n = 0;
            for (double[] p : avoidPx) {
                if (r.contains(p[0], p[1])) {
                    n++;
                }
            }
            if (n < bestCount) {
                bestCount = n;
                best = c;
            }
        }
        legendAt(g, entries, corners[best][0], corners[best][1]);
    }

    static void legendAt(Graphics2D g, List<LegendEntry> entries, int x, int y) {
        java.awt.Dimension d = legendSize(g, entries);
        g.setColor(new Color(255, 255, 255, 225));
        g.fillRect(x, y, d.width, d.height);
        g.setColor(new Color(0xbbbbbb));
        g.setStroke(Theme.solid(1f));
        g.drawRect(x, y, d.width, d.height);
        g.setFont(Theme.LEGEND);
        FontMetrics fm = g.getFontMetrics();
        int rowH = fm.getHeight() + 3;
        double cy = y + 5 + rowH / 2.0;
        for (LegendEntry e : entries) {
            double sx = x + 8;
            if (e.patch != null) {
                g.setColor(e.patch);
                g.fill(new Rectangle2D.Double(sx, cy - 6, 30, 12));
                if (e.color != null) {
                    g.setColor(e.color);
                    g.setStroke(Theme.solid(1f));
                    g.draw(new Rectangle2D.Double(sx, cy - 6, 30, 12));
                }
            }
            if (e.stroke != null) {
                g.setColor(e.color);
                g.setStroke(e.stroke);
                g.draw(new Line2D.Double(sx, cy, sx + 30, cy));
            }
            if (e.marker != Marker.NONE) {
                marker(g, e.marker, sx + 15, cy, 8, e.color, e.markerFilled);
            }
            g.setColor(Theme.INK);
            text(g, e.label, sx + 38, cy, 0, 0.5);
            cy += rowH;
        }
    }

    /** Pixel points of a series, for legend placement. */
    static void collect(List<double[]> out, Axis xa, Axis ya, double[] xs, double[] ys) {
        int step = Math.max(1, xs.length / 400);
        for (int i = 0; i < xs.length; i += step) {
            if (Double.isFinite(xs[i]) && Double.isFinite(ys[i])) {
                out.add(new double[] {xa.px(xs[i]), ya.px(ys[i])});
            }
        }
    }

    /** A polyline through finite points; NaN breaks the line. */
    static Path2D polyline(Axis xa, Axis ya, double[] xs, double[] ys) {
        Path2D p = new Path2D.Double();
        boolean pen = false;
        for (int i = 0; i < xs.length; i++) {
            if (!Double.isFinite(xs[i]) || !Double.isFinite(ys[i])) {
                pen = false;
                continue;
            }
            double px = xa.px(xs[i]);
            double py = ya.px(ys[i]);
            if (pen) {
                p.lineTo(px, py);
            } else {
                p.moveTo(px, py);
                pen = true;
            }
        }
        return p;
    }

    static double[] finiteRange(double[]... arrays) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (double[] a : arrays) {
            if (a == null) {
                continue;
            }
            for (double v : a) {
                if (Double.isFinite(v)) {
                    lo = Math.min(lo, v);
                    hi = Math.max(hi, v);
                }
            }
        }
        return new double[] {lo, hi};
    }
}
