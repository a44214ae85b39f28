package org.littoral.scenarios.report;

import java.util.Locale;

/**
 * Tick marks at "nice" numbers: Heckbert, P. S. (1990), "Nice numbers for graph labels", in
 * Graphics Gems (A. S. Glassner, ed.), Academic Press, pp. 61-63. Spacings are 1, 2 or 5 times a
 * power of ten. {@link #loose} is the paper's loose labelling (graph range rounded outwards to whole
 * ticks); {@link #within} keeps a fixed data range (a field's extent) and puts the ticks inside it.
 */
public final class NiceTicks {
    private final double graphMin;
    private final double graphMax;
    private final double spacing;
    private final int fractionDigits;
    private final double[] values;

    /** True for ticks in hours of the day, labelled HH:MM. */
    private final boolean clock;

    private NiceTicks(double graphMin, double graphMax, double spacing, double[] values) {
        this(graphMin, graphMax, spacing, values, false);
    }

    private NiceTicks(double graphMin, double graphMax, double spacing, double[] values, boolean clock) {
        this.graphMin = graphMin;
        this.graphMax = graphMax;
        this.spacing = spacing;
        // Heckbert (1990): nfrac = max(-floor(log10 d), 0) fraction digits show every tick exactly.
        this.fractionDigits = Math.max(-(int) Math.floor(Math.log10(spacing) + 1e-9), 0);
        this.values = values;
        this.clock = clock;
    }

    /** Tick spacings of a time-of-day axis, hours: the divisions of a clock, not of ten. */
    private static final double[] CLOCK_STEPS_H = {5 / 60.0, 10 / 60.0, 15 / 60.0, 0.5, 1, 2, 3, 4, 6, 12, 24};

    /**
     * Ticks for a time-of-day axis in hours, at about {@code nTicks} ticks, labelled HH:MM: the spacing is the smallest
     * clock division at least (max - min) / (nTicks - 1). {@code loose} rounds the graph range out to whole ticks.
     */
    public static NiceTicks clock(double min, double max, int nTicks, boolean loose) {
        double[] mm = widenDegenerate(min, max);
        min = mm[0];
        max = mm[1];
        double want = (max - min) / Math.max(nTicks - 1, 1);
        double d = CLOCK_STEPS_H[CLOCK_STEPS_H.length - 1];
        for (double c : CLOCK_STEPS_H) {
            if (c >= want - 1e-12) {
                d = c;
                break;
            }
        }
        if (loose) {
            double gmin = Math.floor(min / d + 1e-9) * d;
            double gmax = Math.ceil(max / d - 1e-9) * d;
            return new NiceTicks(gmin, gmax, d, ticks(gmin, gmax, d), true);
        }
        double first = Math.ceil(min / d - 1e-9) * d;
        double last = Math.floor(max / d + 1e-9) * d;
        return new NiceTicks(min, max, d, ticks(first, last, d), true);
    }

    /**
     * Heckbert's nicenum: a nice number near {@code x}; {@code round} rounds to nearest (1, 2, 5, 10),
     * otherwise takes the ceiling among them.
     */
    public static double niceNumber(double x, boolean round) {
        if (!(x > 0) || Double.isInfinite(x)) {
            throw new IllegalArgumentException("nice number needs a positive finite value, got " + x);
        }
        double exponent = Math.floor(Math.log10(x));
        double pow = Math.pow(10, exponent);
        double f = x / pow;
        double nf;
        if (round) {
            nf = f < 1.5 ? 1 : f < 3 ? 2 : f < 7 ? 5 : 10;
        } else {
            nf = f <= 1 ? 1 : f <= 2 ? 2 : f <= 5 ? 5 : 10;
        }
        return nf * pow;
    }

    /** Heckbert's loose labelling with about {@code nTicks} ticks: the graph range covers the data range. */
    public static NiceTicks loose(double min, double max, int nTicks) {
        double[] mm = widenDegenerate(min, max);
        min = mm[0];
        max = mm[1];
        double range = niceNumber(max - min, false);
        double d = niceNumber(range / Math.max(nTicks - 1, 1), true);
        double gmin = Math.floor(min / d + 1e-9) * d;
        double gmax = Math.ceil(max / d - 1e-9) * d;
        return new NiceTicks(gmin, gmax, d, ticks(gmin, gmax, d));
    }

