package org.littoral.scenarios.report;

import java.util.List;

/**
 * One time-height section panel at a site (x: local time, read HH:MM; y: height above ground), the one drawing
 * shared by every report that shows soundings in time: compare (observed beside model) and observe (each observed
 * site-day). Signed quantities (cross-shore wind) use the blue-white-red scale, scalars (theta) the sequential one;
 * events (passages, front arrivals) are labelled vertical lines, drawn only inside the time axis.
 */
public final class TimeHeightPanel {
    private TimeHeightPanel() {
    }

    /** A labelled vertical line at a local time, hours. */
    public record Event(double timeH, String label) {
    }

    /**
     * @param values    [height][time], NaN where there is no data (drawn grey)
     * @param range     colour range {min, max}
     * @param diverging true for a signed quantity centred on zero
     */
    public static FieldFigure of(String title, double[] timeH, double[] heightM, double[][] values, String label, String unit,
                                 double[] range, boolean diverging, List<Event> events, int widthPx, int heightPx) {
        FieldFigure.Builder b = FieldFigure.builder().size(widthPx, heightPx).title(title)
                .x(timeH, "Local time", "h").y(heightM, "Height above ground", "m").values(values)
                .colorBar(label, unit).colorRange(range[0], range[1]);
        if (diverging) {
            b.diverging();
        } else {
            b.sequential();
        }
        double t0 = timeH[0];
        double t1 = timeH[timeH.length - 1];
        for (Event e : events) {
            if (Double.isFinite(e.timeH()) && e.timeH() >= t0 && e.timeH() <= t1) {
                b.verticalLine(e.timeH(), e.label());
            }
        }
        return b.build();
    }

    /** A colour range symmetric about zero that holds every finite value of the fields, rounded out to a nice tick. */
    public static double[] symmetricRange(double[][]... fields) {
        double m = 0;
        for (double[][] f : fields) {
            for (double[] row : f) {
                for (double x : row) {
                    if (Double.isFinite(x)) {
                        m = Math.max(m, Math.abs(x));
                    }
                }
            }
        }
        if (m == 0) {
            m = 1;
        }
        double top = NiceTicks.roundOut(0, m, 4)[1];
        return new double[] {-top, top};
    }

    /** The range of every finite value of the fields, rounded out to nice ticks ({0, 1} when there is none). */
    public static double[] range(double[][]... fields) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (double[][] f : fields) {
            for (double[] row : f) {
                for (double x : row) {
                    if (Double.isFinite(x)) {
                        lo = Math.min(lo, x);
                        hi = Math.max(hi, x);
                    }
                }
            }
        }
        if (lo > hi) {
            return new double[] {0, 1};
        }
        if (hi == lo) {
            hi = lo + 1;
        }
        return NiceTicks.roundOut(lo, hi, 6);
    }
}
