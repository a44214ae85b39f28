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
        return Theme.axisTitle(label, unit);
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