    /**
     * Ticks at a nice spacing near (max - min) / (nTicks - 1), all within [min, max]; the graph range
     * stays [min, max].
     */
    public static NiceTicks within(double min, double max, int nTicks) {
        double[] mm = widenDegenerate(min, max);
        min = mm[0];
        max = mm[1];
        // Heckbert first rounds the range up to a nice number; with a fixed range that can double the
        // spacing (120 -> 200 -> ticks 50 apart), so the spacing is taken from the range itself.
        double d = niceNumber((max - min) / Math.max(nTicks - 1, 1), true);
        // Fewer than two ticks inside a narrow range reads badly: halve the spacing once or twice.
        for (int i = 0; i < 3 && Math.floor(max / d + 1e-9) - Math.ceil(min / d - 1e-9) < 1; i++) {
            d = niceNumber(d / 2, true);
        }
        double first = Math.ceil(min / d - 1e-9) * d;
        double last = Math.floor(max / d + 1e-9) * d;
        return new NiceTicks(min, max, d, ticks(first, last, d));
    }

    /**
     * A nice range that covers [min, max] with a spacing near (max - min) / (nTicks - 1): each end
     * rounded outwards to a multiple of that spacing (used for colour-bar limits, which should end on
     * a labelled tick without Heckbert's range rounding doubling the span).
     */
    public static double[] roundOut(double min, double max, int nTicks) {
        double[] mm = widenDegenerate(min, max);
        double d = niceNumber((mm[1] - mm[0]) / Math.max(nTicks - 1, 1), true);
        double lo = Math.floor(mm[0] / d + 1e-9) * d;
        double hi = Math.ceil(mm[1] / d - 1e-9) * d;
        return new double[] {lo == 0 ? 0.0 : lo, hi == 0 ? 0.0 : hi};
    }

    private static double[] widenDegenerate(double min, double max) {
        if (!Double.isFinite(min) || !Double.isFinite(max)) {
            throw new IllegalArgumentException("tick range must be finite, got [" + min + ", " + max + "]");
        }
        if (max < min) {
            double t = min;
            min = max;
            max = t;
        }
        if (max - min <= 1e-12 * Math.max(1, Math.abs(max))) {
            double w = min == 0 ? 1 : Math.abs(min) * 0.1;
            return new double[] {min - w, max + w};
        }
        return new double[] {min, max};
    }

    private static double[] ticks(double first, double last, double d) {
        int n = (int) Math.round((last - first) / d) + 1;
        double[] v = new double[Math.max(n, 0)];
        for (int i = 0; i < v.length; i++) {
            // multiply from an integer index: no accumulated round-off, and -0 becomes 0
            double t = (Math.round(first / d) + i) * d;
            v[i] = t == 0 ? 0.0 : t;
        }
        return v;
    }

    public double graphMin() {
        return graphMin;
    }

    public double graphMax() {
        return graphMax;
    }

    public double spacing() {
        return spacing;
    }

    /** True for ticks of a time of day (clock divisions of hours, labelled HH:MM). */
    public boolean clock() {
        return clock;
    }

    public int fractionDigits() {
        return fractionDigits;
    }

    /** The tick values (a copy). */
    public double[] values() {
        return values.clone();
    }

    public int count() {
        return values.length;
    }

    public double value(int i) {
        return values[i];
    }

    /** A tick label with exactly the fraction digits the spacing needs, and a true minus sign. */
    public String label(int i) {
        return clock ? ClockTime.hhmm(values[i]) : format(values[i], fractionDigits);
    }

    static String format(double v, int fractionDigits) {
        String s = String.format(Locale.ROOT, "%." + fractionDigits + "f", v);
        if (s.matches("-0(\\.0*)?")) {
            s = s.substring(1);
        }
        return s.replace('-', '\u2212');
    }
}
