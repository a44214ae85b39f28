package org.littoral.scenarios.report;

import java.util.Locale;

/**
 * How a time reads in a report: local clock time as HH:MM (with "+1d" on the next day), durations in whole
 * minutes. Decimal hours are for CSV files only.
 */
public final class ClockTime {
    private ClockTime() {
    }

    /** HH:MM local clock time, "+1d" for the next day; null for NaN or null (a table shows it as a dash). */
    public static String hhmm(Double hours) {
        if (hours == null || Double.isNaN(hours)) {
            return null;
        }
        if (Double.isInfinite(hours)) {
            return "never";
        }
        long minutes = Math.round(hours * 60.0);
        long day = Math.floorDiv(minutes, 1440);
        long m = Math.floorMod(minutes, 1440);
        return String.format(Locale.ROOT, "%02d:%02d", m / 60, m % 60) + (day == 0 ? "" : (day > 0 ? " +" : " ") + day + "d");
    }

    /** A duration given in hours as whole minutes ("7 min"); null for NaN or null. */
    public static String minutes(Double hours) {
        if (hours == null || !Double.isFinite(hours)) {
            return null;
        }
        return Math.round(hours * 60.0) + " min";
    }

    /** A clock time with its uncertainty: "11:53 +/- 7 min". */
    public static String hhmmWithin(double hours, double uncertaintyHours) {
        String t = hhmm(hours);
        if (t == null || !(uncertaintyHours > 0)) {
            return t;
        }
        return t + " +/- " + Math.round(uncertaintyHours * 60.0) + " min";
    }
}
