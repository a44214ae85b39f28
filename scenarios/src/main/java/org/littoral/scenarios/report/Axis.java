package org.littoral.scenarios.report;

import java.awt.FontMetrics;

/** One numeric axis: data range, pixel span, nice ticks and its title. Immutable. */
final class Axis {
    final String title;
    final double min;
    final double max;
    final double p0; // pixel of min
    final double p1; // pixel of max
    final NiceTicks ticks;

    Axis(String title, double min, double max, double p0, double p1, NiceTicks ticks) {
        this.title = title;
        this.min = min;
        this.max = max;
        this.p0 = p0;
        this.p1 = p1;
        this.ticks = ticks;
    }

    double px(double v) {
        return p0 + (v - min) / (max - min) * (p1 - p0);
    }

    double value(double px) {
        return min + (px - p0) / (p1 - p0) * (max - min);
    }

    boolean contains(double v) {
        double lo = Math.min(min, max);
        double hi = Math.max(min, max);
        return v >= lo - 1e-9 * (hi - lo) && v <= hi + 1e-9 * (hi - lo);
    }

    /**
     * Chooses the densest nice ticks whose labels do not collide on an axis {@code lengthPx} long.
     * {@code loose} widens [min, max] to whole ticks (Heckbert's loose labelling).
     */
    static NiceTicks chooseTicks(double min, double max, boolean loose, double lengthPx, boolean horizontal,
            FontMetrics fm) {
        return chooseTicks(min, max, loose, lengthPx, horizontal, fm, false);
    }

    /** As above; {@code clock} puts the ticks on clock divisions of hours and labels them HH:MM. */
    static NiceTicks chooseTicks(double min, double max, boolean loose, double lengthPx, boolean horizontal,
            FontMetrics fm, boolean clock) {
        int target = (int) Math.max(2, Math.round(lengthPx / (horizontal ? 85.0 : 55.0)));
        NiceTicks best = null;
        for (int n = target + 1; n >= 2; n--) {
            NiceTicks t = clock ? NiceTicks.clock(min, max, n, loose)
                    : loose ? NiceTicks.loose(min, max, n) : NiceTicks.within(min, max, n);
            if (best == null) {
                best = t;
            }
            double span = t.graphMax() - t.graphMin();
            double spacingPx = t.spacing() / span * lengthPx;
            double need;
            if (horizontal) {
                int w = 0;
                for (int i = 0; i < t.count(); i++) {
                    w = Math.max(w, fm.stringWidth(t.label(i)));
                }
                need = w + 16;
            } else {
                need = fm.getHeight() + 12;
            }
            if (spacingPx >= need && t.count() <= target + 2) {
                return t;
            }
            best = t;
        }
        return best;
    }
}
