package org.littoral.scenarios.analysis.composite;

import org.littoral.scenarios.analysis.Layer;
import org.littoral.scenarios.analysis.Variable;
import org.littoral.scenarios.input.UserInputException;

/**
 * One composite: a layer-mean variable binned by time relative to the passage or by hour of day,
 * grouped by a per-day attribute.
 *
 * @param axis         time axis
 * @param groupBy      attribute name: site, day, month, breeze_type, or any user attribute (convection, tag, ...)
 * @param anomaly      true: values minus the day's pre-passage mean (relative axis) or daily mean (hour axis)
 * @param binHours     bin width, h
 * @param fromHours    first bin edge (relative hours, or clock hours)
 * @param toHours      last bin edge
 */
public record CompositeSpec(Axis axis, Variable variable, Layer layer, String groupBy, boolean anomaly, double binHours,
                            double fromHours, double toHours) {

    public enum Axis { RELATIVE_TO_PASSAGE, HOUR_OF_DAY }

    public CompositeSpec {
        if (!(binHours > 0) || !(toHours > fromHours)) {
            throw new UserInputException("composite " + variable + " " + layer + ": need binHours > 0 and toHours > fromHours; got "
                    + binHours + ", " + fromHours + ".." + toHours);
        }
    }

    /** Default relative composite: 30-min bins from 3 h before to 4 h after the first onshore passage. */
    public static CompositeSpec relative(Variable v, Layer layer, String groupBy) {
        return new CompositeSpec(Axis.RELATIVE_TO_PASSAGE, v, layer, groupBy, true, 0.5, -3.0, 4.0);
    }

    /** Default hour-of-day composite: 1-h bins 06-20 h local, raw values. */
    public static CompositeSpec hourOfDay(Variable v, Layer layer, String groupBy) {
        return new CompositeSpec(Axis.HOUR_OF_DAY, v, layer, groupBy, false, 1.0, 6.0, 20.0);
    }

    public String label() {
        return (axis == Axis.RELATIVE_TO_PASSAGE ? "relative" : "hour") + ":" + variable.column() + ":" + layer.label() + ":by_"
                + groupBy + (anomaly ? ":anomaly" : "");
    }

    public int bins() {
        return (int) Math.ceil((toHours - fromHours) / binHours - 1e-9);
    }
}
