package org.littoral.scenarios.analysis.ingest;

import java.util.Arrays;
import java.util.Locale;
import java.util.function.Consumer;
import org.littoral.scenarios.input.UserInputException;

/**
 * Whole-column unit checks on the tidy table, before any value is used: a column whose values nearly all
 * look like another unit (kelvin in a Celsius column, Pa in an hPa column, a fraction in a percent column,
 * kg/kg in a g/kg column) stops the run with one line naming the unit they look like; wind speeds that look
 * like knots read as m/s warn. Single odd values stay the per-value QC's business (they are logged there).
 */
public final class UnitSniffer {
    /** Share of a column's values that must look like the other unit before the column is refused. */
    static final double NEARLY_ALL = 0.95;
    /** Fewer values than this are left to the per-value checks. */
    static final int MIN_VALUES = 10;

    private UnitSniffer() {
    }

    public static void check(CsvTable t, Consumer<String> warn) {
        for (int c = 0; c < t.header().size(); c++) {
            String h = t.header().get(c);
            if (h.equals(ProfileColumns.TEMPERATURE_C) || h.startsWith(ProfileColumns.TEMPERATURE_C_SENSOR_PREFIX)
                    || h.equals(ProfileColumns.DEWPOINT_C)) {
                double[] v = values(t, c);
                refuseIf(t, c, v, 150, 350, "kelvin (K)", "deg C", "K");
                // degF: a warm day's 60-110 F would be 16-43 C, so F is named only when the middle of the column is above any plausible C.
                if (v.length >= MIN_VALUES && median(v) > 50 && share(v, 0, 130) >= NEARLY_ALL) {
                    throw refuse(t, c, v, "degrees Fahrenheit (degF)", "deg C", "degF", "its median is " + fmt(median(v)));
                }
            } else if (h.equals(ProfileColumns.PRESSURE_HPA)) {
                double[] v = values(t, c);
                refuseIf(t, c, v, 5000, 120000, "pascal (Pa)", "hPa", "Pa");
                refuseIf(t, c, v, 10, 115, "kilopascal (kPa)", "hPa", "kPa");
            } else if (h.equals(ProfileColumns.RH_PERCENT) || h.startsWith(ProfileColumns.RH_PERCENT_SENSOR_PREFIX)) {
                double[] v = values(t, c);
                if (v.length >= MIN_VALUES && share(v, 0, 1.0) >= 1.0 && max(v) > 0) {
                    throw refuse(t, c, v, "a fraction (unit 1)", "percent", "1", "all lie in 0..1");
                }
            } else if (h.equals(ProfileColumns.MIXING_RATIO_G_PER_KG)) {
                double[] v = values(t, c);
                if (v.length >= MIN_VALUES && share(v, 0, 0.06) >= 1.0 && max(v) > 0) {
                    throw refuse(t, c, v, "kg/kg", "g/kg", "kg/kg", "all lie in 0..0.06");
                }
            } else if (h.equals(ProfileColumns.WIND_SPEED_M_PER_S)) {
                double[] v = values(t, c);
                if (v.length >= MIN_VALUES && median(v) > 15.0) {
                    warn.accept(t.fileName() + ": " + t.describe(c) + ": median wind speed " + fmt(median(v))
                            + " m/s is implausible for boundary-layer profiles; are the values knots or km/h read as m/s? "
                            + "Give the unit in a column map (--columns)");
                }
            }
        }
    }

    private static void refuseIf(CsvTable t, int c, double[] v, double lo, double hi, String looksLike, String expected,
                                 String unit) {
        if (v.length >= MIN_VALUES && share(v, lo, hi) >= NEARLY_ALL) {
            throw refuse(t, c, v, looksLike, expected, unit, String.format(Locale.ROOT, "%.0f %% lie in %s..%s",
                    100 * share(v, lo, hi), fmt(lo), fmt(hi)));
        }
    }

    private static UserInputException refuse(CsvTable t, int c, double[] v, String looksLike, String expected, String unit,
                                             String why) {
        String fix = t.origin(t.header().get(c)) != null
                ? "correct the unit given for it in the column map (e.g. unit: " + unit + ")"
                : "convert the column to " + expected + ", or read the file with a column map (--columns) that gives unit: " + unit;
        return new UserInputException(t.fileName() + ": " + t.describe(c) + ": the values look like " + looksLike + ", not "
                + expected + " (" + why + " of " + v.length + " values, e.g. " + fmt(v[v.length / 2]) + "); " + fix);
    }

    /** The column's non-missing numeric values (unparsable cells are left to the reader's own error). */
    private static double[] values(CsvTable t, int c) {
        double[] out = new double[t.rowCount()];
        int m = 0;
        for (int r = 0; r < t.rowCount(); r++) {
            String s = t.cell(r, c);
            if (CsvTable.isMissing(s)) {
                continue;
            }
            try {
                double d = Double.parseDouble(s);
                if (Double.isFinite(d)) {
                    out[m++] = d;
                }
            } catch (NumberFormatException e) {
                // reported with its line by the reader
            }
        }
        return Arrays.copyOf(out, m);
    }

    private static double share(double[] v, double lo, double hi) {
        if (v.length == 0) {
            return 0;
        }
        int c = 0;
        for (double d : v) {
            if (d >= lo && d <= hi) {
                c++;
            }
        }
        return (double) c / v.length;
    }

    private static double median(double[] v) {
        double[] s = v.clone();
        Arrays.sort(s);
        return s.length % 2 == 1 ? s[s.length / 2] : 0.5 * (s[s.length / 2 - 1] + s[s.length / 2]);
    }

    private static double max(double[] v) {
        double m = Double.NEGATIVE_INFINITY;
        for (double d : v) {
            m = Math.max(m, d);
        }
        return m;
    }

    private static String fmt(double d) {
        return new java.math.BigDecimal(String.format(Locale.ROOT, "%.6g", d)).stripTrailingZeros().toPlainString();
    }
}
