package org.littoral.scenarios.report;

/**
 * What a builder knows about a numeric axis before layout: its label and unit, and an optional fixed
 * range. Without a fixed range the figure takes the data range (tight for coordinates, loose for values).
 */
final class AxisSpec {
    String label = "";
    String unit = "";
    double min = Double.NaN;
    double max = Double.NaN;
    Boolean loose; // null: the figure decides

    String title() {
        return clock() ? label : Theme.axisTitle(label, unit);
    }

    /**
     * A time-of-day axis: unit "h" and a label that says local time. Its ticks fall on whole minutes and hours and read
     * HH:MM (a reader never sees decimal hours).
     */
    boolean clock() {
        return isClock(label, unit);
    }

    static boolean isClock(String label, String unit) {
        if (!"h".equals(unit) || label == null) {
            return false;
        }
        String l = label.toLowerCase(java.util.Locale.ROOT);
        return l.contains("local time") || l.contains("local clock") || l.contains("local)");
    }

    boolean fixed() {
        return Double.isFinite(min) && Double.isFinite(max);
    }

    AxisSpec copy() {
        AxisSpec a = new AxisSpec();
        a.label = label;
        a.unit = unit;
        a.min = min;
        a.max = max;
        a.loose = loose;
        return a;
    }
}
